package app.latentledger.core.findings;

import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;

/**
 * Every threshold a finding uses, in one place, each with its source. Sections per analysis; add
 * a new one to {@link #all()} as well.
 */
public final class Thresholds {
    /** Says where a value comes from when no published source gives it. */
    public static final String COMMON_PRACTICE = "common practice, no source";

    // --- coil check -------------------------------------------------------------------------

    /** Above 450 cfm/ton the coil runs warm and wet air carries over; latent removal suffers. */
    public static final Threshold COIL_HIGH_AIRFLOW_PER_TON = new Threshold("coilHighAirflowPerTon",
            "airflow per ton above which latent removal suffers", Quantity.AIRFLOW_PER_CAPACITY,
            Quantity.AIRFLOW_PER_CAPACITY.fromDisplay(UnitSystem.IP, 450),
            "Parker, Sherwin, Raustad, Shirey, FSEC-PF-321-97 (1997): typical target 350–450 cfm/ton");
    /** Below 300 cfm/ton a coil risks icing and charge tests are not valid. */
    public static final Threshold COIL_LOW_AIRFLOW_PER_TON = new Threshold("coilLowAirflowPerTon",
            "airflow per ton below which the coil risks icing", Quantity.AIRFLOW_PER_CAPACITY,
            Quantity.AIRFLOW_PER_CAPACITY.fromDisplay(UnitSystem.IP, 300),
            "California Title 24 Part 6, Residential Appendix RA3.3 (2008): 300 cfm/ton minimum for a valid charge test");
    /** A sensible heat ratio above this leaves too little capacity for moisture. */
    public static final Threshold COIL_HIGH_SHR = new Threshold("coilHighShr",
            "sensible heat ratio above which the latent share is low", Quantity.DIMENSIONLESS, 0.80,
            "typical design SHR of residential equipment 0.75–0.80 (M. Holladay, Green Building Advisor, 2013);"
                    + " 0.80 as the limit is common practice, no source");
    /**
     * A benchmark for homes, not a limit: ASHRAE 62.1-2022 §5.12 caps the indoor dew point at 60 °F
     * (15 °C) for mechanically cooled commercial buildings; no residential standard sets one.
     */
    public static final Threshold INDOOR_DEW_POINT_MAX = new Threshold("indoorDewPointMax",
            "indoor dew-point benchmark for homes", Quantity.TEMPERATURE,
            Quantity.TEMPERATURE.fromDisplay(UnitSystem.IP, 60),
            "ASHRAE Standard 62.1-2022 §5.12 (indoor dew point ≤ 60 °F / 15 °C in mechanically cooled"
                    + " buildings), used for homes as a benchmark, not a limit");
    /** Keep indoor RH below 60 %. Settable: a home may aim lower. */
    public static final Threshold INDOOR_RH_TARGET = new Threshold("indoorRhTarget",
            "indoor relative humidity target", Quantity.RELATIVE_HUMIDITY, 60.0,
            "US EPA, A Brief Guide to Mold, Moisture and Your Home (keep indoor RH below 60 %)");
    /** Condensate and air side may differ this much before a mismatch is called (beyond uncertainty too). */
    public static final Threshold CONDENSATE_MISMATCH_FRACTION = new Threshold("condensateMismatchFraction",
            "condensate vs air-side moisture removal: largest accepted difference", Quantity.FRACTION_PERCENT, 0.20,
            COMMON_PRACTICE);

    /**
     * The least a wet coil's surface is taken to run above the refrigerant's saturation temperature:
     * 8 °F. Typical residential saturation 35–45 °F against an apparatus dew point of 48–54 °F at a
     * 75 °F / 50 % return, i.e. 8–15 °F of fin and air-film resistance (common practice, no source).
     */
    public static final Threshold COIL_SATURATION_ALLOWANCE = new Threshold("coilSaturationAllowance",
            "least the coil surface runs above the evaporator saturation temperature",
            Quantity.TEMPERATURE_DIFFERENCE, 8 / 1.8,
            COMMON_PRACTICE + " (typical saturation 35–45 °F against apparatus dew point 48–54 °F)");
    /** Measured total below this share of the nameplate, beyond its uncertainty, is low capacity. */
    public static final Threshold CAPACITY_BELOW_NAMEPLATE_FRACTION = new Threshold("capacityBelowNameplateFraction",
            "share of the nameplate capacity below which a measured total counts as low",
            Quantity.FRACTION_PERCENT, 0.75,
            COMMON_PRACTICE + " (techs use 70–80 % of nominal near rating conditions; applied only with the"
                    + " entering wet bulb near the 67 °F rating point of AHRI 210/240)");
    /** Entering wet bulbs within this of the 67 °F rating point count as near rating conditions. */
    public static final Threshold NEAR_RATING_WET_BULB_BAND = new Threshold("nearRatingWetBulbBand",
            "entering wet-bulb distance from the 67 °F (19.4 °C) rating point still called near rating",
            Quantity.TEMPERATURE_DIFFERENCE, 8 / 1.8,
            "rating point 80 °F db / 67 °F wb from AHRI Standard 210/240; the ±8 °F band is " + COMMON_PRACTICE
                    + " (capacity falls roughly 2–3 % per °F of entering wet bulb, so 75 % of nominal stays"
                    + " below a healthy unit across it)");
    /** A supply RH reading at or above this is likely a wetted or slow probe, not a measured state. */
    public static final Threshold SUPPLY_NEAR_SATURATION_RH = new Threshold("supplyNearSaturationRh",
            "supply relative humidity at which a wetted or slow probe is suspected", Quantity.RELATIVE_HUMIDITY,
            97.0, COMMON_PRACTICE + " (capacitive RH sensors: ±3 % RH above 90 % RH, slow and unreliable near"
                    + " saturation; a wetted sensor reads 100 %)");
    /** A condensate catch this long or longer, on a coil that drains steadily, can stand in for the air-side latent. */
    public static final Threshold CONDENSATE_STEADY_MIN_TIME = new Threshold("condensateSteadyMinTime",
            "shortest condensate catch used for latent capacity", Quantity.DURATION_MINUTES, 5 * 60.0,
            COMMON_PRACTICE + " (at ±5 s timing a 5-min catch is good to ±1.7 %)");

