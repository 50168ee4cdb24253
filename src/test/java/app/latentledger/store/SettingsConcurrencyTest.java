package app.latentledger.store;

import app.latentledger.core.settings.Settings;
import app.latentledger.core.settings.SettingsCatalogue;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CyclicBarrier;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Two writers on one ledger, each with its own connection as two programs have: a save states
 * the version it loaded, so a change made elsewhere is merged (other key) or refused with what
 * changed (same key), never silently written back over.
 */
class SettingsConcurrencyTest {
    @TempDir
    Path dir;

    @Test
    void aSaveFromAnOldLoadKeepsTheOtherWritersChange() {
        try (Ledger a = new Ledger(Database.open(dir.resolve("l.db")));
             Ledger b = new Ledger(Database.open(dir.resolve("l.db")))) {
            SettingsRepository.Stamped aLoaded = a.settings().loadStamped();
            SettingsRepository.Stamped bLoaded = b.settings().loadStamped();
            b.settings().save(bLoaded, bLoaded.settings().withChoice("paper", "a4"));
            a.settings().save(aLoaded, aLoaded.settings().withChoice("theme", "dark"));
            Settings stored = a.settings().load();
            assertEquals("a4", stored.choice("paper"), "b's acknowledged change kept");
            assertEquals("dark", stored.choice("theme"), "a's change saved");
        }
    }

    @Test
    void theSameKeyChangedOnBothSidesIsRefusedWithWhatChanged() {
        try (Ledger a = new Ledger(Database.open(dir.resolve("l.db")));
             Ledger b = new Ledger(Database.open(dir.resolve("l.db")))) {
            SettingsRepository.Stamped aLoaded = a.settings().loadStamped();
            SettingsRepository.Stamped bLoaded = b.settings().loadStamped();
            b.settings().save(bLoaded, bLoaded.settings().withNumber("tolRh", 3));
            SettingsConflictException e = assertThrows(SettingsConflictException.class,
                    () -> a.settings().save(aLoaded, aLoaded.settings().withNumber("tolRh", 4)
                            .withChoice("theme", "dark")));
            assertTrue(e.getMessage().contains("tolRh: you changed 2.0 (SI) to 4.0 (SI), another program changed it"
                    + " to 3.0 (SI)"), e.getMessage());
            assertEquals(3, a.settings().load().numberSi("tolRh"));
            assertEquals("light", a.settings().load().choice("theme"), "nothing of the refused save written");
            // the same value on both sides is no conflict
            a.settings().save(aLoaded, aLoaded.settings().withNumber("tolRh", 3));
        }
    }

