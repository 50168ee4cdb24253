package app.latentledger.server;

import app.latentledger.bundle.BundleContent;
import app.latentledger.bundle.Bundles;
import app.latentledger.core.records.RecordKind;
import app.latentledger.core.records.Site;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import app.latentledger.store.TestRecords;
import app.latentledger.sync.OfficeSync;
import app.latentledger.sync.SyncReport;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The two ends together, with nothing doubled: the tablet's own sync client against the real
 * office server on the real PostgreSQL. A visit made on tablet A (with a 3,000-sample log) reaches tablet B equal to what a bundle export/import of the same visit gives a
 * third, fresh ledger; an edit on B comes back to A; a deletion on A reaches B's recycle bin; and a
 * tablet of another company receives none of it.
 */
class TabletsThroughServerTest {
    private static final String LOG_ID = "log-heron-1";
    private static TestServer t;

    @TempDir
    Path dir;
    private final List<Ledger> open = new ArrayList<>();

    @BeforeAll
    static void start() throws Exception {
        t = TestServer.start(TabletsThroughServerTest.class);
        t.company("Saltreed Cooling");
        t.company("Heron Spit Air");
    }

    @AfterAll
    static void stop() throws Exception {
        if (t != null) {
            t.close();
        }
    }

    @AfterEach
    void closeLedgers() {
        open.forEach(Ledger::close);
    }

    private Ledger ledger(String name, boolean demo) {
        Ledger l = Ledger.open(dir.resolve(name), demo ? Ledger.FirstRun.SEED_DEMO : Ledger.FirstRun.NOTHING);
        open.add(l);
        return l;
    }

    /** The client exactly as the app and the {@code office} command make it. */
    private static OfficeSync sync(Ledger l) {
        return new OfficeSync(l);
    }

    private static OfficeSync enrolled(Ledger l, String company, String technician, String device) {
        OfficeSync s = sync(l);
        s.enrol(t.base(), t.accounts.createEnrolCode(company, technician, "technician"), device);
        return s;
    }

    @Test
    void aVisitMadeOnOneTabletArrivesOnAnotherAsABundleWouldBringIt() throws Exception {
        Ledger a = ledger("a", true);
        a.logs().save(TestRecords.log(LOG_ID, DemoScenario.VISIT_COMPLAINT, 3000));
        Ledger b = ledger("b", false);
        Ledger c = ledger("c", false);
        Ledger stranger = ledger("stranger", false);

        SyncReport sent = enrolled(a, "Saltreed Cooling", "Alice Marsh", "Tablet 1").syncNow();
        assertEquals(0, sync(a).status().waiting(), sent.summary());
        SyncReport got = enrolled(b, "Saltreed Cooling", "Ben Okafor", "Tablet 2").syncNow();
        assertTrue(got.received() > 0, got.summary());
        enrolled(stranger, "Heron Spit Air", "Mal Reed", "Tablet 9").syncNow();

        Path file = dir.resolve("visit.zip");
        Bundles.exportVisit(a, DemoScenario.VISIT_COMPLAINT, file);
        Bundles.importBundle(c, file);
        BundleContent viaOffice = Bundles.ofVisit(b, DemoScenario.VISIT_COMPLAINT);
        BundleContent viaBundle = Bundles.ofVisit(c, DemoScenario.VISIT_COMPLAINT);
        assertEquals(viaBundle.site(), viaOffice.site());
        assertEquals(viaBundle.systems(), viaOffice.systems());
        assertEquals(viaBundle.visits(), viaOffice.visits());
        assertEquals(viaBundle.readings(), viaOffice.readings());
        assertEquals(viaBundle.logs(), viaOffice.logs());
        assertEquals(3000, b.logs().find(LOG_ID).orElseThrow().samples().size(), "every sample arrived");
        assertEquals(0, sync(b).status().waiting(), "what B received is not sent back");
        assertTrue(stranger.sites().find(DemoScenario.SITE_HERON).isEmpty(), "another company sees nothing");

        Site heron = b.sites().find(DemoScenario.SITE_HERON).orElseThrow();
        b.sites().save(new Site(heron.id(), heron.name(), heron.address(), heron.elevationM(), "dog in the yard"));
        sync(b).syncNow();
        a.recycleBin().delete(RecordKind.READINGS, DemoScenario.READINGS_AFTER);
        sync(a).syncNow();
        assertEquals("dog in the yard", a.sites().find(DemoScenario.SITE_HERON).orElseThrow().notes());
        sync(b).syncNow();
        assertTrue(b.readings().find(DemoScenario.READINGS_AFTER).isEmpty());
        assertTrue(b.recycleBin().find(RecordKind.READINGS, DemoScenario.READINGS_AFTER).isPresent());
        assertEquals(0, sync(a).status().waiting());
        assertEquals(0, sync(b).status().waiting());
        sync(stranger).syncNow();
        assertTrue(stranger.sites().find(DemoScenario.SITE_HERON).isEmpty());
    }
}
