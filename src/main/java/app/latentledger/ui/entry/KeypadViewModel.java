package app.latentledger.ui.entry;

import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

import java.util.OptionalDouble;

/**
 * What has been tapped on the number pad so far: digits, one decimal point, a sign. Holds text, not
 * a number, so "0." and "-" can be on the way to a value.
 */
public final class KeypadViewModel {
    /** Long enough for any field reading ("-12345.67"), short enough to stay on one line. */
    static final int MAX_CHARACTERS = 9;

    private final ReadOnlyStringWrapper text = new ReadOnlyStringWrapper("");

    public ReadOnlyStringProperty textProperty() {
        return text.getReadOnlyProperty();
    }

    public String text() {
        return text.get();
    }

    public void digit(int d) {
        if (d < 0 || d > 9) {
            throw new IllegalArgumentException("digit " + d);
        }
        String t = text.get();
        if (t.equals("0") || t.equals("-0")) {
            t = t.substring(0, t.length() - 1);
        }
        append(t, Character.forDigit(d, 10));
    }

    public void point() {
        String t = text.get();
        if (t.contains(".")) {
            return;
        }
        append(t.isEmpty() || t.equals("-") ? t + "0" : t, '.');
    }

    /** Flips the sign (outdoor air and coil temperatures can be below zero). */
    public void sign() {
        String t = text.get();
        text.set(t.startsWith("-") ? t.substring(1) : "-" + t);
    }

    public void backspace() {
        String t = text.get();
        if (!t.isEmpty()) {
            text.set(t.substring(0, t.length() - 1));
        }
    }

    public void clear() {
        text.set("");
    }

    /** Starts from a shown value, e.g. to edit the one in the box. */
    public void load(String shown) {
        text.set(shown == null ? "" : shown);
    }

    /** The number tapped, or empty while the text is not one yet ("", "-", "."). */
    public OptionalDouble value() {
        String t = text.get();
        if (t.isEmpty() || t.equals("-")) {
            return OptionalDouble.empty();
        }
        try {
            return OptionalDouble.of(Double.parseDouble(t));
        } catch (NumberFormatException e) {
            return OptionalDouble.empty();
        }
    }

    private void append(String t, char c) {
        if (t.replace("-", "").length() < MAX_CHARACTERS) {
            text.set(t + c);
        }
    }
}
