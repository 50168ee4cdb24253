package app.latentledger.cli;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Why one batch row was not checked: where it is (line of the file, column by its header name),
 * what was typed, what the column accepts, and the refusal as the {@code coil} command says it.
 *
 * @param line    line of the file, 1 being the header
 * @param column  the header name of the cell at fault, or "" when the row as a whole is at fault
 * @param field   the field as a tech names it, e.g. "return wet bulb"
 * @param value   the cell as typed ("" when missing)
 * @param range   what the column accepts in the row's units ("" for free text)
 * @param message the whole refusal
 */
record BatchRefusal(int line, String column, String field, String value, String range, String message) {
    Map<String, Object> json() {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("line", line);
        m.put("column", column);
        m.put("field", field);
        m.put("value", value);
        m.put("range", range);
        m.put("message", message);
        return m;
    }

    /** One line for standard error. */
    String say() {
        return "line " + line + (column.isEmpty() ? "" : ", column " + column) + (value.isEmpty() ? "" : " '" + value + "'")
                + ": " + message + (range.isEmpty() || message.contains(range) ? "" : " (accepted: " + range + ")");
    }
}
