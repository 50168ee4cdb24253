package app.latentledger.report;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.settings.PaperSize;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.ReadingSetCheck;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import app.latentledger.ui.present.FindingCard;
import app.latentledger.ui.present.ResultSheet;
import app.latentledger.ui.present.Row;
import app.latentledger.ui.present.VisitResults;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The same value prints the same string on the screen and on paper: the results screen's figures and
 * finding evidence for the demo's "before" and "after" sets, as the app words them, appear character for character
 * in the PDF report of that visit (read back with PDFBox's own text extraction), in both unit systems.
 */
class ScreenAndPaperTest {
    @TempDir
    Path dir;

    @ParameterizedTest
    @EnumSource(UnitSystem.class)
    void theScreensFiguresAndEvidenceReadTheSameInThePdf(UnitSystem units) throws Exception {
        Path out = dir.resolve("complaint-" + units + ".pdf");
        try (Ledger ledger = Ledger.open(dir.resolve("data"), Ledger.FirstRun.SEED_DEMO)) {
            VisitReport.write(ledger, DemoScenario.VISIT_COMPLAINT, null, PaperSize.LETTER, units, out);
            List<String> shown = new ArrayList<>();
            for (String set : List.of(DemoScenario.READINGS_BEFORE, DemoScenario.READINGS_AFTER)) {
                ResultSheet screen = VisitResults.of(check(ledger, set, units), units);
                for (Row r : screen.performance()) {
                    if (r.key().equals("total") || r.key().equals("moisture-removal")) {
                        shown.add(r.value() + " " + r.unit());
                    }
                }
                for (FindingCard c : screen.findings()) {
                    shown.addAll(c.evidence());
                }
            }
            assertFalse(shown.size() < 6, "the demo's sets have figures and evidence to compare: " + shown);
            try (PDDocument doc = ReportPdfs.open(out)) {
                String text = ReportPdfs.text(doc);
                for (String s : shown) {
                    assertTrue(text.contains(s), "the PDF lacks the screen's \"" + s + "\"");
                }
            }
        }
    }

    private static CoilResult check(Ledger ledger, String readingsId, UnitSystem units) {
        ReadingSet rs = ledger.readings().find(readingsId).orElseThrow();
        var visit = ledger.visits().find(rs.visitId()).orElseThrow();
        HvacSystem system = ledger.systems().find(visit.systemId()).orElseThrow();
        Site site = ledger.sites().find(visit.siteId()).orElseThrow();
        return ReadingSetCheck.run(rs, system, site, ThresholdSettings.DEFAULTS, units);
    }
}
