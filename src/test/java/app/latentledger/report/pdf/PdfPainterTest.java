package app.latentledger.report.pdf;

import app.latentledger.chart.draw.Colour;
import app.latentledger.chart.draw.Stroke;
import app.latentledger.chart.draw.TextStyle;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.junit.jupiter.api.Test;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The PDF painter puts things where the chart asks, in the chart's y-down device space: checked by
 * reading the PDF back with PDFBox's text extraction (glyph positions) and its renderer (pixels).
 */
class PdfPainterTest {
    private static final double W = 400;
    private static final double H = 300;

    private record Drawn(String text, double x, double yFromTop, double rotation) {
    }

    private static PDDocument paint(Consumer<PdfPainter> body) throws Exception {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (PDDocument doc = new PDDocument()) {
            PDPage page = new PDPage(new PDRectangle((float) W, (float) H));
            doc.addPage(page);
            ReportFonts fonts = ReportFonts.load(doc);
            try (PDPageContentStream cs = new PDPageContentStream(doc, page)) {
                body.accept(new PdfPainter(cs, fonts, H));
            }
            doc.save(bytes);
        }
        return Loader.loadPDF(bytes.toByteArray());
    }

    private static List<Drawn> glyphs(PDDocument doc) throws Exception {
        List<Drawn> out = new ArrayList<>();
        PDFTextStripper s = new PDFTextStripper() {
            @Override
            protected void processTextPosition(TextPosition t) {
                out.add(new Drawn(t.getUnicode(), t.getXDirAdj(), t.getYDirAdj(), t.getDir()));
            }
        };
        s.getText(doc);
        return out;
    }

    @Test
    void textSitsUprightAtItsAnchorWithYDown() throws Exception {
        TextStyle style = TextStyle.of(20, Colour.rgb(0x000000));
        try (PDDocument doc = paint(p -> {
            p.text(50, 80, "A", style);
            p.text(300, 200, "B", style.align(TextStyle.HAlign.RIGHT, TextStyle.VAlign.TOP));
        })) {
            List<Drawn> g = glyphs(doc);
            assertEquals(2, g.size(), g::toString);
            Drawn a = g.get(0);
            assertEquals("A", a.text());
            assertEquals(50, a.x(), 0.01, "left-anchored text starts at x");
            assertEquals(80, a.yFromTop(), 0.01, "baseline 80 pt from the top: y grows downwards as in the chart");
            assertEquals(0, a.rotation(), 0, "upright, not mirrored");
            Drawn b = g.get(1);
            ReportFonts fonts = ReportFonts.load(new PDDocument());
            double width = fonts.width("B", 20, false);
            assertEquals(300 - width, b.x(), 0.05, "right-anchored: ends at x");
            assertEquals(200 + fonts.ascent(20), b.yFromTop(), 0.05, "top-anchored: baseline one cap height below");
        }
    }

    @Test
    void rotatedTextTurnsClockwiseLikeTheCanvas() throws Exception {
        try (PDDocument doc = paint(p -> p.text(100, 100, "R", TextStyle.of(20, Colour.rgb(0)).rotated(-90)))) {
            // −90° in a y-down space turns text to read upwards (the chart's y-axis title)
            assertEquals(90, glyphs(doc).get(0).rotation(), 0);
        }
    }

    @Test
    void placedFrameScalesAndClips() throws Exception {
        try (PDDocument doc = paint(p -> {
            p.place(100, 50, 0.5, 200, 200);
            p.rect(0, 0, 1000, 1000, Colour.rgb(0xC2410C), null); // clipped to 200 × 200 units = 100 × 100 pt
            p.text(20, 40, "S", TextStyle.of(20, Colour.rgb(0)));
            p.restore();
            p.line(0, 290, 400, 290, Stroke.solid(Colour.rgb(0x0B3C78), 2));
        })) {
            Drawn s = glyphs(doc).get(0);
            assertEquals(100 + 20 * 0.5, s.x(), 0.01);
            assertEquals(50 + 40 * 0.5, s.yFromTop(), 0.01);
            BufferedImage img = new PDFRenderer(doc).renderImage(0, 1);
            assertEquals(0xC2410C, img.getRGB(150, 100) & 0xFFFFFF, "inside the frame: filled");
            assertEquals(0xFFFFFF, img.getRGB(250, 100) & 0xFFFFFF, "right of the clip: untouched");
            assertEquals(0xFFFFFF, img.getRGB(150, 170) & 0xFFFFFF, "below the clip: untouched");
            assertEquals(0x0B3C78, img.getRGB(200, 290) & 0xFFFFFF, "after restore the clip is gone");
        }
    }

    @Test
    void circlesAndTranslucentFillsRender() throws Exception {
        try (PDDocument doc = paint(p -> {
            p.circle(100, 100, 40, Colour.rgb(0x000000), null);
            p.rect(200, 50, 100, 100, Colour.rgb(0x000000).withAlpha(0.5), null);
        })) {
            BufferedImage img = new PDFRenderer(doc).renderImage(0, 1);
            assertEquals(0, img.getRGB(100, 100) & 0xFFFFFF, "circle centre filled");
            assertEquals(0xFFFFFF, img.getRGB(100 + 36, 100 + 36) & 0xFFFFFF, "outside the circle, inside its box");
            int grey = img.getRGB(250, 100) & 0xFF;
            assertTrue(grey > 100 && grey < 155, "half-opaque black on white is mid grey: " + grey);
        }
    }

    @Test
    void unbalancedRestoreIsRefused() {
        assertThrows(IllegalStateException.class, () -> paint(p -> p.restore()));
    }

    @Test
    void charactersTheFontLacksBecomeQuestionMarksInsteadOfFailing() throws Exception {
        try (PDDocument doc = new PDDocument()) {
            ReportFonts fonts = ReportFonts.load(doc);
            assertEquals("°F ± ³ ½ ≤ → ?", fonts.printable("°F ± ³ ½ ≤ → 漢"));
        }
    }
}
