package app.latentledger.io.logcsv;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.IntRange;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The importer's row splitter against the outside reference it replaces: commons-csv with the
 * importer's format ({@link LogCsvImporter#format}), row by row and field by field, and the line
 * numbers against a count of line breaks as an editor shows them (CR, LF and CRLF each one). The
 * splitter's {@link RowSplitter#position()} is where the row's first char is; commons-csv counts
 * blank lines before a row into it, so the reference steps over those.
 */
class RowSplitterTest {
    /** A row as "line@position:field|field|…" with trimmed fields. */
    private static List<String> split(Reader in, char d) throws IOException {
        RowSplitter rows = new RowSplitter(in, d);
        List<String> out = new ArrayList<>();
        while (rows.next()) {
            StringBuilder b = new StringBuilder().append(rows.line()).append('@').append(rows.position()).append(':');
            for (int i = 0; i < rows.size(); i++) {
                b.append(i == 0 ? "" : "|").append(rows.text(i));
            }
            out.add(b.toString());
        }
        return out;
    }

    private static List<String> reference(String text, char d) throws IOException {
        List<String> out = new ArrayList<>();
        try (CSVParser p = CSVParser.builder().setReader(new StringReader(text)).setFormat(LogCsvImporter.format(d)).get()) {
            for (CSVRecord rec : p) {
                // commons-csv counts skipped blank lines into the row's position: step over them
                int pos = (int) rec.getCharacterPosition();
                while (pos < text.length() && (text.charAt(pos) == '\r' || text.charAt(pos) == '\n')) {
                    pos++;
                }
                StringBuilder b = new StringBuilder().append(editorLine(text, pos)).append('@').append(pos).append(':');
                for (int i = 0; i < rec.size(); i++) {
                    b.append(i == 0 ? "" : "|").append(rec.get(i));
                }
                out.add(b.toString());
            }
        }
        return out;
    }

    /** 1 + the line breaks before {@code pos}, a CRLF counted once. */
    private static long editorLine(String text, int pos) {
        long line = 1;
        for (int i = 0; i < pos; i++) {
            char c = text.charAt(i);
            if (c == '\n' || c == '\r' && (i + 1 >= text.length() || text.charAt(i + 1) != '\n')) {
                line++;
            }
        }
        return line;
    }

    /** A reader that hands out at most {@code step} chars per call, to cross block boundaries everywhere. */
    private static Reader trickle(String text, int step) {
        return new Reader() {
            private int at;

            @Override
            public int read(char[] cbuf, int off, int len) {
                if (at >= text.length()) {
                    return -1;
                }
                int n = Math.min(Math.min(len, step), text.length() - at);
                text.getChars(at, at + n, cbuf, off);
                at += n;
                return n;
            }

            @Override
            public void close() {
            }
        };
    }

    @Test
    void quotesEmptyFieldsCrlfBomAndTrailingSeparators() throws IOException {
        String text = "\uFEFFtime,\"return_db\",rh\r\n"
                + "1, 2 ,\r\n"      // spaces trimmed, trailing comma: an empty third field
                + "\r\n\n"          // blank lines skipped, but counted
                + "\"a,b\",,\n"     // a quote hides nothing: the comma splits
                + "   \n"           // spaces only: one empty field
                + "x,y,z";          // no break at the end
        List<String> rows = split(new StringReader(text), ',');
        assertEquals(List.of("1@0:\uFEFFtime|\"return_db\"|rh", "2@22:1|2|", "5@33:\"a|b\"||",
                "6@41:", "7@45:x|y|z"), rows);
        assertEquals(reference(text, ','), rows);
    }

    @Test
    void crAloneEndsARowAndAFieldLongerThanTheBlockGrowsTheBuffer() throws IOException {
        String big = "9".repeat(200_000);
        String text = "a;b\r1;" + big + "\r\r\n2;3";
        List<String> rows = split(trickle(text, 7000), ';');
        assertTrue(reference(text, ';').equals(rows), "same rows as commons-csv");
        assertTrue(rows.get(1).equals("2@4:1|" + big), "the long row whole");
        assertEquals(3, rows.size());
    }

    @Test
    void firstLineIsPeekedWithoutConsumingIt() throws IOException {
        RowSplitter rows = new RowSplitter(trickle("\n\r\nseconds;x\n1;2\n", 3), ',');
        assertEquals("seconds;x", rows.peekFirstLine(100));
        rows.delimiter(';');
        rows.next();
        assertEquals(3, rows.line());
        assertEquals("x", rows.text(1));
        assertEquals("0123", new RowSplitter(new StringReader("012345\n"), ',').peekFirstLine(3));
        assertEquals(null, new RowSplitter(new StringReader("\r\n\n"), ',').peekFirstLine(3));
    }

    @Property(tries = 1500)
    void sameRowsAndFieldsAsCommonsCsv(@ForAll("text") String text, @ForAll @IntRange(min = 1, max = 9) int step,
                                       @ForAll("separators") char d) throws IOException {
        assertEquals(reference(text, d), split(trickle(text, step), d));
        assertEquals(reference(text, d), split(new StringReader(text), d));
    }

    @Provide
    Arbitrary<String> text() {
        return Arbitraries.strings().withChars(",;\t\"\r\n  ab1.\uFEFF\u0001é").ofMaxLength(200);
    }

    @Provide
    Arbitrary<Character> separators() {
        return Arbitraries.of(',', ';', '\t');
    }
}
