package app.latentledger.io.logcsv;

/**
 * The file cannot be a log (no time column, no temperature columns, no readable rows, samples too
 * far apart, or a header map that names nothing). The message says what is missing. This is the
 * only exception {@link LogCsvImporter} throws for bad content.
 */
public final class LogRefusedException extends Exception {
    private static final long serialVersionUID = 1L;

    public LogRefusedException(String message) {
        super(message);
    }
}
