package app.latentledger.fielddata;

import app.latentledger.cli.Cli;
import app.latentledger.core.cycles.BlowerState;
import app.latentledger.core.cycles.CycleResult;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.FindingCode;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.LogConditions;
import app.latentledger.io.logcsv.LogImport;
import app.latentledger.ui.log.CycleLogAnalysis;
import app.latentledger.ui.present.Row;
import app.latentledger.visit.VisitLog;
import app.latentledger.visit.VisitLogs;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.ZoneId;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Over every log in {@code field-data-samples/}: the cycle table (the {@code log} command's), the
 * summaries (the command's and the app's Logs screen) and the findings say the same thing about the
 * blower in the rests. The truth each is held to is the analysis's own per-rest blower record (state
 * and blower-on seconds of each rest), counted here without the display code: a rest the blower ran
 * through is "left on" (continuous fan), a rest in which it ran on after the compressor and then
 * stopped is a fan-off delay, and no display may call the one by the other's name or give a count
 * the per-rest record does not.
 */
class BlowerInRestsAgreeTest {
    private static final Path DIR = Path.of("field-data-samples");
    private static final Pattern RAN_ON = Pattern.compile("ran on (\\d+) s");

    /** A log sample and the command-line options it is read with. */
    private record LogSample(String file, List<String> options) {
    }

    private static List<LogSample> samples() throws Exception {
        List<LogSample> out = new ArrayList<>();
        for (FieldSamples.Sample s : FieldSamples.all()) {
            out.add(new LogSample(s.file(), s.options()));
        }
        for (IndependentSamples.Sample s : IndependentSamples.all()) {
            out.add(new LogSample(s.file(), s.options()));
        }
        return out;
    }

