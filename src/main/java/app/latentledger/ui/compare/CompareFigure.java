package app.latentledger.ui.compare;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.function.ToDoubleFunction;

/** A figure shown side by side on the compare screen, read from a coil check's result. */
enum CompareFigure {
    RETURN_DRY_BULB("Return dry bulb", Quantity.TEMPERATURE, r -> r.entering().dryBulbC()),
    RETURN_DEW_POINT("Return dew point", Quantity.TEMPERATURE, r -> r.entering().dewPointC()),
    SUPPLY_DRY_BULB("Supply dry bulb", Quantity.TEMPERATURE, r -> r.leaving().dryBulbC()),
    SUPPLY_DEW_POINT("Supply dew point", Quantity.TEMPERATURE, r -> r.leaving().dewPointC()),
    AIRFLOW("Airflow", Quantity.AIRFLOW, r -> r.readings().airflowM3PerS()),
    AIRFLOW_PER_NOMINAL(Measurand.AIRFLOW_PER_NOMINAL_CAPACITY, CoilResult::airflowPerNominalCapacity),
    COIL("Coil temperature", Quantity.TEMPERATURE, CoilResult::coilTemperatureC),
    MARGIN("Coil against the return dew point", Quantity.TEMPERATURE_DIFFERENCE,
            r -> r.estimate(Measurand.DEW_POINT_MARGIN).valueSi()),
    DROP(Measurand.HUMIDITY_RATIO_DROP, r -> r.process().humidityRatioDrop()),
    TOTAL("Total capacity", Quantity.POWER, r -> r.process().totalW()),
    SENSIBLE("Sensible", Quantity.POWER, r -> r.process().sensibleW()),
    LATENT("Latent", Quantity.POWER, r -> r.process().latentW()),
    /** Withheld as the results screen withholds it: only when the total is clearly above zero. */
    SHR("Sensible heat ratio", Quantity.DIMENSIONLESS, r -> r.estimate(Measurand.SHR).valueSi()),
    WATER(Measurand.MOISTURE_REMOVAL, r -> r.process().moistureRemovalKgPerS()),
    LATENT_PER_AIRFLOW(Measurand.LATENT_PER_AIRFLOW, r -> r.process().latentPerAirflow());

    private final String label;
    /** The coil check's name for the figure, when it has one: the label then comes from there. */
    private final Measurand named;
    final Quantity quantity;
    final ToDoubleFunction<CoilResult> read;

    CompareFigure(String label, Quantity quantity, ToDoubleFunction<CoilResult> read) {
        this.label = label;
        this.named = null;
        this.quantity = quantity;
        this.read = read;
    }

    CompareFigure(Measurand named, ToDoubleFunction<CoilResult> read) {
        this.label = null;
        this.named = named;
        this.quantity = named.quantity();
        this.read = read;
    }

    /** The row's name in the tech's units, as Results and the report name the same figure. */
    String label(UnitSystem units) {
        return named == null ? label : named.title(units);
    }

    String key() {
        return name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
    }
}
