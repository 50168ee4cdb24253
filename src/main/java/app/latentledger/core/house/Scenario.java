package app.latentledger.core.house;

/**
 * One state of the house for the budget: as found, or with one fix applied. NaN or false leaves
 * that part as found.
 *
 * @param key                 stable key, e.g. "as-found", "lower-airflow"
 * @param change              what changes, in plain words
 * @param airflowM3PerS       new blower airflow, m³/s, or NaN
 * @param fanAuto             blower to AUTO (no off-cycle re-evaporation)
 * @param sealReturnLeak      return leak sealed (f = 0)
 * @param ventilationM3PerS   new ventilation airflow, m³/s, or NaN
 * @param addErv              ventilation through an ERV of default latent effectiveness
 * @param q50M3PerS           new blower-door flow at 50 Pa, m³/s, or NaN
 * @param dehumidifierKgPerS  supplemental dehumidifier removal, kg/s (0 without one)
 */
public record Scenario(String key, String change, double airflowM3PerS, boolean fanAuto, boolean sealReturnLeak,
                       double ventilationM3PerS, boolean addErv, double q50M3PerS, double dehumidifierKgPerS) {
    /** The house as found. */
    public static final Scenario AS_FOUND = new Scenario("as-found", "as found", Double.NaN, false, false,
            Double.NaN, false, Double.NaN, 0.0);

    public static Scenario airflow(double m3PerS, String change) {
        return new Scenario("lower-airflow", change, m3PerS, false, false, Double.NaN, false, Double.NaN, 0.0);
    }

    public static Scenario blowerAuto() {
        return new Scenario("fan-auto", "blower to AUTO with no fan-off delay (no off-cycle re-evaporation)",
                Double.NaN, true, false, Double.NaN, false, Double.NaN, 0.0);
    }

    public static Scenario sealLeak() {
        return new Scenario("seal-return-leak", "seal the return duct leak", Double.NaN, false, true, Double.NaN,
                false, Double.NaN, 0.0);
    }

    public static Scenario ventilation(double m3PerS, String change) {
        return new Scenario("reduce-ventilation", change, Double.NaN, false, false, m3PerS, false, Double.NaN, 0.0);
    }

    public static Scenario erv() {
        return new Scenario("add-erv", "ventilate through an ERV (latent effectiveness 0.5)", Double.NaN, false, false,
                Double.NaN, true, Double.NaN, 0.0);
    }

    public static Scenario tighten(double q50M3PerS, String change) {
        return new Scenario("tighten-envelope", change, Double.NaN, false, false, Double.NaN, false, q50M3PerS, 0.0);
    }

    public static Scenario dehumidifier(double kgPerS, String change) {
        return new Scenario("add-dehumidifier", change, Double.NaN, false, false, Double.NaN, false, Double.NaN, kgPerS);
    }
}