    private static final List<Threshold> COIL = List.of(COIL_HIGH_AIRFLOW_PER_TON, COIL_LOW_AIRFLOW_PER_TON,
            COIL_HIGH_SHR, INDOOR_DEW_POINT_MAX, INDOOR_RH_TARGET, CONDENSATE_MISMATCH_FRACTION,
            COIL_SATURATION_ALLOWANCE, CAPACITY_BELOW_NAMEPLATE_FRACTION, NEAR_RATING_WET_BULB_BAND,
            SUPPLY_NEAR_SATURATION_RH, CONDENSATE_STEADY_MIN_TIME);

    // --- logged run cycles ------------------------------------------------------------------
    // Used by app.latentledger.core.cycles. docs/methods.md §3.6 and §9.9 give the part-load latent
    // model and the rules for reading a log that these values come from.

    /** More starts per hour than this is short cycling. */
    public static final Threshold CYCLES_PER_HOUR_MAX = new Threshold("cyclesPerHourMax",
            "most compressor starts per hour before it counts as short cycling", Quantity.DIMENSIONLESS, 3.0,
            COMMON_PRACTICE + " (3 cycles/h is also the typical largest cycling rate published for"
                    + " single-speed cooling equipment, Methods guide §3.6)");
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
            COMMON_PRACTICE + " (Methods guide §9.9: noise floor 0.0003–0.0005 kg/kg)");
    /** Return and supply RH disagreeing by more than this over a dry coil with the blower on is a sensor offset. */
    public static final Threshold SENSOR_OFFSET_RH = new Threshold("sensorOffsetRh",
            "largest return/supply RH difference accepted over a dry coil with the blower on",
            Quantity.RELATIVE_HUMIDITY, 3.0, COMMON_PRACTICE + " (typical capacitive RH probe accuracy ±2–3 % RH)");
    /** Blower-on, compressor-off time after which the coil is taken as dry for the sensor comparison. */
    public static final Threshold SENSOR_CHECK_AFTER = new Threshold("sensorCheckAfter",
            "blower-on off time before return and supply humidity are compared", Quantity.DURATION_MINUTES,
            30 * 60.0, "Methods guide §9.9 (≥ 30 min: about the time a wet coil takes to dry out with the"
                    + " blower running, from the published part-load model's typical values)");
    /** On-cycles at least this long give the steady-state latent rate. */
    public static final Threshold LONG_CYCLE_ON_TIME = new Threshold("longCycleOnTime",
            "shortest on-cycle used for the steady-state moisture removal rate", Quantity.DURATION_MINUTES,
            15 * 60.0, "Methods guide §9.9 (steady ΔW from on-cycles ≥ 15 min; derived, with common practice)");
    /** Return-minus-supply split above which the compressor is taken as running (no status column). */
    public static final Threshold SPLIT_ON = new Threshold("splitOn",
            "return-minus-supply dry-bulb split that confirms the compressor is running",
            Quantity.TEMPERATURE_DIFFERENCE, 3.0, COMMON_PRACTICE + " (Methods guide §9.9)");
    /** Split below which the compressor is taken as stopped. */
    public static final Threshold SPLIT_OFF = new Threshold("splitOff",
            "return-minus-supply dry-bulb split below which the compressor is taken as stopped",
            Quantity.TEMPERATURE_DIFFERENCE, 1.0, COMMON_PRACTICE);
    /** Supply rise above its on-cycle low (or fall below its off-cycle high) that marks a stop (start). */
    public static final Threshold SUPPLY_EDGE = new Threshold("supplyEdge",
            "supply dry-bulb rise from its on-cycle low (or fall from its off-cycle high) that marks a stop (start)",
            Quantity.TEMPERATURE_DIFFERENCE, 1.5, COMMON_PRACTICE + " (Methods guide §9.9)");
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

    /** Blower-on time over a dry coil needed before the probe pair is checked (and corrected). */
    public static final Threshold SENSOR_CHECK_MIN_TIME = new Threshold("sensorCheckMinTime",
            "blower-on time over a dry coil needed before the humidity probes are compared",
            Quantity.DURATION_MINUTES, 10 * 60.0, COMMON_PRACTICE + " (several probe time constants, and enough"
                    + " samples that one gust does not decide)");
    /** An off period at least this long shows how the house gains moisture on its own. */
    public static final Threshold LONG_OFF_PERIOD = new Threshold("longOffPeriod",
            "shortest compressor-off stretch used for the house's humidity trend", Quantity.DURATION_MINUTES,
            30 * 60.0, COMMON_PRACTICE);
    /** The house gains moisture while the unit is off when its humidity ratio rises faster than this per hour. */
    public static final Threshold OFF_MOISTURE_GAIN = new Threshold("offMoistureGain",
            "rise of the house's humidity ratio per hour while the unit is off that counts as gaining moisture",
            Quantity.HUMIDITY_RATIO_FINE, 0.0002, COMMON_PRACTICE + " (0.2 g/kg, about 1.4 gr/lb, per hour: above"
                    + " the drift of a capacitive RH probe over an hour)");
    /** Hottest logged hours at least this warm outdoors say something about sizing. */
    public static final Threshold HOT_OUTDOOR_MIN = new Threshold("hotOutdoorMin",
            "outdoor temperature of the hottest logged hours needed before runtime judges the unit's size",
            Quantity.TEMPERATURE, Quantity.TEMPERATURE.fromDisplay(UnitSystem.IP, 85), COMMON_PRACTICE);
    /** Runtime over the hottest hours below this (beyond its uncertainty) is oversized for the house's load. */
    public static final Threshold HOT_RUNTIME_MIN = new Threshold("hotRuntimeMin",
            "lowest runtime fraction over the hottest logged hours for a unit sized to the house's load",
            Quantity.FRACTION_PERCENT, 0.6, COMMON_PRACTICE + " (a unit sized to the load, e.g. within ACCA"
                    + " Manual S's 115 % of the design cooling load, runs most of an hour near design weather)");

    private static final List<Threshold> LOGGED_RUN_CYCLES = List.of(CYCLES_PER_HOUR_MAX, MEDIAN_ON_TIME_MIN,
            LATENT_FRACTION_MIN, REEVAPORATION_SHARE, MOISTURE_REMOVAL_FLOOR, SENSOR_OFFSET_RH, SENSOR_CHECK_AFTER,
            LONG_CYCLE_ON_TIME, SPLIT_ON, SPLIT_OFF, SUPPLY_EDGE, EDGE_TOLERANCE, MIN_RUN_TIME, BLOWER_ENTHALPY_BAND,
            GAP_FACTOR, SENSOR_CHECK_MIN_TIME, LONG_OFF_PERIOD, OFF_MOISTURE_GAIN, HOT_OUTDOOR_MIN, HOT_RUNTIME_MIN);

    private Thresholds() {
    }

    /** All thresholds, for settings screens and the methods document. */
    // --- the house's moisture budget (core.house) ----------------------------------------------

    /** A return leak fraction above this, beyond its uncertainty, is worth sealing. */
    public static final Threshold RETURN_LEAK_FRACTION = new Threshold("returnLeakFraction",
            "return-duct leak fraction above which the leak is called", Quantity.FRACTION_PERCENT, 0.05,
            COMMON_PRACTICE + " (a tight return leaks a few per cent at most)");
    /** Ventilation bringing at least this share of the house's water gains is called out. */
    public static final Threshold VENTILATION_LOAD_SHARE = new Threshold("ventilationLoadShare",
            "share of the water gains from mechanical ventilation before it is called", Quantity.FRACTION_PERCENT,
            0.25, COMMON_PRACTICE);
    /** Infiltration bringing at least this share of the house's water gains is called out. */
    public static final Threshold INFILTRATION_LOAD_SHARE = new Threshold("infiltrationLoadShare",
            "share of the water gains from air leakage before it is called", Quantity.FRACTION_PERCENT, 0.25,
            COMMON_PRACTICE);

    private static final List<Threshold> HOUSE = List.of(RETURN_LEAK_FRACTION, VENTILATION_LOAD_SHARE,
            INFILTRATION_LOAD_SHARE);

    public static List<Threshold> all() {
        List<Threshold> all = new ArrayList<>(COIL);
        all.addAll(LOGGED_RUN_CYCLES);
        all.addAll(HOUSE);
        return List.copyOf(all);
    }
}
