package app.latentledger.sync;

/** Why a sync or an enrolment did not happen, in a sentence a tech can act on. Nothing local is lost. */
public final class SyncException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** What kind of trouble: the faces choose the exit code and the tone from it. */
    public enum Kind {
        /** Something the tech typed (server address, code) is not usable. */
        BAD_INPUT,
        /** The tablet has no office account yet. */
        NOT_ENROLLED,
        /** The server could not be reached (no network, server down, time out). */
        NO_NETWORK,
        /** The server refused this tablet's token: it was removed from the office. */
        REVOKED,
        /** The server refused the request (a used or expired code, too many tries). */
        REFUSED,
        /** The server answered with something this tablet cannot use. */
        SERVER
    }

    private final Kind kind;

    public SyncException(Kind kind, String message) {
        super(message);
        this.kind = kind;
    }

    public SyncException(Kind kind, String message, Throwable cause) {
        super(message, cause);
        this.kind = kind;
    }

    public Kind kind() {
        return kind;
    }

    /** The sentence for a revoked or expired token. */
    static final String REVOKED_MESSAGE = "this tablet was removed from the office; enrol again";
}
