package app.latentledger.sync;

import app.latentledger.bundle.BundleContent;
import app.latentledger.bundle.Bundles;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.records.HumidityReading;
import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.RecordKind;
import app.latentledger.core.records.SignOff;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.StatedAccuracy;
import app.latentledger.core.records.VisitPaperwork;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import app.latentledger.store.TestRecords;
import app.latentledger.sync.wire.SyncKind;
import app.latentledger.sync.wire.WireHash;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The tablet's sync client against an in-memory test double of the office server. */
class OfficeSyncTest {
    private static final String LOG_ID = "log-heron-1";

    @TempDir
    Path dir;
    StubOffice office;
    final List<Ledger> open = new ArrayList<>();

    @BeforeEach
    void start() throws Exception {
        office = new StubOffice();
    }

    @AfterEach
    void stop() {
        open.forEach(Ledger::close);
        office.close();
        assertEquals(List.of(), office.violations, "the client kept to the contract");
    }

    private Ledger ledger(String name, boolean demo) {
        Ledger l = Ledger.open(dir.resolve(name), demo ? Ledger.FirstRun.SEED_DEMO : Ledger.FirstRun.NOTHING);
        open.add(l);
        return l;
    }

    /** The demo plus a log, an instrument chosen on a reading set and the visit's paperwork. */
    private Ledger tabletA() {
        Ledger a = ledger("a", true);
        a.logs().save(TestRecords.log(LOG_ID, DemoScenario.VISIT_COMPLAINT, 3000));
        a.instruments().save(new Instrument("inst-1", DemoScenario.VISIT_COMPLAINT, "Probe kit A", "SR-1042",
                LocalDate.parse("2024-05-01"), new StatedAccuracy(0.3, 2.0, null, null, null, null)));
        a.instruments().useOn(DemoScenario.READINGS_BEFORE, List.of("inst-1"));
        a.paperwork().save(new VisitPaperwork(DemoScenario.VISIT_COMPLAINT, "Clammy upstairs", "Fan to auto",
                new SignOff("Ada Marsh", TestRecords.T0, ""), null));
        return a;
    }

    private OfficeSync sync(Ledger l, int chunkBytes) {
        return new OfficeSync(l, OfficeHttp.newClient(), OfficeSync.MAX_PUSH, chunkBytes, java.time.Clock.systemUTC());
    }

    private OfficeSync enrolled(Ledger l, int chunkBytes) {
        OfficeSync s = sync(l, chunkBytes);
        s.enrol(office.url(), office.newCode(), "Tablet " + open.size());
        return s;
    }

    @Test
    void aSyncPushesEveryRecordParentsFirstThenNothingIsWaiting() throws Exception {
        Ledger a = tabletA();
        OfficeSync s = enrolled(a, 8 * 1024);
        OfficeAccount account = s.state().account().orElseThrow();
        assertEquals(StubOffice.COMPANY, account.company());
        Path token = dir.resolve("a").resolve(TokenFile.NAME);
        if (Files.getFileStore(token).supportsFileAttributeView("posix")) {
            assertEquals("rw-------", PosixFilePermissions.toString(Files.getPosixFilePermissions(token)));
        }
        assertFalse(Files.readString(dir.resolve("a").resolve(Ledger.FILE_NAME), java.nio.charset.StandardCharsets.ISO_8859_1)
                .contains(Files.readString(token)), "the token is not in the ledger");

        int local = new LocalRecords(a).all().size();
        assertEquals(local, s.status().waiting(), "before the first sync every record waits");
        SyncReport r = s.syncNow();
        assertEquals(local, r.sent());
        assertEquals(local, office.stored());
        assertEquals(0, r.waiting());
        assertEquals(0, s.status().waiting());
        assertTrue(office.samplesComplete(LOG_ID));
        // every record the office holds is the one here, by the shared hash
        for (LocalRecords.Local l : new LocalRecords(a).all()) {
            assertEquals(l.hash(), office.current(l.kind(), l.id()).orElseThrow().hash(), l.kind() + " " + l.id());
        }
        // the samples went in chunks of the size asked, each at the bytes received so far
        long offset = 0;
        for (String c : office.chunks) {
            assertTrue(c.startsWith(LOG_ID + "@" + offset + "+"), c);
            int size = Integer.parseInt(c.substring(c.indexOf('+') + 1));
            assertTrue(size <= 8 * 1024, c);
            offset += size;
        }
        assertTrue(office.chunks.size() > 5, "a 3000-sample log takes several 8 KiB chunks");

        SyncReport again = s.syncNow();
        assertEquals(0, again.sent(), "nothing changed: nothing is sent");
        assertEquals("done", s.state().lastSync().orElseThrow().outcome());
    }

    @Test
    void aPushNeverHoldsMoreThan500Records() {
        Ledger a = ledger("a", false);
        a.inTransaction(() -> {
            for (int i = 0; i < 520; i++) {
                a.sites().save(TestRecords.site(String.format("site-%04d", i)));
            }
        });
        OfficeSync s = enrolled(a, OfficeSync.CHUNK_BYTES);
        assertEquals(520, s.syncNow().sent());
        assertEquals(List.of(500, 20), office.pushSizes);
    }

