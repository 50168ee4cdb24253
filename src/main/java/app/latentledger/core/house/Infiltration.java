package app.latentledger.core.house;

/**
 * Natural air leakage of a house from a blower-door result.
 *
 * <ul>
 *   <li><b>Leakage area</b>: power law Q = C·Δpⁿ through the 50 Pa point with n = 0.65 (single-point
 *       test; OpenStudio-HPXML's default, within EnergyPlus's "typical" 0.6–0.7), then the effective
 *       leakage area at the LBL reference pressure Δp_r = 4 Pa with discharge coefficient 1:
 *       A_L = Q₄·√(ρ/(2Δp_r)), Q₄ = Q₅₀·(4/50)ⁿ, ρ = 1.2 kg/m³ (ASHRAE HoF 2017 ch. 16,
 *       "Effective leakage area"; the explicit formula with C_D is from memory, its result matches
 *       OpenStudio-HPXML's independent SLA chain to 4 digits).</li>
 *   <li><b>Sherman–Grimsrud (LBL) model</b>: Q [L/s] = A_L [cm²]·√(C_s·ΔT + C_w·U²), with the stack
 *       coefficient C_s by stories and the wind coefficient C_w by shelter class and stories (Sherman &
 *       Grimsrud 1980; ASHRAE HoF 2001 ch. 26 "basic model"; coefficients and form as in the
 *       EnergyPlus Input Output Reference, ZoneInfiltration:EffectiveLeakageArea, and Engineering
 *       Reference, "Infiltration by Effective Leakage Area"). Valid for small residential buildings
 *       of 1–3 stories.</li>
 *   <li><b>N-factor rule</b> when no shelter class is known: ACH_nat = ACH50 / N, N = 20 (the
 *       Kronvall–Persily "divide by 20"; Sherman, "Estimation of infiltration from leakage and
 *       climate indicators", Energy and Buildings 10 (1987) 81–86, gives N from 9.8 to 29.4). It is
 *       an annual average, so its uncertainty is taken as the half-range N = 15–25 (common practice).</li>
 *   <li><b>Combination with fans</b>: Q = √(Q_n² + Q_unbalanced²) + Q_balanced (EnergyPlus
 *       Engineering Reference, "Zone Air Balance Outdoor Airflow", after HoF 2009 ch. 16).</li>
 * </ul>
 */
public final class Infiltration {
    /** Pressure exponent of a single-point blower-door test. */
    public static final double PRESSURE_EXPONENT = 0.65;
    /** LBL reference pressure of the effective leakage area, Pa. */
    public static final double REFERENCE_PA = 4.0;
    /** Air density used to define the leakage area, kg/m³. */
    public static final double AIR_DENSITY = 1.2;
    /** Wind speed used when none is given, m/s (common practice: a light breeze). */
    public static final double DEFAULT_WIND_M_PER_S = 3.0;
    /** N-factor used when no shelter class is given. */
    public static final double DEFAULT_N_FACTOR = 20.0;
    /** ± half-range of the N-factor taken as its uncertainty (N 15–25; common practice). */
    public static final double N_FACTOR_HALF_RANGE = 5.0;

    /** C_s, (L/s)²/(cm⁴·K), for 1, 2, 3 stories. */
    private static final double[] STACK = {0.000145, 0.000290, 0.000435};
    /** C_w, (L/s)²/(cm⁴·(m/s)²), by shelter class 1–5 (rows) and stories 1–3 (columns). */
    private static final double[][] WIND = {
            {0.000319, 0.000420, 0.000494},
            {0.000246, 0.000325, 0.000382},
            {0.000174, 0.000231, 0.000271},
            {0.000104, 0.000137, 0.000161},
            {0.000032, 0.000042, 0.000049}};

    /** Which model gave the natural infiltration. */
    public enum Method {
        SHERMAN_GRIMSRUD("sherman-grimsrud", "LBL/Sherman–Grimsrud model with shelter class"),
        N_FACTOR("n-factor", "N-factor rule (ACH50 ÷ 20), no shelter class given"),
        NONE("none", "no blower-door result: infiltration not counted");

        private final String key;
        private final String label;

        Method(String key, String label) {
            this.key = key;
            this.label = label;
        }

        public String key() {
            return key;
        }

        public String label() {
            return label;
        }
    }

    private Infiltration() {
    }

    /** Effective leakage area at 4 Pa, m², from the flow at 50 Pa, m³/s. */
    public static double leakageAreaM2(double q50M3PerS) {
        double q4 = q50M3PerS * Math.pow(REFERENCE_PA / 50.0, PRESSURE_EXPONENT);
        return q4 * Math.sqrt(AIR_DENSITY / (2.0 * REFERENCE_PA));
    }

    /** Stack coefficient C_s for 1–3 stories. */
    public static double stackCoefficient(int stories) {
        return STACK[storyIndex(stories)];
    }

    /** Wind coefficient C_w for shelter class 1–5 and 1–3 stories. */
    public static double windCoefficient(int shelterClass, int stories) {
        return WIND[shelterClass - 1][storyIndex(stories)];
    }

    /**
     * Sherman–Grimsrud flow, m³/s.
     *
     * @param leakageAreaM2 effective leakage area at 4 Pa, m²
     * @param deltaTK       indoor–outdoor temperature difference, K (sign ignored)
     * @param windMPerS     local wind speed, m/s
     */
    public static double shermanGrimsrudM3PerS(double leakageAreaM2, int stories, int shelterClass, double deltaTK,
                                               double windMPerS) {
        double cm2 = leakageAreaM2 * 1e4;
        double bracket = stackCoefficient(stories) * Math.abs(deltaTK)
                + windCoefficient(shelterClass, stories) * windMPerS * windMPerS;
        return cm2 * Math.sqrt(Math.max(0.0, bracket)) / 1000.0;
    }

    /** N-factor flow, m³/s: ACH50/N air changes per hour of {@code volumeM3}. */
    public static double nFactorM3PerS(double ach50, double volumeM3, double nFactor) {
        return ach50 / nFactor * volumeM3 / 3600.0;
    }

    /** Natural infiltration combined with ventilation fans, m³/s (quadrature for unbalanced flows). */
    public static double combinedM3PerS(double naturalM3PerS, double unbalancedM3PerS, double balancedM3PerS) {
        return Math.hypot(naturalM3PerS, unbalancedM3PerS) + balancedM3PerS;
    }

    private static int storyIndex(int stories) {
        if (stories < 1 || stories > 3) {
            throw new IllegalArgumentException("stories must be 1–3, got " + stories);
        }
        return stories - 1;
    }
}
