package app.latentledger.ui.job;

import app.latentledger.core.records.VisitPurpose;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Screen;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The job screen's view model without a window. */
class JobViewModelTest {
    @TempDir
    Path dir;

    @Test
    void addASiteAndASystemThenStartAVisit() {
        try (AppSession s = TestSessions.open(dir)) {
            JobViewModel vm = new JobViewModel(s);
            assertEquals(2, vm.sites().size(), "the demo's two sites");
            vm.newSiteNameProperty().set("Gullwing Terrace flat");
            vm.newSiteAddressProperty().set("7 Gullwing Terrace, Saltreed");
            vm.newSiteElevationFtProperty().set("30");
            assertTrue(vm.addSite(), vm.siteStatusProperty().get());
            assertEquals("Gullwing Terrace flat", vm.siteProperty().get().name());
            // 30 ft = 9.144 m (exact: 1 ft = 0.3048 m)
            assertEquals(9.144, vm.siteProperty().get().elevationM(), 1e-9);
            vm.newSystemLabelProperty().set("Hall closet air handler");
            vm.newSystemTonsProperty().set("2");
            assertTrue(vm.addSystem(), vm.systemStatusProperty().get());
            vm.purposeProperty().set(VisitPurpose.COMMISSIONING);
            vm.technicianProperty().set("Odile Marsh");
            assertTrue(vm.startVisit(), vm.statusProperty().get());
            assertEquals(Screen.READINGS, s.screenProperty().get());
            assertEquals(VisitPurpose.COMMISSIONING, s.visit().purpose());
            assertEquals(1, vm.visits().size());
        }
    }

    @Test
    void aVisitWithoutATechnicianIsRefusedWithTheRecordsMessage() {
        try (AppSession s = TestSessions.open(dir)) {
            JobViewModel vm = new JobViewModel(s);
            vm.technicianProperty().set("  ");
            assertFalse(vm.startVisit());
            assertEquals("Not started: visit technician refused: missing", vm.statusProperty().get());
        }
    }

    @Test
    void aCommaInTheElevationIsRefusedNotReadAsADecimalPoint() {
        try (AppSession s = TestSessions.open(dir)) {
            JobViewModel vm = new JobViewModel(s);
            int before = vm.sites().size();
            vm.newSiteNameProperty().set("Comma test house");
            vm.newSiteElevationFtProperty().set("5,000");
            assertFalse(vm.addSite(), "5,000 must not be stored as 5 ft");
            assertEquals(before, vm.sites().size());
            assertTrue(vm.siteStatusProperty().get().contains("elevation '5,000' refused: type digits with a point"
                    + " for decimals, no thousands separator, e.g. 5000"), vm.siteStatusProperty().get());
            vm.newSystemLabelProperty().set("Attic unit");
            vm.newSystemTonsProperty().set("2,5");
            assertFalse(vm.addSystem());
            assertTrue(vm.systemStatusProperty().get().contains("nominal size '2,5' refused"),
                    vm.systemStatusProperty().get());
        }
    }

    @Test
    void aSiteAboveTheElevationRangeIsRefusedWithTheRange() {
        try (AppSession s = TestSessions.open(dir)) {
            JobViewModel vm = new JobViewModel(s);
            vm.newSiteNameProperty().set("Summit hut");
            vm.newSiteElevationFtProperty().set("20000");
            assertFalse(vm.addSite());
            // the core accepts −450 to 4500 m = −1476.4 to 14763.8 ft (InputLimits)
            // shown beside the site fields, not in the visit column
            assertTrue(vm.siteStatusProperty().get().contains("accepted range -1476 to 14763 ft"),
                    vm.siteStatusProperty().get());
            assertEquals("", vm.statusProperty().get());
        }
    }

