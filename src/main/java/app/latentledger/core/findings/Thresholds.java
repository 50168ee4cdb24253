package app.latentledger.core.findings;

import app.latentledger.core.units.Quantity;

import java.util.List;

/**
 * Every threshold a finding uses, in one place, each with its source. Sections per analysis; add
 * a new one to {@link #all()} as well.
 */
public final class Thresholds {
    /** Says where a value comes from when no published source gives it. */
    public static final String COMMON_PRACTICE = "common practice, no source";

    // --- coil check -------------------------------------------------------------------------

    // --- logged run cycles ------------------------------------------------------------------
    // Used by app.latentledger.core.cycles. "latent-degradation.md" is the team research note on
    // the part-load latent model; its section numbers are given where a value comes from there.

    /** More starts per hour than this is short cycling. */
    public static final Threshold CYCLES_PER_HOUR_MAX = new Threshold("cyclesPerHourMax",
            "most compressor starts per hour before it counts as short cycling", Quantity.DIMENSIONLESS, 3.0,
            COMMON_PRACTICE + " (3 cycles/h is also the EnergyPlus-suggested maximum cycling rate N_max,"
                    + " Coil:Cooling:DX:SingleSpeed)");
    /** A median on-time below this is short cycling. */
    public static final Threshold MEDIAN_ON_TIME_MIN = new Threshold("medianOnTimeMin",
            "shortest median compressor on-time before it counts as short cycling", Quantity.DURATION_MINUTES,
            8 * 60.0, COMMON_PRACTICE);
    /** Below this fraction of steady-state moisture removal, cycling is limiting dehumidification. */
    public static final Threshold LATENT_FRACTION_MIN = new Threshold("latentFractionMin",
            "lowest fraction of steady-state moisture removal accepted at the observed cycling",
            Quantity.FRACTION_PERCENT, 0.7, COMMON_PRACTICE);
    /** Off-cycle re-evaporation is reported when it returns at least this share of the removed moisture. */
    public static final Threshold REEVAPORATION_SHARE = new Threshold("reevaporationShare",
            "share of the moisture removed that blower-on off periods put back before it counts",
            Quantity.FRACTION_PERCENT, 0.10, COMMON_PRACTICE);
    /** Humidity-ratio drop across the coil that counts as moisture removal (above sensor noise). */
    public static final Threshold MOISTURE_REMOVAL_FLOOR = new Threshold("moistureRemovalFloor",
            "smallest return-minus-supply humidity ratio counted as moisture removal",
            Quantity.HUMIDITY_RATIO_FINE, 0.0004,
            COMMON_PRACTICE + " (latent-degradation.md §5.4: noise floor 0.0003–0.0005 kg/kg)");
    /** Return and supply RH disagreeing by more than this over a dry coil with the blower on is a sensor offset. */
    public static final Threshold SENSOR_OFFSET_RH = new Threshold("sensorOffsetRh",
            "largest return/supply RH difference accepted over a dry coil with the blower on",
            Quantity.RELATIVE_HUMIDITY, 3.0, COMMON_PRACTICE + " (typical capacitive RH probe accuracy ±2–3 % RH)");
    /** Blower-on, compressor-off time after which the coil is taken as dry for the sensor comparison. */
    public static final Threshold SENSOR_CHECK_AFTER = new Threshold("sensorCheckAfter",
            "blower-on off time before return and supply humidity are compared", Quantity.DURATION_MINUTES,
            30 * 60.0, "latent-degradation.md §5.1 (≥ 30 min, derived from the 2·t_wet/γ dry-out of"
                    + " Henderson & Rengarajan 1996 with the EnergyPlus-suggested values)");
    /** On-cycles at least this long give the steady-state latent rate. */
    public static final Threshold LONG_CYCLE_ON_TIME = new Threshold("longCycleOnTime",
            "shortest on-cycle used for the steady-state moisture removal rate", Quantity.DURATION_MINUTES,
            15 * 60.0, "latent-degradation.md §5.6 (steady ΔW from on-cycles ≥ 15 min; derived, with common practice)");
    /** Return-minus-supply split above which the compressor is taken as running (no status column). */
    public static final Threshold SPLIT_ON = new Threshold("splitOn",
            "return-minus-supply dry-bulb split that confirms the compressor is running",
            Quantity.TEMPERATURE_DIFFERENCE, 3.0, COMMON_PRACTICE + " (latent-degradation.md §5.2)");
    /** Split below which the compressor is taken as stopped. */
    public static final Threshold SPLIT_OFF = new Threshold("splitOff",
            "return-minus-supply dry-bulb split below which the compressor is taken as stopped",
            Quantity.TEMPERATURE_DIFFERENCE, 1.0, COMMON_PRACTICE);
    /** Supply rise above its on-cycle low (or fall below its off-cycle high) that marks a stop (start). */
    public static final Threshold SUPPLY_EDGE = new Threshold("supplyEdge",
            "supply dry-bulb rise from its on-cycle low (or fall from its off-cycle high) that marks a stop (start)",
            Quantity.TEMPERATURE_DIFFERENCE, 1.5, COMMON_PRACTICE + " (latent-degradation.md §5.2)");
    /** How close to its low (high) the supply must be to date the stop (start) back to it. */
    public static final Threshold EDGE_TOLERANCE = new Threshold("edgeTolerance",
            "supply dry-bulb band used to date a start or stop back to where the change began",
            Quantity.TEMPERATURE_DIFFERENCE, 0.3, COMMON_PRACTICE);
    /** Detected runs or rests shorter than this are merged away (no status column). */
    public static final Threshold MIN_RUN_TIME = new Threshold("minRunTime",
            "shortest compressor run or rest the temperature detector accepts", Quantity.DURATION_SECONDS, 60.0,
            COMMON_PRACTICE);
    /** Blower judged on in an off period when supply and return enthalpy agree within this. */
    public static final Threshold BLOWER_ENTHALPY_BAND = new Threshold("blowerEnthalpyBand",
            "supply-minus-return enthalpy band that shows air moving over the stopped coil",
            Quantity.ENTHALPY, 2000.0, "derived: evaporation from a wet coil is adiabatic (ASHRAE Handbook—"
                    + "Fundamentals 2017 ch. 1, adiabatic saturation), so h_supply ≈ h_return with the blower on;"
                    + " band covers ±2–3 % RH probe error (common practice, no source)");
    /** A sample interval this many times the log's median is a gap. */
    public static final Threshold GAP_FACTOR = new Threshold("gapFactor",
            "sample interval, as a multiple of the log's usual interval, that counts as a gap",
            Quantity.DIMENSIONLESS, 3.0, COMMON_PRACTICE);

    private static final List<Threshold> LOGGED_RUN_CYCLES = List.of(CYCLES_PER_HOUR_MAX, MEDIAN_ON_TIME_MIN,
            LATENT_FRACTION_MIN, REEVAPORATION_SHARE, MOISTURE_REMOVAL_FLOOR, SENSOR_OFFSET_RH, SENSOR_CHECK_AFTER,
            LONG_CYCLE_ON_TIME, SPLIT_ON, SPLIT_OFF, SUPPLY_EDGE, EDGE_TOLERANCE, MIN_RUN_TIME, BLOWER_ENTHALPY_BAND,
            GAP_FACTOR);

    private Thresholds() {
    }

    /** All thresholds, for settings screens and the methods document. */
    public static List<Threshold> all() {
        java.util.List<Threshold> all = new java.util.ArrayList<>();
        all.addAll(LOGGED_RUN_CYCLES);
        return List.copyOf(all);
    }
}
