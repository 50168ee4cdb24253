package app.latentledger.io.logcsv;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The buffer comparisons give what the String methods they replace give (the JDK as the reference),
 * including letters whose case rules are unusual (dotless ı, long ſ, the Kelvin sign).
 */
class CellsTest {
    private static final String CHARS = " \t\u0001\u2003\uFEFF\"aAnNlLuUsSıİſ\u212Ak0-.,";

    @Property(tries = 3000)
    void cleanIsTheImportersStringClean(@ForAll("cells") String cell) {
        char[] buf = ("," + cell + ",").toCharArray();
        // the cell as the splitter hands it over: trimmed of chars <= U+0020 first
        String trimmed = cell.trim();
        int lead = 0;
        while (lead < cell.length() && cell.charAt(lead) <= ' ') {
            lead++;
        }
        int from = 1 + lead;
        int to = from + trimmed.length();
        long r = Cells.clean(buf, from, to);
        String got = new String(buf, (int) (r >>> 32), (int) r - (int) (r >>> 32));
        assertEquals(LogCsvImporter.clean(trimmed), got, cell);
    }

    @Property(tries = 3000)
    void caseRulesAreTheJdks(@ForAll("cells") String cell) {
        char[] buf = ("x" + cell + "y").toCharArray();
        for (String word : new String[] {"nan", "na", "null", "on", "off", "true", "false", "PM", "A.M.", "-", "1"}) {
            assertEquals(cell.equalsIgnoreCase(word), Cells.equalsIgnoreCase(buf, 1, 1 + cell.length(), word), cell + " ~ " + word);
            assertEquals(cell.equals(word), Cells.equals(buf, 1, 1 + cell.length(), word), cell + " = " + word);
        }
        assertEquals(DecimalText.missing(cell), DecimalText.missing(buf, 1, 1 + cell.length()), cell);
    }

    @Provide
    Arbitrary<String> cells() {
        return Arbitraries.oneOf(Arbitraries.strings().withChars(CHARS).ofMaxLength(8),
                Arbitraries.of("NaN", "nAn", "NA", "null", "NULL", "nuſſ", "ON", "oN", "Off", "TRUE", "fAlSe", "pm",
                        "a.m.", "-", "1", "0", " \"na\" ", "\uFEFF 75 ", "\"\""));
    }
}
