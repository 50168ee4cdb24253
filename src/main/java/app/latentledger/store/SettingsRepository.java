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
 * transaction. A row this build does not know (a threshold of a newer build) or cannot accept (a
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

    /** Saves {@code next}: every setting whose value differs from the stored one, in one transaction. */
    public void save(Settings next) {
        db.write(c -> {
            Settings current = load(c);
            String now = OffsetDateTime.now(ZoneOffset.UTC).toString();
            for (String key : SettingsCatalogue.keys()) {
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
            return null;
        });
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
