package app.latentledger.store;

import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.settings.Settings;
import app.latentledger.core.settings.SettingsCatalogue;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.util.LinkedHashMap;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SettingsRepositoryTest {
    @TempDir
    Path dir;

    private Ledger open() {
        return new Ledger(Database.open(dir.resolve("ledger.db")));
    }

    private static Settings everythingChanged() {
        return Settings.DEFAULTS.withChoice("units", "si").withChoice("theme", "dark").withChoice("paper", "a4")
                .withTyped(SettingsCatalogue.DEFAULT_ELEVATION, 1200, UnitSystem.IP)
                .withTyped(SettingsCatalogue.TOL_DRY_BULB, 0.3, UnitSystem.IP)
                .withNumber(SettingsCatalogue.TOL_RH, 3.5)
                .withTyped(SettingsCatalogue.TOL_WET_BULB, 0.2, UnitSystem.IP)
                .withTyped(SettingsCatalogue.TOL_DEW_POINT, 2, UnitSystem.IP)
                .withTyped(SettingsCatalogue.TOL_COIL, 1.5, UnitSystem.IP)
                .withNumber(SettingsCatalogue.TOL_AIRFLOW, 0.15)
                .withNumber(SettingsCatalogue.TOL_CONDENSATE, 0.05)
                .withNumber(SettingsCatalogue.INDOOR_RH_TARGET, 55)
                .withTyped(Thresholds.COIL_HIGH_AIRFLOW_PER_TON.key(), 400, UnitSystem.IP)
                .withNumber(Thresholds.MEDIAN_ON_TIME_MIN.key(), 10 * 60.0);
    }

    @Test
    void everySettingRoundTripsExactlyAndSurvivesReopening() {
        Settings s = everythingChanged();
        try (Ledger l = open()) {
            assertEquals(Settings.DEFAULTS, l.settings().load(), "empty table: defaults");
            l.settings().save(s);
            assertEquals(s, l.settings().load());
        }
        try (Ledger l = open()) {
            assertEquals(s, l.settings().load(), "committed to the file");
            assertEquals(Map.of(), l.settings().ignored());
        }
    }

    @Test
    void onlySettingsAwayFromTheirDefaultAreStoredAndResetDeletesThem() {
        try (Ledger l = open()) {
            l.settings().save(Settings.DEFAULTS.withChoice("paper", "a4"));
            assertEquals(Map.of("paper", "a4"), rows(l));
            l.settings().save(l.settings().load().reset("paper"));
            assertEquals(Map.of(), rows(l));
        }
    }

    @Test
    void rowsOfANewerBuildAreKeptAndIgnored() {
        try (Ledger l = open()) {
            insert(l, "futureThreshold", 12.5, null);
            // a value this build refuses (say a newer build widened the range), and a word where a number belongs
            insert(l, Thresholds.COIL_HIGH_AIRFLOW_PER_TON.key(), 9.0, null);
            insert(l, SettingsCatalogue.TOL_RH, null, "wide");
            insert(l, SettingsCatalogue.THEME, null, "dark");
            Settings loaded = l.settings().load();
            assertEquals(Settings.DEFAULTS.withChoice("theme", "dark"), loaded);
            Map<String, String> ignored = l.settings().ignored();
            assertEquals(3, ignored.size(), ignored.toString());
            assertTrue(ignored.get("futureThreshold").contains("not a setting of this build"));
            assertTrue(ignored.get(Thresholds.COIL_HIGH_AIRFLOW_PER_TON.key()).contains("refused"));
            // saving something else leaves all three rows as they were
            l.settings().save(loaded.withChoice("paper", "a4").reset("theme"));
            Map<String, Object> after = rows(l);
            assertEquals(12.5, after.get("futureThreshold"));
            assertEquals(9.0, after.get(Thresholds.COIL_HIGH_AIRFLOW_PER_TON.key()));
            assertEquals("wide", after.get(SettingsCatalogue.TOL_RH));
            assertEquals("a4", after.get("paper"));
            assertFalse(after.containsKey("theme"));
        }
    }

    @Test
    void aPairThatOnlyFitsTogetherLoadsWhateverTheRowOrder() {
        // a high airflow limit of 280 cfm/ton is valid only above a low limit under 280: rows come back in key
        // order, "coilHigh…" before "coilLow…", so the high row is refused against the default low (300) at
        // first and must be tried again once the low row (250) is in
        Settings s = Settings.DEFAULTS.withTyped(Thresholds.COIL_LOW_AIRFLOW_PER_TON.key(), 250, UnitSystem.IP)
                .withTyped(Thresholds.COIL_HIGH_AIRFLOW_PER_TON.key(), 280, UnitSystem.IP);
        try (Ledger l = open()) {
            l.settings().save(s);
            assertEquals(s, l.settings().load());
            assertEquals(Map.of(), l.settings().ignored());
        }
    }

    @Test
    void aFailedSaveChangesNothing() {
        try (Ledger l = open()) {
            Settings first = Settings.DEFAULTS.withChoice("units", "si");
            l.settings().save(first);
            assertThrows(RuntimeException.class, () -> l.inTransaction(() -> {
                l.settings().save(everythingChanged());
                throw new IllegalStateException("power cut mid-save");
            }));
            assertEquals(first, l.settings().load());
        }
    }

    @Test
    void commandsReadDefaultsWithoutCreatingALedger() {
        DataLocation none = DataLocation.resolve(dir.resolve("nothing-here"));
        assertEquals(Settings.DEFAULTS, StoredSettings.read(none));
        assertFalse(Files.exists(none.folder()), "reading settings created nothing");
        Settings s = Settings.DEFAULTS.withChoice("units", "si");
        try (Ledger l = Ledger.open(dir.resolve("tablet"))) {
            l.settings().save(s);
        }
        assertEquals(s, StoredSettings.read(DataLocation.resolve(dir.resolve("tablet"))));
    }

    private static void insert(Ledger l, String key, Double number, String word) {
        l.database().write(c -> {
            try (PreparedStatement p = c.prepareStatement(
                    "INSERT INTO setting (key, number_si, word, updated_at) VALUES (?, ?, ?, 'x')")) {
                p.setString(1, key);
                p.setObject(2, number);
                p.setString(3, word);
                return p.executeUpdate();
            }
        });
    }

    private static Map<String, Object> rows(Ledger l) {
        return l.database().read(c -> {
            Map<String, Object> m = new LinkedHashMap<>();
            try (PreparedStatement p = c.prepareStatement("SELECT key, number_si, word FROM setting");
                 ResultSet r = p.executeQuery()) {
                while (r.next()) {
                    m.put(r.getString(1), r.getString(3) != null ? r.getString(3) : (Object) r.getDouble(2));
                }
            }
            return m;
        });
    }
}
