package app.latentledger.report;

import app.latentledger.core.house.HouseBudget;
import app.latentledger.core.house.HouseFindings;
import app.latentledger.core.house.ScenarioResult;
import app.latentledger.core.settings.PaperSize;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.Locale;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The demo visit's report carries "Where the water comes from" with the budget's figures and cautions. */
class HouseSectionTest {
    @TempDir
    Path dir;

    @Test
    void demoReportShowsTheHouseBudget() throws Exception {
        Path out = dir.resolve("house.pdf");
        try (Ledger ledger = Ledger.open(dir.resolve("data"), Ledger.FirstRun.SEED_DEMO)) {
            VisitReport.write(ledger, DemoScenario.VISIT_COMPLAINT, null, PaperSize.LETTER, UnitSystem.IP, out);
            HouseBudget b = HouseBudgets.of(ledger, ReportData.load(ledger, DemoScenario.VISIT_COMPLAINT, null,
                    UnitSystem.IP));
            assertNotNull(b, "the demo visit has house facts and readings");
            ScenarioResult s = b.asFound();
            try (PDDocument doc = ReportPdfs.open(out)) {
                String text = ReportPdfs.text(doc).replaceAll("\\s+", " ");
                for (String want : new String[] {"Where the water comes from", "Fixes compared", "Return-duct leak",
                        "from memory", "licensed practitioners",
                        String.format(Locale.ROOT, "%.1f", Quantity.WATER_RATE_DAILY.toDisplay(UnitSystem.IP,
                                s.gains().valueSi()))}) {
                    assertTrue(text.contains(want), want);
                }
                assertTrue(text.contains(HouseFindings.ATTIC_HEAT.substring(0, 40)));
            }
        }
    }
}
