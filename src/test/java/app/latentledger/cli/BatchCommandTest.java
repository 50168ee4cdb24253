package app.latentledger.cli;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.InputStreamReader;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * {@code batch FILE.csv}: rows in every humidity kind and both unit systems, with outdoor air mixed
 * in and a condensate catch, checked against figures made outside the project (PsychroLib 2.5.0 via
 * npm psychrolib@1.1.1 and the coil balance of ASHRAE Handbook—Fundamentals ch. 1, written
 * independently in JavaScript: src/test/resources/reference/coil/*.json with their generators);
 * bad rows refused one by one with line, column, value and range while the good rows go on.
 */
class BatchCommandTest {
    @TempDir
    Path dir;

    /** ASHRAE Handbook—Fundamentals ch. 1 / NIST SP 811 conversion factors, typed here, not the project's. */
    private static final double PA_PER_PSI = 6894.757293168;
    private static final double M3S_PER_CFM = 0.3048 * 0.3048 * 0.3048 / 60;

    record Run(int code, String out, String err) {
        JsonObject json() {
            return JsonParser.parseString(out).getAsJsonObject();
        }
    }

    Run run(String... words) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        List<String> all = new ArrayList<>(List.of("--data-dir", dir.resolve("data").toString()));
        all.addAll(List.of(words));
        int code = Cli.standard().run(all, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    static final List<String> HEADER = List.of("site", "system", "nominal-tons", "units", "pressure", "return-db",
            "return-wb", "return-rh", "return-dew-point", "supply-db", "supply-wb", "supply-rh", "supply-dew-point",
            "airflow", "airflow-at", "outdoor-db", "outdoor-wb", "outdoor-rh", "outdoor-dew-point", "outdoor-fraction",
            "condensate", "condensate-minutes", "label", "technician");

    /** One CSV row from column values; absent columns are empty. */
    static String row(Map<String, String> cells) {
        List<String> out = new ArrayList<>();
        for (String h : HEADER) {
            String v = cells.getOrDefault(h, "");
            out.add(v.contains(",") || v.contains("\"") ? "\"" + v.replace("\"", "\"\"") + "\"" : v);
        }
        return String.join(",", out);
    }

    static JsonObject reference(String file) throws Exception {
        try (var in = BatchCommandTest.class.getResourceAsStream("/reference/coil/" + file)) {
            assertNotNull(in, file + " on the test class path");
            return JsonParser.parseReader(new InputStreamReader(in, StandardCharsets.UTF_8)).getAsJsonObject();
        }
    }

    private static String humidityColumn(String where, String kind) {
        return where + "-" + switch (kind) {
            case "rh" -> "rh";
            case "wb" -> "wb";
            default -> "dew-point";
        };
    }

    /** A temperature in the row's units: °F = °C × 1.8 + 32 (definition of the scales). */
    private static String t(double c, boolean ip) {
        return Double.toString(ip ? c * 1.8 + 32 : c);
    }

    /** A reference coil case as a batch row in SI or I-P units. */
    static Map<String, String> coilRow(JsonObject c, boolean ip) {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("site", "Ref " + c.get("id").getAsString());
        m.put("system", ip ? "IP" : "SI");
        m.put("nominal-tons", "3");
        m.put("units", ip ? "ip" : "si");
        double p = c.get("pressurePa").getAsDouble();
        m.put("pressure", Double.toString(ip ? p / PA_PER_PSI : p / 1000));
        for (String[] side : new String[][] {{"return", "entering"}, {"supply", "leaving"}}) {
            String kind = c.get(side[1] + "Kind").getAsString();
            m.put(side[0] + "-db", t(c.get(side[1] + "Db").getAsDouble(), ip));
            double v = c.get(side[1] + "Value").getAsDouble();
            m.put(humidityColumn(side[0], kind), kind.equals("rh") ? Double.toString(v) : t(v, ip));
        }
        double q = c.get("airflowM3PerS").getAsDouble();
        m.put("airflow", Double.toString(ip ? q / M3S_PER_CFM : q * 1000));
        m.put("airflow-at", c.get("airflowAt").getAsString().equals("leaving") ? "supply" : "return");
        m.put("technician", "R. Okafor");
        return m;
    }

    /** A reference mixing case (return, outdoor share, supply) as a batch row. */
    static Map<String, String> mixingRow(JsonObject c, boolean ip) {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("site", "Mix " + c.get("id").getAsString());
        m.put("system", ip ? "IP" : "SI");
        m.put("nominal-tons", "3");
        m.put("units", ip ? "ip" : "si");
        double p = c.get("pressurePa").getAsDouble();
        m.put("pressure", Double.toString(ip ? p / PA_PER_PSI : p / 1000));
        for (String where : List.of("return", "outdoor", "supply")) {
            String kind = c.get(where + "Kind").getAsString();
            m.put(where + "-db", t(c.get(where + "Db").getAsDouble(), ip));
            double v = c.get(where + "Value").getAsDouble();
            m.put(humidityColumn(where, kind), kind.equals("rh") ? Double.toString(v) : t(v, ip));
        }
        m.put("outdoor-fraction", Double.toString(c.get("outdoorVolumeFraction").getAsDouble() * 100));
        double q = c.get("airflowM3PerS").getAsDouble();
        m.put("airflow", Double.toString(ip ? q / M3S_PER_CFM : q * 1000));
        m.put("airflow-at", "mixed");
        m.put("technician", "J. Pell");
        return m;
    }

    private Path file(String name, List<String> rows) throws Exception {
        Path f = dir.resolve(name);
        Files.writeString(f, String.join(",", HEADER) + "\n" + String.join("\n", rows) + "\n", StandardCharsets.UTF_8);
        return f;
    }

    private static void close(double expected, JsonElement actual, double relative, String what) {
        assertNotNull(actual, what);
        assertFalse(actual.isJsonNull(), what + " is null");
        assertEquals(expected, actual.getAsDouble(), Math.abs(expected) * relative + 1e-9, what);
    }

    @Test
    void everyHumidityKindInBothUnitSystemsChecksToThePsychroLibReference() throws Exception {
        JsonArray cases = reference("coil-cases.json").getAsJsonArray("cases");
        List<String> rows = new ArrayList<>();
        List<JsonObject> expected = new ArrayList<>();
        java.util.Set<String> kinds = new java.util.HashSet<>();
        for (JsonElement e : cases) {
            JsonObject c = e.getAsJsonObject();
            for (boolean ip : new boolean[] {false, true}) {
                rows.add(row(coilRow(c, ip)));
                expected.add(c);
            }
            kinds.add(c.get("enteringKind").getAsString());
            kinds.add(c.get("leavingKind").getAsString());
        }
        assertEquals(java.util.Set.of("rh", "wb", "dp"), kinds, "the reference covers every humidity kind");
        Run r = run("batch", file("kinds.csv", rows).toString(), "--units", "si", "--json");
        assertEquals(0, r.code(), r.err());
        JsonArray out = r.json().getAsJsonArray("rows");
        assertEquals(rows.size(), out.size());
        for (int i = 0; i < out.size(); i++) {
            JsonObject o = out.get(i).getAsJsonObject();
            JsonObject c = expected.get(i);
            String what = o.get("site").getAsString() + " " + o.get("system").getAsString();
            assertEquals(i + 2, o.get("line").getAsInt(), "rows in file order, header on line 1");
            JsonObject f = o.getAsJsonObject("figures");
            // same equations on both sides; the I-P rows add only the round trip through °F, psia and cfm
            close(c.get("totalW").getAsDouble(), f.get("total"), 1e-5, what + " total");
            close(c.get("sensibleW").getAsDouble(), f.get("sensible"), 1e-5, what + " sensible");
            close(c.get("latentW").getAsDouble(), f.get("latent"), 1e-4, what + " latent");
            close(c.get("shr").getAsDouble(), f.get("shr"), 1e-5, what + " SHR");
            close(c.get("enteringDewPointC").getAsDouble(), f.get("enteringDewPoint"), 1e-6, what + " entering dew point");
            // every figure carries its k = 2 uncertainty, as coil --json gives it
            JsonObject u = f.getAsJsonObject("uncertainty");
            assertTrue(u.get("latent").getAsDouble() > 0 && u.get("shr").getAsDouble() > 0, what);
            assertTrue(o.get("verdict").isJsonPrimitive() && o.get("findings").isJsonArray(), what);
        }
    }

    @Test
    void outdoorAirIsMixedAheadOfTheCoilAsTheHandbookMixes() throws Exception {
        List<String> rows = new ArrayList<>();
        List<JsonObject> expected = new ArrayList<>();
        for (JsonElement e : reference("mixing-cases.json").getAsJsonArray("cases")) {
            JsonObject c = e.getAsJsonObject();
            if (!c.has("coil")) {
                continue;
            }
            for (boolean ip : new boolean[] {false, true}) {
                rows.add(row(mixingRow(c, ip)));
                expected.add(c);
            }
        }
        assertTrue(rows.size() >= 4);
        Run r = run("batch", file("mixing.csv", rows).toString(), "--units", "si", "--json");
        assertEquals(0, r.code(), r.err());
        JsonArray out = r.json().getAsJsonArray("rows");
        for (int i = 0; i < out.size(); i++) {
            JsonObject f = out.get(i).getAsJsonObject().getAsJsonObject("figures");
            JsonObject c = expected.get(i);
            String what = c.get("id").getAsString() + " row " + i;
            assertEquals("mixed", f.get("enteringSource").getAsString(), what);
            close(c.get("mixedW").getAsDouble(), f.getAsJsonObject("entering").get("humidityRatio"), 1e-6, what + " mixed W");
            close(c.get("mixedDb").getAsDouble(), f.getAsJsonObject("entering").get("dryBulb"), 1e-6, what + " mixed db");
            close(c.get("mixedDewPoint").getAsDouble(), f.get("enteringDewPoint"), 1e-5, what + " mixed dew point");
            JsonObject coil = c.getAsJsonObject("coil");
            close(coil.get("totalW").getAsDouble(), f.get("total"), 1e-5, what + " total");
            close(coil.get("latentW").getAsDouble(), f.get("latent"), 1e-4, what + " latent");
        }
    }

    @Test
    void aCondensateCatchIsTheVolumeCaughtOverItsMinutes() throws Exception {
        JsonObject c = reference("coil-cases.json").getAsJsonArray("cases").get(1).getAsJsonObject();
        Map<String, String> si = coilRow(c, false);
        si.put("condensate", "1200");
        si.put("condensate-minutes", "20");
        Map<String, String> ip = coilRow(c, true);
        ip.put("condensate", "1200");
        ip.put("condensate-minutes", "20");
        Run r = run("batch", file("catch.csv", List.of(row(si), row(ip))).toString(), "--units", "si", "--json");
        assertEquals(0, r.code(), r.err());
        for (JsonElement e : r.json().getAsJsonArray("rows")) {
            JsonObject k = e.getAsJsonObject().getAsJsonObject("figures").getAsJsonObject("condensate");
            // 1.2 L in 20 min = 3.6 L/h; water is 997–1000 kg/m³ between 4 and 25 °C (from memory), so 3.59–3.60 kg/h
            assertEquals(3.6, k.get("rate").getAsDouble(), 0.6 * 0.02, "condensate rate kg/h");
            assertTrue(k.get("rateUncertainty").getAsDouble() > 0);
        }
    }

    @Test
    void badRowsAreRefusedOneByOneWithLineColumnValueAndRangeAndTheGoodRowsGoOn() throws Exception {
        JsonObject c = reference("coil-cases.json").getAsJsonArray("cases").get(1).getAsJsonObject();
        Map<String, String> good = coilRow(c, true);
        Map<String, String> rh = coilRow(c, true);
        rh.put("return-rh", "155");
        Map<String, String> wb = coilRow(c, true);
        wb.remove("return-rh");
        wb.put("return-db", "75");
        wb.put("return-wb", "78");
        Map<String, String> airflow = coilRow(c, true);
        airflow.put("airflow", "5");
        Map<String, String> notNumber = coilRow(c, true);
        notNumber.put("supply-db", "fifty-five");
        Map<String, String> noSite = coilRow(c, true);
        noSite.put("site", "");
        Map<String, String> siTemp = coilRow(c, false);
        siTemp.put("return-db", "120");
        Path f = file("bad.csv", List.of(row(good), row(rh), row(wb), row(airflow), row(notNumber), row(noSite),
                row(siTemp), row(good)));
        Path out = dir.resolve("results.csv");
        Run r = run("batch", f.toString(), "--units", "ip", "--json", "--out", out.toString());
        assertEquals(2, r.code(), "a refused row makes exit 2");
        JsonArray rows = r.json().getAsJsonArray("rows");
        assertEquals(8, rows.size());
        assertTrue(rows.get(0).getAsJsonObject().has("verdict"));
        assertTrue(rows.get(7).getAsJsonObject().has("verdict"), "a good row after bad rows is still checked");

        // RH is 0–100 % by its definition (ASHRAE Handbook—Fundamentals ch. 1)
        refusal(rows.get(1), 3, "return-rh", "155", "0 to 100 %");
        // a wet bulb cannot exceed its dry bulb (definition of the thermodynamic wet bulb, HoF ch. 1)
        JsonObject w = refusal(rows.get(2), 4, "return-wb", "78", "-58 to 75 °F");
        assertTrue(w.get("message").getAsString().contains("wet bulb"), w.toString());
        // FieldLimits' airflow, 0.0094–25 m³/s, in cfm (÷ 0.000471947 m³/s per cfm), rounded inwards: 20 to 52972
        refusal(rows.get(3), 5, "airflow", "5", "20 to 52972 cfm");
        refusal(rows.get(4), 6, "supply-db", "fifty-five", "-58 to 203 °F");
        JsonObject s = refusal(rows.get(5), 7, "site", "", "");
        assertTrue(s.get("message").getAsString().contains("site"), s.toString());
        // the row's own units: 120 °C is above the 95 °C limit of any air temperature
        refusal(rows.get(6), 8, "return-db", "120", "-50 to 95 °C");
        for (int line : new int[] {3, 4, 5, 6, 7, 8}) {
            assertTrue(r.err().contains("line " + line), "each refusal stated on standard error: " + r.err());
        }
        // the results file still holds every row, good ones with figures
        try (CSVParser p = CSVParser.parse(out, StandardCharsets.UTF_8, CSVFormat.DEFAULT.builder().setHeader()
                .setSkipHeaderRecord(true).get())) {
            List<CSVRecord> recs = p.getRecords();
            assertEquals(8, recs.size());
            assertFalse(recs.get(0).get("latent (Btu/h)").isEmpty());
            assertFalse(recs.get(0).get("latent ± (Btu/h)").isEmpty());
            assertEquals("refused", recs.get(1).get("verdict"));
            assertEquals("return-rh", recs.get(1).get("refused column"));
            assertEquals("0 to 100 %", recs.get(1).get("accepted range"));
        }
    }

    private static JsonObject refusal(JsonElement row, int line, String column, String value, String range) {
        JsonObject o = row.getAsJsonObject();
        assertEquals(line, o.get("line").getAsInt(), o.toString());
        assertFalse(o.has("verdict"), o.toString());
        JsonObject x = o.getAsJsonObject("refused");
        assertEquals(line, x.get("line").getAsInt(), x.toString());
        assertEquals(column, x.get("column").getAsString(), x.toString());
        assertEquals(value, x.get("value").getAsString(), x.toString());
        assertEquals(range, x.get("range").getAsString(), x.toString());
        assertFalse(x.get("field").getAsString().isEmpty(), x.toString());
        assertFalse(x.get("message").getAsString().isEmpty(), x.toString());
        return x;
    }

    @Test
    void aFileThatCannotBeReadIsRefusedWholeWithExit2() throws Exception {
        Run missing = run("batch", dir.resolve("nowhere.csv").toString());
        assertEquals(2, missing.code());
        assertTrue(missing.err().contains("no such file"), missing.err());
        Path typo = dir.resolve("typo.csv");
        Files.writeString(typo, "site,system,nominal-tons,return-db,return-rh,supply-db,supply-rh,airflw\n");
        Run t = run("batch", typo.toString());
        assertEquals(2, t.code());
        assertTrue(t.err().contains("unknown column 'airflw'") && t.err().contains("did you mean airflow"), t.err());
        Path latin1 = dir.resolve("latin1.csv");
        Files.write(latin1, "site,system\nCaf\u00e9,A\n".getBytes(StandardCharsets.ISO_8859_1));
        assertEquals(2, run("batch", latin1.toString()).code());
    }

    @Test
    void theTemplateIsAFileTheBatchChecks() throws Exception {
        Run t = run("batch", "--template");
        assertEquals(0, t.code(), t.err());
        String[] lines = t.out().split("\n");
        assertEquals(2, lines.length, "a header and one example row");
        assertTrue(lines[0].startsWith("site,address,system,nominal-tons"), lines[0]);
        Path f = dir.resolve("template.csv");
        Files.writeString(f, t.out());
        Run r = run("batch", f.toString(), "--json");
        assertEquals(0, r.code(), r.err());
        assertEquals("dehumidifying", r.json().getAsJsonArray("rows").get(0).getAsJsonObject().get("verdict").getAsString());
    }

    @Test
    void cellsASpreadsheetWouldRunAreWrittenAsText() throws Exception {
        JsonObject c = reference("coil-cases.json").getAsJsonArray("cases").get(1).getAsJsonObject();
        Map<String, String> m = coilRow(c, true);
        m.put("site", "=HYPERLINK(\"http://example.invalid\",\"x\")");
        m.put("system", "@SUM(A1)");
        Path out = dir.resolve("r.csv");
        Run r = run("batch", file("formula.csv", List.of(row(m))).toString(), "--out", out.toString());
        assertEquals(0, r.code(), r.err());
        try (CSVParser p = CSVParser.parse(out, StandardCharsets.UTF_8, CSVFormat.DEFAULT.builder().setHeader()
                .setSkipHeaderRecord(true).get())) {
            CSVRecord rec = p.getRecords().get(0);
            assertEquals("'=HYPERLINK(\"http://example.invalid\",\"x\")", rec.get("site"));
            assertEquals("'@SUM(A1)", rec.get("system"));
        }
    }

    @Test
    void resultsAsJsonFileHoldRowsAndSummaryAndNoProgressLineReachesAPipe() throws Exception {
        JsonObject c = reference("coil-cases.json").getAsJsonArray("cases").get(1).getAsJsonObject();
        Path out = dir.resolve("r.json");
        Run r = run("batch", file("one.csv", List.of(row(coilRow(c, true)), row(coilRow(c, false)))).toString(),
                "--out", out.toString());
        assertEquals(0, r.code(), r.err());
        assertFalse(r.err().contains("\r") || r.out().contains("\r"), "no progress line without a terminal");
        JsonObject j = JsonParser.parseString(Files.readString(out)).getAsJsonObject();
        assertEquals(2, j.getAsJsonArray("rows").size());
        JsonObject s = j.getAsJsonObject("summary");
        assertEquals(2, s.get("checked").getAsInt());
        assertEquals(0, s.get("refused").getAsInt());
        int sum = 0;
        for (var e : s.getAsJsonObject("verdicts").entrySet()) {
            sum += e.getValue().getAsInt();
        }
        assertEquals(2, sum);
        assertTrue(s.getAsJsonObject("distributions").has("shr"));
        assertTrue(r.out().toLowerCase(Locale.ROOT).contains("2 checked"), r.out());
    }

    @Test
    void theBatchDocumentNamesEveryColumnTheBatchAccepts() throws Exception {
        String doc = Files.readString(Path.of("docs", "batch.md"));
        for (String c : BatchColumns.ALL.keySet()) {
            assertTrue(doc.contains("| `" + c + "` |"), c + " in docs/batch.md");
        }
    }

    @Test
    void theBadRowsExampleIsRefusedAsItsReadmeSays() {
        Run r = run("batch", Path.of("field-data-samples", "commissioning-batch-bad-rows.csv").toString(), "--json");
        assertEquals(2, r.code());
        JsonArray rows = r.json().getAsJsonArray("rows");
        assertEquals(3, rows.size());
        assertEquals(3, rows.get(0).getAsJsonObject().get("line").getAsInt(), "the comment line is counted, not read");
        assertTrue(rows.get(0).getAsJsonObject().has("verdict"));
        refusal(rows.get(1), 4, "return-rh", "155", "0 to 100 %");
        refusal(rows.get(2), 5, "return-wb", "79.0", "-58 to 77 °F");
    }

    @Test
    void aTechnicianIsNeededOnlyWhenVisitsAreStoredOrReported() throws Exception {
        JsonObject c = reference("coil-cases.json").getAsJsonArray("cases").get(1).getAsJsonObject();
        Map<String, String> m = coilRow(c, true);
        m.remove("technician");
        Path f = file("notech.csv", List.of(row(m)));
        assertEquals(0, run("batch", f.toString()).code(), "a check alone needs no technician");
        Run stored = run("batch", f.toString(), "--store", "--json");
        assertEquals(2, stored.code());
        refusal(stored.json().getAsJsonArray("rows").get(0), 2, "technician", "", "");
        assertEquals(0, run("batch", f.toString(), "--store", "--technician", "R. Okafor").code());
    }
}
