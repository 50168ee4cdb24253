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

import static org.junit.jupiter.api.Assertions.assertFalse;
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

    /**
     * The fixes the demo's planner compares include ventilation and tightness changes (its house has
     * an exhaust fan and a blower-door result), so the report carries the depressurisation caution for
     * combustion appliances beside the attic-heat and mold lines (common practice, no source: worst-case
     * depressurisation testing after exhaust or tightness changes).
     */
    @Test
    void fixesThatChangeHousePressureBringTheCombustionCaution() throws Exception {
        Path out = dir.resolve("cautions.pdf");
        try (Ledger ledger = Ledger.open(dir.resolve("data"), Ledger.FirstRun.SEED_DEMO)) {
            VisitReport.write(ledger, DemoScenario.VISIT_COMPLAINT, null, PaperSize.LETTER, UnitSystem.IP, out);
            HouseBudget b = HouseBudgets.of(ledger, ReportData.load(ledger, DemoScenario.VISIT_COMPLAINT, null,
                    UnitSystem.IP));
            assertNotNull(b);
            assertTrue(b.whatIfs().stream().anyMatch(w -> w.scenario().key().equals("add-erv")
                    || w.scenario().key().equals("reduce-ventilation") || w.scenario().key().equals("tighten-envelope")),
                    "the demo's planner compares a pressure-changing fix");
            try (PDDocument doc = ReportPdfs.open(out)) {
                String text = ReportPdfs.text(doc).replaceAll("\\s+", " ");
                for (String caution : new String[] {HouseFindings.ATTIC_HEAT, HouseFindings.MOLD,
                        HouseFindings.COMBUSTION, HouseFindings.LICENSED}) {
                    assertTrue(text.contains(caution.substring(0, 40)), caution);
                }
            }
        }
    }

    /** A visit whose site has no house facts gets no budget section (nothing to build it from). */
    @Test
    void noHouseFactsNoSection() throws Exception {
        Path out = dir.resolve("quay.pdf");
        try (Ledger ledger = Ledger.open(dir.resolve("data"), Ledger.FirstRun.SEED_DEMO)) {
            assertTrue(ledger.houses().facts(DemoScenario.SITE_QUAY).isEmpty());
            VisitReport.write(ledger, DemoScenario.VISIT_COMMISSIONING, null, PaperSize.LETTER, UnitSystem.IP, out);
            try (PDDocument doc = ReportPdfs.open(out)) {
                assertFalse(ReportPdfs.text(doc).contains("Where the water comes from"));
            }
        }
    }
}
