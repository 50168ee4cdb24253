package app.latentledger.report;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.Estimate;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.findings.Evidence;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.ReadingSetCheck;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The export read back with an ordinary CSV parser and an ordinary JSON parser gives exactly the
 * coil check's numbers (ReadingSetCheck, the path the app and commands use) and the stored readings.
 */
class VisitDataExportTest {
    @TempDir
    Path dir;

    private static List<CSVRecord> parse(String csv) throws Exception {
        try (CSVParser p = CSVParser.parse(new StringReader(csv),
                CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get())) {
            assertEquals(List.of(DataRow.COLUMNS), p.getHeaderNames());
            return p.getRecords();
        }
    }

    private static CSVRecord row(List<CSVRecord> rows, String sourceId, String record, String key) {
        return rows.stream().filter(r -> r.get("source_id").equals(sourceId) && r.get("record").equals(record)
                && r.get("key").equals(key)).findFirst().orElseThrow(() -> new AssertionError(record + " " + key));
    }

    @Test
    void csvRoundTripGivesTheCoilCheckNumbers() throws Exception {
        Path out = dir.resolve("v.csv");
        try (Ledger ledger = Ledger.open(dir.resolve("data"), Ledger.FirstRun.SEED_DEMO)) {
            VisitDataExport.write(ledger, DemoScenario.VISIT_COMPLAINT, VisitDataExport.Format.CSV, UnitSystem.IP, out);
            List<CSVRecord> rows = parse(Files.readString(out, StandardCharsets.UTF_8));
            var visit = ledger.visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow();
            var system = ledger.systems().find(visit.systemId()).orElseThrow();
            var site = ledger.sites().find(visit.siteId()).orElseThrow();
            for (String id : List.of(DemoScenario.READINGS_BEFORE, DemoScenario.READINGS_AFTER)) {
                ReadingSet rs = ledger.readings().find(id).orElseThrow();
                CoilResult r = ReadingSetCheck.run(rs, system, site, ThresholdSettings.DEFAULTS, UnitSystem.IP);
                for (Measurand m : Measurand.values()) {
                    Estimate e = r.estimate(m);
                    if (!e.exists()) {
                        continue;
                    }
                    CSVRecord x = row(rows, id, "result", m.key());
                    assertEquals(m.quantity().toDisplay(UnitSystem.IP, e.valueSi()), Double.parseDouble(x.get("value")),
                            0, m.key());
                    Quantity uq = m.uncertaintyQuantity();
                    assertEquals(uq.toDisplay(UnitSystem.IP, e.expandedSi()), Double.parseDouble(x.get("plus_minus")),
                            0, m.key() + " U");
                    assertEquals(m.quantity().symbol(UnitSystem.IP), x.get("unit"));
                    assertEquals(DataRow.EXPANDED, x.get("plus_minus_kind"));
                }
                assertEquals(r.verdict().key(), row(rows, id, "result", "verdict").get("text"));
                CSVRecord db = row(rows, id, "reading", "returnDryBulb");
                assertEquals(Quantity.TEMPERATURE.toDisplay(UnitSystem.IP, rs.returnDryBulb().valueSi()),
                        Double.parseDouble(db.get("value")), 1e-12);
                assertEquals(0.5, Double.parseDouble(db.get("plus_minus")), 1e-12, "±0.5 °F probe tolerance as entered");
                assertEquals(DataRow.TOLERANCE, db.get("plus_minus_kind"));
                assertEquals(rs.instrument(), row(rows, id, "info", "instrument").get("text"));
                int evidence = 0;
                for (Finding f : r.findings()) {
                    assertEquals(f.message(), row(rows, id, "finding", f.code().key()).get("text"));
                    assertEquals(f.severity().key(), row(rows, id, "finding", f.code().key()).get("label"));
                    assertEquals(f.technical(), row(rows, id, "technical", f.code().key()).get("text"));
                    evidence += f.evidence().size();
                }
                long exported = rows.stream().filter(x -> x.get("source_id").equals(id)
                        && x.get("record").equals("evidence")).count();
                assertEquals(evidence, exported, "every piece of evidence, once");
            }
        }
    }

    @Test
    void jsonRoundTripGroupsTheSameRows() throws Exception {
        Path out = dir.resolve("v.json");
        try (Ledger ledger = Ledger.open(dir.resolve("data"), Ledger.FirstRun.SEED_DEMO)) {
            VisitDataExport.write(ledger, DemoScenario.VISIT_COMMISSIONING, VisitDataExport.Format.JSON, UnitSystem.SI, out);
            JsonObject root = JsonParser.parseString(Files.readString(out, StandardCharsets.UTF_8)).getAsJsonObject();
            assertEquals(VisitDataExport.JSON_FORMAT, root.get("format").getAsString());
            assertEquals("si", root.get("units").getAsString());
            JsonArray sets = root.getAsJsonArray("readingSets");
            assertEquals(1, sets.size());
            JsonObject set = sets.get(0).getAsJsonObject();
            assertEquals(DemoScenario.READINGS_COMMISSIONING, set.get("id").getAsString());
            var visit = ledger.visits().find(DemoScenario.VISIT_COMMISSIONING).orElseThrow();
            CoilResult r = ReadingSetCheck.run(ledger.readings().find(DemoScenario.READINGS_COMMISSIONING).orElseThrow(),
                    ledger.systems().find(visit.systemId()).orElseThrow(), ledger.sites().find(visit.siteId()).orElseThrow(),
                    ThresholdSettings.DEFAULTS, UnitSystem.SI);
            JsonObject latent = find(set.getAsJsonArray("results"), "key", "latent");
            assertEquals(r.estimate(Measurand.LATENT).valueSi(), latent.get("value").getAsDouble(), 0, "W in SI");
            assertEquals(r.estimate(Measurand.LATENT).expandedSi(), latent.get("uncertainty").getAsDouble(), 0);
            assertEquals("W", latent.get("unit").getAsString());
            JsonObject rh = find(set.getAsJsonArray("readings"), "key", "returnHumidity");
            assertEquals(50, rh.get("value").getAsDouble(), 0);
            assertEquals(2, rh.get("tolerance").getAsDouble(), 0);
            assertEquals("rh", rh.get("kind").getAsString());
            List<String> codes = new ArrayList<>();
            for (JsonElement e : set.getAsJsonArray("findings")) {
                JsonObject f = e.getAsJsonObject();
                codes.add(f.get("code").getAsString());
                Finding expected = r.findings().stream().filter(x -> x.code().equals(f.get("code").getAsString()))
                        .findFirst().orElseThrow();
                assertEquals(expected.technical(), f.get("technical").getAsString());
                assertEquals(expected.evidence().size(), f.getAsJsonArray("evidence").size());
                for (Evidence ev : expected.evidence()) {
                    JsonObject x = find(f.getAsJsonArray("evidence"), "key", ev.key());
                    assertEquals(ev.quantity().toDisplay(UnitSystem.SI, ev.valueSi()), x.get("value").getAsDouble(), 0);
                }
                assertEquals(expected.nextChecks().size(), f.getAsJsonArray("nextChecks").size());
            }
            assertEquals(r.findings().stream().map(Finding::code).toList(), codes);
            assertNotNull(root.get("safety"));
            assertTrue(root.getAsJsonObject("visit").get("technician").getAsString().contains("Brandtner"));
        }
    }

    private static JsonObject find(JsonArray a, String field, String value) {
        for (JsonElement e : a) {
            if (e.getAsJsonObject().get(field).getAsString().equals(value)) {
                return e.getAsJsonObject();
            }
        }
        throw new AssertionError("no " + field + " = " + value);
    }
}
