package app.latentledger.core.records;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.units.Quantity;

import java.util.Locale;
import java.util.Objects;
import java.util.regex.Pattern;

/** The checks every record constructor shares, so each refusal names its field the same way. */
final class Check {
    /** Ids travel in bundles and file names: letters, digits, '-' and '_' only, 1 to 64 of them. */
    private static final Pattern ID = Pattern.compile("[A-Za-z0-9_-]{1,64}");

    private Check() {
    }

    static String id(String field, String id) {
        if (id == null || id.isBlank()) {
            throw new InvalidRecordException(field, "missing");
        }
        if (!ID.matcher(id).matches()) {
            throw new InvalidRecordException(field, "'" + id + "' is not an id (1 to 64 letters, digits, '-' or '_')");
        }
        return id;
    }

    /** Required text: trimmed, not blank, at most {@code max} characters. */
    static String text(String field, String value, int max) {
        if (value == null || value.isBlank()) {
            throw new InvalidRecordException(field, "missing");
        }
        return optionalText(field, value, max);
    }

    /** Optional text: null or blank becomes "", at most {@code max} characters. */
    static String optionalText(String field, String value, int max) {
        String t = value == null ? "" : value.strip();
        if (t.length() > max) {
            throw new InvalidRecordException(field, t.length() + " characters; at most " + max);
        }
        return t;
    }

    static <T> T present(String field, T value) {
        if (value == null) {
            throw new InvalidRecordException(field, "missing");
        }
        return value;
    }

    /** Range check in SI; NaN and infinities refused. */
    static double range(String field, Quantity q, double value, double min, double max) {
        if (!Double.isFinite(value) || value < min || value > max) {
            throw new InvalidInputException(field, q, value, min, max, null);
        }
        return value;
    }

    /** An enum value from its lower-case key ("two-stage"), naming the choices when it is not one. */
    static <E extends Enum<E>> E choice(String field, Class<E> type, String key) {
        Objects.requireNonNull(type);
        if (key == null || key.isBlank()) {
            throw new InvalidRecordException(field, "missing; one of " + keys(type));
        }
        String wanted = key.strip().toLowerCase(Locale.ROOT).replace('_', '-');
        for (E e : type.getEnumConstants()) {
            if (key(e).equals(wanted)) {
                return e;
            }
        }
        throw new InvalidRecordException(field, "'" + key + "' is not one of " + keys(type));
    }

    static String key(Enum<?> e) {
        return e.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    private static <E extends Enum<E>> String keys(Class<E> type) {
        StringBuilder b = new StringBuilder();
        for (E e : type.getEnumConstants()) {
            b.append(b.length() == 0 ? "" : ", ").append(key(e));
        }
        return b.toString();
    }
}
