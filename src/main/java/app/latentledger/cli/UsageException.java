package app.latentledger.cli;

/** A command line the tool cannot act on; the message says what to change. Exit code 2. */
public final class UsageException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public UsageException(String message) {
        super(message);
    }
}
