package app.latentledger.sync.wire;

/** A wire record or body that cannot be read; carries the {@link Refusal} to send back or show. */
public final class WireException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final transient Refusal refusal;

    public WireException(Refusal refusal) {
        super(refusal.message());
        this.refusal = refusal;
    }

    public WireException(String field, String message) {
        this(new Refusal(field, "", "", message));
    }

    public Refusal refusal() {
        return refusal;
    }
}
