package app.latentledger.core.measure;

import java.util.Locale;

/** Parsing a choice from its key, the same way for every enum of this package. */
final class Choices {
    private Choices() {
    }

    /** The constant whose key is {@code key} (case and '_' vs '-' ignored), else a refusal naming the choices. */
    static <E extends Enum<E>> E parse(String field, Class<E> type, String key, java.util.function.Function<E, String> keyOf) {
        if (key == null || key.isBlank()) {
            throw new InvalidChoiceException(field, "missing; one of " + keys(type, keyOf));
        }
        String wanted = key.strip().toLowerCase(Locale.ROOT).replace('_', '-');
        for (E e : type.getEnumConstants()) {
            if (keyOf.apply(e).equals(wanted)) {
                return e;
            }
        }
        throw new InvalidChoiceException(field, "'" + key + "' is not one of " + keys(type, keyOf));
    }

    static <E extends Enum<E>> String keys(Class<E> type, java.util.function.Function<E, String> keyOf) {
        StringBuilder b = new StringBuilder();
        for (E e : type.getEnumConstants()) {
            b.append(b.length() == 0 ? "" : ", ").append(keyOf.apply(e));
        }
        return b.toString();
    }
}
