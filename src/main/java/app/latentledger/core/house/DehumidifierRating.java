package app.latentledger.core.house;

/**
 * Converting a dehumidifier capacity between inlet conditions: Cap_rated = Cap_op·f(T_rated,
 * RH_rated)/f(T_op, RH_op), with f the water-removal curve of Winkler, Christensen and Tomerlin
 * (2011), f = a + b·T + c·T² + d·RH + e·RH² + g·T·RH (T in °C, RH in %), as used by OpenStudio-HPXML
 * ({@code apply_dehumidifiers}). The ratio form does not depend on how the curve is normalised.
 *
 * <p>Rating conditions: US DOE test procedure, 10 CFR 430 Subpart B Appendix X1 — portable units at
 * 65 °F dry bulb / 60 % RH, whole-home (ducted) units at 73 °F / 60 % (80 FR 45801, 2015; the
 * conditions as implemented by OpenStudio-HPXML {@code apply_dehumidifier_ief_to_ef_inputs}); the
 * older rating at 80 °F / 60 % (the EnergyPlus ZoneHVAC:Dehumidifier:DX rated inlet 26.7 °C / 60 %;
 * its attribution to AHAM DH-1 is from memory). The curve is an extrapolation below about 60 °F and
 * above 90 °F.
 */
public final class DehumidifierRating {
    private static final double A = -1.162525707;
    private static final double B = 0.02271469;
    private static final double C = -0.000113208;
    private static final double D = 0.021110538;
    private static final double E = -0.0000693034;
    private static final double G = 0.000378843;

    /** 65 °F in °C. */
    public static final double PORTABLE_C = (65 - 32) / 1.8;
    /** 73 °F in °C. */
    public static final double WHOLE_HOME_C = (73 - 32) / 1.8;
    /** 80 °F in °C. */
    public static final double OLDER_C = (80 - 32) / 1.8;
    /** Rating RH of all three, %. */
    public static final double RATING_RH = 60.0;
    /** Range over which the curve is not an extrapolation, °C (about 60–90 °F). */
    public static final double CURVE_MIN_C = (60 - 32) / 1.8;
    public static final double CURVE_MAX_C = (90 - 32) / 1.8;

    /**
     * @param needed          capacity needed at the operating condition (any unit)
     * @param portable65F     the same at the DOE portable rating condition
     * @param wholeHome73F    at the DOE whole-home rating condition
     * @param rated80F        at the older 80 °F / 60 % rating
     * @param extrapolated    true when the operating condition lies outside the curve's range
     */
    public record Rated(double needed, double portable65F, double wholeHome73F, double rated80F,
                        boolean extrapolated) {
    }

    private DehumidifierRating() {
    }

    /** Relative water removal at an inlet dry bulb (°C) and RH (%). */
    public static double curve(double dryBulbC, double rhPct) {
        return A + B * dryBulbC + C * dryBulbC * dryBulbC + D * rhPct + E * rhPct * rhPct + G * dryBulbC * rhPct;
    }

    /** A capacity at {@code dryBulbC}/{@code rhPct} converted to another inlet condition. */
    public static double convert(double capacity, double fromC, double fromRhPct, double toC, double toRhPct) {
        return capacity * curve(toC, toRhPct) / curve(fromC, fromRhPct);
    }

    /** The capacity needed at the house condition, stated at each rating condition. */
    public static Rated rated(double neededAtHouse, double houseDryBulbC, double houseRhPct) {
        return new Rated(neededAtHouse,
                convert(neededAtHouse, houseDryBulbC, houseRhPct, PORTABLE_C, RATING_RH),
                convert(neededAtHouse, houseDryBulbC, houseRhPct, WHOLE_HOME_C, RATING_RH),
                convert(neededAtHouse, houseDryBulbC, houseRhPct, OLDER_C, RATING_RH),
                houseDryBulbC < CURVE_MIN_C || houseDryBulbC > CURVE_MAX_C);
    }
}
