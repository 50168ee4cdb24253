package app.latentledger.bench;

import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.MoistAirState;
import app.latentledger.store.DemoScenario;
import app.latentledger.ui.entry.EntryRules;
import app.latentledger.ui.entry.EntryViewModel;
import app.latentledger.ui.present.ResultSheet;
import app.latentledger.ui.results.ResultsViewModel;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.CoilChecker;
import app.latentledger.ui.session.CurrentCheck;
import app.latentledger.ui.session.Draft;
import app.latentledger.ui.session.LogAnalysisService;
import app.latentledger.ui.session.Slot;
import app.latentledger.ui.session.SlotValue;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.concurrent.TimeUnit;

/**
 * What one Enter on the pad costs, on the demo's complete "after" reading set with a new coil
 * temperature each time (46 / 47 °F):
 * <ul>
 * <li>{@code recompute}: the check of the value (EntryRules) and every result the screens show
 *     (the session's CurrentCheck through ReadingSetCheck: both states, capacities with their
 *     uncertainty, findings, worded as the sheet) — the target is 5 ms;</li>
 * <li>{@code enterWithSave}: the whole Enter as the app runs it: check, draft file written and
 *     forced to disk, reading set saved in SQLite (synchronous=FULL), results view model
 *     recomputed; the disk dominates it;</li>
 * <li>{@code referenceState}: one moist-air state from dry bulb and RH, for ratios in the same
 *     process.</li>
 * </ul>
 * No JavaFX toolkit is needed: view models use only observable properties.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class KeypadRecomputeBenchmark {
    private Path dir;
    private AppSession session;
    private EntryViewModel entry;
    private ResultsViewModel results;
    private Draft after;
    private int n;

    @Setup(Level.Trial)
    public void open() throws Exception {
        dir = Files.createTempDirectory("keypad-bench");
        session = AppSession.open(dir, LogAnalysisService.NOT_WIRED);
        session.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).ifPresent(session::openVisit);
        session.openReadingSet(DemoScenario.READINGS_AFTER);
        after = session.draft();
        entry = new EntryViewModel(session);
        results = new ResultsViewModel(session);
        entry.select(Slot.COIL_TEMPERATURE);
    }

    @TearDown(Level.Trial)
    public void close() {
        session.close();
    }

    @Benchmark
    public MoistAirState referenceState() {
        return MoistAirState.fromRelativeHumidity(101_325, 23.8889, 50, HandbookEdition.SI);
    }

    @Benchmark
    public ResultSheet recompute() {
        double coilC = ((n++ & 1) == 0 ? 46 - 32 : 47 - 32) / 1.8;
        Draft candidate = after.with(Slot.COIL_TEMPERATURE, new SlotValue(coilC, 1.0));
        EntryRules.check(candidate, Slot.COIL_TEMPERATURE, session.site());
        return CurrentCheck.of(candidate, session.site(), session.system(), session.thresholds(), session.units(),
                CoilChecker.STANDARD, OffsetDateTime.now()).sheet();
    }

    @Benchmark
    public ResultSheet enterWithSave() {
        entry.select(Slot.COIL_TEMPERATURE);
        entry.pad().clear();
        entry.pad().digit(4);
        entry.pad().digit((n++ & 1) == 0 ? 6 : 7);
        if (!entry.enter()) {
            throw new IllegalStateException(entry.messageProperty().get());
        }
        return results.sheet();
    }
}
