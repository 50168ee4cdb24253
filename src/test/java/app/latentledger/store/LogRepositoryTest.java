package app.latentledger.store;

import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.InvalidRecordException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class LogRepositoryTest {
    @TempDir
    Path dir;

    @Test
    void logsRoundTripAcrossChunkBoundariesWithMissingSamples() {
        try (Ledger ledger = new Ledger(Database.open(dir.resolve("t.db")))) {
            ledger.sites().save(TestRecords.site("s"));
            ledger.systems().save(TestRecords.system("y", "s"));
            ledger.visits().save(TestRecords.visit("v", "s", "y"));
            // a log needs two sample times (RecordRules), so the smallest stored log has two
            for (int n : new int[] {2, SampleChunks.CHUNK - 1, SampleChunks.CHUNK, SampleChunks.CHUNK + 1,
                    2 * SampleChunks.CHUNK + 5}) {
                ImportedLog log = TestRecords.log("log-" + n, "v", n);
                ledger.logs().save(log);
                ImportedLog back = ledger.logs().find("log-" + n).orElseThrow();
                assertEquals(log, back, "samples " + n);
                if (n > 3) {
                    assertTrue(Double.isNaN(back.samples().channels().get(0).value(3)), "NaN kept as missing");
                }
            }
            assertEquals(5, ledger.logs().idsForVisit("v").size());
        }
    }

    @Test
    void savingALogAgainReplacesItsSamples() {
        try (Ledger ledger = new Ledger(Database.open(dir.resolve("t.db")))) {
            ledger.sites().save(TestRecords.site("s"));
            ledger.systems().save(TestRecords.system("y", "s"));
            ledger.visits().save(TestRecords.visit("v", "s", "y"));
            ledger.logs().save(TestRecords.log("l", "v", 3 * SampleChunks.CHUNK));
            ImportedLog shorter = TestRecords.log("l", "v", 10);
            ledger.logs().save(shorter);
            assertEquals(Optional.of(shorter), ledger.logs().find("l"));
            assertEquals(List.of(shorter), ledger.logs().forVisit("v"));
            assertEquals("log visit", assertThrows(InvalidRecordException.class,
                    () -> ledger.logs().save(TestRecords.log("m", "nowhere", 2))).field());
            assertEquals("log time", assertThrows(InvalidRecordException.class,
                    () -> ledger.logs().save(TestRecords.log("one", "v", 1))).field(), "one sample time is not a log");
        }
    }
}
