package app.latentledger.ui;

import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import app.latentledger.ui.compare.CompareRow;
import app.latentledger.ui.compare.CompareViewModel;
import app.latentledger.ui.entry.EntryViewModel;
import app.latentledger.ui.export.ExportViewModel;
import app.latentledger.ui.job.JobViewModel;
import app.latentledger.ui.log.LogImportViewModel;
import app.latentledger.ui.results.ResultsViewModel;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import app.latentledger.ui.session.CoilChecker;
import app.latentledger.ui.session.LogAnalysisService;
import app.latentledger.ui.session.Slot;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicInteger;

import static app.latentledger.ui.entry.Typing.type;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The session works the draft out once per change and every screen reads that one result: with
 * every view model of the app alive (as after the first frame), one keypad Enter runs the coil
 * check exactly once. The count comes from a checker handed to the session, not from a global.
 */
class OneCheckPerChangeTest {
    @TempDir
    Path dir;

    private final AtomicInteger checks = new AtomicInteger();
    private final CoilChecker counting = (rs, system, site, thresholds, units) -> {
        checks.incrementAndGet();
        return CoilChecker.STANDARD.check(rs, system, site, thresholds, units);
    };

    /** The demo's complaint visit with its complete "after" set open, and every screen's view model. */
    private record App(AppSession session, EntryViewModel entry, ResultsViewModel results, CompareViewModel compare) {
    }

    private App open() {
        AppSession s = new AppSession(Ledger.open(dir, Ledger.FirstRun.SEED_DEMO), dir, LogAnalysisService.NOT_WIRED, counting);
        s.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).ifPresent(s::openVisit);
        s.openReadingSet(DemoScenario.READINGS_AFTER);
        EntryViewModel entry = new EntryViewModel(s);
        ResultsViewModel results = new ResultsViewModel(s);
        CompareViewModel compare = new CompareViewModel(s);
        new LogImportViewModel(s, Background.DIRECT, Background.DIRECT);
        new JobViewModel(s);
        new ExportViewModel(s);
        return new App(s, entry, results, compare);
    }

    @Test
    void oneKeypadEnterRunsTheCoilCheckOnce() {
        App app = open();
        try (AppSession s = app.session()) {
            checks.set(0);
            type(app.entry(), Slot.COIL_TEMPERATURE, "46");
            assertFalse(app.entry().refusedProperty().get(), app.entry().messageProperty().get());
            assertEquals(1, checks.get(), "the session works the candidate out once; every screen reads it");
            // and every screen shows that one result
            assertTrue(s.currentCheck().checked());
            assertEquals(s.currentCheck().coil().verdict(), app.results().sheet().verdict());
            // 46 °F on the coil, as typed (°C = (°F − 32) / 1.8)
            assertEquals((46 - 32) / 1.8, s.currentCheck().coil().coilTemperatureC(), 1e-9);
            assertEquals("46.0", row(app.compare(), "coil").after());
        }
    }

    @Test
    void aValueRefusedAtItsBoxIsNeverWorkedOutAndKeepsNothing() {
        App app = open();
        try (AppSession s = app.session()) {
            var before = s.currentCheck();
            checks.set(0);
            // a supply wet bulb above the after set's supply dry bulb (57 °F) is no air stream at all
            type(app.entry(), Slot.SUPPLY_HUMIDITY, "70");
            assertTrue(app.entry().isHeld(Slot.SUPPLY_HUMIDITY), "held on the pad, not stored");
            assertEquals(0, checks.get(), "refused at the box, before the set is worked out");
            assertSame(before, s.currentCheck(), "nothing kept changed, so the current check stays");
        }
    }

    @Test
    void aNominalSizeChangeWorksEachSetOutOnceAndTheCompareScreenFollows() {
        App app = open();
        try (AppSession s = app.session()) {
            checks.set(0);
            // the demo system is 3 tons as found; the tech corrects it to the 2.5 tons of the nameplate
            type(app.entry(), Slot.NOMINAL_TONS, "2.5");
            // the set in hand and the earlier set it is compared with depend on the size: once each
            assertEquals(2, checks.get());
            // the demo's airflow: 1410 cfm before, 1080 cfm after; per 2.5 tons that is 564 and 432 cfm/ton
            CompareRow perTon = row(app.compare(), "airflow-per-nominal");
            assertEquals("564", perTon.before());
            assertEquals("432", perTon.after());
        }
    }

    private static CompareRow row(CompareViewModel vm, String key) {
        return vm.rows().stream().filter(r -> r.key().equals(key)).findFirst().orElseThrow();
    }
}