    /**
     * Six writers, each on its own connection, each setting its own key at the same moment,
     * 10 rounds: every acknowledged value must be stored (the attack found 9 of 18 lost).
     */
    @RepeatedTest(5)
    void racingWritersOnDifferentKeysLoseNothing() throws Exception {
        List<String> keys = new ArrayList<>();
        for (String k : SettingsCatalogue.keys()) {
            if (SettingsCatalogue.number(k).isPresent() && keys.size() < 6 && !k.equals("defaultElevation")) {
                keys.add(k);
            }
        }
        Path file = dir.resolve("race.db");
        try (Ledger setup = new Ledger(Database.open(file))) {
            setup.settings().loadStamped();
        }
        ExecutorService pool = Executors.newFixedThreadPool(keys.size());
        try {
            for (int round = 0; round < 10; round++) {
                CyclicBarrier together = new CyclicBarrier(keys.size());
                List<Future<Double>> saved = new ArrayList<>();
                for (String key : keys) {
                    int r = round;
                    saved.add(pool.submit(() -> {
                        try (Ledger l = new Ledger(Database.open(file))) {
                            SettingsRepository.Stamped base = l.settings().loadStamped();
                            var n = SettingsCatalogue.number(key).orElseThrow();
                            double value = n.minSi() + (n.maxSi() - n.minSi()) * (0.2 + 0.05 * r);
                            together.await();
                            l.settings().save(base, base.settings().withNumber(key, value));
                            return value;
                        }
                    }));
                }
                try (Ledger check = new Ledger(Database.open(file))) {
                    Settings stored = null;
                    for (int i = 0; i < keys.size(); i++) {
                        double acknowledged = saved.get(i).get();
                        stored = check.settings().load();
                        assertEquals(acknowledged, stored.numberSi(keys.get(i)), 1e-9, keys.get(i) + " round " + round);
                    }
                }
            }
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    void unitsChangedElsewhereAreNotRevertedByAThemeSave() {
        try (Ledger app = new Ledger(Database.open(dir.resolve("l.db")));
             Ledger cli = new Ledger(Database.open(dir.resolve("l.db")))) {
            SettingsRepository.Stamped appLoaded = app.settings().loadStamped();
            SettingsRepository.Stamped cliLoaded = cli.settings().loadStamped();
            cli.settings().save(cliLoaded, cliLoaded.settings().withChoice("units", UnitSystem.SI.key()));
            assertTrue(!app.settings().version().equals(appLoaded.version()), "the version shows the change");
            SettingsRepository.Stamped after = app.settings().save(appLoaded, appLoaded.settings().withChoice("theme", "dark"));
            assertEquals(UnitSystem.SI, after.settings().units());
            assertEquals(after.version(), app.settings().version(), "the returned version is the stored one");
        }
    }

    /**
     * The same race through the command line, as six {@code settings set} runs at once make it; 40
     * rounds, because a program opening the ledger while another closes it was refused "busy" in
     * about 1 round of 40 before opening retried.
     */
    @RepeatedTest(40)
    void racingSettingsSetCommandsLoseNothing() throws Exception {
        Path data = dir.resolve("cli");
        List<String[]> sets = List.of(new String[] {"tolRh", "3"}, new String[] {"tolDryBulb", "0.7"},
                new String[] {"tolWetBulb", "0.8"}, new String[] {"tolDewPoint", "0.9"}, new String[] {"paper", "a4"},
                new String[] {"theme", "dark"});
        assertEquals(0, run(data, "settings", "show"));
        ExecutorService pool = Executors.newFixedThreadPool(sets.size());
        try {
            CyclicBarrier together = new CyclicBarrier(sets.size());
            List<Future<String>> outcomes = new ArrayList<>();
            for (String[] kv : sets) {
                outcomes.add(pool.submit(() -> {
                    together.await();
                    java.io.ByteArrayOutputStream err = new java.io.ByteArrayOutputStream();
                    int code = run(data, new java.io.PrintStream(err, true, java.nio.charset.StandardCharsets.UTF_8),
                            "settings", "set", kv[0], kv[1]);
                    return code + " " + err.toString(java.nio.charset.StandardCharsets.UTF_8).trim();
                }));
            }
            for (Future<String> o : outcomes) {
                // a refusal says why, so a failure here names its cause
                assertTrue(o.get().startsWith("0 "), o.get());
            }
        } finally {
            pool.shutdownNow();
        }
        try (Ledger l = Ledger.open(data)) {
            Settings s = l.settings().load();
            assertEquals(3, s.numberSi("tolRh"), 1e-9);
            assertEquals("a4", s.choice("paper"));
            assertEquals("dark", s.choice("theme"));
            assertEquals(0.9 / 1.8, s.numberSi("tolDewPoint"), 1e-9, "0.9 °F typed in the default ip units");
            assertEquals(0.8 / 1.8, s.numberSi("tolWetBulb"), 1e-9);
            assertEquals(0.7 / 1.8, s.numberSi("tolDryBulb"), 1e-9);
        }
    }

    private static int run(Path data, String... words) {
        return run(data, new java.io.PrintStream(java.io.OutputStream.nullOutputStream()), words);
    }

    private static int run(Path data, java.io.PrintStream err, String... words) {
        List<String> all = new ArrayList<>(List.of("--data-dir", data.toString()));
        all.addAll(List.of(words));
        java.io.PrintStream quiet = new java.io.PrintStream(java.io.OutputStream.nullOutputStream());
        return app.latentledger.cli.Cli.standard().run(all, quiet, err);
    }
}
