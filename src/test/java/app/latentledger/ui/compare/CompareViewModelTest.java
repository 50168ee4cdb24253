package app.latentledger.ui.compare;

import app.latentledger.core.coil.AirReading;
import app.latentledger.core.coil.CoilCheck;
import app.latentledger.core.coil.CoilReadings;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.Tolerances;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.measure.AirflowPoint;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.DemoScenario;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.session.AppSession;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** The compare screen's view model on the demo's before/after pair (DemoScenario's numbers). */
class CompareViewModelTest {
    @TempDir
    Path dir;

    @Test
    void afterIsComparedWithBeforeSideBySide() {
        try (AppSession s = TestSessions.open(dir)) {
            s.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).ifPresent(s::openVisit);
            s.openReadingSet(DemoScenario.READINGS_AFTER);
            CompareViewModel vm = new CompareViewModel(s);
            assertEquals(DemoScenario.READINGS_BEFORE, vm.chosenProperty().get().id());
            CompareRow airflow = row(vm, "airflow");
            // the demo's airflow went from 1410 to 1080 cfm when the blower tap was lowered
            assertEquals("1,410", airflow.before());
            assertEquals("1,080", airflow.after());
            assertEquals("-330", airflow.change());
            assertEquals("cfm", airflow.unit());
            assertEquals("Not dehumidifying  →  Dehumidifying", vm.verdictsProperty().get());
        }
    }

    @Test
    void anIncompleteCurrentSetSaysWhatIsMissing() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            CompareViewModel vm = new CompareViewModel(s);
            assertEquals(0, vm.rows().size());
            assertEquals("The current readings are not complete yet: return dry bulb, return wet bulb, supply dry bulb,"
                    + " supply wet bulb, airflow.", vm.statusProperty().get());
        }
    }

    /**
     * A coil whose air leaves warmer than it enters (a stopped compressor with the blower on over a
     * warm duct; both at the same dew point, so no moisture moves) has no sensible heat ratio; the
     * change against a working coil is said in the check's words with the side it is missing on.
     */
    @Test
    void aWithheldRatioGivesItsReasonAndSideInTheChangeColumn() {
        CoilResult working = check(24, 13, 13, 10);
        CoilResult warmer = check(24, 13, 27, 13);
        assertEquals("not measurable: the air leaves warmer than it enters (after)",
                CompareViewModel.withheldChange(working, warmer));
        assertEquals("not measurable: the air leaves warmer than it enters (before)",
                CompareViewModel.withheldChange(warmer, working));
    }

    private static CoilResult check(double returnDb, double returnDp, double supplyDb, double supplyDp) {
        CoilReadings r = new CoilReadings(101_325, air("return", returnDb, returnDp), air("supply", supplyDb, supplyDp),
                0.5, 0.1, AirflowPoint.ENTERING, Double.NaN, 0, null, 10_550, null);
        return CoilCheck.run(r, ThresholdSettings.DEFAULTS, UnitSystem.SI);
    }

    private static AirReading air(String where, double db, double dewPoint) {
        return new AirReading(where, db, 0.3, HumidityKind.DEW_POINT, dewPoint, Tolerances.humidity(HumidityKind.DEW_POINT));
    }

    private static CompareRow row(CompareViewModel vm, String key) {
        return vm.rows().stream().filter(r -> r.key().equals(key)).findFirst().orElseThrow();
    }
}
