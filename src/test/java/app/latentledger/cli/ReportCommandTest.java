package app.latentledger.cli;

import app.latentledger.store.DemoScenario;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** {@code report} and {@code data} on the command line: good runs, and bad input that leaves no file behind. */
class ReportCommandTest {
    @TempDir
    Path dir;

    private record Run(int code, String out, String err) {
    }

    private Run run(String... words) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        List<String> all = new ArrayList<>(List.of("--data-dir", dir.resolve("data").toString()));
        all.addAll(List.of(words));
        int code = Cli.standard().run(all, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    /** Files in the test folder other than the ledger's. */
    private List<String> leftOver() throws Exception {
        try (var s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).filter(n -> !n.equals("data")).sorted().toList();
        }
    }

    @Test
    @DisplayName("a visit id prefix, default Letter for IP and A4 for SI, --compare, --json")
    void writes() throws Exception {
        Run r = run("report", DemoScenario.VISIT_COMPLAINT.substring(0, 8), "--out", dir.resolve("a.pdf").toString());
        assertEquals(Cli.OK, r.code(), r.err());
        assertTrue(r.out().startsWith("Wrote "), r.out());
        try (PDDocument d = Loader.loadPDF(dir.resolve("a.pdf").toFile())) {
            assertEquals(612, d.getPage(0).getMediaBox().getWidth(), 0.01);
        }
        r = run("report", DemoScenario.VISIT_COMMISSIONING.substring(0, 6), "--units", "si", "--out",
                dir.resolve("b.pdf").toString());
        assertEquals(Cli.OK, r.code(), r.err());
        try (PDDocument d = Loader.loadPDF(dir.resolve("b.pdf").toFile())) {
            assertEquals(595.28, d.getPage(0).getMediaBox().getWidth(), 0.01);
        }
        r = run("report", DemoScenario.VISIT_COMPLAINT, "--compare", DemoScenario.VISIT_COMMISSIONING.substring(0, 5),
                "--paper", "A4", "--out", dir.resolve("c.pdf").toString(), "--json");
        assertEquals(Cli.OK, r.code(), r.err());
        assertTrue(r.out().contains("\"paper\": \"a4\""), r.out());
        assertEquals(List.of("a.pdf", "b.pdf", "c.pdf"), leftOver());
        assertTrue(Cli.standard().overview().contains("report "));
        assertTrue(Cli.standard().overview().contains("data "));
    }

    @Test
    @DisplayName("unknown visit, missing --out, unwritable path, bad paper: exit 2, a clear message, no file")
    void refusals() throws Exception {
        Path pdf = dir.resolve("r.pdf");
        Run r = run("report", "zzzz9999", "--out", pdf.toString());
        assertEquals(Cli.REFUSED, r.code());
        assertTrue(r.err().contains("no visit with id 'zzzz9999'"), r.err());

        r = run("report", DemoScenario.VISIT_COMPLAINT);
        assertEquals(Cli.REFUSED, r.code());
        assertTrue(r.err().contains("needs --out"), r.err());

        Path notAFolder = dir.resolve("plain.txt");
        Files.writeString(notAFolder, "x");
        r = run("report", DemoScenario.VISIT_COMPLAINT, "--out", notAFolder.resolve("r.pdf").toString());
        assertEquals(Cli.REFUSED, r.code());
        assertTrue(r.err().contains("cannot write") && r.err().contains("does not exist"), r.err());

        r = run("report", DemoScenario.VISIT_COMPLAINT, "--out", dir.resolve("missing/r.pdf").toString());
        assertEquals(Cli.REFUSED, r.code());
        assertTrue(r.err().contains("does not exist"), r.err());

        Files.createDirectory(dir.resolve("folder.pdf"));
        r = run("report", DemoScenario.VISIT_COMPLAINT, "--out", dir.resolve("folder.pdf").toString());
        assertEquals(Cli.REFUSED, r.code());
        assertTrue(r.err().contains("it is a folder"), r.err());

        r = run("report", DemoScenario.VISIT_COMPLAINT, "--paper", "legal", "--out", pdf.toString());
        assertEquals(Cli.REFUSED, r.code());
        assertTrue(r.err().contains("'legal' is not a paper size; use letter or a4"), r.err());

        r = run("report", DemoScenario.VISIT_COMPLAINT, "--compare", DemoScenario.VISIT_COMPLAINT, "--out", pdf.toString());
        assertEquals(Cli.REFUSED, r.code());
        assertTrue(r.err().contains("cannot be compared with itself"), r.err());

        r = run("data", "zzzz9999", "--format", "csv", "--out", dir.resolve("d.csv").toString());
        assertEquals(Cli.REFUSED, r.code());
        r = run("data", DemoScenario.VISIT_COMPLAINT, "--format", "xml", "--out", dir.resolve("d.xml").toString());
        assertEquals(Cli.REFUSED, r.code());
        assertTrue(r.err().contains("use csv or json"), r.err());

        assertEquals(List.of("folder.pdf", "plain.txt"), leftOver(), "no report, export or temporary file was left");
        assertFalse(Files.exists(pdf));
    }

    @Test
    @DisplayName("an existing report is replaced only by a complete one")
    void replaces() throws Exception {
        Path pdf = dir.resolve("r.pdf");
        Files.writeString(pdf, "old");
        assertEquals(Cli.OK, run("report", DemoScenario.VISIT_COMPLAINT, "--out", pdf.toString()).code());
        assertTrue(Files.size(pdf) > 10_000);
        assertEquals(Cli.REFUSED, run("report", "zzzz9999", "--out", pdf.toString()).code());
        assertTrue(Files.size(pdf) > 10_000, "a refused run leaves the earlier report alone");
        assertEquals(List.of("r.pdf"), leftOver());
    }
}
