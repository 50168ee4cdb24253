package app.latentledger.bundle;

import app.latentledger.core.records.Site;
import app.latentledger.store.Database;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import app.latentledger.store.TestLedgers;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A site's time zone travels in {@code site.json} as the optional {@code timeZone} field: written
 * only when the site has one, read as "none" when absent (a bundle from before the field), and a
 * zone that is not a region id refuses the bundle naming the field.
 */
class BundleSiteZoneTest {
    @TempDir
    Path dir;
    Ledger source;
    Ledger target;

    @BeforeEach
    void setUp() {
        source = TestLedgers.withDemo(dir.resolve("source"));
        target = new Ledger(Database.open(dir.resolve("target.db")));
    }

    @AfterEach
    void tearDown() {
        source.close();
        target.close();
    }

    @Test
    void aSitesZoneRoundTrips() throws Exception {
        Site heron = source.sites().find(DemoScenario.SITE_HERON).orElseThrow();
        source.sites().save(heron.withTimeZone("America/Denver"));
        Path file = dir.resolve("site.zip");
        Bundles.exportSite(source, DemoScenario.SITE_HERON, file);
        assertEquals("America/Denver", siteJson(file).get("timeZone").getAsString());
        Bundles.importBundle(target, file);
        assertEquals("America/Denver", target.sites().find(DemoScenario.SITE_HERON).orElseThrow().timeZone());
    }

    @Test
    void aSiteWithoutAZoneWritesNoFieldAndABundleWithoutTheFieldImportsWithNone() throws Exception {
        Site heron = source.sites().find(DemoScenario.SITE_HERON).orElseThrow();
        source.sites().save(heron.withTimeZone(""));
        Path file = dir.resolve("site.zip");
        Bundles.exportSite(source, DemoScenario.SITE_HERON, file);
        JsonObject site = siteJson(file);
        assertFalse(site.has("timeZone"), "the object an older app wrote: " + site);
        Bundles.importBundle(target, file);
        assertEquals("", target.sites().find(DemoScenario.SITE_HERON).orElseThrow().timeZone());
    }

    @Test
    void aZoneThatIsNotARegionIdIsRefusedNamingIt() throws Exception {
        Path template = dir.resolve("site.zip");
        Bundles.exportSite(source, DemoScenario.SITE_HERON, template);
        Path bad = BundleFiles.rehashed(template, dir.resolve("bad.zip"), e -> BundleFiles.editText(e, "site.json",
                t -> t.replace("\"" + DemoScenario.SALTREED_ZONE + "\"", "\"Saltreed/Harbor\"")));
        BundleException e = assertThrows(BundleException.class, () -> Bundles.importBundle(target, bad));
        assertTrue(e.getMessage().contains("site time zone") && e.getMessage().contains("Saltreed/Harbor"),
                e.getMessage());
        assertTrue(target.sites().all().isEmpty(), "nothing was imported");
    }

    private static JsonObject siteJson(Path zip) throws Exception {
        Map<String, byte[]> entries = BundleFiles.entries(zip);
        return JsonParser.parseString(new String(entries.get("site.json"), StandardCharsets.UTF_8)).getAsJsonObject();
    }
}
