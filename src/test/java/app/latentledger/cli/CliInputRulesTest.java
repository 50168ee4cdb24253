package app.latentledger.cli;

import app.latentledger.bundle.BundleFiles;
import app.latentledger.bundle.Bundles;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import app.latentledger.store.TestLedgers;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The command line's input rules: one number rule, no silently ignored words, clear refusals
 * (exit 2, never 1) for bad paths and folders, and record text that cannot drive the terminal.
 */
class CliInputRulesTest {
    private static final String COIL = "coil --return-db 75 --return-rh 50 --supply-db 55 --supply-rh 90 --airflow 1200";

    @TempDir
    Path dir;

    record Run(int code, String out, String err) {
    }

    private Run run(String line) {
        return run(new ArrayList<>(Arrays.asList(line.split(" "))));
    }

    private Run run(List<String> words) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        List<String> all = new ArrayList<>(words);
        if (!all.contains("--data-dir")) {
            all.addAll(0, List.of("--data-dir", dir.resolve("data").toString()));
        }
        int code = Cli.standard().run(all, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    @Test
    void aCommaInANumberIsRefusedWithAHint() {
        Run r = run(COIL + " --condensate-minutes 15 --condensate 1,000");
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("--condensate value '1,000' has a comma"), r.err());
        assertTrue(r.err().contains("1000") && r.err().contains("--decimal-comma"), r.err());
        assertEquals(2, run("state --elevation 1,500 --dry-bulb 75 --rh 40").code());
        Run set = run("settings set defaultElevation 12,000");
        assertEquals(2, set.code(), set.err());
        assertTrue(set.err().contains("has a comma"), set.err());
    }

    @Test
    void decimalCommaMakesTheCommaTheDecimalMark() {
        Run comma = run(COIL + " --condensate-minutes 15 --condensate 560,5 --decimal-comma --json");
        Run point = run(COIL + " --condensate-minutes 15 --condensate 560.5 --json");
        assertEquals(0, comma.code(), comma.err());
        assertEquals(JsonParser.parseString(point.out()), JsonParser.parseString(comma.out()), "560,5 read as 560.5");
        Run mixed = run(COIL + " --condensate-minutes 15 --condensate 560.5 --decimal-comma");
        assertEquals(2, mixed.code());
        assertTrue(mixed.err().contains("write it as 560,5"), mixed.err());
    }

    @Test
    void singleDashOptionsAndStrayWordsAreRefused() {
        Run dash = run(COIL + " -coil-temp 47");
        assertEquals(2, dash.code(), dash.err());
        assertTrue(dash.err().contains("'-coil-temp' is not an option") && dash.err().contains("--coil-temp"), dash.err());
        Run stray = run("state --dry-bulb 75 --rh 40 elevation");
        assertEquals(2, stray.code());
        assertTrue(stray.err().contains("unexpected word 'elevation'"), stray.err());
        Run typo = run(COIL + " --coil-tmp 47");
        assertEquals(2, typo.code());
        assertTrue(typo.err().contains("unknown option --coil-tmp; did you mean --coil-temp?"), typo.err());
        Run flag = run("state --dry-bulb 75 --rh 40 --json=maybe");
        assertEquals(2, flag.code());
        assertTrue(flag.err().contains("--json takes no value"), flag.err());
        // a negative number is still a value, not an option
        assertEquals(0, run("state --dry-bulb 20 --dew-point -5 --units si").code());
    }

    @Test
    void badDataFoldersAndExportPathsAreRefusedWithExitTwo() throws Exception {
        Path cwdLedger = Path.of("").toAbsolutePath().resolve("ledger.db");
        boolean existedBefore = Files.exists(cwdLedger);
        Run empty = run(List.of("--data-dir", "", "visits", "list"));
        assertEquals(2, empty.code(), empty.err());
        assertTrue(empty.err().contains("--data-dir is empty"), empty.err());
        assertEquals(existedBefore, Files.exists(cwdLedger), "no ledger made in the current folder");

        Path file = Files.writeString(dir.resolve("a-file"), "x");
        Run notFolder = run(List.of("--data-dir", file.toString(), "settings", "show"));
        assertEquals(2, notFolder.code(), notFolder.err());
        assertTrue(notFolder.err().contains("is a file, not a folder"), notFolder.err());

        String visit = DemoScenario.VISIT_COMPLAINT;
        for (String target : List.of("/", dir.toString(), "", dir.resolve("no/such/tree/v.zip").toString(),
                file.resolve("v.zip").toString())) {
            Run r = run(List.of("--data-dir", dir.resolve("data").toString(), "visits", "export", visit, target));
            assertEquals(2, r.code(), target + ": " + r.err());
            assertFalse(r.err().contains("unexpected failure"), r.err());
        }
        assertFalse(Files.exists(dir.resolve("no")), "no folder tree made for a mistyped path");
    }

    @Test
    void recordTextCannotDriveTheTerminal() throws Exception {
        Path template = dir.resolve("t.zip");
        try (Ledger l = TestLedgers.withDemo(dir.resolve("source"))) {
            Bundles.exportVisit(l, DemoScenario.VISIT_COMPLAINT, template);
        }
        String hostile = "\u001B]0;pwned\u0007\u001B[2J\u001B[31mInvoice \u202EFDP.exe";
        java.util.Set<String> ids = new java.util.HashSet<>();
        try (Ledger l = TestLedgers.withDemo(dir.resolve("source"))) {
            var content = Bundles.ofVisit(l, DemoScenario.VISIT_COMPLAINT);
            ids.add(content.site().id());
            content.systems().forEach(x -> ids.add(x.id()));
            content.visits().forEach(x -> ids.add(x.id()));
            content.readings().forEach(x -> ids.add(x.id()));
        }
        var entries = BundleFiles.renamed(BundleFiles.entries(template), ids, "-h");
        BundleFiles.editText(entries, "site.json", t -> t.replace("Heron Spit Road residence",
                hostile.replace("\u001B", "\\u001b").replace("\u0007", "\\u0007").replace("\u202E", "\\u202e")));
        Path bundle = dir.resolve("hostile.zip");
        BundleFiles.write(bundle, BundleFiles.rehash(entries));
        Run imported = run("visits import " + bundle);
        assertEquals(0, imported.code(), imported.err());
        Run list = run("visits list");
        assertEquals(0, list.code(), list.err());
        assertFalse(list.out().contains("\u001B") || list.out().contains("\u202E") || list.out().contains("\u0007"),
                "no raw control characters on the terminal");
        assertTrue(list.out().contains("\\u001B]0;pwned"), list.out());
        Run json = run("visits list --json");
        assertTrue(JsonParser.parseString(json.out()).toString().contains("\\u202e")
                || JsonParser.parseString(json.out()).getAsJsonArray().toString().contains("\u202E"), "JSON still valid");
    }
}
