package app.latentledger.core.house;

import app.latentledger.core.units.Conversions;

/**
 * Mechanical ventilation: the ASHRAE 62.2 whole-house rate, and the share of the outdoor humidity an
 * ERV hands back.
 *
 * <p>ASHRAE Standard 62.2-2013 to -2019 total required ventilation Q_tot = 0.03·A_floor + 7.5·(N_br + 1)
 * cfm (A_floor in ft²; as implemented by OpenStudio-HPXML {@code get_mech_vent_qtot_cfm}, "ASHRAE
 * 62.2-2019"). Computed in IP and converted, so the SI result is the IP rate (the standard's own SI
 * form, 0.15·A + 3.5·(N_br + 1) L/s, is within 1.5 % — from memory).
 *
 * <p>ERV: W_supply = W_o + ε_L·(ṁc_p,min/ṁc_p,sup)·(W_i − W_o) (EnergyPlus Engineering Reference,
 * "Air System Air-To-Air Sensible and Latent Effectiveness Heat Exchanger"); with balanced flow the
 * water carried in is (1 − ε_L)·ṁ_da·(W_o − W_i). Latent effectiveness 0–0.8; 0.5 when unknown
 * (residential ERVs rate about 0.4–0.7; common practice).
 */
public final class Ventilation {
    /** Latent effectiveness assumed for an ERV when none is given. */
    public static final double DEFAULT_ERV_LATENT_EFFECTIVENESS = 0.5;
    /** Highest latent effectiveness accepted. */
    public static final double MAX_LATENT_EFFECTIVENESS = 0.8;

    private Ventilation() {
    }

    /** ASHRAE 62.2 total required whole-house ventilation, m³/s. */
    public static double ashrae622TotalM3PerS(double floorAreaM2, int bedrooms) {
        double ft2 = floorAreaM2 / (Conversions.M_PER_FT * Conversions.M_PER_FT);
        double cfm = 0.03 * ft2 + 7.5 * (bedrooms + 1);
        return cfm * Conversions.M3_PER_FT3 / 60.0;
    }

    /** Share of the outdoor-indoor humidity difference that reaches the house: 1 − ε_L (ERV), else 1. */
    public static double moisturePassFraction(VentilationType type, double latentEffectiveness) {
        return type == VentilationType.ERV ? 1.0 - latentEffectiveness : 1.0;
    }
}
