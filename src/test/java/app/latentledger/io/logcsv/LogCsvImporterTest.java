package app.latentledger.io.logcsv;

import app.latentledger.core.cycles.Channel;
import app.latentledger.core.cycles.LogSeries;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import java.io.StringReader;
import java.time.LocalDateTime;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class LogCsvImporterTest {
    private static LogImport read(String text, UnitSystem units, Map<String, String> maps) throws Exception {
        return new LogCsvImporter(units, maps, null).read(new StringReader(text), text.length());
    }

    private static LogImport read(String text) throws Exception {
        return read(text, UnitSystem.IP, Map.of());
    }

    @Test
    @DisplayName("generic layout, IP: °F converted to °C by (F − 32)/1.8 (definition of the scales)")
    void genericIp() throws Exception {
        LogImport r = read("time,return_db,return_rh,supply_db,supply_rh,compressor,fan\n"
                + "2026-07-14T13:00:00-04:00,77.0,55,57.2,90,1,1\n"
                + "2026-07-14T13:00:10-04:00,77.0,55.5,57.2,90,on,1\n");
        LogSeries s = r.series();
        assertEquals(2, s.size());
        assertEquals(25.0, s.value(Channel.RETURN_DB, 0), 1e-12);
        assertEquals(14.0, s.value(Channel.SUPPLY_DB, 1), 1e-12);
        assertEquals(55.5, s.value(Channel.RETURN_RH, 1), 1e-12);
        assertEquals(1, s.status(Channel.COMPRESSOR, 1));
        assertEquals(10.0, s.timeS(1), 1e-12);
        assertEquals("2026-07-14T13:00:00-04:00", s.origin().label(0));
        assertEquals("2026-07-14T13:00:10-04:00", s.origin().label(10));
        assertEquals(',', r.report().delimiter());
        assertTrue(r.report().timesHaveOffset());
        assertEquals(0, r.report().rejectedCount());
    }

    @Test
    @DisplayName("fast ISO parse agrees with java.time for offsets, Z, fractions, a space separator and leap days")
    void isoAgreesWithJavaTime() {
        IsoTimes.Parsed p = new IsoTimes.Parsed();
        String[] offsetTimes = {"2026-07-14T13:05:07-04:00", "2024-02-29T23:59:59Z", "1999-12-31T00:00:00+05:30",
            "2026-03-08T02:30:00-0500"};
        for (String s : offsetTimes) {
            assertTrue(IsoTimes.parse(s, p), s);
            String javaForm = s.endsWith("-0500") ? s.substring(0, s.length() - 2) + ":00" : s;
            assertEquals(OffsetDateTime.parse(javaForm).toEpochSecond(), p.epochSeconds, 1e-9, s);
        }
        assertTrue(IsoTimes.parse("2026-07-14 13:05:07.25", p));
        assertFalse(p.hasOffset);
        assertEquals(LocalDateTime.parse("2026-07-14T13:05:07").toEpochSecond(ZoneOffset.UTC) + 0.25, p.epochSeconds, 1e-9);
        for (String bad : new String[] {"2026-02-30T00:00:00", "2026-13-01T00:00", "2026-07-14T24:00:00",
            "2026-07-14T13:05:07+", "14/07/2026 13:05", "2026-07-14T13:05:07.", "2026-07-14T13:05:07-04:00x"}) {
            assertFalse(IsoTimes.parse(bad, p), bad);
        }
    }

    @Test
    @DisplayName("semicolon, decimal comma, SI, elapsed seconds, tab")
    void delimitersAndDecimalComma() throws Exception {
        LogImport r = read("seconds;return_db;supply_db\n0;24,5;13,25\n60;24,6;13,5\n", UnitSystem.SI, Map.of());
        assertEquals(';', r.report().delimiter());
        assertTrue(r.report().decimalComma());
        assertEquals(13.25, r.series().value(Channel.SUPPLY_DB, 0), 1e-12);
        assertEquals(60, r.series().timeS(1));
        assertEquals(null, r.series().origin());
        LogImport tab = read("seconds\treturn_db\tsupply_db\n0\t24.5\t13\n60\t24.6\t13.5\n", UnitSystem.SI, Map.of());
        assertEquals('\t', tab.report().delimiter());
        assertEquals(24.6, tab.series().value(Channel.RETURN_DB, 1), 1e-12);
    }

    @Test
    @DisplayName("--map reads another logger's headers, any case, with quotes and a byte-order mark")
    void maps() throws Exception {
        LogImport r = read("\uFEFF\"Stamp\";\"RA Temp (°C)\";\"SA Temp (°C)\";Battery\n2026-07-14 08:00:00;24,0;13,0;3,1\n"
                + "2026-07-14 08:01:00;24,0;13,0;3,1\n", UnitSystem.SI,
                Map.of("stamp", "time", "RA Temp (°C)", "return_db", "sa temp (°c)", "supply_db"));
        assertEquals(2, r.series().size());
        assertEquals(24.0, r.series().value(Channel.RETURN_DB, 1));
        assertEquals("return_db", r.report().columns().get("RA Temp (°C)"));
        assertEquals(java.util.List.of("Battery"), r.report().ignoredHeaders());
    }

    @Test
    @DisplayName("bad rows are kept out and named line:column; good rows are kept")
    void badRows() throws Exception {
        String text = "time,return_db,return_rh,supply_db,supply_rh\n"
                + "2026-07-14T13:00:00,77,55,57,90\n"           // line 2 good
                + "2026-07-14T13:00:10,77,abc,57,90\n"          // 3 not a number in column 3
                + "2026-07-14T13:00:20,77,55\n"                 // 4 cut short
                + "2026-07-14T13:00:30,77,55,57,90,12\n"        // 5 extra column
                + "14/07/2026 13:00,77,55,57,90\n"              // 6 bad time
                + "2026-07-14T13:00:50,400,55,57,90\n"          // 7 temperature out of range
                + "2026-07-14T13:01:00,77,55,57,150\n"          // 8 RH out of range
                + "2026-07-14T13:01:10,77,,57,101.5\n"          // 9 good: blank RH missing, 101.5 % → 100
                + "2026-07-14T13:01:20-04:00,77,55,57,90\n"     // 10 offset where earlier rows had none
                + "2026-07-14T13:01:30,77,55,57,90\n";          // 11 good
        LogImport r = read(text);
        assertEquals(10, r.report().rowsRead());
        assertEquals(3, r.report().rowsKept());
        assertEquals(7, r.report().rejectedCount());
        assertEquals(java.util.List.of(
                "3:3: return relative humidity 'abc' is not a number",
                "4: 3 of 5 columns (line cut short?)",
                "5: 6 columns, the header has 5",
                "6:1: time '14/07/2026 13:00' is not a date and time this reader knows (e.g. 2026-07-14T13:05:00, 2026-07-14T13:05:00-04:00, 7/14/2026 1:05:00 PM or 14/07/2026 13:05)",
                "7:2: return dry bulb '400' °F outside -58 to 203 °F",
                "8:5: supply relative humidity '150' % outside 0 to 100 %",
                "10:1: time '2026-07-14T13:01:20-04:00' has a UTC offset, earlier rows had none"), r.report().rejected());
        assertTrue(Double.isNaN(r.series().value(Channel.RETURN_RH, 1)));
        assertEquals(100.0, r.series().value(Channel.SUPPLY_RH, 1));
    }

    @Test
    @DisplayName("out-of-order rows are sorted, duplicate times keep the first, gaps and irregular intervals counted")
    void orderDuplicatesGaps() throws Exception {
        String text = "seconds,return_db,supply_db\n0,75,55\n10,75,55\n30,75,55\n20,75,56\n20,75,57\n40,75,55\n"
                + "50,75,55\n200,75,55\n210,75,55\n225,75,55\n";
        LogImport r = read(text);
        ImportReport rep = r.report();
        assertEquals(2, rep.outOfOrder()); // both rows at 20 s come after the row at 30 s
        assertEquals(1, rep.duplicates());
        assertEquals(9, rep.rowsKept());
        assertEquals(10.0, rep.medianIntervalS());
        assertEquals(1, rep.gaps());
        assertEquals(150.0, rep.longestGapS());
        assertEquals(1, rep.irregularIntervals());
        LogSeries s = r.series();
        assertEquals(20.0, s.timeS(2));
        assertEquals((56 - 32) / 1.8, s.value(Channel.SUPPLY_DB, 2), 1e-12); // first of the two rows at 20 s
    }

    @Test
    @DisplayName("files that cannot be a log are refused, saying what is missing")
    void refusals() {
        assertRefused("", "empty");
        assertRefused("return_db,supply_db\n75,55\n", "no time column");
        assertRefused("time,return_rh,fan\n2026-07-14T13:00:00,50,1\n", "no temperature column");
        assertRefused("seconds,return_db\nx,75\ny,75\n", "no readable rows");
        assertRefused("seconds,return_db\n0,75\n", "at least two");
        assertRefused("seconds,return_db\n0,75\n600,75\n1200,75\n", "1 s to 5 min");
        assertRefused("seconds,return_db,supply_db,Return_DB\n0,75,55,75\n", "two columns are read as return_db");
        LogRefusedException e = assertThrows(LogRefusedException.class, () -> read("seconds,T1\n0,1\n", UnitSystem.IP,
                Map.of("T2", "return_db")));
        assertTrue(e.getMessage().contains("not in the file"), e.getMessage());
        e = assertThrows(LogRefusedException.class, () -> read("seconds,T1\n0,1\n", UnitSystem.IP, Map.of("T1", "ret")));
        assertTrue(e.getMessage().contains("'ret' is not a field"), e.getMessage());
    }

    private static void assertRefused(String text, String expected) {
        LogRefusedException e = assertThrows(LogRefusedException.class, () -> read(text));
        assertTrue(e.getMessage().contains(expected), e.getMessage());
    }
}