    @Test
    void aChangeGoesAloneAndADeletionGoesAsDeleted() {
        Ledger a = tabletA();
        OfficeSync s = enrolled(a, OfficeSync.CHUNK_BYTES);
        s.syncNow();
        Site heron = a.sites().find(DemoScenario.SITE_HERON).orElseThrow();
        a.sites().save(new Site(heron.id(), heron.name(), heron.address(), heron.elevationM(), "gate code 4411"));
        a.recycleBin().delete(RecordKind.READINGS, DemoScenario.READINGS_AFTER);
        assertEquals(2, s.status().waiting());
        office.pushSizes.clear();
        SyncReport r = s.syncNow();
        assertEquals(List.of(2), office.pushSizes);
        assertEquals(2, r.sent());
        assertTrue(office.current(SyncKind.READINGS, DemoScenario.READINGS_AFTER).orElseThrow().deleted());
        assertEquals(WireHash.DELETED, office.current(SyncKind.READINGS, DemoScenario.READINGS_AFTER).orElseThrow().hash());
        assertEquals(0, s.status().waiting());
    }

    @Test
    void withNoNetworkTheSyncSaysSoPlainlyAndLosesNothing() throws Exception {
        Ledger a = tabletA();
        OfficeSync s = enrolled(a, OfficeSync.CHUNK_BYTES);
        int waiting = s.status().waiting();
        office.close();
        SyncException e = assertThrows(SyncException.class, s::syncNow);
        assertEquals(SyncException.Kind.NO_NETWORK, e.kind());
        assertTrue(e.getMessage().startsWith("cannot reach the office server at " + office.url()), e.getMessage());
        assertTrue(e.getMessage().contains("nothing was lost"), e.getMessage());
        assertEquals(waiting, s.status().waiting(), "everything still waits");
        assertEquals("failed", s.state().lastSync().orElseThrow().outcome());
        office = new StubOffice(); // for the check in stop()
    }

    @Test
    void aRevokedTokenAsksForANewEnrolment() {
        Ledger a = tabletA();
        OfficeSync s = enrolled(a, OfficeSync.CHUNK_BYTES);
        office.revokeAll();
        SyncException e = assertThrows(SyncException.class, s::syncNow);
        assertEquals(SyncException.Kind.REVOKED, e.kind());
        assertEquals("this tablet was removed from the office; enrol again", e.getMessage());
    }

    @Test
    void aCodeIsUsedOnce() {
        Ledger a = ledger("a", false);
        String code = office.newCode();
        sync(a, 1024).enrol(office.url(), code, "Tablet 1");
        SyncException e = assertThrows(SyncException.class, () -> sync(ledger("b", false), 1024)
                .enrol(office.url(), code, "Tablet 2"));
        assertEquals(SyncException.Kind.REFUSED, e.kind());
        assertTrue(e.getMessage().contains("code unknown, used or expired"), e.getMessage());
        assertEquals(SyncException.Kind.BAD_INPUT, assertThrows(SyncException.class,
                () -> sync(a, 1024).enrol("ftp://office", "X", "T")).kind());
    }

    /**
     * A set stored with a wet bulb above its dry bulb (the repository keeps what an older build
     * kept; the keypad would refuse it) is refused by the office with field, value and range,
     * while the rest of the push lands; it stays here, waiting and shown.
     */
    @Test
    void aRefusedRecordIsShownAndKeptWhileTheRestLands() {
        Ledger a = tabletA();
        ReadingSet bad = new ReadingSet("rs-bad", DemoScenario.VISIT_COMPLAINT, TestRecords.T0, "", "",
                new Measurement(24, 0.3), new HumidityReading(HumidityKind.WET_BULB, new Measurement(27, 0.3)),
                new Measurement(13, 0.3), new HumidityReading(HumidityKind.RELATIVE_HUMIDITY, new Measurement(90, 2)),
                null, null, null, null, null, null, "", null);
        a.readings().save(bad);
        OfficeSync s = enrolled(a, OfficeSync.CHUNK_BYTES);
        SyncReport r = s.syncNow();
        assertEquals(1, r.refused().size());
        SyncReport.Refused refused = r.refused().get(0);
        assertEquals("rs-bad", refused.id());
        assertTrue(refused.refusal().field().startsWith("return"), refused.refusal().toString());
        assertEquals("27 °C", refused.refusal().value());
        assertFalse(refused.refusal().range().isEmpty());
        assertEquals(new LocalRecords(a).all().size() - 1, office.stored(), "the rest of the push landed");
        assertTrue(a.readings().find("rs-bad").isPresent(), "kept on the tablet");
        SyncStatus st = s.status();
        assertEquals(1, st.waiting());
        assertEquals("rs-bad", st.refusals().get(0).id());
        assertEquals("refusals", s.state().lastSync().orElseThrow().outcome());
        assertTrue(r.summary().contains("refused and stay on this tablet"), r.summary());
    }

