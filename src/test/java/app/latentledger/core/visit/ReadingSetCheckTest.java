package app.latentledger.core.visit;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.CoilVerdict;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.records.Airflow;
import app.latentledger.core.records.AirflowPoint;
import app.latentledger.core.records.Condensate;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Stored reading sets run through the coil check. The demo's complaint visit is the story the
 * whole app tells: "before", the coil runs above the return dew point and takes out no water;
 * "after", with the airflow lowered, it dehumidifies.
 */
class ReadingSetCheckTest {

    @Test
    void demoBeforeAndAfterTellTheStory(@TempDir Path dir) {
        try (Ledger ledger = Ledger.open(dir, Ledger.FirstRun.SEED_DEMO)) {
            Site site = ledger.sites().find(DemoScenario.SITE_HERON).orElseThrow();
            HvacSystem system = ledger.systems().find(DemoScenario.SYSTEM_HERON).orElseThrow();
            ReadingSet before = ledger.readings().find(DemoScenario.READINGS_BEFORE).orElseThrow();
            ReadingSet after = ledger.readings().find(DemoScenario.READINGS_AFTER).orElseThrow();
            CoilResult b = ReadingSetCheck.run(before, system, site, ThresholdSettings.DEFAULTS, UnitSystem.IP);
            CoilResult a = ReadingSetCheck.run(after, system, site, ThresholdSettings.DEFAULTS, UnitSystem.IP);
            assertEquals(CoilVerdict.NOT_DEHUMIDIFYING, b.verdict(), () -> b.findings().toString());
            assertEquals(CoilVerdict.DEHUMIDIFYING, a.verdict(), () -> a.findings().toString());
            assertTrue(ReadingSetCheck.missing(before).isEmpty());
            // the tolerance typed with the reading becomes the coil check's tolerance
            assertEquals(before.returnDryBulb().toleranceSi(),
                    ReadingSetCheck.inputs(before, system, site).entering().dryBulbTolK());
        }
    }

    /** Whatever a reading set may store, the coil check accepts: the two sets of limits agree. */
    @Test
    void aReadingSetAtItsLimitsStillChecks(@TempDir Path dir) {
        try (Ledger ledger = Ledger.open(dir, Ledger.FirstRun.SEED_DEMO)) {
            Site site = ledger.sites().find(DemoScenario.SITE_HERON).orElseThrow();
            HvacSystem system = ledger.systems().find(DemoScenario.SYSTEM_HERON).orElseThrow();
            ReadingSet a = ledger.readings().find(DemoScenario.READINGS_AFTER).orElseThrow();
            double flow = ReadingSet.MIN_AIRFLOW_M3_PER_S;
            double volume = 1e-6;
            ReadingSet edge = new ReadingSet(a.id(), a.visitId(), a.takenAt(), a.label(), a.instrument(),
                    a.returnDryBulb(), a.returnHumidity(), a.supplyDryBulb(), a.supplyHumidity(),
                    a.outdoorDryBulb(), a.outdoorHumidity(), a.coilTemperature(),
                    new Airflow(new Measurement(flow, flow / 2), AirflowPoint.ENTERING, "edge"), null,
                    new Condensate(new Measurement(volume, volume / 2),
                            new Measurement(ReadingSet.MIN_COLLECTION_S, ReadingSet.MIN_COLLECTION_S / 2)),
                    a.notes());
            CoilResult r = ReadingSetCheck.run(edge, system, site, ThresholdSettings.DEFAULTS, UnitSystem.IP);
            assertTrue(r.condensate() != null);
        }
    }
}
