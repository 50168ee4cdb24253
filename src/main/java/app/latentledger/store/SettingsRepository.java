package app.latentledger.store;

import app.latentledger.core.settings.Settings;
import app.latentledger.core.settings.SettingsCatalogue;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The tech's settings in the {@code setting} table (schema V4): one row per setting that is not at
 * its default, numbers in SI.
 *
 * <p>What is never lost: a save writes only the settings whose value it changes, in one
 * transaction, and a save based on settings loaded earlier ({@link #save(Stamped, Settings)})
 * never writes back over a change another program made meanwhile (docs/storage.md). A row this build does not know (a threshold of a newer build) or cannot accept (a
 * value outside this build's range) is ignored on load and left as it is on save, unless the tech
 * changes that very setting here.
 */
public final class SettingsRepository {
    private final Database db;

    SettingsRepository(Database db) {
        this.db = db;
    }

    /** A stored row: a number (SI) or a word. */
    private record Row(Double numberSi, String word) {
    }

    /** The stored settings; defaults for every setting with no row or a row this build cannot use. */
    public Settings load() {
        return db.read(SettingsRepository::load);
    }

    /** The stored keys this build ignores (unknown or not acceptable here), with why. */
    public Map<String, String> ignored() {
        return db.read(c -> {
            Map<String, String> ignored = new LinkedHashMap<>();
            apply(rows(c), ignored);
            return ignored;
        });
    }

    /**
     * Settings as loaded, with the version they were loaded at. The version is a fingerprint
     * (SHA-256) of the stored rows, so it changes with every change to a setting whoever makes it,
     * and needs no schema step.
     */
    public record Stamped(Settings settings, String version) {
    }

    /** The stored settings and their version, read together. */
    public Stamped loadStamped() {
        return db.read(c -> {
            Map<String, Row> rows = rows(c);
            return new Stamped(apply(rows, new LinkedHashMap<>()), stamp(rows));
        });
    }

    /** The version of the stored settings (cheap: one small query), to see whether they changed. */
    public String version() {
        return db.read(c -> stamp(rows(c)));
    }

    /**
     * Saves the settings the caller changed, optimistically: {@code base} is what the caller loaded,
     * {@code next} what it wants. Only the keys where {@code next} differs from {@code base} are
     * written. When the stored settings changed since {@code base} (another program or window
     * saved), the save merges field by field: keys changed on one side only are kept from that
     * side; a key both sides changed to different values refuses the save with what changed, and
     * nothing is written. All of it in one write transaction.
     *
     * @return the settings now stored, with their version (the base of the next save)
     * @throws SettingsConflictException when the same key was changed elsewhere to another value,
     *                                   or the merged settings do not fit together
     */
    public Stamped save(Stamped base, Settings next) {
        return db.write(c -> {
            Map<String, Row> rows = rows(c);
            Settings current = apply(rows, new LinkedHashMap<>());
            List<String> mine = changedKeys(base.settings(), next);
            Settings target = next;
            if (!stamp(rows).equals(base.version())) {
                List<String> theirs = changedKeys(base.settings(), current);
                List<String> clashes = new ArrayList<>();
                for (String key : mine) {
                    if (theirs.contains(key) && !same(current, next, key)) {
                        clashes.add(key + ": you changed " + shown(base.settings(), key) + " to " + shown(next, key)
                                + ", another program changed it to " + shown(current, key));
                    }
                }
                if (!clashes.isEmpty()) {
                    throw new SettingsConflictException(clashes);
                }
                target = current;
                for (String key : mine) {
                    try {
                        target = SettingsCatalogue.choice(key).isPresent() ? target.withChoice(key, next.choice(key))
                                : target.withNumber(key, next.numberSi(key));
                    } catch (IllegalArgumentException e) {
                        throw new SettingsConflictException(List.of(key + ": does not fit the settings another program"
                                + " saved meanwhile (" + e.getMessage() + ")"));
                    }
                }
            }
            write(c, current, target, mine);
            Map<String, Row> after = rows(c);
            return new Stamped(apply(after, new LinkedHashMap<>()), stamp(after));
        });
    }

    /**
     * Saves {@code next} as a whole: every setting whose value differs from the stored one, in one
     * transaction. Last writer wins over a change made since {@code next} was loaded; a caller that
     * loaded settings earlier uses {@link #save(Stamped, Settings)}.
     */
    public void save(Settings next) {
        db.write(c -> {
            Settings current = load(c);
            write(c, current, next, SettingsCatalogue.keys());
            return null;
        });
    }

    private static List<String> changedKeys(Settings from, Settings to) {
        List<String> keys = new ArrayList<>();
        for (String key : SettingsCatalogue.keys()) {
            if (!same(from, to, key)) {
                keys.add(key);
            }
        }
        return keys;
    }

    private static String shown(Settings s, String key) {
        return SettingsCatalogue.choice(key).isPresent() ? s.choice(key) : Double.toString(s.numberSi(key)) + " (SI)";
    }

    /** Writes the given keys of {@code next} that differ from {@code current}. */
    private static void write(Connection c, Settings current, Settings next, List<String> keys) throws SQLException {
        String now = OffsetDateTime.now(ZoneOffset.UTC).toString();
        for (String key : keys) {
            if (same(current, next, key)) {
                continue;
            }
            if (next.isDefault(key)) {
                try (PreparedStatement p = c.prepareStatement("DELETE FROM setting WHERE key = ?")) {
                    p.setString(1, key);
                    p.executeUpdate();
                }
                continue;
            }
            try (PreparedStatement p = c.prepareStatement("INSERT INTO setting (key, number_si, word, updated_at)"
                    + " VALUES (?, ?, ?, ?) ON CONFLICT (key) DO UPDATE SET number_si = excluded.number_si,"
                    + " word = excluded.word, updated_at = excluded.updated_at")) {
                p.setString(1, key);
                boolean choice = SettingsCatalogue.choice(key).isPresent();
                if (choice) {
                    p.setNull(2, Types.REAL);
                    p.setString(3, next.choice(key));
                } else {
                    p.setDouble(2, next.numberSi(key));
                    p.setNull(3, Types.VARCHAR);
                }
                p.setString(4, now);
                p.executeUpdate();
            }
        }
    }

    /** A fingerprint of the stored rows (key, value), in key order. */
    private static String stamp(Map<String, Row> rows) {
        try {
            java.security.MessageDigest d = java.security.MessageDigest.getInstance("SHA-256");
            for (Map.Entry<String, Row> e : rows.entrySet()) {
                d.update((e.getKey() + "\u0000" + e.getValue().numberSi() + "\u0000" + e.getValue().word() + "\n")
                        .getBytes(java.nio.charset.StandardCharsets.UTF_8));
            }
            return java.util.HexFormat.of().formatHex(d.digest(), 0, 16);
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }

    private static boolean same(Settings a, Settings b, String key) {
        return SettingsCatalogue.choice(key).isPresent() ? a.choice(key).equals(b.choice(key))
                : Double.compare(a.numberSi(key), b.numberSi(key)) == 0;
    }

    private static Settings load(Connection c) throws SQLException {
        return apply(rows(c), new LinkedHashMap<>());
    }

    private static Map<String, Row> rows(Connection c) throws SQLException {
        Map<String, Row> rows = new LinkedHashMap<>();
        try (PreparedStatement p = c.prepareStatement("SELECT key, number_si, word FROM setting ORDER BY key");
             ResultSet r = p.executeQuery()) {
            while (r.next()) {
                rows.put(r.getString(1), new Row(Sql.nullableDouble(r, "number_si"), r.getString(3)));
            }
        }
        return rows;
    }

    /**
     * Applies the rows to the defaults. A pair such as the low and high airflow thresholds may only
     * fit together, so refused rows are tried again after the others until nothing more fits.
     */
    private static Settings apply(Map<String, Row> rows, Map<String, String> ignored) {
        Settings s = Settings.DEFAULTS;
        List<String> pending = new ArrayList<>();
        for (String key : rows.keySet()) {
            if (SettingsCatalogue.choice(key).isPresent() || SettingsCatalogue.number(key).isPresent()) {
                pending.add(key);
            } else {
                ignored.put(key, "not a setting of this build (kept for the build that wrote it)");
            }
        }
        Map<String, String> refusals = new LinkedHashMap<>();
        boolean progress = true;
        while (progress && !pending.isEmpty()) {
            progress = false;
            refusals.clear();
            for (String key : new ArrayList<>(pending)) {
                try {
                    s = applyOne(s, key, rows.get(key));
                    pending.remove(key);
                    progress = true;
                } catch (IllegalArgumentException e) {
                    refusals.put(key, e.getMessage());
                }
            }
        }
        ignored.putAll(refusals);
        return s;
    }

    private static Settings applyOne(Settings s, String key, Row row) {
        if (SettingsCatalogue.choice(key).isPresent()) {
            if (row.word() == null) {
                throw new IllegalArgumentException("stored as a number, expected a word");
            }
            return s.withChoice(key, row.word());
        }
        if (row.numberSi() == null) {
            throw new IllegalArgumentException("stored as a word, expected a number");
        }
        return s.withNumber(key, row.numberSi());
    }
}
