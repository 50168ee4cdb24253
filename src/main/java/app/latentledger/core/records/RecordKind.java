package app.latentledger.core.records;

import java.util.Locale;

/** The records a tech can delete and restore; the words are the command line's KIND. */
public enum RecordKind {
    SITE("site"), SYSTEM("system"), VISIT("visit"), READINGS("readings"), LOG("log");

    private final String key;

    RecordKind(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }

    /** The kind from its word; "reading-set" and plurals are accepted too. */
    public static RecordKind parse(String field, String word) {
        if (word == null || word.isBlank()) {
            throw new InvalidRecordException(field, "missing; one of site, system, visit, readings, log");
        }
        String w = word.strip().toLowerCase(Locale.ROOT);
        for (RecordKind k : values()) {
            if (k.key.equals(w) || (k.key + "s").equals(w)) {
                return k;
            }
        }
        if (w.equals("reading-set") || w.equals("reading-sets") || w.equals("reading")) {
            return READINGS;
        }
        throw new InvalidRecordException(field, "'" + word + "' is not one of site, system, visit, readings, log");
    }
}