    @Test
    void anUploadResumesWhereTheServerStopped() {
        Ledger a = tabletA();
        OfficeSync s = enrolled(a, 4096);
        office.failChunksAfter = 3;
        office.failChunks = 1;
        SyncException e = assertThrows(SyncException.class, s::syncNow);
        assertEquals(SyncException.Kind.SERVER, e.kind());
        assertFalse(office.samplesComplete(LOG_ID));
        assertEquals(1, s.status().waiting(), "only the log's samples wait");
        int before = office.chunks.size();
        assertEquals(LOG_ID + "@" + (3 * 4096) + "+4096", office.chunks.get(before - 1), "the 4th chunk failed");
        s.syncNow();
        assertTrue(office.samplesComplete(LOG_ID));
        assertEquals(LOG_ID + "@" + (3 * 4096) + "+4096", office.chunks.get(before),
                "the next sync starts at the bytes the server holds, not at 0");
        assertEquals(0, s.status().waiting());
    }

    /**
     * A visit made on tablet A reaches tablet B through the office equal to what a bundle
     * export/import of the same visit gives a third, fresh ledger (snapshots aside: results are
     * not synced, the receiving side computes them).
     */
    @Test
    void aVisitFromOneTabletArrivesOnAnotherAsABundleWouldBringIt() throws Exception {
        Ledger a = tabletA();
        Ledger b = ledger("b", false);
        Ledger c = ledger("c", false);
        enrolled(a, 16 * 1024).syncNow();
        SyncReport got = enrolled(b, 16 * 1024).syncNow();
        assertTrue(got.received() > 0);
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
        assertEquals(viaBundle.instruments(), viaOffice.instruments());
        assertEquals(viaBundle.instrumentUses(), viaOffice.instrumentUses());
        assertEquals(viaBundle.paperwork(), viaOffice.paperwork());
        assertEquals(a.houses().facts(DemoScenario.SITE_HERON), b.houses().facts(DemoScenario.SITE_HERON),
                "house facts travel too (a bundle does not carry them)");
        assertEquals(0, sync(b, 1024).status().waiting(), "what B received is not sent back");

        // an edit on B comes back to A; a deletion on A reaches B's recycle bin
        Site heron = b.sites().find(DemoScenario.SITE_HERON).orElseThrow();
        b.sites().save(new Site(heron.id(), heron.name(), heron.address(), heron.elevationM(), "dog in the yard"));
        sync(b, 1024).syncNow();
        a.recycleBin().delete(RecordKind.READINGS, DemoScenario.READINGS_AFTER);
        sync(a, 1024).syncNow();
        assertEquals("dog in the yard", a.sites().find(DemoScenario.SITE_HERON).orElseThrow().notes());
        sync(b, 1024).syncNow();
        assertTrue(b.readings().find(DemoScenario.READINGS_AFTER).isEmpty());
        assertTrue(b.recycleBin().find(RecordKind.READINGS, DemoScenario.READINGS_AFTER).isPresent());
        assertEquals(0, sync(a, 1024).status().waiting());
        assertEquals(0, sync(b, 1024).status().waiting());
    }

    /**
     * The same record edited on two tablets, the first tablet's clock an hour behind: its edit is
     * kept at the office as a revision, the later one stays current and both tablets show it; the
     * slow tablet still shows its own edit in the record's history, next to the one it adopted.
     */
    @Test
    void twoEditsOfOneRecordKeepBothRevisions() {
        Ledger a = tabletA();
        Ledger b = ledger("b", false);
        OfficeSync sa = enrolled(a, 1 << 20);
        sa = new OfficeSync(a, OfficeHttp.newClient(), OfficeSync.MAX_PUSH, 1 << 20,
                java.time.Clock.offset(java.time.Clock.systemUTC(), java.time.Duration.ofHours(-1)));
        OfficeSync sb = enrolled(b, 1 << 20);
        sa.syncNow();
        sb.syncNow();
        Site heron = a.sites().find(DemoScenario.SITE_HERON).orElseThrow();
        b.sites().save(new Site(heron.id(), heron.name(), heron.address(), heron.elevationM(), "from B"));
        sb.syncNow();
        a.sites().save(new Site(heron.id(), heron.name(), heron.address(), heron.elevationM(), "from A"));
        SyncReport r = sa.syncNow();
        assertEquals(1, r.keptAside(), r.summary());
        assertEquals("from B", a.sites().find(heron.id()).orElseThrow().notes(), "the later edit is shown");
        List<SyncState.Revision> history = sa.state().history(SyncKind.SITE, heron.id());
        assertTrue(history.stream().anyMatch(v -> v.body().contains("from A") && !v.applied()), history::toString);
        assertTrue(history.stream().anyMatch(v -> v.body().contains("from B") && v.applied()), history::toString);
        sb.syncNow();
        assertEquals("from B", b.sites().find(heron.id()).orElseThrow().notes());
        assertEquals(0, sa.status().waiting());
        assertEquals(0, sb.status().waiting());
    }
}
