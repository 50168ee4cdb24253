package app.latentledger.report;

/** The report or export cannot be made from what was asked: an unknown visit, an unwritable file. */
public final class ReportRefusedException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public ReportRefusedException(String message) {
        super(message);
    }

    public ReportRefusedException(String message, Throwable cause) {
        super(message, cause);
    }
}
