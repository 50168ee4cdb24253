package app.latentledger.ui.log;

import app.latentledger.core.cycles.Channel;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * What a logger column can be read as, in the words the screen shows: the two kinds of time, then
 * each logged quantity in {@link Channel}'s own words (the one vocabulary the findings and the
 * importer's messages also use), and "Not used". The key is the importer's field name, which the
 * screen never shows.
 *
 * @param key   the importer's field ("time", "seconds", "return_db", …), "" for a column not read
 * @param words what the tech reads in the column picker
 */
public record LogField(String key, String words) {
    /** A column left out of the import. */
    public static final LogField NOT_USED = new LogField("", "Not used");
    public static final LogField TIME = new LogField("time", "Date and time");
    public static final LogField SECONDS = new LogField("seconds", "Seconds from the start");

    /** Every choice, "Not used" first, then the times, then the quantities in logging order. */
    public static List<LogField> choices() {
        List<LogField> all = new ArrayList<>(List.of(NOT_USED, TIME, SECONDS));
        for (Channel c : Channel.values()) {
            all.add(of(c));
        }
        return List.copyOf(all);
    }

    /** The choice for one of the importer's fields; an unknown key reads as itself. */
    public static LogField ofKey(String key) {
        for (LogField f : choices()) {
            if (f.key.equals(key)) {
                return f;
            }
        }
        return new LogField(key, key);
    }

    private static LogField of(Channel c) {
        String l = c.label();
        return new LogField(c.field(), l.substring(0, 1).toUpperCase(Locale.ROOT) + l.substring(1));
    }

    public boolean isTime() {
        return this.equals(TIME) || this.equals(SECONDS);
    }

    public boolean isTemperature() {
        Channel c = Channel.ofField(key);
        return c != null && c.isTemperature();
    }

    @Override
    public String toString() {
        return words;
    }
}
