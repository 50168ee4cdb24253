package app.latentledger.report.pdf;

import app.latentledger.chart.draw.TextMeasurer;
import org.apache.fontbox.ttf.TTFParser;
import org.apache.fontbox.ttf.TrueTypeFont;
import org.apache.pdfbox.io.RandomAccessReadBuffer;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.font.PDType0Font;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.HashMap;
import java.util.Map;

/**
 * The report's two faces, DejaVu Sans and DejaVu Sans Bold, read from the fonts jar on the class
 * path (never from the system, so a fresh machine prints the same) and subset-embedded in the
 * document: only the glyphs used travel with the file. DejaVu covers °, ±, ³, ½, ≤, →, Δ and ṁ.
 * Licence: Bitstream Vera / DejaVu, shipped beside the TTFs in the jar.
 */
public final class ReportFonts implements TextMeasurer {
    static final String FOLDER = "/net/sf/jasperreports/fonts/dejavu/";
    static final String REGULAR = "DejaVuSans.ttf";
    static final String BOLD = "DejaVuSans-Bold.ttf";

    private final PDType0Font regular;
    private final PDType0Font bold;
    private final Map<Integer, Boolean> covered = new HashMap<>();

    private ReportFonts(PDType0Font regular, PDType0Font bold) {
        this.regular = regular;
        this.bold = bold;
    }

    /** Loads both faces into {@code doc}, for subset embedding when the document is saved. */
    public static ReportFonts load(PDDocument doc) {
        return new ReportFonts(font(doc, REGULAR), font(doc, BOLD));
    }

    /**
     * Each thread parses each face once and reuses it for every document it writes: parsing the two
     * TTFs was about a tenth of a report's time in a 1,000-report batch. A parsed font is read
     * lazily and is not safe to share between threads, hence one per thread; a font passed in this
     * way is not closed with the document (PDFBox closes only the fonts it parsed itself).
     */
    private static final ThreadLocal<Map<String, TrueTypeFont>> PARSED = ThreadLocal.withInitial(HashMap::new);

    private static PDType0Font font(PDDocument doc, String name) {
        try {
            TrueTypeFont ttf = PARSED.get().get(name);
            if (ttf == null) {
                ttf = parse(name);
                PARSED.get().put(name, ttf);
            }
            return PDType0Font.load(doc, ttf, true);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read font " + name, e);
        }
    }

    private static TrueTypeFont parse(String name) throws IOException {
        try (InputStream in = ReportFonts.class.getResourceAsStream(FOLDER + name)) {
            if (in == null) {
                throw new IllegalStateException("font " + name + " is not on the class path (jasperreports-fonts jar)");
            }
            return new TTFParser().parse(new RandomAccessReadBuffer(in.readAllBytes()));
        }
    }

    public PDType0Font face(boolean boldFace) {
        return boldFace ? bold : regular;
    }

    /**
     * {@code text} with every character the fonts cannot show replaced by '?', so one odd
     * character typed in a note never stops a report.
     */
    public String printable(String text) {
        StringBuilder b = null;
        for (int i = 0; i < text.length(); ) {
            int cp = text.codePointAt(i);
            int len = Character.charCount(cp);
            boolean ok = covered.computeIfAbsent(cp, this::hasGlyph);
            if (!ok && b == null) {
                b = new StringBuilder(text.substring(0, i));
            }
            if (b != null) {
                if (ok) {
                    b.appendCodePoint(cp);
                } else {
                    b.append(Character.isWhitespace(cp) ? ' ' : '?');
                }
            }
            i += len;
        }
        return b == null ? text : b.toString();
    }

    private boolean hasGlyph(int codePoint) {
        try {
            String s = new String(Character.toChars(codePoint));
            regular.encode(s);
            bold.encode(s);
            return true;
        } catch (IOException | IllegalArgumentException e) {
            return false;
        }
    }

    @Override
    public double width(String text, double size, boolean boldFace) {
        try {
            return face(boldFace).getStringWidth(printable(text)) / 1000.0 * size;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    public double ascent(double size) {
        return regular.getFontDescriptor().getCapHeight() / 1000.0 * size;
    }

    @Override
    public double descent(double size) {
        return Math.abs(regular.getFontDescriptor().getDescent()) / 1000.0 * size;
    }
}
