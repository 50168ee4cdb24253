package app.latentledger.core.cycles;

/**
 * One cycle with its moisture numbers.
 *
 * @param cycle             timing and blower state
 * @param moisture          per-airflow integrals and onset
 * @param removedKg         water taken out during the run, kg (NaN without an airflow)
 * @param returnedKg        water put back while the blower ran in the rest, kg (NaN without an
 *                          airflow or when the blower state is unknown)
 * @param predictedFraction model net removal ÷ (steady rate × on-time) for this run (NaN when the
 *                          blower state of the rest before it is unknown)
 * @param measuredFraction  measured net ÷ (steady rate × on-time) (NaN without a steady rate)
 */
public record CycleResult(Cycle cycle, CycleMoisture moisture, double removedKg, double returnedKg,
                          double predictedFraction, double measuredFraction) {
    /** Removed minus returned, kg. */
    public double netKg() {
        return removedKg - (Double.isNaN(returnedKg) ? 0.0 : returnedKg);
    }
}
