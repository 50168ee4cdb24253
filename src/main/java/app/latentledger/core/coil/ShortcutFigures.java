package app.latentledger.core.coil;

import app.latentledger.core.measure.AirflowBasis;
import app.latentledger.core.units.Conversions;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

/**
 * The trade's standard-air shortcut figures, shown beside the mass-flow figures as a cross-check
 * only (the shortcuts disagree with each other by about 2 %).
 *
 * <p>IP: q_s = 1.08 × cfm × Δt (°F), q_l = 0.68 × cfm × Δgr, q = 4.5 × cfm × Δh (Btu/lb); 1.08 =
 * 60 min/h × 0.075 lb/ft³ × 0.24 Btu/(lb·°F) and 4.5 = 60 × 0.075 (common practice, no source;
 * the handbook's own IP sensible constant is 1.10 with moist-air c_p). SI (ASHRAE HoF 2021 SI ch. 18,
 * §"standard air", eqs. 8–10): q_s = 1.23 Q Δt, q_l = 3010 Q ΔW, q = 1.2 Q Δh, Q in L/s, Δh in kJ/kg.
 *
 * <p><b>Altitude.</b> Every constant is scaled by the density ratio, which the handbook takes as the
 * pressure ratio p / 101.325 kPa with p from the standard atmosphere (ch. 18 §"standard air"; ch. 1
 * eq. 3) — here the site pressure in force, measured or standard. This keeps the standard air
 * temperature: it treats the cfm as if measured at about 69 °F dry.
 *
 * @param convention     whose constants (IP trade or SI handbook)
 * @param pressureRatio  p / 101 325 Pa, the factor applied to every constant
 * @param sensibleW      W
 * @param latentW        W
 * @param totalW         W
 */
public record ShortcutFigures(UnitSystem convention, double pressureRatio, double sensibleW, double latentW,
                              double totalW) {
    /** Sea-level IP constants: Btu/h per cfm·°F, per cfm·grain, per cfm·Btu/lb. */
    public static final double IP_SENSIBLE = 1.08;
    public static final double IP_LATENT = 0.68;
    public static final double IP_TOTAL = 4.5;
    /** Sea-level SI constants: W per L/s·K, per L/s·(kg/kg), per L/s·(kJ/kg). */
    public static final double SI_SENSIBLE = 1.23;
    public static final double SI_LATENT = 3010;
    public static final double SI_TOTAL = 1.2;
    /** Standard sea-level pressure, Pa (HoF ch. 1 Table 1). */
    public static final double SEA_LEVEL_PA = 101_325.0;

    /** p / p₀, the altitude factor on every constant. */
    public static double pressureRatio(double pressurePa) {
        return pressurePa / SEA_LEVEL_PA;
    }

    /**
     * @param convention    which constants
     * @param pressurePa    site pressure, Pa
     * @param airflowM3PerS measured airflow, m³/s
     * @param process       the coil process (for Δt, ΔW, Δh)
     */
    public static ShortcutFigures of(UnitSystem convention, double pressurePa, double airflowM3PerS,
                                     CoilProcess process) {
        return of(convention, pressurePa, airflowM3PerS, process, AirflowBasis.ACTUAL);
    }

    /**
     * @param basis standard cfm already stands for standard-air mass, so its constants are not
     *              scaled (ratio 1); an actual airflow gets the altitude ratio p/p₀
     */
    public static ShortcutFigures of(UnitSystem convention, double pressurePa, double airflowM3PerS,
                                     CoilProcess process, AirflowBasis basis) {
        double r = basis == AirflowBasis.STANDARD ? 1.0 : pressureRatio(pressurePa);
        if (convention == UnitSystem.IP) {
            double cfm = Quantity.AIRFLOW.toDisplay(UnitSystem.IP, airflowM3PerS);
            double dtF = process.temperatureDropK() * 1.8;
            double dgr = process.humidityRatioDrop() * Conversions.GRAINS_PER_LB;
            double dh = process.enthalpyDropJPerKg() / Conversions.J_PER_KG_PER_BTU_PER_LB;
            return new ShortcutFigures(convention, r,
                    btuPerHourToW(IP_SENSIBLE * r * cfm * dtF),
                    btuPerHourToW(IP_LATENT * r * cfm * dgr),
                    btuPerHourToW(IP_TOTAL * r * cfm * dh));
        }
        double ls = airflowM3PerS * 1000;
        return new ShortcutFigures(convention, r,
                SI_SENSIBLE * r * ls * process.temperatureDropK(),
                SI_LATENT * r * ls * process.humidityRatioDrop(),
                SI_TOTAL * r * ls * process.enthalpyDropJPerKg() / 1000);
    }

    /** The three constants in force at this pressure ratio: sensible, latent, total. */
    public double[] scaledConstants() {
        return convention == UnitSystem.IP
                ? new double[] {IP_SENSIBLE * pressureRatio, IP_LATENT * pressureRatio, IP_TOTAL * pressureRatio}
                : new double[] {SI_SENSIBLE * pressureRatio, SI_LATENT * pressureRatio, SI_TOTAL * pressureRatio};
    }

    private static double btuPerHourToW(double btuPerHour) {
        return btuPerHour * Conversions.J_PER_BTU / 3600.0;
    }
}
