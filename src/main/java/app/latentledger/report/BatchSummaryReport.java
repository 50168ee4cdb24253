package app.latentledger.report;

import app.latentledger.store.AppVersion;
import app.latentledger.core.coil.CoilVerdict;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.findings.Cautions;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.settings.PaperSize;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.report.pdf.Ink;
import app.latentledger.report.pdf.PageFlow;
import app.latentledger.report.pdf.PdfPainter;
import app.latentledger.report.pdf.ReportFonts;
import app.latentledger.report.pdf.Table;
import app.latentledger.report.pdf.Typeset;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.GregorianCalendar;
import java.util.List;
import java.util.Map;

/**
 * The summary of a batch as a PDF, in the report's own type, tables and painter: counts by verdict,
 * the systems needing attention first, the spread of SHR, latent per airflow, airflow per nominal
 * ton and dew-point margin as histograms, the refused rows, then every system.
 */
public final class BatchSummaryReport {
    private BatchSummaryReport() {
    }

    /** Writes the summary to {@code output}, complete or not at all (the report's safe-file rule). */
    public static Path write(BatchSummary summary, PaperSize paper, Path output) {
        return VisitReport.SafeFile.write(output, out -> write(summary, paper, out));
    }

    public static void write(BatchSummary s, PaperSize paper, OutputStream out) throws IOException {
        try (PDDocument doc = new PDDocument()) {
            ReportFonts fonts = ReportFonts.load(doc);
            try (PageFlow flow = new PageFlow(doc, fonts, paper.widthPt(), paper.heightPt(), ReportDocument.MARGIN_PT)) {
                Typeset t = new Typeset(flow);
                t.paragraph("Batch check: " + s.source(), Ink.TITLE, 0, flow.width());
                t.paragraph(PlainWords.dateTime(s.generated()) + " · " + s.systems().size() + " systems checked, "
                        + s.refused().size() + " rows refused · figures in " + s.units().key().toUpperCase(java.util.Locale.ROOT)
                        + " units · uncertainties k = 2 are in each system's report and the results file", Ink.SMALL, 0);
                counts(t, s);
                attention(t, s);
                plots(t, s);
                refused(t, s);
                everySystem(t, s);
                t.heading("Safety", 40);
                t.paragraph(Cautions.SAFETY_LINE, Ink.BODY, 0);
                flow.finish("Batch summary · " + s.source(), Ink.SMALL, Ink.RULE);
            }
            PDDocumentInformation info = doc.getDocumentInformation();
            info.setTitle("Batch summary: " + s.source());
            info.setSubject("Air-conditioning moisture check of " + s.systems().size() + " systems");
            info.setCreator("Latent Ledger " + AppVersion.current());
            info.setCreationDate(GregorianCalendar.from(s.generated().toZonedDateTime()));
            doc.save(out);
        }
    }

    private static void counts(Typeset t, BatchSummary s) {
        t.heading("Systems by verdict", 80);
        Table table = new Table(new String[] {"Verdict", "Systems"}, new double[] {3, 1}, new boolean[] {false, true});
        Map<CoilVerdict, Integer> counts = s.counts();
        for (CoilVerdict v : CoilVerdict.values()) {
            table.row(v.key(), Integer.toString(counts.get(v)));
        }
        table.row("refused (not checked)", Integer.toString(s.refused().size()));
        table.draw(t);
    }

    private static void attention(Typeset t, BatchSummary s) {
        List<BatchSummary.Entry> list = s.attention();
        t.heading("Systems needing attention (" + list.size() + ")", 60);
        if (list.isEmpty()) {
            t.paragraph("None: every checked coil is dehumidifying and no finding asks for a closer look.", Ink.BODY, 0);
            return;
        }
        t.paragraph("Not dehumidifying first, then a finding calling for a fix, then checks that cannot tell, then"
                + " findings asking for a closer look; each system's own report has the evidence.", Ink.SMALL, 0);
        Table table = new Table(new String[] {"Line", "Site", "System", "Verdict", "Findings"},
                new double[] {0.6, 2.2, 1.4, 1.6, 4.2}, new boolean[] {true, false, false, false, false});
        for (BatchSummary.Entry e : list) {
            List<String> codes = new ArrayList<>();
            for (Finding f : e.result().findings()) {
                codes.add(f.code().key() + " (" + f.severity().key() + ")");
            }
            table.row(Integer.toString(e.line()), e.site(), e.system(), e.verdict().key(), String.join(", ", codes));
        }
        table.draw(t);
    }

