package app.latentledger.report;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.measure.AirflowBasis;
import app.latentledger.core.measure.AirflowPoint;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.records.Airflow;
import app.latentledger.core.records.HumidityReading;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.settings.PaperSize;
import app.latentledger.core.units.Ratio;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.ReadingSetCheck;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import app.latentledger.ui.present.ResultSheet;
import app.latentledger.ui.present.Row;
import app.latentledger.ui.present.VisitResults;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A ratio that cannot be measured reads "not measurable (why)" on the results screen and in the PDF,
 * never NaN, a bare dash or a misleading 0. The situation: the supply leaves cooler but wetter than
 * the return (75 °F / 50 % RH in, 68 °F / 75 % RH out — an evaporative signature, e.g. a wet coil
 * with the compressor off or water re-evaporating), so the air-side total is near zero and negative:
 * the sensible heat ratio would print as about −16 ± 120 (the handbook's SHR = q_s / q, ASHRAE
 * Handbook—Fundamentals ch. 1, has no meaning for q ≤ 0), and the coil added moisture, so there is
 * no apparatus dew point and no bypass factor (the straight coil line of the handbook needs
 * moisture removed).
 */
class NotMeasurableWordsTest {
    @TempDir
    Path dir;

    private static double c(double f) {
        return (f - 32) / 1.8;
    }

    @Test
    void withheldRatiosSayWhyOnScreenAndOnPaper() throws Exception {
        try (Ledger ledger = Ledger.open(dir.resolve("data"), Ledger.FirstRun.SEED_DEMO)) {
            Visit visit = ledger.visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow();
            ReadingSet wetter = new ReadingSet("set-wetter", visit.id(), OffsetDateTime.parse("2024-07-16T12:00:00-05:00"),
                    "evaporative", "", new Measurement(c(75), 0.5 / 1.8),
                    new HumidityReading(HumidityKind.RELATIVE_HUMIDITY, new Measurement(50, 2)),
                    new Measurement(c(68), 0.5 / 1.8),
                    new HumidityReading(HumidityKind.RELATIVE_HUMIDITY, new Measurement(75, 2)), null, null, null,
                    new Airflow(new Measurement(1200 * 0.028316846592 / 60, 0.1 * 1200 * 0.028316846592 / 60),
                            AirflowPoint.ENTERING, "", AirflowBasis.ACTUAL), null, null, "");
            ledger.readings().save(wetter);
            HvacSystem system = ledger.systems().find(visit.systemId()).orElseThrow();
            Site site = ledger.sites().find(visit.siteId()).orElseThrow();
            CoilResult r = ReadingSetCheck.run(wetter, system, site, ThresholdSettings.DEFAULTS, UnitSystem.IP);
            assertTrue(r.process().totalW() < 0, "the situation: the air-side total is below zero");

            ResultSheet sheet = VisitResults.of(r, UnitSystem.IP);
            List<String> words = List.of(
                    Ratio.notMeasurable("the coil removes no heat from the air"),
                    Ratio.notMeasurable("the coil added moisture; no apparatus dew point"),
                    Ratio.notMeasurable("the coil added moisture; no apparatus dew point"));
            assertEquals(words.get(0), sheet.performance("shr").value());
            assertEquals(words.get(1), sheet.performance("bypass-factor").value());
            assertEquals(words.get(2), sheet.performance("apparatus-dew-point").value());
            for (Row row : sheet.performance()) {
                // capacities may be below zero (the air gained heat); no figure is NaN or infinite
                assertFalse(row.value().contains("NaN") || row.value().contains("∞"), row.key() + " shows " + row.value());
            }
            for (String ratio : List.of("shr", "bypass-factor")) {
                assertTrue(sheet.performance(ratio).unit().isEmpty(), "words carry no unit");
            }

            Path pdf = dir.resolve("wetter.pdf");
            VisitReport.write(ledger, visit.id(), null, PaperSize.LETTER, UnitSystem.IP, pdf);
            try (PDDocument doc = ReportPdfs.open(pdf)) {
                String text = ReportPdfs.text(doc).replaceAll("\\s+", " ");
                for (String w : words) {
                    assertTrue(text.contains(w), "the PDF lacks \"" + w + "\"");
                }
                assertFalse(text.contains("NaN"), "no NaN on paper");
            }
        }
    }

    @Test
    void theCommandLineUsesTheSameWords() {
        java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
        java.io.ByteArrayOutputStream err = new java.io.ByteArrayOutputStream();
        int code = app.latentledger.cli.Cli.standard().run(List.of("--data-dir", dir.toString(), "coil",
                        "--return-db", "75", "--return-rh", "50", "--supply-db", "68", "--supply-rh", "75",
                        "--airflow", "1200", "--nominal-tons", "3"),
                new java.io.PrintStream(out, true, java.nio.charset.StandardCharsets.UTF_8),
                new java.io.PrintStream(err, true, java.nio.charset.StandardCharsets.UTF_8));
        assertEquals(0, code, err.toString(java.nio.charset.StandardCharsets.UTF_8));
        String table = out.toString(java.nio.charset.StandardCharsets.UTF_8);
        assertTrue(table.contains("sensible heat ratio: " + Ratio.notMeasurable("the coil removes no heat from the air")),
                table);
    }
}
