package app.latentledger.report;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.records.ResultsSnapshot;
import app.latentledger.core.records.SnapshotSubject;
import app.latentledger.core.settings.PaperSize;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.ReadingSetCheck;
import app.latentledger.store.AppVersion;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Making a report keeps what it showed: one results snapshot per worked-out reading set. */
class ReportSnapshotsTest {
    @TempDir
    Path dir;

    @Test
    void aWrittenReportLeavesASnapshotOfEachCheckedSet() {
        try (Ledger ledger = Ledger.open(dir.resolve("data"), Ledger.FirstRun.SEED_DEMO)) {
            assertTrue(ledger.snapshots().forSubject(SnapshotSubject.READING_SET, DemoScenario.READINGS_AFTER).isEmpty());
            VisitReport.write(ledger, DemoScenario.VISIT_COMPLAINT, null, PaperSize.LETTER, UnitSystem.IP,
                    dir.resolve("complaint.pdf"));
            List<ResultsSnapshot> after = ledger.snapshots().forSubject(SnapshotSubject.READING_SET,
                    DemoScenario.READINGS_AFTER);
            assertEquals(1, after.size());
            assertEquals(1, ledger.snapshots().forSubject(SnapshotSubject.READING_SET, DemoScenario.READINGS_BEFORE).size());
            ResultsSnapshot s = after.get(0);
            assertEquals(AppVersion.current(), s.appVersion());
            // the snapshot holds the same check the report printed (ReadingSetCheck, the stored thresholds)
            var rs = ledger.readings().find(DemoScenario.READINGS_AFTER).orElseThrow();
            var visit = ledger.visits().find(rs.visitId()).orElseThrow();
            CoilResult r = ReadingSetCheck.run(rs, ledger.systems().find(visit.systemId()).orElseThrow(),
                    ledger.sites().find(visit.siteId()).orElseThrow(), ThresholdSettings.DEFAULTS, UnitSystem.IP);
            JsonObject j = JsonParser.parseString(s.json()).getAsJsonObject();
            assertEquals(r.verdict().name().toLowerCase(java.util.Locale.ROOT), j.get("verdict").getAsString());
            JsonObject total = j.getAsJsonObject("figures").getAsJsonObject(Measurand.TOTAL.key());
            assertEquals(r.estimate(Measurand.TOTAL).valueSi(), total.get("valueSi").getAsDouble(), 1e-9);
            assertEquals(r.findings().size(), j.getAsJsonArray("findings").size());
        }
    }
}
