package app.latentledger.core.findings;

import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

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
    /** ASHRAE 62.1-2022 §5.12: indoor dew point at most 60 °F (15 °C). */
    public static final Threshold INDOOR_DEW_POINT_MAX = new Threshold("indoorDewPointMax",
            "highest indoor dew point", Quantity.TEMPERATURE,
            Quantity.TEMPERATURE.fromDisplay(UnitSystem.IP, 60),
            "ASHRAE Standard 62.1-2022 §5.12 (indoor dew point ≤ 60 °F / 15 °C)");
    /** Keep indoor RH below 60 %. Settable: a home may aim lower. */
    public static final Threshold INDOOR_RH_TARGET = new Threshold("indoorRhTarget",
            "indoor relative humidity target", Quantity.RELATIVE_HUMIDITY, 60.0,
            "US EPA, A Brief Guide to Mold, Moisture and Your Home (keep indoor RH below 60 %)");
    /** Condensate and air side may differ this much before a mismatch is called (beyond uncertainty too). */
    public static final Threshold CONDENSATE_MISMATCH_FRACTION = new Threshold("condensateMismatchFraction",
            "condensate vs air-side moisture removal: largest accepted difference", Quantity.FRACTION_PERCENT, 0.20,
            COMMON_PRACTICE);

    private static final List<Threshold> COIL = List.of(COIL_HIGH_AIRFLOW_PER_TON, COIL_LOW_AIRFLOW_PER_TON,
            COIL_HIGH_SHR, INDOOR_DEW_POINT_MAX, INDOOR_RH_TARGET, CONDENSATE_MISMATCH_FRACTION);

    // --- logged run cycles ------------------------------------------------------------------

    private Thresholds() {
    }

    /** All thresholds, for settings screens and the methods document. */
    public static List<Threshold> all() {
        return List.copyOf(COIL);
    }
}
