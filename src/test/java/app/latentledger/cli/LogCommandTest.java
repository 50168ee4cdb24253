package app.latentledger.cli;

import app.latentledger.core.findings.Cautions;
import app.latentledger.fielddata.SyntheticLog;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class LogCommandTest {
    @TempDir
    Path dir;

    private record Result(int code, String out, String err) {
    }

    private static Result run(String... words) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Cli.standard().run(List.of(words), new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Result(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private Path synthetic(String name, double fillS, double interval) throws Exception {
        SyntheticLog.Scenario s = new SyntheticLog.Scenario();
        s.intervalS = interval;
        s.onOff = new double[] {1200, 600};
        s.fillToS = fillS;
        s.blower = SyntheticLog.Blower.CONTINUOUS;
        s.returnRhPct = 45;
        s.splitK = 9;
        s.steadyDryingW = 0.0012;
        Path f = dir.resolve(name);
        try (Writer w = Files.newBufferedWriter(f)) {
            SyntheticLog.generate(s).write(w, new SyntheticLog.Layout());
        }
        return f;
    }

    @Test
    @DisplayName("registered in Cli.standard() and listed in the overview")
    void registered() {
        assertTrue(Cli.standard().overview().contains("log "));
        assertTrue(run("log", "--help").out().contains("--map HEADER=field"));
    }

    @Test
    @DisplayName("JSON has the keys the issue lists")
    void jsonKeys() throws Exception {
        Path f = synthetic("a.csv", 4 * 3600, 10);
        Result r = run("log", f.toString(), "--airflow", "1000", "--json");
        assertEquals(0, r.code(), r.err());
        JsonObject o = JsonParser.parseString(r.out()).getAsJsonObject();
        for (String k : List.of("samples", "durationHours", "cycles", "cyclesPerHour", "medianOnMinutes",
                "moistureRemovedPerHour", "latentFractionMeasured", "latentFractionPredicted", "modelParameters",
                "rejectedRows", "findings")) {
            assertTrue(o.has(k), k);
        }
        JsonObject c = o.getAsJsonArray("cycles").get(0).getAsJsonObject();
        for (String k : List.of("start", "onSeconds", "offSeconds", "offBlower", "moistureRemoved", "moistureReturned",
                "onsetSeconds")) {
            assertTrue(c.has(k), k);
        }
        assertEquals("on", c.get("offBlower").getAsString());
        assertEquals("2026-07-14T00:20:00-04:00", c.get("start").getAsString());
        for (String k : List.of("twetSeconds", "gamma", "tauSeconds", "source")) {
            assertTrue(o.getAsJsonObject("modelParameters").has(k), k);
        }
        assertEquals(Cautions.SAFETY_LINE, o.get("safety").getAsString());
        assertTrue(o.get("steadyLatentRate").getAsDouble() > 0);
    }

    @Test
    @DisplayName("no run long enough for a steady rate: steadyLatentRate is \"unknown\"")
    void unknownSteadyRate() throws Exception {
        SyntheticLog.Scenario s = new SyntheticLog.Scenario();
        s.onOff = new double[] {300, 600};
        s.fillToS = 3 * 3600;
        Path f = dir.resolve("short.csv");
        try (Writer w = Files.newBufferedWriter(f)) {
            SyntheticLog.generate(s).write(w, new SyntheticLog.Layout());
        }
        JsonObject o = JsonParser.parseString(run("log", f.toString(), "--json").out()).getAsJsonObject();
        assertEquals("unknown", o.get("steadyLatentRate").getAsString());
        assertTrue(o.get("latentFractionMeasured").isJsonNull());
    }

    @Test
    @DisplayName("readable output: cycle table, summary, findings, and the safety line last")
    void readable() throws Exception {
        Path f = synthetic("b.csv", 4 * 3600, 10);
        Result r = run("log", f.toString(), "--airflow", "1000");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("Cycles"));
        assertTrue(r.out().contains("off-cycle-reevaporation"));
        assertTrue(r.out().strip().endsWith(Cautions.SAFETY_LINE));
    }

    @Test
    @DisplayName("refusals exit 2 with a message naming what is wrong")
    void refusals() throws Exception {
        Result missing = run("log", dir.resolve("nope.csv").toString());
        assertEquals(2, missing.code());
        assertTrue(missing.err().contains("no such file"), missing.err());
        Path bad = dir.resolve("bad.csv");
        Files.writeString(bad, "a,b\n1,2\n");
        Result refused = run("log", bad.toString());
        assertEquals(2, refused.code());
        assertTrue(refused.err().contains("no time column"), refused.err());
        Path f = synthetic("c.csv", 3600, 10);
        Result airflow = run("log", f.toString(), "--airflow", "5");
        assertEquals(2, airflow.code());
        assertTrue(airflow.err().contains("--airflow: airflow 5 cfm refused"), airflow.err());
        assertEquals(2, run("log", f.toString(), "--map", "nonsense").code());
        assertEquals(2, run("log").code());
        Path onlyReturn = dir.resolve("r.csv");
        Files.writeString(onlyReturn, "seconds,return_db\n0,75\n10,75\n20,75\n");
        Result notAnalysable = run("log", onlyReturn.toString());
        assertEquals(2, notAnalysable.code());
        assertTrue(notAnalysable.err().contains("needs a compressor column"), notAnalysable.err());
    }

    @Test
    @DisplayName("a long file shows progress on standard error")
    void progress() throws Exception {
        Path f = synthetic("long.csv", 2 * 86_400, 2);
        assertTrue(Files.size(f) > 2_000_000);
        Result r = run("log", f.toString(), "--json");
        assertEquals(0, r.code(), r.err());
        List<String> lines = new ArrayList<>(r.err().lines().toList());
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("reading long.csv: ") && l.endsWith("%")), r.err());
    }
}
