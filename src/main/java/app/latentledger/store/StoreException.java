package app.latentledger.store;

/**
 * The database could not do what was asked (disk full, file locked by another program, file not
 * a ledger database). Nothing of the failed transaction was kept.
 */
public final class StoreException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public StoreException(String message, Throwable cause) {
        super(message, cause);
    }

    public StoreException(String message) {
        super(message);
    }
}
