package app.latentledger.io.logcsv;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * How another logger's column headers are read as the generic fields: "RA Temp=return_db", the
 * command line's repeated {@code --map}. (The app asks with a column picker in words instead and
 * builds the same header → field map from it.)
 */
public final class HeaderMap {
    private HeaderMap() {
    }

    /** One entry per item (the command line's repeated option); an item may hold ';' in its header. */
    public static Map<String, String> parse(List<String> entries) {
        Map<String, String> m = new LinkedHashMap<>();
        for (String e : entries) {
            put(m, e);
        }
        return m;
    }

    private static void put(Map<String, String> m, String entry) {
        String p = entry.strip();
        if (p.isEmpty()) {
            return;
        }
        int eq = p.lastIndexOf('=');
        if (eq <= 0 || eq == p.length() - 1) {
            throw new IllegalArgumentException("header map entry '" + p
                    + "' must be written HEADER=field, e.g. RA Temp=return_db");
        }
        m.put(p.substring(0, eq).strip(), p.substring(eq + 1).strip());
    }
}
