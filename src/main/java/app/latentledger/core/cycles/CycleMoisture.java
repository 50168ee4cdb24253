package app.latentledger.core.cycles;

/**
 * Moisture bookkeeping of one cycle. Amounts are per unit of volumetric airflow, "kg of water per
 * (m³/s of return air)", so that they can be computed without the airflow and scaled by it later:
 * moisture in kg = airflow (m³/s) × amount.
 *
 * @param removedPerFlow  ∫ (W_return − W_supply)/v_return dt over the run
 * @param returnedPerFlow ∫ (W_supply − W_return)/v_return dt while the blower ran in the rest
 * @param onsetS          seconds from start until W_return − W_supply first reached half its steady
 *                        value (NaN when it never did or no steady value is known)
 * @param wet             whether the run removed moisture at all (drop above the noise floor for at
 *                        least two samples)
 * @param lateDryingW     median W_return − W_supply over the last quarter of the run, kg/kg
 * @param lateDryingPerFlow median of (W_return − W_supply)/v_return over the same samples
 */
public record CycleMoisture(double removedPerFlow, double returnedPerFlow, double onsetS, boolean wet,
                            double lateDryingW, double lateDryingPerFlow) {
    /** Removed minus returned. */
    public double netPerFlow() {
        return removedPerFlow - returnedPerFlow;
    }
}
