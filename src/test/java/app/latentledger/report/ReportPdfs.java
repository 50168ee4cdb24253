package app.latentledger.report;

import app.latentledger.core.cycles.LogSeries;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.StoredLogSeries;
import app.latentledger.io.logcsv.LogCsvImporter;
import app.latentledger.store.Ledger;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;

import java.io.IOException;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.Map;

/** Test helpers: read a report back, and give a demo visit a stored log from a field-data sample. */
final class ReportPdfs {
    private ReportPdfs() {
    }

    /** All text of the PDF in reading order, runs of white space as one space. */
    static String text(PDDocument doc) throws IOException {
        PDFTextStripper s = new PDFTextStripper();
        s.setSortByPosition(true);
        return s.getText(doc).replaceAll("\\s+", " ");
    }

    /** "log-oversized-short-cycling" for "oversized-short-cycling.csv". */
    static String logId(String file) {
        return "log-" + file.replace(".csv", "");
    }

    static PDDocument open(Path file) throws IOException {
        return Loader.loadPDF(file.toFile());
    }

    /** Stores {@code field-data-samples/<file>} (invented Saltreed data) as a log of {@code visitId}. */
    static void addLog(Ledger ledger, String visitId, String file) throws Exception {
        LogSeries series = new LogCsvImporter(UnitSystem.IP, Map.of(), null)
                .read(Path.of("field-data-samples", file)).series();
        ledger.logs().save(new ImportedLog(logId(file), visitId, file, "generic layout",
                OffsetDateTime.parse("2024-07-17T08:00:00-04:00"), StoredLogSeries.samples(series)));
    }
}
