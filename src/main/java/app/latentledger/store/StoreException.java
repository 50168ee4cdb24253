package app.latentledger.store;

/**
 * The database could not do what was asked (disk full, file locked by another program, file not
 * a ledger database). Nothing of the failed transaction was kept. {@link #kind()} tells a caller
 * whether trying again later can help.
 */
public class StoreException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** Why the store could not do it. */
    public enum Kind {
        /** Another program held the write lock past the busy timeout: try again in a moment. */
        BUSY,
        /** The data folder or file cannot be used as a ledger (not a folder, no permission, not a database). */
        UNAVAILABLE,
        /** A save based on data another program changed meanwhile; nothing was written. */
        CONFLICT,
        /** Anything else. */
        FAILED
    }

    private final Kind kind;

    public StoreException(String message, Throwable cause) {
        this(Kind.FAILED, message, cause);
    }

    public StoreException(String message) {
        this(Kind.FAILED, message, null);
    }

    public StoreException(Kind kind, String message, Throwable cause) {
        super(message, cause);
        this.kind = kind;
    }

    public Kind kind() {
        return kind;
    }
}
