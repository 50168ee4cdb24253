package app.latentledger.report;

import app.latentledger.core.settings.PaperSize;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.Estimate;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.cycles.RunCycleAnalysis;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.findings.Cautions;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.psychro.StandardAtmosphere;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.ReadingSetCheck;
import app.latentledger.core.visit.StoredLogSeries;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDResources;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The demo visits' reports read back with PDFBox's own text extraction: the numbers in the PDF are
 * the ones {@link ReadingSetCheck} (the app's and the commands' path) computes, formatted here
 * independently; every finding's words are there; fonts are embedded; pages render.
 */
class VisitReportTest {
    @TempDir
    Path dir;

    /** Fixed decimals, thousands grouped with a comma, the same on every locale; never "-0". */
    private static String f(double v, int decimals) {
        String s = String.format(Locale.ROOT, "%,." + decimals + "f", v);
        return s.matches("-0\\.?0*") ? s.substring(1) : s;
    }

    /** "v ± U unit" as a tech would write it, from the core's estimate. */
    private static String pm(Estimate e, Quantity q, int decimals) {
        Quantity uq = q == Quantity.TEMPERATURE ? Quantity.TEMPERATURE_DIFFERENCE : q;
        String unit = q.symbol(UnitSystem.IP).isEmpty() ? "" : " " + q.symbol(UnitSystem.IP);
        return f(q.toDisplay(UnitSystem.IP, e.valueSi()), decimals) + " ± "
                + f(uq.toDisplay(UnitSystem.IP, e.expandedSi()), decimals) + unit;
    }

    private CoilResult check(Ledger ledger, String readingsId, UnitSystem units) {
        ReadingSet rs = ledger.readings().find(readingsId).orElseThrow();
        var visit = ledger.visits().find(rs.visitId()).orElseThrow();
        HvacSystem system = ledger.systems().find(visit.systemId()).orElseThrow();
        Site site = ledger.sites().find(visit.siteId()).orElseThrow();
        return ReadingSetCheck.run(rs, system, site, ThresholdSettings.DEFAULTS, units);
    }

    @Test
    @DisplayName("complaint visit: before/after numbers, changes, findings and safety wording match the coil check")
    void complaintBeforeAfter() throws Exception {
        Path out = dir.resolve("complaint.pdf");
        try (Ledger ledger = Ledger.open(dir.resolve("data"), Ledger.FirstRun.SEED_DEMO)) {
            VisitReport.write(ledger, DemoScenario.VISIT_COMPLAINT, null, PaperSize.LETTER, UnitSystem.IP, out);
            CoilResult b = check(ledger, DemoScenario.READINGS_BEFORE, UnitSystem.IP);
            CoilResult a = check(ledger, DemoScenario.READINGS_AFTER, UnitSystem.IP);
            try (PDDocument doc = ReportPdfs.open(out)) {
                String text = ReportPdfs.text(doc);
                for (CoilResult r : List.of(b, a)) {
                    assertContains(text, pm(r.estimate(Measurand.MOISTURE_REMOVAL), Quantity.WATER_RATE, 2));
                    assertContains(text, pm(r.estimate(Measurand.SHR), Quantity.DIMENSIONLESS, 3));
                    assertContains(text, pm(r.estimate(Measurand.RETURN_DEW_POINT), Quantity.TEMPERATURE, 1));
                    assertContains(text, pm(r.estimate(Measurand.LATENT), Quantity.POWER, 0));
                    assertContains(text, pm(r.estimate(Measurand.DEW_POINT_MARGIN), Quantity.TEMPERATURE_DIFFERENCE, 1));
                    assertContains(text, r.verdict().key());
                    for (Finding fi : r.findings()) {
                        assertContains(text, fi.message());
                        assertContains(text, fi.technical());
                        fi.nextChecks().forEach(n -> assertContains(text, n));
                    }
                }
                // the change and its uncertainty: after − before, U = √(Ub² + Ua²) (GUM eq. 10, uncorrelated)
                Estimate mb = b.estimate(Measurand.MOISTURE_REMOVAL);
                Estimate ma = a.estimate(Measurand.MOISTURE_REMOVAL);
                double d = Quantity.WATER_RATE.toDisplay(UnitSystem.IP, ma.valueSi() - mb.valueSi());
                double u = Quantity.WATER_RATE.toDisplay(UnitSystem.IP,
                        Math.sqrt(mb.expandedSi() * mb.expandedSi() + ma.expandedSi() * ma.expandedSi()));
                assertContains(text, "+" + f(d, 2) + " ± " + f(u, 2) + " lb/h");
                assertContains(text, "Heron Spit Road residence");
                assertContains(text, "Marisol Teague");
                assertContains(text, Cautions.SAFETY_LINE);
                assertContains(text, "Local codes and licensed practice govern any repair");
                assertContains(text, "Signature");
                for (String sign : List.of("°", "±", "³")) {
                    assertTrue(text.contains(sign), "extracted text holds " + sign);
                }
                pagesNumbered(doc, text);
                fontsEmbedded(doc);
                assertEquals(612, doc.getPage(0).getMediaBox().getWidth(), 0.01, "Letter is 8.5 in wide");
                assertEquals(792, doc.getPage(0).getMediaBox().getHeight(), 0.01);
                renders(doc);
            }
        }
        try (var files = Files.list(dir)) {
            assertEquals(List.of("complaint.pdf", "data"), files.map(p -> p.getFileName().toString()).sorted().toList(),
                    "no temporary file is left beside the report");
        }
    }