    @Test
    @DisplayName("every log sample in the folder is checked (the batch files are not logs)")
    void everyLogSample() throws Exception {
        TreeSet<String> inFolder;
        try (Stream<Path> files = Files.list(DIR)) {
            inFolder = files.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".csv"))
                    .filter(n -> !n.startsWith("commissioning-batch")).collect(Collectors.toCollection(TreeSet::new));
        }
        assertEquals(inFolder, samples().stream().map(LogSample::file).collect(Collectors.toCollection(TreeSet::new)));
    }

    @Test
    @DisplayName("log command: each rest's blower cell, the summary and the findings agree with the per-rest record")
    void commandAgrees() throws Exception {
        for (LogSample s : samples()) {
            JsonObject json = JsonParser.parseString(cli(s, true)).getAsJsonObject();
            String text = cli(s, false);
            JsonArray cycles = json.getAsJsonArray("cycles");
            int n = cycles.size();
            int leftOn = 0;
            int ranOn = 0;
            List<String> expectedCells = new ArrayList<>();
            List<Double> leftOnSeconds = new ArrayList<>();
            for (JsonElement e : cycles) {
                JsonObject c = e.getAsJsonObject();
                String state = c.get("offBlower").getAsString();
                double blowerS = c.get("blowerOnSeconds").isJsonNull() ? Double.NaN : c.get("blowerOnSeconds").getAsDouble();
                if (state.equals("on")) {
                    leftOn++;
                    leftOnSeconds.add(blowerS);
                    expectedCells.add("left on");
                } else if (state.equals("off") && blowerS > 0) {
                    ranOn++;
                    expectedCells.add(String.format(Locale.ROOT, "ran on %.0f s", blowerS));
                } else {
                    expectedCells.add(state);
                }
            }
            String where = s.file() + "\n" + text;
            // the table: one row per rest (up to the rows it prints), its blower cell from the record
            List<String> rows = tableRows(text);
            assertEquals(Math.min(n, 200), rows.size(), where);
            for (int k = 0; k < rows.size(); k++) {
                assertTrue(rows.get(k).contains(" " + expectedCells.get(k) + " "), s.file() + " rest " + (k + 1)
                        + " should read '" + expectedCells.get(k) + "': " + rows.get(k));
            }
            // the summary
            String leftOnLine = line(text, "blower left on");
            assertTrue(leftOnLine.contains((leftOn == 0 ? "none" : String.valueOf(leftOn)) + " of " + n + " rest"),
                    s.file() + ": " + leftOnLine);
            String delayLine = line(text, "fan-off delay");
            if (ranOn > 0) {
                assertTrue(delayLine.contains("in " + ranOn + " of " + n + " rest"), s.file() + ": " + delayLine);
            } else {
                assertTrue(delayLine.contains("none"), s.file() + ": " + delayLine);
            }
            assertEquals(ranOn, json.get("fanOffDelayRests").getAsInt(), s.file());
            assertEquals(leftOn, json.get("blowerLeftOnRests").getAsInt(), s.file());
            // the findings, and every figure in their evidence has a value to show
            for (JsonElement e : json.getAsJsonArray("findings")) {
                JsonObject f = e.getAsJsonObject();
                String code = f.get("code").getAsString();
                String technical = f.get("technical").getAsString();
                for (JsonElement ev : f.getAsJsonArray("evidence")) {
                    if (code.endsWith("reevaporation")) {
                        assertFalse(ev.getAsJsonObject().get("value").isJsonNull(), s.file() + " " + code + " " + ev);
                    }
                }
                if (code.equals(FindingCode.FAN_OFF_DELAY_REEVAPORATION.key())) {
                    assertTrue(ranOn > 0, s.file() + ": a fan-off delay finding with no rest the blower ran on in");
                    assertTrue(technical.contains("ran on after the compressor stopped in " + ranOn + " of " + n
                            + " rests"), s.file() + ": " + technical);
                } else if (code.equals(FindingCode.OFF_CYCLE_REEVAPORATION.key())) {
                    assertTrue(leftOn > 0, s.file() + ": a left-on finding with no rest the blower was left on through");
                    assertTrue(technical.contains("left on through " + leftOn + " of " + n + " rests"),
                            s.file() + ": " + technical);
                    double median = median(leftOnSeconds) / 60.0;
                    double shown = evidence(f, "blowerOnInRests");
                    assertEquals(median, shown, 0.01, s.file() + " median blower time in a left-on rest, min");
                    assertTrue(technical.contains(String.format(Locale.ROOT, "median %.1f min", median)),
                            s.file() + ": " + technical);
                }
            }
        }
    }

    @Test
    @DisplayName("Logs screen summary: left-on rests and fan-off delay counted as the rests and the findings count them")
    void appSummaryAgrees() throws Exception {
        for (LogSample s : samples()) {
            Options o = Options.of(s.options());
            LogImport imported = VisitLogs.read(DIR.resolve(s.file()), new VisitLogs.ReadOptions(o.units, o.maps, null,
                    o.zone, o.zone), null);
            LogConditions c = LogConditions.checked(101_325, "", o.airflowSi, "airflow", Double.NaN);
            VisitLog a = VisitLogs.analyse("", s.file(), imported.series(), c, ThresholdSettings.DEFAULTS, o.units,
                    imported, List.of(), "");
            assertTrue(a.analysed(), s.file() + ": " + a.refusal());
            RunCycleReport r = a.report();
            int n = r.cycles().size();
            int leftOn = 0;
            int ranOn = 0;
            // the app's per-cycle readout (a tap on a cycle of the timeline) says the same of each rest
            var marks = app.latentledger.chart.source.LogTimelineSource.timeline(a.series(), r,
                    a.conditions().pressurePa(), o.units, s.file()).cycles();
            assertEquals(n, marks.size(), s.file());
            for (int k = 0; k < n; k++) {
                CycleResult x = r.cycles().get(k);
                String readout = String.join("\n", app.latentledger.chart.timeline.CycleReadout.lines(k, marks.get(k),
                        o.units));
                if (x.cycle().offBlower() == BlowerState.ON) {
                    leftOn++;
                    assertTrue(readout.contains("left on through the rest"), s.file() + ": " + readout);
                } else if (x.cycle().offBlower() == BlowerState.OFF && x.cycle().blowerOnSeconds() > 0) {
                    ranOn++;
                    assertTrue(readout.contains(String.format(Locale.ROOT, "ran on %.0f s after the compressor",
                            x.cycle().blowerOnSeconds())), s.file() + ": " + readout);
                } else if (x.cycle().offBlower() == BlowerState.OFF) {
                    assertTrue(readout.contains("stopped with the compressor"), s.file() + ": " + readout);
                }
            }
            Map<String, Row> rows = new LinkedHashMap<>();
            for (Row row : CycleLogAnalysis.summary(r, o.units)) {
                rows.put(row.key(), row);
            }
            String leftOnShown = rows.get("blower-left-on").value();
            assertTrue(leftOnShown.startsWith((leftOn == 0 ? "none" : String.valueOf(leftOn)) + " of " + n),
                    s.file() + ": " + leftOnShown);
            String delayShown = rows.get("fan-off-delay").value();
            if (ranOn > 0) {
                assertTrue(delayShown.contains("in " + ranOn + " of " + n), s.file() + ": " + delayShown);
            } else {
                assertTrue(delayShown.startsWith("none"), s.file() + ": " + delayShown);
            }
            for (Finding f : r.findings()) {
                if (f.code() == FindingCode.FAN_OFF_DELAY_REEVAPORATION) {
                    assertFalse(delayShown.startsWith("none"), s.file() + ": summary " + delayShown + " but " + f.technical());
                }
                if (f.code() == FindingCode.OFF_CYCLE_REEVAPORATION) {
                    assertFalse(leftOnShown.startsWith("none"), s.file() + ": summary " + leftOnShown + " but " + f.technical());
                }
            }
        }
    }

    /** The few options the samples use, read as the log command reads them. */
    private record Options(UnitSystem units, double airflowSi, Map<String, String> maps, ZoneId zone) {
        static Options of(List<String> words) {
            UnitSystem units = UnitSystem.IP;
            double airflow = Double.NaN;
            List<String> maps = new ArrayList<>();
            ZoneId zone = ZoneId.systemDefault();
            for (int i = 0; i < words.size(); i += 2) {
                String v = words.get(i + 1);
                switch (words.get(i)) {
                    case "--units" -> units = v.equals("si") ? UnitSystem.SI : UnitSystem.IP;
                    case "--airflow" -> airflow = Double.parseDouble(v);
                    case "--map" -> maps.add(v);
                    case "--time-zone" -> zone = ZoneId.of(v);
                    default -> throw new IllegalArgumentException("option not read by this test: " + words.get(i));
                }
            }
            return new Options(units, Double.isNaN(airflow) ? airflow : Quantity.AIRFLOW.fromDisplay(units, airflow),
                    app.latentledger.io.logcsv.HeaderMap.parse(maps), zone);
        }
    }

    private static String cli(LogSample s, boolean json) {
        List<String> words = new ArrayList<>(List.of("log", DIR.resolve(s.file()).toString()));
        words.addAll(s.options());
        if (json) {
            words.add("--json");
        }
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Cli.standard().run(words, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        assertEquals(0, code, s.file() + ": " + err.toString(StandardCharsets.UTF_8));
        return out.toString(StandardCharsets.UTF_8);
    }

    /** The numbered rows of the "Cycles" table. */
    private static List<String> tableRows(String text) {
        List<String> rows = new ArrayList<>();
        String table = text.substring(text.indexOf("\nCycles\n"), text.indexOf("\nSummary\n"));
        for (String l : table.split("\n")) {
            if (l.matches("\\s+\\d+\\s{2}.*")) {
                rows.add(l + " ");
            }
        }
        return rows;
    }

    private static String line(String text, String label) {
        for (String l : text.split("\n")) {
            if (l.strip().startsWith(label)) {
                return l;
            }
        }
        throw new AssertionError("no '" + label + "' line in\n" + text);
    }

    private static double evidence(JsonObject finding, String key) {
        for (JsonElement e : finding.getAsJsonArray("evidence")) {
            JsonObject o = e.getAsJsonObject();
            if (o.get("key").getAsString().equals(key)) {
                return o.get("value").getAsDouble();
            }
        }
        throw new AssertionError("no evidence " + key + " in " + finding);
    }

    private static double median(List<Double> v) {
        List<Double> s = new ArrayList<>(v);
        s.sort(null);
        int n = s.size();
        return n == 0 ? Double.NaN : n % 2 == 1 ? s.get(n / 2) : 0.5 * (s.get(n / 2 - 1) + s.get(n / 2));
    }
}
