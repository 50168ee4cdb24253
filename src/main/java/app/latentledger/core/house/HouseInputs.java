package app.latentledger.core.house;

import app.latentledger.core.coil.UncertainInput;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.units.Quantity;

import java.util.ArrayList;
import java.util.List;

/**
 * Everything the budget is computed from, with the ± half-widths (rectangular, GUM §4.3.7) of the
 * quantities that carry an uncertainty. Half-widths of values reported with an expanded uncertainty
 * U (k = 2) are U·√3/2, which gives back the same standard uncertainty U/2.
 *
 * @param facts       the house
 * @param readings    the visit's readings
 * @param system      what the system removes
 * @param pressurePa  barometric pressure, Pa
 * @param thresholds  RH target, dew-point benchmark and finding thresholds
 */
public record HouseInputs(HouseFacts facts, HouseReadings readings, SystemRemoval system, double pressurePa,
                          ThresholdSettings thresholds) {
    /** ± share of the blower-door flow (common practice: single-point test repeatability). */
    public static final double Q50_HALF_WIDTH = 0.10;
    /** ± wind speed, m/s (common practice: the site wind is rarely measured). */
    public static final double WIND_HALF_WIDTH = 1.5;
    /** ± share of a ventilation airflow (common practice: a flow hood or the fan's rating). */
    public static final double VENTILATION_HALF_WIDTH = 0.15;
    /** ± ERV latent effectiveness (common practice). */
    public static final double ERV_HALF_WIDTH = 0.10;

    /** The indoor RH target, %. */
    public double rhTargetPct() {
        return thresholds.valueSi(Thresholds.INDOOR_RH_TARGET);
    }

    /** The indoor dew-point benchmark, °C. */
    public double dewPointMaxC() {
        return thresholds.valueSi(Thresholds.INDOOR_DEW_POINT_MAX);
    }

    /** The uncertain inputs in {@link BudgetModel}'s order. */
    public List<UncertainInput> uncertainInputs() {
        List<UncertainInput> in = new ArrayList<>(BudgetModel.N_INPUTS);
        reading(in, "indoor", readings.indoor());
        reading(in, "outdoor", readings.outdoor());
        reading(in, "grille", readings.grille());
        reading(in, "plenum", readings.plenum());
        reading(in, "space", readings.space());
        double q50 = facts.hasLeakage() ? facts.q50M3PerS() : 0.0;
        in.add(new UncertainInput("q50", "blower-door flow at 50 Pa", Quantity.AIRFLOW, q50, q50 * Q50_HALF_WIDTH));
        boolean sg = facts.infiltrationMethod() == Infiltration.Method.SHERMAN_GRIMSRUD;
        in.add(new UncertainInput("wind", "wind speed", Quantity.WIND_SPEED, facts.windOrDefault(),
                sg ? Math.min(WIND_HALF_WIDTH, facts.windOrDefault()) : 0));
        boolean nf = facts.infiltrationMethod() == Infiltration.Method.N_FACTOR;
        in.add(new UncertainInput("nFactor", "N-factor", Quantity.DIMENSIONLESS, Infiltration.DEFAULT_N_FACTOR,
                nf ? Infiltration.N_FACTOR_HALF_RANGE : 0));
        double vent = facts.ventilationType() == VentilationType.NONE ? 0 : facts.ventilationM3PerS();
        in.add(new UncertainInput("ventilation", "ventilation airflow", Quantity.AIRFLOW, vent,
                vent * VENTILATION_HALF_WIDTH));
        double eps = facts.latentEffectiveness();
        in.add(new UncertainInput("ervLatentEffectiveness", "ERV latent effectiveness", Quantity.DIMENSIONLESS, eps,
                facts.ventilationType() == VentilationType.ERV ? Math.min(ERV_HALF_WIDTH, eps) : 0));
        int occ = facts.occupantsOrDefault();
        in.add(new UncertainInput("internal", "internal moisture generation", Quantity.WATER_MASS_DAILY,
                InternalMoisture.midpointKgPerS(facts.floorAreaM2(), facts.bedrooms(), occ),
                InternalMoisture.halfSpreadKgPerS(facts.floorAreaM2(), facts.bedrooms(), occ)));
        in.add(k2("steadyRemoval", "steady moisture removal", Quantity.WATER_RATE, system.steadyRemovalKgPerS(),
                system.steadyRemovalU()));
        in.add(k2("adp", "apparatus dew point", Quantity.TEMPERATURE_DIFFERENCE, system.adpC(), system.adpU()));
        in.add(k2("bypassFactor", "bypass factor", Quantity.DIMENSIONLESS, system.bypassFactor(),
                system.bypassFactorU()));
        in.add(k2("total", "total capacity", Quantity.POWER, system.totalW(), 0));
        in.add(k2("airflow", "blower airflow", Quantity.AIRFLOW, system.airflowM3PerS(), system.airflowU()));
        in.add(k2("runtime", "runtime fraction", Quantity.FRACTION_PERCENT, system.runtimeFraction(),
                system.runtimeU()));
        in.add(k2("latentFraction", "part-load latent fraction", Quantity.FRACTION_PERCENT, system.latentFraction(),
                system.latentU()));
        in.add(k2("reevaporation", "share re-evaporated", Quantity.FRACTION_PERCENT, system.reevaporationShare(), 0));
        return in;
    }

    private static UncertainInput k2(String key, String label, Quantity q, double value, double expanded) {
        return new UncertainInput(key, label, q, value, expanded * Math.sqrt(3) / 2);
    }

    private static void reading(List<UncertainInput> in, String where, app.latentledger.core.coil.AirReading r) {
        if (r == null) {
            in.add(new UncertainInput(where + "DryBulb", where + " dry bulb", Quantity.TEMPERATURE_DIFFERENCE, 0, 0));
            in.add(new UncertainInput(where + "Humidity", where + " humidity", Quantity.DIMENSIONLESS, 0, 0));
            return;
        }
        in.add(new UncertainInput(where + "DryBulb", where + " dry bulb", Quantity.TEMPERATURE_DIFFERENCE,
                r.dryBulbC(), r.dryBulbTolK()));
        in.add(new UncertainInput(where + "Humidity", where + " " + r.humidityKind().label(),
                r.humidityKind().toleranceQuantity(), r.humiditySi(), r.humidityTolSi()));
    }
}