    @Test
    void aSiteIsCorrectedUnderItsOwnId() {
        try (AppSession s = TestSessions.open(dir)) {
            JobViewModel vm = new JobViewModel(s);
            var before = vm.siteProperty().get();
            int count = vm.sites().size();
            vm.editSite();
            assertEquals(before.name(), vm.newSiteNameProperty().get());
            vm.newSiteNameProperty().set("Heron Spit Road, upstairs flat");
            vm.newSiteElevationFtProperty().set("40");
            assertTrue(vm.addSite(), vm.siteStatusProperty().get());
            assertEquals(count, vm.sites().size(), "corrected, not added");
            var after = s.ledger().sites().find(before.id()).orElseThrow();
            assertEquals("Heron Spit Road, upstairs flat", after.name());
            // 40 ft = 12.192 m (exact: 1 ft = 0.3048 m)
            assertEquals(12.192, after.elevationM(), 1e-9);
            assertEquals(null, vm.editingSiteProperty().get());
        }
    }

    @Test
    void deletingASiteAsksFirstGoesToTheBinAndComesBackWhole() {
        try (AppSession s = TestSessions.open(dir)) {
            JobViewModel vm = new JobViewModel(s);
            var site = s.site();
            vm.siteProperty().set(vm.sites().stream().filter(x -> x.id().equals(site.id())).findFirst().orElseThrow());
            int visits = s.ledger().visits().forSite(site.id()).size();
            assertTrue(visits > 0, "the demo site has visits");
            vm.askDeleteSite();
            assertTrue(s.ledger().sites().find(site.id()).isPresent(), "nothing deleted before the yes");
            vm.bin().cancelDelete();
            assertTrue(s.ledger().sites().find(site.id()).isPresent(), "No keeps it");
            vm.askDeleteSite();
            assertTrue(vm.bin().confirmDelete());
            assertTrue(s.ledger().sites().find(site.id()).isEmpty());
            assertTrue(s.ledger().visits().forSite(site.id()).isEmpty(), "its visits went with it");
            assertFalse(vm.sites().stream().anyMatch(x -> x.id().equals(site.id())), "gone from the list");
            // the session no longer works on a deleted visit
            assertTrue(s.visit() == null || s.ledger().visits().find(s.visit().id()).isPresent());
            assertHealthy(s);

            var row = vm.bin().rows().stream().filter(r -> r.entry().recordId().equals(site.id())).findFirst()
                    .orElseThrow();
            assertTrue(vm.bin().restore(row), vm.bin().messageProperty().get());
            assertTrue(s.ledger().sites().find(site.id()).isPresent());
            assertEquals(visits, s.ledger().visits().forSite(site.id()).size(), "every visit back");
            assertTrue(vm.sites().stream().anyMatch(x -> x.id().equals(site.id())), "back in the list");
            assertHealthy(s);
        }
    }

    @Test
    void deletingAnEarlierVisitAndASystemUseTheSameBin() {
        try (AppSession s = TestSessions.open(dir)) {
            JobViewModel vm = new JobViewModel(s);
            var v = vm.visits().get(0);
            vm.askDeleteVisit(v);
            assertTrue(vm.bin().confirmDelete());
            assertTrue(s.ledger().visits().find(v.id()).isEmpty());
            assertFalse(vm.visits().contains(v));
            var system = vm.systemProperty().get();
            vm.askDeleteSystem();
            assertTrue(vm.bin().confirmDelete());
            assertTrue(s.ledger().systems().find(system.id()).isEmpty());
            assertEquals(2, s.ledger().recycleBin().list().size());
            assertHealthy(s);
        }
    }

    /** {@code PRAGMA integrity_check} is "ok" and {@code PRAGMA foreign_key_check} finds no dangling row. */
    private static void assertHealthy(AppSession s) {
        assertEquals("ok", s.ledger().database().integrityCheck());
        java.util.List<String> dangling = s.ledger().database().read(c -> {
            java.util.List<String> out = new java.util.ArrayList<>();
            try (var st = c.createStatement(); var r = st.executeQuery("PRAGMA foreign_key_check")) {
                while (r.next()) {
                    out.add(r.getString(1) + " row " + r.getLong(2) + " -> " + r.getString(3));
                }
            }
            return out;
        });
        assertEquals(java.util.List.of(), dangling, "PRAGMA foreign_key_check");
    }
}
