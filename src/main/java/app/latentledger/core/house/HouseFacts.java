package app.latentledger.core.house;

import app.latentledger.core.psychro.InputLimits;
import app.latentledger.core.units.Quantity;

/**
 * What a house is, kept with the site: size, people, air tightness, shelter and ventilation. SI.
 *
 * @param floorAreaM2              conditioned floor area, m²
 * @param ceilingHeightM           average ceiling height, m (volume = area × height)
 * @param stories                  above-grade stories, 1–3
 * @param bedrooms                 bedrooms, 0–10
 * @param occupants                people living there, or 0 for bedrooms + 1
 * @param cfm50M3PerS              blower-door flow at 50 Pa, m³/s, or NaN (then {@code ach50})
 * @param ach50                    air changes per hour at 50 Pa, or NaN (then {@code cfm50M3PerS})
 * @param shelterClass             1 (open) … 5 (buildings adjacent), or 0 when not known
 * @param windMPerS                local wind speed, m/s, or NaN for the default
 * @param ventilationType          mechanical ventilation
 * @param ventilationM3PerS        its airflow, m³/s (0 with {@link VentilationType#NONE})
 * @param ervLatentEffectiveness   ERV latent effectiveness 0–0.8, or NaN for the default
 */
public record HouseFacts(double floorAreaM2, double ceilingHeightM, int stories, int bedrooms, int occupants,
                         double cfm50M3PerS, double ach50, int shelterClass, double windMPerS,
                         VentilationType ventilationType, double ventilationM3PerS, double ervLatentEffectiveness) {
    public static final double MIN_AREA_M2 = 20;
    public static final double MAX_AREA_M2 = 2000;
    public static final double MIN_HEIGHT_M = 2.0;
    public static final double MAX_HEIGHT_M = 6.0;
    public static final double MIN_CFM50_M3_PER_S = 0.02;
    public static final double MAX_CFM50_M3_PER_S = 5.0;
    public static final double MIN_ACH50 = 0.3;
    public static final double MAX_ACH50 = 40;
    public static final double MAX_WIND_M_PER_S = 20;
    public static final double MAX_VENTILATION_M3_PER_S = 0.5;

    public HouseFacts {
        InputLimits.check("floor area", Quantity.AREA, floorAreaM2, MIN_AREA_M2, MAX_AREA_M2, null);
        InputLimits.check("ceiling height", Quantity.LENGTH, ceilingHeightM, MIN_HEIGHT_M, MAX_HEIGHT_M, null);
        InputLimits.check("stories", Quantity.DIMENSIONLESS, stories, 1, 3,
                "the leakage model's coefficients cover 1–3 stories");
        InputLimits.check("bedrooms", Quantity.DIMENSIONLESS, bedrooms, 0, 10, null);
        InputLimits.check("occupants", Quantity.DIMENSIONLESS, occupants, 0, 20, "0 means bedrooms + 1");
        if (!Double.isNaN(cfm50M3PerS)) {
            InputLimits.check("blower-door flow at 50 Pa", Quantity.AIRFLOW, cfm50M3PerS, MIN_CFM50_M3_PER_S,
                    MAX_CFM50_M3_PER_S, null);
        }
        if (!Double.isNaN(ach50)) {
            InputLimits.check("ACH50", Quantity.DIMENSIONLESS, ach50, MIN_ACH50, MAX_ACH50, null);
        }
        InputLimits.check("shelter class", Quantity.DIMENSIONLESS, shelterClass, 0, 5, "1 open … 5 adjacent buildings;"
                + " 0 = not known");
        if (!Double.isNaN(windMPerS)) {
            InputLimits.check("wind speed", Quantity.WIND_SPEED, windMPerS, 0, MAX_WIND_M_PER_S, null);
        }
        if (ventilationType == null) {
            ventilationType = VentilationType.NONE;
        }
        InputLimits.check("ventilation airflow", Quantity.AIRFLOW, ventilationM3PerS, 0, MAX_VENTILATION_M3_PER_S, null);
        if (!Double.isNaN(ervLatentEffectiveness)) {
            InputLimits.check("ERV latent effectiveness", Quantity.FRACTION_PERCENT, ervLatentEffectiveness, 0,
                    Ventilation.MAX_LATENT_EFFECTIVENESS, null);
        }
    }

    /** Conditioned volume, m³. */
    public double volumeM3() {
        return floorAreaM2 * ceilingHeightM;
    }

    /** Occupants, bedrooms + 1 when not given. */
    public int occupantsOrDefault() {
        return occupants > 0 ? occupants : bedrooms + 1;
    }

    /** True when a blower-door result is known. */
    public boolean hasLeakage() {
        return Double.isFinite(cfm50M3PerS) || Double.isFinite(ach50);
    }

    /** Flow at 50 Pa, m³/s (from ACH50 × volume when only ACH50 is known), or NaN. */
    public double q50M3PerS() {
        return Double.isFinite(cfm50M3PerS) ? cfm50M3PerS : ach50 * volumeM3() / 3600.0;
    }

    /** Wind speed, or the default when not given, m/s. */
    public double windOrDefault() {
        return Double.isFinite(windMPerS) ? windMPerS : Infiltration.DEFAULT_WIND_M_PER_S;
    }

    /** ERV latent effectiveness, the default when not given; 0 for every other type. */
    public double latentEffectiveness() {
        if (ventilationType != VentilationType.ERV) {
            return 0.0;
        }
        return Double.isFinite(ervLatentEffectiveness) ? ervLatentEffectiveness
                : Ventilation.DEFAULT_ERV_LATENT_EFFECTIVENESS;
    }

    /** Which infiltration model these facts allow. */
    public Infiltration.Method infiltrationMethod() {
        if (!hasLeakage()) {
            return Infiltration.Method.NONE;
        }
        return shelterClass > 0 ? Infiltration.Method.SHERMAN_GRIMSRUD : Infiltration.Method.N_FACTOR;
    }
}
