package app.latentledger.bundle;

import app.latentledger.core.house.HouseVisitReadings;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.store.Database;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import app.latentledger.store.TestLedgers;
import app.latentledger.store.TestRecords;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Map;
import java.util.function.Consumer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Format version 3: the house's facts, the visit's house readings (weather and the return-leak
 * trio) and each log's stored analysis conditions travel with a bundle, come back equal, and pass
 * the same checks as typing them: a re-hashed bundle with a value out of range is refused whole,
 * naming the entry, the field, the value and the accepted range. Versions 1 and 2 still import.
 *
 * <p>Ranges checked: floor area 20–2000 m² and runtime fraction 1–100 % (the house facts' and
 * readings' own limits); a dew point no warmer than its dry bulb (saturation, ASHRAE HoF 2017
 * ch. 1); the keypad's airflow range for a log's stored airflow.
 */
class BundleHouseTest {
    @TempDir
    Path dir;
    Ledger source;
    Ledger target;
    Path template;
    ImportedLog kept;

    @BeforeEach
    void setUp() throws Exception {
        source = TestLedgers.withDemo(dir.resolve("source"));
        ImportedLog plain = TestRecords.log("log-1", DemoScenario.VISIT_COMPLAINT, 2_000);
        kept = new ImportedLog(plain.id(), plain.visitId(), plain.sourceFileName(), plain.columnMapping(),
                plain.importedAt(), plain.samples(),
                new ImportedLog.KeptConditions(0.566, "reading set Before", 0.47, "America/New_York"));
        source.logs().save(kept);
        target = new Ledger(Database.open(dir.resolve("target.db")));
        template = dir.resolve("template.zip");
        Bundles.exportVisit(source, DemoScenario.VISIT_COMPLAINT, template);
    }

    @AfterEach
    void tearDown() {
        source.close();
        target.close();
    }

    @Test
    void houseDataAndStoredLogConditionsRoundTrip() throws Exception {
        Bundles.ImportSummary s = Bundles.importBundle(target, template);
        assertEquals(1, s.addedByKind().get("house"));
        assertEquals(1, s.addedByKind().get("house readings"));
        assertTrue(s.plainWords().contains("1 house's facts, 1 visit's house readings"), s.plainWords());

        assertEquals(source.houses().facts(DemoScenario.SITE_HERON), target.houses().facts(DemoScenario.SITE_HERON));
        HouseVisitReadings there = target.houses().readings(DemoScenario.VISIT_COMPLAINT);
        assertEquals(source.houses().readings(DemoScenario.VISIT_COMPLAINT), there);
        assertNotNull(there.outdoor(), "the weather travelled");
        assertNotNull(there.space(), "the attic air of the return-leak check travelled");
        assertEquals(kept.kept(), target.logs().find("log-1").orElseThrow().kept(), "stored log conditions travelled");
        assertEquals(Bundles.ofVisit(source, DemoScenario.VISIT_COMPLAINT), Bundles.ofVisit(target, DemoScenario.VISIT_COMPLAINT));

        Bundles.ImportSummary again = Bundles.importBundle(target, template);
        assertEquals(0, again.added(), "importing the same bundle twice changes nothing");
    }

    @Test
    void differingHouseFactsRefuseTheWholeImport() throws Exception {
        Path other = BundleFiles.rehashed(template, dir.resolve("other.zip"),
                e -> house(e, h -> h.getAsJsonObject("facts").addProperty("bedrooms", 2)));
        Bundles.importBundle(target, template);
        BundleException e = assertThrows(BundleException.class, () -> Bundles.importBundle(target, other));
        assertTrue(e.getMessage().contains("house " + DemoScenario.SITE_HERON + " differs"), e.getMessage());
    }

    @Test
    void aFloorAreaOutOfRangeIsRefusedNamingEntryFieldValueAndRange() throws Exception {
        refused(e -> house(e, h -> h.getAsJsonObject("facts").addProperty("floorAreaM2", 5000.0)),
                "house.json facts", "floor area 5000 m²", "accepted range 20 to 2000 m²");
    }

