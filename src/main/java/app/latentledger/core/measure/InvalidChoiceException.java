package app.latentledger.core.measure;

/**
 * A word that is not one of a field's choices (a humidity kind, a coil temperature kind, an airflow
 * basis), or a choice the tool refuses on purpose (a suction-line temperature typed as a coil
 * temperature). Names the field and says what is accepted.
 */
public final class InvalidChoiceException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final String field;

    /**
     * @param field  the field as a tech names it, e.g. "coil temperature kind"
     * @param reason what is wrong and what is accepted
     */
    public InvalidChoiceException(String field, String reason) {
        super(field + " refused: " + reason);
        this.field = field;
    }

    public String field() {
        return field;
    }
}