    @Test
    @DisplayName("commissioning visit in SI on A4: one process, SI numbers, no before/after section")
    void commissioningSi() throws Exception {
        Path out = dir.resolve("commissioning.pdf");
        try (Ledger ledger = Ledger.open(dir.resolve("data"), Ledger.FirstRun.SEED_DEMO)) {
            VisitReport.write(ledger, DemoScenario.VISIT_COMMISSIONING.substring(0, 36), null, PaperSize.A4, UnitSystem.SI, out);
            CoilResult r = check(ledger, DemoScenario.READINGS_COMMISSIONING, UnitSystem.SI);
            try (PDDocument doc = ReportPdfs.open(out)) {
                String text = ReportPdfs.text(doc);
                Estimate m = r.estimate(Measurand.MOISTURE_REMOVAL);
                assertContains(text, f(Quantity.WATER_RATE.toDisplay(UnitSystem.SI, m.valueSi()), 2) + " ± "
                        + f(Quantity.WATER_RATE.toDisplay(UnitSystem.SI, m.expandedSi()), 2) + " kg/h");
                Estimate dp = r.estimate(Measurand.RETURN_DEW_POINT);
                assertContains(text, f(dp.valueSi(), 1) + " ± " + f(dp.expandedSi(), 1) + " °C");
                assertContains(text, "COMMISSIONING RECORD");
                assertContains(text, "Saltreed Marina office");
                assertFalse(text.contains("What changed"), "one reading set: nothing to compare");
                assertTrue(text.contains("m³/kg"), "SI specific volume label with ³");
                assertEquals(595.28, doc.getPage(0).getMediaBox().getWidth(), 0.01, "A4 is 210 mm wide");
                assertEquals(841.89, doc.getPage(0).getMediaBox().getHeight(), 0.01);
                pagesNumbered(doc, text);
                fontsEmbedded(doc);
            }
        }
    }

    @Test
    @DisplayName("two visits compared: earlier as found against later as left, and a plain warning when systems differ")
    void twoVisitsCompared() throws Exception {
        Path out = dir.resolve("compare.pdf");
        try (Ledger ledger = Ledger.open(dir.resolve("data"), Ledger.FirstRun.SEED_DEMO)) {
            VisitReport.write(ledger, DemoScenario.VISIT_COMMISSIONING, DemoScenario.VISIT_COMPLAINT, PaperSize.LETTER,
                    UnitSystem.IP, out);
            CoilResult b = check(ledger, DemoScenario.READINGS_BEFORE, UnitSystem.IP);
            CoilResult a = check(ledger, DemoScenario.READINGS_COMMISSIONING, UnitSystem.IP);
            try (PDDocument doc = ReportPdfs.open(out)) {
                String text = ReportPdfs.text(doc);
                assertContains(text, "Earlier visit (Before, 10:05)");
                assertContains(text, "Later visit (Commissioning, 14:35)");
                assertContains(text, "different systems");
                Estimate db = b.estimate(Measurand.RETURN_DEW_POINT);
                Estimate da = a.estimate(Measurand.RETURN_DEW_POINT);
                double d = Quantity.TEMPERATURE_DIFFERENCE.toDisplay(UnitSystem.IP, da.valueSi() - db.valueSi());
                double u = Quantity.TEMPERATURE_DIFFERENCE.toDisplay(UnitSystem.IP, Math.hypot(db.expandedSi(), da.expandedSi()));
                assertContains(text, "-" + f(-d, 1) + " ± " + f(u, 1) + " °F");
                assertContains(text, "Saltreed Marina office");
                assertContains(text, "Heron Spit Road residence");
                pagesNumbered(doc, text);
                fontsEmbedded(doc);
            }
        }
    }

