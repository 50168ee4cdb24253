package app.latentledger.ui.compare;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.units.Quantity;

import java.util.function.ToDoubleFunction;

/** A figure shown side by side on the compare screen, read from a coil check's result. */
enum CompareFigure {
    RETURN_DRY_BULB("Return dry bulb", Quantity.TEMPERATURE, 1, r -> r.entering().dryBulbC()),
    RETURN_DEW_POINT("Return dew point", Quantity.TEMPERATURE, 1, r -> r.entering().dewPointC()),
    SUPPLY_DRY_BULB("Supply dry bulb", Quantity.TEMPERATURE, 1, r -> r.leaving().dryBulbC()),
    SUPPLY_DEW_POINT("Supply dew point", Quantity.TEMPERATURE, 1, r -> r.leaving().dewPointC()),
    AIRFLOW("Airflow", Quantity.AIRFLOW, 0, r -> r.readings().airflowM3PerS()),
    AIRFLOW_PER_NOMINAL("Airflow per nominal size", Quantity.AIRFLOW_PER_CAPACITY, 0,
            CoilResult::airflowPerNominalCapacity),
    COIL("Coil temperature", Quantity.TEMPERATURE, 1, CoilResult::coilTemperatureC),
    MARGIN("Dew point minus coil", Quantity.TEMPERATURE_DIFFERENCE, 1,
            r -> r.estimate(Measurand.DEW_POINT_MARGIN).valueSi()),
    DROP("Moisture drop", Quantity.HUMIDITY_RATIO_FINE, 1, r -> r.process().humidityRatioDrop()),
    TOTAL("Total capacity", Quantity.POWER, 0, r -> r.process().totalW()),
    SENSIBLE("Sensible", Quantity.POWER, 0, r -> r.process().sensibleW()),
    LATENT("Latent", Quantity.POWER, 0, r -> r.process().latentW()),
    SHR("Sensible heat ratio", Quantity.DIMENSIONLESS, 2, r -> r.process().sensibleHeatRatio()),
    WATER("Water removed", Quantity.WATER_RATE, 2, r -> r.process().moistureRemovalKgPerS()),
    LATENT_PER_AIRFLOW("Latent per airflow", Quantity.POWER_PER_AIRFLOW, 1, r -> r.process().latentPerAirflow());

    final String label;
    final Quantity quantity;
    final int decimals;
    final ToDoubleFunction<CoilResult> read;

    CompareFigure(String label, Quantity quantity, int decimals, ToDoubleFunction<CoilResult> read) {
        this.label = label;
        this.quantity = quantity;
        this.decimals = decimals;
        this.read = read;
    }

    String key() {
        return name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
    }
}
