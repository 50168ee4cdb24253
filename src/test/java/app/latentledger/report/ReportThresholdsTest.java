package app.latentledger.report;

import app.latentledger.core.findings.FindingCode;
import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The report finds what the app showed: it uses the tech's stored thresholds. The demo "after"
 * set runs at 360 cfm/ton, under the default 450 cfm/ton limit (FSEC-PF-321-97) but over a stored
 * 350 cfm/ton limit.
 */
class ReportThresholdsTest {

    @Test
    void storedAirflowLimitReachesTheReport(@TempDir Path dir) {
        try (Ledger ledger = Ledger.open(dir, Ledger.FirstRun.SEED_DEMO)) {
            assertFalse(afterHasHighAirflow(ledger), "default 450 cfm/ton: quiet");
            ledger.settings().save(ledger.settings().load().withTyped(Thresholds.COIL_HIGH_AIRFLOW_PER_TON.key(), 350,
                    UnitSystem.IP));
            assertTrue(afterHasHighAirflow(ledger), "stored 350 cfm/ton: fires");
        }
    }

    private static boolean afterHasHighAirflow(Ledger ledger) {
        return VisitEvidence.load(ledger, DemoScenario.VISIT_COMPLAINT, UnitSystem.IP).checkedReadings().stream()
                .filter(c -> c.set().id().equals(DemoScenario.READINGS_AFTER))
                .flatMap(c -> c.result().findings().stream())
                .anyMatch(f -> f.code() == FindingCode.HIGH_AIRFLOW_PER_TON);
    }
}
