package app.latentledger.core.visit;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.CoilVerdict;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.records.HvacSystem;
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
        try (Ledger ledger = Ledger.open(dir)) {
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
}