    private static void plots(Typeset t, BatchSummary s) {
        t.heading("How the systems spread", BatchHistogramPlot.HEIGHT * t.flow().width() / BatchHistogramPlot.WIDTH + 70);
        t.paragraph("Each bar counts the systems whose figure falls in its range. Systems without a figure (no coil"
                + " temperature, no nameplate size, or a figure that does not exist) are counted under the plot.",
                Ink.SMALL, 0);
        for (Measurand m : BatchSummary.PLOTTED) {
            BatchSummary.Histogram h = s.histogram(m);
            PageFlow f = t.flow();
            double scale = f.width() / BatchHistogramPlot.WIDTH;
            t.subheading(BatchSummary.title(m, s.units()), BatchHistogramPlot.HEIGHT * scale + 8);
            f.need(BatchHistogramPlot.HEIGHT * scale + 6);
            PdfPainter p = f.painter();
            p.place(f.left(), f.y(), scale, BatchHistogramPlot.WIDTH, BatchHistogramPlot.HEIGHT);
            new BatchHistogramPlot(h).paint(p);
            p.restore();
            f.advance(BatchHistogramPlot.HEIGHT * scale + 4);
            t.paragraph(h.total() + " systems plotted" + (h.missing() == 0 ? "" : "; " + h.missing() + " without this figure"),
                    Ink.SMALL, 0);
        }
    }

    private static void refused(Typeset t, BatchSummary s) {
        t.heading("Rows refused (" + s.refused().size() + ")", 40);
        if (s.refused().isEmpty()) {
            t.paragraph("None: every row was checked.", Ink.BODY, 0);
            return;
        }
        Table table = new Table(new String[] {"Line", "Column", "Value", "Accepted", "Why"},
                new double[] {0.6, 1.4, 1.0, 1.8, 5.0}, new boolean[] {true, false, false, false, false});
        for (BatchSummary.Refused r : s.refused()) {
            table.row(Integer.toString(r.line()), r.column(), r.value(), r.range(), r.message());
        }
        table.draw(t);
    }

    private static void everySystem(Typeset t, BatchSummary s) {
        t.heading("Every system", 40);
        String[] header = {"Line", "Site", "System", "Verdict", "SHR", "Latent/airflow", "Airflow/nominal", "DP margin",
                "Report"};
        Table table = new Table(header, new double[] {0.6, 2.0, 1.3, 1.5, 0.7, 1.1, 1.1, 1.0, 2.2},
                new boolean[] {true, false, false, false, true, true, true, true, false});
        for (BatchSummary.Entry e : s.systems()) {
            table.row(Integer.toString(e.line()), e.site(), e.system(), e.verdict().key(),
                    figure(e, Measurand.SHR, s), figure(e, Measurand.LATENT_PER_AIRFLOW, s),
                    figure(e, Measurand.AIRFLOW_PER_NOMINAL_CAPACITY, s), figure(e, Measurand.DEW_POINT_MARGIN, s),
                    e.report());
        }
        table.draw(t);
        t.paragraph("Units: " + Measurand.LATENT_PER_AIRFLOW.label(s.units()) + " "
                + Measurand.LATENT_PER_AIRFLOW.quantity().symbol(s.units())
                + "; " + Measurand.AIRFLOW_PER_NOMINAL_CAPACITY.label(s.units()) + " "
                + Measurand.AIRFLOW_PER_NOMINAL_CAPACITY.quantity().symbol(s.units())
                + "; dew-point margin " + Measurand.DEW_POINT_MARGIN.quantity().symbol(s.units()) + ".", Ink.SMALL, 0);
    }

    private static String figure(BatchSummary.Entry e, Measurand m, BatchSummary s) {
        var est = e.result().estimate(m);
        return est.exists() ? DisplayNumber.value(m.quantity(), s.units(), est.valueSi()) : DisplayNumber.NONE;
    }
}
