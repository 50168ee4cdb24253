package app.latentledger.visit;

/** A log that cannot be read or analysed, with a message for the tech (already in the tech's units). */
public final class LogProblem extends Exception {
    private static final long serialVersionUID = 1L;

    public LogProblem(String message, Throwable cause) {
        super(message, cause);
    }
}
