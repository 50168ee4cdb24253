package app.latentledger.core.cycles;

/** A log that holds no runs the analysis can time, with what is missing. */
public final class LogNotAnalysableException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public LogNotAnalysableException(String message) {
        super(message);
    }
}
