package app.latentledger.report;

import app.latentledger.TradeWords;
import app.latentledger.core.settings.PaperSize;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The demo visits' reports in both unit systems, with the short-cycling and the blower-left-on logs
 * stored on the complaint visit (so the part-load finding and the returned-water finding are
 * printed), read back with PDFBox and scanned for what a customer or a tech must not read
 * ({@link TradeWords}).
 */
class TradeWordsReportTest {
    @TempDir
    Path dir;

    @Test
    void noReportPrintsModelSymbolsFileNamesCommandSyntaxFieldKeysOrNegativeWater() throws Exception {
        List<String> problems = new ArrayList<>();
        try (Ledger ledger = Ledger.open(dir.resolve("data"), Ledger.FirstRun.SEED_DEMO)) {
            ReportPdfs.addLog(ledger, DemoScenario.VISIT_COMPLAINT, "oversized-short-cycling.csv");
            for (UnitSystem u : UnitSystem.values()) {
                for (String visit : List.of(DemoScenario.VISIT_COMPLAINT, DemoScenario.VISIT_COMMISSIONING)) {
                    Path out = dir.resolve(u.key() + "-" + visit.substring(0, 8) + ".pdf");
                    VisitReport.write(ledger, visit, null, PaperSize.LETTER, u, out);
                    try (PDDocument doc = ReportPdfs.open(out)) {
                        String text = ReportPdfs.text(doc);
                        assertTrue(text.contains("Methods guide") || text.length() > 2000, "the report has its words");
                        problems.addAll(TradeWords.problems(out.getFileName().toString(), text));
                    }
                }
            }
        }
        assertTrue(problems.isEmpty(), String.join("\n", problems));
    }
}