    @Test
    @DisplayName("stored logs: cycle figures and the timeline in the report, cycles per hour compared across visits")
    void withStoredLogs() throws Exception {
        Path one = dir.resolve("log.pdf");
        Path pair = dir.resolve("log-pair.pdf");
        try (Ledger ledger = Ledger.open(dir.resolve("data"), Ledger.FirstRun.SEED_DEMO)) {
            ReportPdfs.addLog(ledger, DemoScenario.VISIT_COMPLAINT, "oversized-short-cycling.csv");
            ReportPdfs.addLog(ledger, DemoScenario.VISIT_COMMISSIONING, "healthy-long-cycling.csv");
            VisitReport.write(ledger, DemoScenario.VISIT_COMPLAINT, null, PaperSize.LETTER, UnitSystem.IP, one);
            VisitReport.write(ledger, DemoScenario.VISIT_COMPLAINT, DemoScenario.VISIT_COMMISSIONING, PaperSize.LETTER,
                    UnitSystem.IP, pair);
            // the analysis as the log command would run it: 1080 cfm from the "after" set, standard atmosphere at 12 m
            var log = ledger.logs().find(ReportPdfs.logId("oversized-short-cycling.csv")).orElseThrow();
            RunCycleReport expected = new RunCycleAnalysis(ThresholdSettings.DEFAULTS).analyse(
                    StoredLogSeries.of(log.samples(), ZoneOffset.ofHours(-4)).series(),
                    StandardAtmosphere.pressurePa(12), Quantity.AIRFLOW.fromDisplay(UnitSystem.IP, 1080));
            try (PDDocument doc = ReportPdfs.open(one)) {
                String text = ReportPdfs.text(doc);
                assertContains(text, "Logged run: oversized-short-cycling.csv");
                assertContains(text, "Cycles per hour " + f(expected.cyclesPerHour(), 2));
                assertContains(text, "Runs found " + expected.cycles().size());
                for (Finding fi : expected.findings()) {
                    assertContains(text, fi.message());
                }
                fontsEmbedded(doc);
            }
            try (PDDocument doc = ReportPdfs.open(pair)) {
                String text = ReportPdfs.text(doc);
                assertContains(text, "Cycles per hour (logged) " + f(expected.cyclesPerHour(), 1));
                assertContains(text, "Latent fraction (logged)");
            }
        }
    }

    private static void assertContains(String text, String expected) {
        String e = expected.replaceAll("\\s+", " ");
        assertTrue(text.contains(e), () -> "report text lacks: " + e);
    }

    /** "Page i of N" on every page, N the document's page count. */
    private static void pagesNumbered(PDDocument doc, String text) {
        int n = doc.getNumberOfPages();
        assertTrue(n >= 3 && n <= 10, "pages: " + n);
        Matcher m = Pattern.compile("Page (\\d+) of (\\d+)").matcher(text);
        int seen = 0;
        while (m.find()) {
            seen++;
            assertEquals(n, Integer.parseInt(m.group(2)));
        }
        assertEquals(n, seen, "one page number per page");
    }

    /** Every font on every page is embedded, and it is DejaVu (never a system or Standard-14 font). */
    private static void fontsEmbedded(PDDocument doc) throws Exception {
        int fonts = 0;
        for (PDPage page : doc.getPages()) {
            PDResources res = page.getResources();
            for (COSName name : res.getFontNames()) {
                PDFont font = res.getFont(name);
                assertTrue(font.isEmbedded(), font.getName() + " is embedded");
                assertTrue(font.getName().contains("DejaVuSans"), font.getName());
                fonts++;
            }
        }
        assertTrue(fonts >= doc.getNumberOfPages(), "every page uses the embedded fonts");
    }

    /** Page 1 and the chart page render (PDFBox renderer, headless) to something far from blank. */
    private static void renders(PDDocument doc) throws Exception {
        PDFRenderer renderer = new PDFRenderer(doc);
        BufferedImage first = renderer.renderImageWithDPI(0, 60);
        assertTrue(inkShare(first) > 0.03, "page 1 has text and panels: " + inkShare(first));
        BufferedImage chart = renderer.renderImageWithDPI(1, 60);
        assertTrue(colouredShare(chart) > 0.003, "the chart page has the chart's coloured lines: " + colouredShare(chart));
    }

    /** Share of pixels that are not near-white. */
    static double inkShare(BufferedImage img) {
        long ink = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int rgb = img.getRGB(x, y);
                int r = (rgb >> 16) & 0xFF;
                int g = (rgb >> 8) & 0xFF;
                int b = rgb & 0xFF;
                if (r + g + b < 700) {
                    ink++;
                }
            }
        }
        return ink / (double) (img.getWidth() * img.getHeight());
    }

    /** Share of clearly coloured (not grey) pixels. */
    static double colouredShare(BufferedImage img) {
        long n = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int rgb = img.getRGB(x, y);
                int r = (rgb >> 16) & 0xFF;
                int g = (rgb >> 8) & 0xFF;
                int b = rgb & 0xFF;
                if (Math.max(r, Math.max(g, b)) - Math.min(r, Math.min(g, b)) > 60) {
                    n++;
                }
            }
        }
        return n / (double) (img.getWidth() * img.getHeight());
    }
}
