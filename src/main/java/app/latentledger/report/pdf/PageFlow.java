package app.latentledger.report.pdf;

import app.latentledger.chart.draw.Colour;
import app.latentledger.chart.draw.TextStyle;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;

/**
 * Pages filled from the top down: a cursor, margins, and a new page when the next block does not
 * fit. Everything is drawn through {@link PdfPainter} in points, y down from the page's top.
 * Page numbers ("Page 2 of 5") are set when the document is finished and the count is known.
 */
public final class PageFlow implements AutoCloseable {
    private final PDDocument doc;
    private final ReportFonts fonts;
    private final double pageWidth;
    private final double pageHeight;
    private final double margin;
    private final double footerHeight;
    private final List<PDPage> pages = new ArrayList<>();
    private PDPageContentStream stream;
    private PdfPainter painter;
    private double y;

    public PageFlow(PDDocument doc, ReportFonts fonts, double pageWidth, double pageHeight, double margin) {
        this.doc = doc;
        this.fonts = fonts;
        this.pageWidth = pageWidth;
        this.pageHeight = pageHeight;
        this.margin = margin;
        this.footerHeight = 28;
        newPage();
    }

    public ReportFonts fonts() {
        return fonts;
    }

    public PdfPainter painter() {
        return painter;
    }

    public double left() {
        return margin;
    }

    public double width() {
        return pageWidth - 2 * margin;
    }

    public double y() {
        return y;
    }

    public int pageNumber() {
        return pages.size();
    }

    /** Room left above the footer, pt. */
    public double remaining() {
        return pageHeight - margin - footerHeight - y;
    }

    /** Starts a new page when less than {@code height} pt are left. */
    public void need(double height) {
        if (remaining() < height) {
            newPage();
        }
    }

    public void advance(double height) {
        y += height;
    }

    public void newPage() {
        closeStream();
        PDPage page = new PDPage(new PDRectangle((float) pageWidth, (float) pageHeight));
        doc.addPage(page);
        pages.add(page);
        try {
            stream = new PDPageContentStream(doc, page);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        painter = new PdfPainter(stream, fonts, pageHeight);
        y = margin;
    }

    /**
     * Ends the last page and writes the footer on every page: {@code left} text and "Page i of N".
     */
    public void finish(String left, TextStyle style, Colour rule) {
        closeStream();
        int n = pages.size();
        for (int i = 0; i < n; i++) {
            try (PDPageContentStream s = new PDPageContentStream(doc, pages.get(i),
                    PDPageContentStream.AppendMode.APPEND, true, true)) {
                PdfPainter p = new PdfPainter(s, fonts, pageHeight);
                double base = pageHeight - margin + 4;
                p.line(margin, base - 14, pageWidth - margin, base - 14,
                        app.latentledger.chart.draw.Stroke.solid(rule, 0.5));
                p.text(margin, base, left, style);
                p.text(pageWidth - margin, base, "Page " + (i + 1) + " of " + n,
                        style.align(TextStyle.HAlign.RIGHT, TextStyle.VAlign.BASELINE));
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }

    private void closeStream() {
        if (stream != null) {
            try {
                stream.close();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            stream = null;
        }
    }

    @Override
    public void close() {
        closeStream();
    }
}
