package app.latentledger.bundle;

/**
 * A bundle the app will not import (truncated, changed after export, an unknown format version,
 * records that do not hold together). The message says which and what to do; the ledger was not
 * changed.
 */
public final class BundleException extends Exception {
    private static final long serialVersionUID = 1L;

    public BundleException(String message) {
        super(message);
    }

    public BundleException(String message, Throwable cause) {
        super(message, cause);
    }
}
