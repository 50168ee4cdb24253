package app.latentledger.store;

import app.latentledger.bundle.Bundles;
import app.latentledger.core.settings.Settings;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Imports and settings saves killed with SIGKILL, 50 times each, at random moments (many while a
 * write transaction is open). After every kill: {@code PRAGMA integrity_check} is "ok", every
 * acknowledged import is complete, the import in flight is all or nothing, and every setting holds
 * its last acknowledged value or the value of the save in flight. What it rests on: SQLite's
 * guarantee that a committed WAL transaction with synchronous=FULL survives an application crash
 * and an uncommitted one leaves nothing (sqlite.org/wal.html, sqlite.org/atomiccommit.html).
 */
class ImportAndSettingsCrashTest {
    private static final int KILLS = 50;

    @TempDir
    Path dir;

    @Test
    void killedImportsAreAllOrNothingAndAcknowledgedOnesStay() throws Exception {
        Path data = dir.resolve("data");
        Path template = dir.resolve("template.zip");
        Set<String> ids = new HashSet<>();
        try (Ledger source = TestLedgers.withDemo(dir.resolve("source"))) {
            source.logs().save(TestRecords.log("log-1", DemoScenario.VISIT_COMPLAINT, 5_000));
            Bundles.exportVisit(source, DemoScenario.VISIT_COMPLAINT, template);
            var content = Bundles.ofVisit(source, DemoScenario.VISIT_COMPLAINT);
            ids.add(content.site().id());
            content.systems().forEach(x -> ids.add(x.id()));
            content.visits().forEach(x -> ids.add(x.id()));
            content.readings().forEach(x -> ids.add(x.id()));
            content.logs().forEach(x -> ids.add(x.id()));
            content.snapshots().forEach(x -> ids.add(x.id()));
        }
        Path idsFile = Files.write(dir.resolve("ids.txt"), ids);
        Ledger.open(data).close();
        Random random = new Random(20261203L);
        Set<Integer> acknowledged = new HashSet<>();
        int inFlight = 0;
        for (int kill = 0; kill < KILLS; kill++) {
            ChildJvm child = ChildJvm.start(dir, CrashChild.class, "import", data.toString(), template.toString(),
                    idsFile.toString(), String.valueOf(kill * 100));
            if (kill % 5 == 0) {
                Thread.sleep(random.nextInt(800));
            } else {
                int begins = 1 + random.nextInt(2);
                child.await(lines -> count(lines, "begin ") >= begins, Duration.ofSeconds(30));
                Thread.sleep(random.nextInt(60));
            }
            Set<Integer> begun = new HashSet<>();
            for (String line : child.kill()) {
                if (line.startsWith("begin ")) {
                    begun.add(Integer.parseInt(line.substring(6)));
                } else if (line.startsWith("ok ")) {
                    acknowledged.add(Integer.parseInt(line.substring(3)));
                }
            }
            try (Ledger l = new Ledger(Database.open(data.resolve(Ledger.FILE_NAME)))) {
                assertEquals("ok", l.database().integrityCheck(), "after kill " + kill);
                for (int i : acknowledged) {
                    assertEquals(4, parts(l, i), "acknowledged import " + i + " complete after kill " + kill);
                }
                for (int i : begun) {
                    if (!acknowledged.contains(i)) {
                        int p = parts(l, i);
                        assertTrue(p == 0 || p == 4, "import " + i + " in flight is all or nothing, found " + p + "/4");
                        inFlight++;
                    }
                }
            }
        }
        assertTrue(acknowledged.size() > 5, "the children acknowledged imports: " + acknowledged.size());
        assertTrue(inFlight > 10, "kills should land during imports: " + inFlight);
    }

    /** Of a renamed copy: its visit, its log with all samples, and its two reading sets (4 when complete). */
    private static int parts(Ledger l, int i) {
        String visit = DemoScenario.VISIT_COMPLAINT + "-c" + i;
        int n = l.visits().find(visit).isPresent() ? 1 : 0;
        n += l.logs().find("log-1-c" + i).map(x -> x.samples().size() == 5_000 ? 1 : 0).orElse(0);
        n += l.readings().forVisit(visit).size();
        return n;
    }