    @Test
    void aRuntimeFractionOutOfRangeIsRefused() throws Exception {
        refused(e -> house(e, h -> firstReadings(h).addProperty("runtimeFraction", 1.5)),
                "house.json readings", "runtime fraction", "150", "accepted range 1 to 100");
    }

    @Test
    void impossibleWeatherIsRefusedAsTheHouseScreenRefusesIt() throws Exception {
        // a dew point of 40 °C in 31 °C air: supersaturated, no possible moist-air state
        refused(e -> house(e, h -> {
            JsonObject outdoor = firstReadings(h).getAsJsonObject("outdoor");
            outdoor.addProperty("dryBulbC", 31.0);
            outdoor.addProperty("humidityKind", "dew-point");
            outdoor.addProperty("humidity", 40.0);
        }), "house.json readings of visit " + DemoScenario.VISIT_COMPLAINT, "outdoor dew point 40 °C", "accepted range");
    }

    @Test
    void aStoredLogAirflowOutOfRangeIsRefused() throws Exception {
        refused(e -> BundleFiles.editText(e, "logs.json", t -> t.replace("\"airflowM3PerS\": 0.566",
                "\"airflowM3PerS\": 900.0")), "logs.json log log-1 kept", "log airflow 900", "accepted range");
    }

    @Test
    void houseFactsOfAnotherSiteAreRefused() throws Exception {
        refused(e -> house(e, h -> h.getAsJsonObject("facts").addProperty("siteId", "elsewhere")),
                "house.json facts name site elsewhere");
    }

    @Test
    void readingsOfAVisitOutsideTheBundleAreRefused() throws Exception {
        refused(e -> house(e, h -> firstReadings(h).addProperty("visitId", "elsewhere")),
                "house readings name visit elsewhere, not in the bundle");
    }

    @Test
    void aVersionTwoBundleImportsWithoutHouseDataOrLogConditions() throws Exception {
        Path v2 = BundleFiles.rehashed(template, dir.resolve("v2.zip"), e -> {
            e.remove("house.json");
            BundleFiles.editText(e, "manifest.json", t -> t.replace("\"formatVersion\": 3", "\"formatVersion\": 2"));
        });
        Bundles.importBundle(target, v2);
        assertTrue(target.houses().facts(DemoScenario.SITE_HERON).isEmpty());
        assertEquals(HouseVisitReadings.EMPTY, target.houses().readings(DemoScenario.VISIT_COMPLAINT));
        assertNull(target.logs().find("log-1").orElseThrow().kept(), "a version 2 log carries no conditions");
        assertFalse(target.readings().forVisit(DemoScenario.VISIT_COMPLAINT).isEmpty());
    }

    @Test
    void aVersionTwoBundleHoldingHouseDataIsRefused() throws Exception {
        refused(e -> BundleFiles.editText(e, "manifest.json",
                t -> t.replace("\"formatVersion\": 3", "\"formatVersion\": 2")), "house.json is not one this format holds");
    }

    private void refused(Consumer<Map<String, byte[]>> change, String... words) throws Exception {
        Path bad = BundleFiles.rehashed(template, dir.resolve("bad.zip"), change);
        BundleException e = assertThrows(BundleException.class, () -> Bundles.importBundle(target, bad));
        for (String w : words) {
            assertTrue(e.getMessage().contains(w), "'" + w + "' in: " + e.getMessage());
        }
        assertTrue(e.getMessage().endsWith("nothing was imported"), e.getMessage());
        assertTrue(target.sites().all().isEmpty(), "the target ledger is unchanged");
    }

    private static void house(Map<String, byte[]> entries, Consumer<JsonObject> edit) {
        JsonObject h = JsonParser.parseString(new String(entries.get("house.json"), StandardCharsets.UTF_8)).getAsJsonObject();
        edit.accept(h);
        entries.put("house.json", BundleFormat.GSON.toJson(h).getBytes(StandardCharsets.UTF_8));
    }

    private static JsonObject firstReadings(JsonObject house) {
        JsonArray list = house.getAsJsonArray("readings");
        JsonElement first = list.get(0);
        return first.getAsJsonObject();
    }
}
