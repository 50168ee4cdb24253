package app.latentledger.core.records;

/**
 * A record the ledger refuses to keep: a required field missing, a name too long, a word that is
 * not one of the choices, a reference to something that is not there. Numeric fields out of range
 * are refused with {@link app.latentledger.core.InvalidInputException} instead, which also carries
 * the accepted range in the tech's units.
 */
public final class InvalidRecordException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final String field;

    /**
     * @param field  the field as a tech names it, e.g. "visit purpose"
     * @param reason what is wrong and what is accepted
     */
    public InvalidRecordException(String field, String reason) {
        super(field + " refused: " + reason);
        this.field = field;
    }

    public String field() {
        return field;
    }
}
