package app.latentledger.report;

import app.latentledger.core.settings.PaperSize;
import app.latentledger.report.pdf.Ink;
import app.latentledger.report.pdf.PageFlow;
import app.latentledger.report.pdf.ReportFonts;
import app.latentledger.report.pdf.Typeset;
import app.latentledger.store.AppVersion;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;

import java.io.IOException;
import java.io.OutputStream;
import java.time.OffsetDateTime;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.TimeZone;

/**
 * Lays out the whole report: page 1 for the homeowner, then the chart, the readings and results,
 * the findings with their evidence, the logs, safety and signatures.
 */
final class ReportDocument {
    /** Margin: 0.75 in on Letter, 19 mm on A4; close enough to be one number. */
    static final double MARGIN_PT = 54;

    private ReportDocument() {
    }

    static void write(ReportData data, PaperSize paper, OffsetDateTime generated, OutputStream out) throws IOException {
        try (PDDocument doc = new PDDocument()) {
            ReportFonts fonts = ReportFonts.load(doc);
            try (PageFlow flow = new PageFlow(doc, fonts, paper.widthPt(), paper.heightPt(), MARGIN_PT)) {
                Typeset t = new Typeset(flow);
                new SummarySection(data, generated).write(t);
                if (flow.pageNumber() == 1) {
                    // the technical pages start on a fresh page unless page 1 already ran over
                    flow.newPage();
                }
                ChartSection charts = new ChartSection(data);
                charts.psychro(t);
                new ReadingsSection(data).write(t);
                new PaperworkSection(data).write(t);
                TechnicalSection technical = new TechnicalSection(data, charts);
                technical.findings(t);
                technical.logs(t);
                new ClosingSection(data).write(t);
                VisitEvidence v = data.latest();
                flow.finish(v.site().name() + " · " + PlainWords.date(v.visit().startedAt()), Ink.SMALL, Ink.RULE);
            }
            info(doc, data, generated);
            doc.save(out);
        }
    }

    private static void info(PDDocument doc, ReportData data, OffsetDateTime generated) {
        PDDocumentInformation info = doc.getDocumentInformation();
        info.setTitle(SummarySection.title(data));
        info.setSubject("Air-conditioning moisture report");
        info.setAuthor(data.latest().visit().technician());
        info.setCreator("Latent Ledger " + AppVersion.current());
        Calendar when = new GregorianCalendar(TimeZone.getTimeZone(generated.getOffset()));
        when.setTimeInMillis(generated.toInstant().toEpochMilli());
        info.setCreationDate(when);
    }
}
