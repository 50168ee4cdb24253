package app.latentledger.io.logcsv;

import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.Test;

import java.io.StringReader;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * A refused row is named by the physical line a text editor shows it on: blank lines, CRLF and a
 * last line without a line break counted as an editor counts them. The expected numbers are
 * counted by hand from the literal files below.
 */
class PhysicalLineNumberTest {
    private static List<String> rejectedLines(String csv) throws Exception {
        LogImport r = new LogCsvImporter(UnitSystem.SI, Map.of(), f -> { }).read(new StringReader(csv), csv.length());
        return r.report().rejected().stream().map(m -> m.substring(0, m.indexOf(':'))).toList();
    }

    @Test
    void blankLinesAreCountedBeforeARefusedRow() throws Exception {
        // line 1 header, 2-3 rows, 4 blank, 5 blank, 6 refused (RH 500), 7 row, 8 refused (abc)
        String csv = "seconds,return_db,return_rh\n0,24,50\n60,24,50\n\n\n120,24,500\n180,24,50\n240,abc,50\n300,24,50\n";
        assertEquals(List.of("6", "8"), rejectedLines(csv));
    }

    @Test
    void crlfAndALastLineWithoutBreak() throws Exception {
        // line 1 header, 2 row, 3 blank, 4 refused, 5 row, 6 refused with no line break after it
        String csv = "seconds,return_db\r\n0,24\r\n\r\n60,999\r\n120,24\r\n180,-999";
        assertEquals(List.of("4", "6"), rejectedLines(csv));
    }
}