    /**
     * The children's output is the record of what they began and what they were told was saved.
     * It is complete (every line written before the kill is read; {@link ChildJvm}) and in order,
     * and a child writes "begin" before its save starts and "ok" only after it returned, one save at
     * a time. So after a kill each setting holds either the value of its last acknowledged save
     * (or, without one, the value found at the previous check) or the value of the one save in flight,
     * and nothing else.
     */
    @Test
    void killedSettingsSavesLoseNoAcknowledgedValue() throws Exception {
        Path data = dir.resolve("data");
        Ledger.open(data).close();
        Random random = new Random(7_2026L);
        Map<String, Double> found = new HashMap<>();
        for (String k : CrashChild.KEYS) {
            found.put(k, Settings.DEFAULTS.numberSi(k));
        }
        int saves = 0;
        int killedInSave = 0;
        for (int kill = 0; kill < KILLS; kill++) {
            ChildJvm child = ChildJvm.start(dir, CrashChild.class, "settings", data.toString(), String.valueOf(kill));
            int oks = 1 + random.nextInt(12);
            child.await(lines -> count(lines, "ok ") >= oks, Duration.ofSeconds(30));
            Thread.sleep(random.nextInt(3));
            SaveRecord record = SaveRecord.of(child.kill(), kill);
            saves += record.acknowledged();
            killedInSave += record.inFlight() != null ? 1 : 0;
            try (Ledger l = new Ledger(Database.open(data.resolve(Ledger.FILE_NAME)))) {
                assertEquals("ok", l.database().integrityCheck(), "after kill " + kill);
                Settings stored = l.settings().load();
                for (String k : CrashChild.KEYS) {
                    double v = stored.numberSi(k);
                    double last = record.lastAcknowledged().getOrDefault(k, found.get(k));
                    boolean inFlight = record.inFlight() != null && record.inFlight().key().equals(k)
                            && Double.compare(record.inFlight().value(), v) == 0;
                    assertTrue(Double.compare(last, v) == 0 || inFlight, k + " = " + v + " after kill " + kill
                            + "; the last acknowledged value is " + last + ", the save in flight " + record.inFlight());
                    found.put(k, v);
                }
            }
        }
        assertTrue(saves > KILLS, "acknowledged saves: " + saves);
        assertTrue(killedInSave > 0, "some kills should land inside a save");
    }

    /** One setting saved by a child: its key and value (SI). */
    record Save(String key, double value) {
    }

    /**
     * What one child's output says: the last acknowledged value of each key it saved, how many saves
     * were acknowledged, and the save begun but not acknowledged when it was killed (null if none).
     * A record that breaks the child's order (an "ok" without its "begin", a "begin" while another
     * save is open) is refused: it would mean lines were lost, and the check would blame the ledger.
     */
    record SaveRecord(Map<String, Double> lastAcknowledged, int acknowledged, Save inFlight) {
        static SaveRecord of(List<String> lines, int kill) {
            Map<String, Double> last = new HashMap<>();
            int acknowledged = 0;
            Save open = null;
            for (String line : lines) {
                String[] w = line.split(" ");
                boolean begin = w[0].equals("begin");
                if (!begin && !w[0].equals("ok")) {
                    continue; // "ready", or a notice of the JVM's own
                }
                assertEquals(3, w.length, "kill " + kill + ": a save line has a key and a value: " + line);
                Save save = new Save(w[1], Double.parseDouble(w[2]));
                if (begin) {
                    assertEquals(null, open, "kill " + kill + ": " + line + " began while a save was open; lines lost");
                    open = save;
                } else {
                    assertEquals(open, save, "kill " + kill + ": " + line + " acknowledged a save not begun; lines lost");
                    last.put(save.key(), save.value());
                    acknowledged++;
                    open = null;
                }
            }
            return new SaveRecord(last, acknowledged, open);
        }
    }

    private static long count(List<String> lines, String prefix) {
        return lines.stream().filter(s -> s.startsWith(prefix)).count();
    }
}
