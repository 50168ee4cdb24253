package app.latentledger.io.logcsv;

import app.latentledger.core.cycles.Channel;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Where each field sits in a log's header row, and the temperature unit a header states.
 *
 * <p>A header is read as a field when it is the field's name ({@code return_db}, any case), when
 * the header map names it, or when either is followed by a unit in brackets or after a space
 * ({@code return_db [°C]}, {@code RA Temp (degF)}). A stated unit — °C, degC, deg C, C in brackets;
 * °F, degF, deg F, F in brackets — is remembered per column, so a file whose headers say °C is read
 * in °C whatever the settings' units are.
 */
final class HeaderLayout {
    private static final Channel[] CHANNELS = Channel.values();
    /** A trailing unit: "[°C]", "(degF)", " °C", " deg C", "_degF". */
    private static final Pattern UNIT = Pattern.compile(
            "^(.*?)[\\s_]*(?:[\\[(]\\s*(°\\s*[CF]|º\\s*[CF]|deg\\.?\\s*[CF]|[CF])\\s*[\\])]"
                    + "|(°\\s*[CF]|º\\s*[CF]|deg\\.?\\s*[CF]))$", Pattern.CASE_INSENSITIVE);

    final int width;
    int timeColumn = -1;
    boolean timeIsIso;
    final int[] analogColumn = new int[CHANNELS.length];
    /** Unit a temperature column's header states, or null. */
    final UnitSystem[] statedUnit = new UnitSystem[CHANNELS.length];
    final String[] names;
    final Map<String, String> columns = new LinkedHashMap<>();
    final List<String> ignored = new ArrayList<>();
    /** Channels present, with their columns, in reading order (built once, read per row). */
    Channel[] present = new Channel[0];
    int[] presentColumn = new int[0];

    private HeaderLayout(int width) {
        this.width = width;
        this.names = new String[width];
        Arrays.fill(analogColumn, -1);
    }

