package app.latentledger.ui.session;

/**
 * One accepted value in a box, SI, with its tolerance (SI; for airflow a fraction of reading).
 *
 * @param valueSi     the value
 * @param toleranceSi its ± tolerance
 */
public record SlotValue(double valueSi, double toleranceSi) {
    public SlotValue {
        if (!Double.isFinite(valueSi) || !Double.isFinite(toleranceSi) || toleranceSi < 0) {
            throw new IllegalArgumentException("value " + valueSi + " ± " + toleranceSi + " is not a reading");
        }
    }
}
