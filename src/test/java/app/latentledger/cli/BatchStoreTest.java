package app.latentledger.cli;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.store.Ledger;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * {@code batch --store}: each row lands as the record commands would save it, appears in
 * {@code visits list}, and travels in a bundle like any visit; the README's example file in a fresh
 * folder gives ten visits, ten reports and a summary from one command.
 */
class BatchStoreTest {
    @TempDir
    Path dir;

    private record Run(int code, String out, String err) {
        JsonObject json() {
            return JsonParser.parseString(out).getAsJsonObject();
        }

        String id() {
            return json().get("id").getAsString();
        }
    }

    private Run run(Path data, String... words) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        List<String> all = new ArrayList<>(List.of("--data-dir", data.toString()));
        all.addAll(List.of(words));
        int code = Cli.standard().run(all, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private Run ok(Path data, String... words) {
        Run r = run(data, words);
        assertEquals(0, r.code(), String.join(" ", words) + "\n" + r.err());
        return r;
    }

    /** The same readings as a batch row and as readings-add options, each kind of reading once. */
    private static final String HEADER = "site,address,system,nominal-tons,units,elevation,pressure,return-db,return-rh,"
            + "supply-db,supply-dew-point,airflow,airflow-at,airflow-basis,coil-temp,coil-temp-kind,condensate,"
            + "condensate-minutes,tol-db,label,technician,notes,taken-at";
    private static final String ROW = "Gull Row 7,\"7 Gull Row, Saltreed\",Attic air handler,3,ip,650,,76,55,56,52.5,"
            + "1200,supply,standard,47,evaporator-saturation,900,15,0.4,before,Rowan Teale,filter changed,"
            + "2026-07-16T10:05:00-04:00";
    private static final String ROW_MEASURED_PRESSURE = "Gull Row 9,,Closet,2.5,si,,100.2,24.5,55,13.5,11.0,520,return,"
            + "actual,,,,,,after,Rowan Teale,,2026-07-16T11:00:00-04:00";

    @Test
    void aStoredRowIsWhatReadingsAddStoresForTheSameReadings() throws Exception {
        Path batchData = dir.resolve("batch");
        Path f = dir.resolve("one.csv");
        Files.writeString(f, HEADER + "\n" + ROW + "\n" + ROW_MEASURED_PRESSURE + "\n");
        Run b = ok(batchData, "batch", f.toString(), "--store", "--json");
        JsonArray rows = b.json().getAsJsonArray("rows");
        String batchVisit = rows.get(0).getAsJsonObject().get("visitId").getAsString();
        String batchVisit2 = rows.get(1).getAsJsonObject().get("visitId").getAsString();

        Path byHand = dir.resolve("hand");
        String site = ok(byHand, "sites", "add", "--name", "Gull Row 7", "--address", "7 Gull Row, Saltreed",
                "--elevation", "650", "--units", "ip", "--json").id();
        String system = ok(byHand, "systems", "add", site, "--label", "Attic air handler", "--nominal-tons", "3",
                "--json").id();
        String visit = ok(byHand, "visits", "new", system, "--technician", "Rowan Teale", "--purpose", "commissioning",
                "--started-at", "2026-07-16T10:05:00-04:00", "--json").id();
        ok(byHand, "readings", "add", visit, "--units", "ip", "--return-db", "76", "--return-rh", "55",
                "--supply-db", "56", "--supply-dew-point", "52.5", "--airflow", "1200", "--airflow-at", "supply",
                "--airflow-basis", "standard", "--coil-temp", "47", "--coil-temp-kind", "evaporator-saturation",
                "--condensate", "900", "--condensate-minutes", "15", "--tol-db", "0.4", "--label", "before",
                "--notes", "filter changed", "--taken-at", "2026-07-16T10:05:00-04:00", "--json");
        String site2 = ok(byHand, "sites", "add", "--name", "Gull Row 9", "--json").id();
        String system2 = ok(byHand, "systems", "add", site2, "--label", "Closet", "--nominal-tons", "2.5", "--json").id();
        String visit2 = ok(byHand, "visits", "new", system2, "--technician", "Rowan Teale", "--purpose", "commissioning",
                "--started-at", "2026-07-16T11:00:00-04:00", "--json").id();
        ok(byHand, "readings", "add", visit2, "--units", "si", "--pressure", "100.2", "--return-db", "24.5",
                "--supply-db", "13.5", "--supply-dew-point", "11.0", "--return-rh", "55", "--airflow", "520",
                "--label", "after", "--taken-at", "2026-07-16T11:00:00-04:00", "--json");

        assertSame(batchData, batchVisit, byHand, visit);
        assertSame(batchData, batchVisit2, byHand, visit2);
    }

    /** Everything but the ids (and the ids they point at) is equal. */
    private static void assertSame(Path aData, String aVisit, Path bData, String bVisit) {
        try (Ledger a = Ledger.open(aData); Ledger b = Ledger.open(bData)) {
            Visit va = a.visits().find(aVisit).orElseThrow();
            Visit vb = b.visits().find(bVisit).orElseThrow();
            assertEquals(vb.startedAt(), va.startedAt());
            assertEquals(vb.technician(), va.technician());
            assertEquals(vb.purpose(), va.purpose());
            Site sa = a.sites().find(va.siteId()).orElseThrow();
            Site sb = b.sites().find(vb.siteId()).orElseThrow();
            assertEquals(new Site("x", sb.name(), sb.address(), sb.elevationM(), sb.notes()),
                    new Site("x", sa.name(), sa.address(), sa.elevationM(), sa.notes()));
            HvacSystem ya = a.systems().find(va.systemId()).orElseThrow();
            HvacSystem yb = b.systems().find(vb.systemId()).orElseThrow();
            assertEquals(yb.label(), ya.label());
            assertEquals(yb.nominalCapacityW(), ya.nominalCapacityW(), 0.0);
            assertEquals(yb.type(), ya.type());
            List<ReadingSet> ra = a.readings().forVisit(va.id());
            List<ReadingSet> rb = b.readings().forVisit(vb.id());
            assertEquals(1, ra.size());
            assertEquals(1, rb.size());
            ReadingSet x = ra.get(0);
            ReadingSet y = rb.get(0);
            assertEquals(new ReadingSet("id", "visit", y.takenAt(), y.label(), y.instrument(), y.returnDryBulb(),
                    y.returnHumidity(), y.supplyDryBulb(), y.supplyHumidity(), y.outdoorDryBulb(), y.outdoorHumidity(),
                    y.coilTemperature(), y.airflow(), y.stationPressurePa(), y.condensate(), y.notes(), y.probes()),
                    new ReadingSet("id", "visit", x.takenAt(), x.label(), x.instrument(), x.returnDryBulb(),
                            x.returnHumidity(), x.supplyDryBulb(), x.supplyHumidity(), x.outdoorDryBulb(),
                            x.outdoorHumidity(), x.coilTemperature(), x.airflow(), x.stationPressurePa(), x.condensate(),
                            x.notes(), x.probes()));
        }
    }

    @Test
    void aBatchStoredVisitIsListedWithItsVerdictAndTravelsInABundle() throws Exception {
        Path data = dir.resolve("data");
        Path f = dir.resolve("one.csv");
        Files.writeString(f, HEADER + "\n" + ROW + "\n");
        Run b = ok(data, "batch", f.toString(), "--store", "--json");
        JsonObject row = b.json().getAsJsonArray("rows").get(0).getAsJsonObject();
        String visit = row.get("visitId").getAsString();

        JsonArray list = JsonParser.parseString(ok(data, "visits", "list", "--json").out()).getAsJsonArray();
        JsonObject listed = null;
        for (JsonElement e : list) {
            if (e.getAsJsonObject().get("id").getAsString().equals(visit)) {
                listed = e.getAsJsonObject();
            }
        }
        assertNotNull(listed, "the stored visit is in the ledger's list");
        assertEquals(row.get("verdict").getAsString(), listed.get("latestVerdict").getAsString());

        Path bundle = dir.resolve("visit.zip");
        ok(data, "visits", "export", visit, bundle.toString());
        Path fresh = dir.resolve("fresh");
        ok(fresh, "visits", "import", bundle.toString());
        assertSame(data, visit, fresh, visit);
        JsonArray imported = JsonParser.parseString(ok(fresh, "visits", "list", "--json").out()).getAsJsonArray();
        boolean found = false;
        for (JsonElement e : imported) {
            JsonObject o = e.getAsJsonObject();
            if (o.get("id").getAsString().equals(visit)) {
                found = true;
                assertEquals(row.get("verdict").getAsString(), o.get("latestVerdict").getAsString());
            }
        }
        assertTrue(found, "the imported visit is listed in the fresh folder");
    }

    @Test
    void theReadmeExampleGivesTenVisitsTenReportsAndASummaryInAFreshFolder() throws Exception {
        Path data = dir.resolve("fresh-data");
        Path reports = dir.resolve("reports");
        Path example = Path.of("field-data-samples", "commissioning-batch.csv");
        Run r = ok(data, "batch", example.toString(), "--store", "--reports", reports.toString(), "--out",
                dir.resolve("results.csv").toString());
        assertTrue(r.out().contains("Stored 10 visits"), r.out());
        // what field-data-samples/README.md says the example gives
        List<String> results = Files.readAllLines(dir.resolve("results.csv"));
        assertEquals(11, results.size());
        for (String line : results.subList(1, results.size())) {
            String want = line.startsWith("4,") ? ",not-dehumidifying," : line.startsWith("11,") ? ",cant-tell,"
                    : ",dehumidifying,";
            assertTrue(line.contains(want), want + " in " + line);
        }
        try (Ledger ledger = Ledger.open(data)) {
            assertEquals(10, ledger.visits().all().size());
            // two rows at Marsh Lane 14 and two at Tidewater Court 22 and Quay Street 9 share their site
            assertEquals(7, ledger.sites().all().size());
        }
        List<String> pdfs;
        try (Stream<Path> s = Files.list(reports)) {
            pdfs = s.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".pdf")).sorted().toList();
        }
        assertEquals(11, pdfs.size(), pdfs.toString());
        assertTrue(pdfs.contains("batch-summary.pdf"));
        for (String p : pdfs) {
            byte[] head = Files.readAllBytes(reports.resolve(p));
            assertEquals("%PDF", new String(head, 0, 4, StandardCharsets.US_ASCII), p);
        }
        // a second run adds visits to the same houses, not new houses
        ok(data, "batch", example.toString(), "--store");
        try (Ledger ledger = Ledger.open(data)) {
            assertEquals(20, ledger.visits().all().size());
            assertEquals(7, ledger.sites().all().size());
        }
    }

    @Test
    void aRowWithOutdoorAirIsCheckedButNotStoredAndSaysWhy() throws Exception {
        Path data = dir.resolve("data");
        Path f = dir.resolve("oa.csv");
        Files.writeString(f, "site,system,nominal-tons,return-db,return-rh,outdoor-db,outdoor-wb,outdoor-fraction,"
                + "supply-db,supply-rh,airflow,technician\n"
                + "Quay Street 9,Unit A,2,75,50,92,77,20,55,90,1200,R. Okafor\n");
        Run r = ok(data, "batch", f.toString(), "--store", "--json");
        JsonObject row = r.json().getAsJsonArray("rows").get(0).getAsJsonObject();
        assertTrue(row.get("visitId").isJsonNull());
        assertTrue(row.get("notStored").getAsString().contains("outdoor air"));
        assertTrue(r.err().contains("line 2 checked, not stored"), r.err());
        try (Ledger ledger = Ledger.open(data)) {
            assertEquals(0, ledger.visits().all().size());
        }
    }
}