    /**
     * @param headers the header row's cells, cleaned (no quotes, no byte-order mark)
     * @param maps    logger header → generic field name
     * @throws LogRefusedException when a map names no field or no header, two columns would be one
     *                             field, or there is no time or no temperature column
     */
    static HeaderLayout read(String[] headers, Map<String, String> maps) throws LogRefusedException {
        HeaderLayout h = new HeaderLayout(headers.length);
        Map<String, String> lowerMaps = new LinkedHashMap<>();
        for (Map.Entry<String, String> e : maps.entrySet()) {
            String field = e.getValue().strip().toLowerCase(Locale.ROOT);
            if (!field.equals("time") && !field.equals("seconds") && Channel.ofField(field) == null) {
                throw new LogRefusedException("header map " + e.getKey() + "=" + e.getValue() + ": '" + e.getValue()
                        + "' is not a field; fields are time, seconds, " + fieldList());
            }
            lowerMaps.put(e.getKey().strip().toLowerCase(Locale.ROOT), field);
        }
        List<String> unmatched = new ArrayList<>(lowerMaps.keySet());
        for (int c = 0; c < headers.length; c++) {
            String name = headers[c];
            h.names[c] = name;
            String key = name.toLowerCase(Locale.ROOT);
            Matcher u = UNIT.matcher(name);
            String bare = u.matches() ? u.group(1).strip().toLowerCase(Locale.ROOT) : key;
            UnitSystem stated = u.matches() ? unitOf(u.group(2) != null ? u.group(2) : u.group(3)) : null;
            String field = lowerMaps.get(key);
            String matchedKey = key;
            if (field == null && stated != null) {
                field = lowerMaps.get(bare);
                matchedKey = bare;
            }
            if (field != null) {
                unmatched.remove(matchedKey);
            } else if (isField(key)) {
                field = key;
            } else if (stated != null && isField(bare)) {
                field = bare;
            }
            if (field == null) {
                if (!name.isEmpty()) {
                    h.ignored.add(name);
                }
                continue;
            }
            if (h.columns.containsValue(field)) {
                throw new LogRefusedException("two columns are read as " + field + " (the second is '" + name
                        + "', column " + (c + 1) + "); map one of them to another field");
            }
            h.columns.put(name, field);
            if (field.equals("time") || field.equals("seconds")) {
                if (h.timeColumn >= 0) {
                    throw new LogRefusedException("both a time and a seconds column: keep one (map the other"
                            + " to a different field or delete it)");
                }
                h.timeColumn = c;
                h.timeIsIso = field.equals("time");
            } else {
                Channel ch = Channel.ofField(field);
                h.analogColumn[ch.ordinal()] = c;
                if (ch.isTemperature()) {
                    h.statedUnit[ch.ordinal()] = stated;
                }
            }
        }
        List<Channel> present = new ArrayList<>();
        for (Channel ch : CHANNELS) {
            if (h.analogColumn[ch.ordinal()] >= 0) {
                present.add(ch);
            }
        }
        h.present = present.toArray(new Channel[0]);
        h.presentColumn = new int[h.present.length];
        for (int k = 0; k < h.present.length; k++) {
            h.presentColumn[k] = h.analogColumn[h.present[k].ordinal()];
        }
        if (!unmatched.isEmpty()) {
            throw new LogRefusedException("the header map names header(s) not in the file: " + unmatched
                    + "; headers are " + shown(h.names));
        }
        if (h.timeColumn < 0) {
            throw new LogRefusedException("no time column: expected a column named 'time' (a date and time)"
                    + " or 'seconds' (elapsed), or a header map entry HEADER=time; headers are " + shown(h.names));
        }
        boolean anyTemperature = false;
        for (Channel ch : CHANNELS) {
            anyTemperature |= ch.isTemperature() && h.analogColumn[ch.ordinal()] >= 0;
        }
        if (!anyTemperature) {
            throw new LogRefusedException("no temperature column: expected at least one of return_db, supply_db,"
                    + " return_wb, supply_wb, coil_temp, outdoor_db (or a header map entry HEADER=field);"
                    + " headers are " + shown(h.names));
        }
        return h;
    }

    /**
     * The field a header is read as without a header map, by the rule {@link #read} applies: the
     * field's own name, alone or followed by a stated unit; null when it needs a map entry.
     */
    static String fieldByName(String header) {
        String key = header.toLowerCase(Locale.ROOT);
        if (isField(key)) {
            return key;
        }
        Matcher u = UNIT.matcher(header);
        String bare = u.matches() ? u.group(1).strip().toLowerCase(Locale.ROOT) : null;
        return bare != null && isField(bare) ? bare : null;
    }

    /** The unit the temperature columns' headers agree on, null when none states one. */
    UnitSystem statedTemperatureUnit() throws LogRefusedException {
        UnitSystem found = null;
        String first = null;
        for (Channel ch : CHANNELS) {
            UnitSystem u = statedUnit[ch.ordinal()];
            if (u == null) {
                continue;
            }
            String name = names[analogColumn[ch.ordinal()]];
            if (found != null && u != found) {
                throw new LogRefusedException("the headers state two temperature units: '" + first + "' and '"
                        + name + "'; a log is read in one unit");
            }
            found = u;
            first = name;
        }
        return found;
    }

    private static boolean isField(String key) {
        return key.equals("time") || key.equals("seconds") || Channel.ofField(key) != null;
    }

    private static UnitSystem unitOf(String token) {
        char last = Character.toUpperCase(token.charAt(token.length() - 1));
        return last == 'C' ? UnitSystem.SI : UnitSystem.IP;
    }

    private static String fieldList() {
        StringBuilder b = new StringBuilder();
        for (Channel c : CHANNELS) {
            b.append(b.length() == 0 ? "" : ", ").append(c.field());
        }
        return b.toString();
    }

    static String shown(String[] names) {
        String s = Arrays.toString(names);
        return s.length() > 300 ? s.substring(0, 300) + "…]" : s;
    }
}
