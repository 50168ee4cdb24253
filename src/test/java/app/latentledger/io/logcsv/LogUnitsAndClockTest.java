package app.latentledger.io.logcsv;

import app.latentledger.core.cycles.Channel;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import java.io.StringReader;
import java.time.LocalDateTime;
import java.time.ZoneId;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Temperature units checked, not assumed; US and day-first dates; time zones for local clocks. */
class LogUnitsAndClockTest {
    private static LogImport read(String text, UnitSystem units, DateOrder order, ZoneId zone) throws Exception {
        return new LogCsvImporter(units, Map.of(), order, zone, null).read(new StringReader(text), text.length());
    }

    private static String rows(String header, String unitLess, double ret, double sup) {
        StringBuilder b = new StringBuilder(header).append('\n');
        for (int i = 0; i < 20; i++) {
            b.append(String.format(java.util.Locale.ROOT, "%d,%.1f,55,%.1f,90%n", i * 60, ret, sup));
        }
        return b.toString();
    }

    @Test
    @DisplayName("a °C file under °F settings is refused, naming the column, its values and the unit")
    void celsiusUnderFahrenheitRefused() {
        LogRefusedException e = assertThrows(LogRefusedException.class, () -> read(
                rows("seconds,return_db,return_rh,supply_db,supply_rh", "", 24.0, 13.0), UnitSystem.IP, DateOrder.AUTO,
                null));
        assertTrue(e.getMessage().contains("'return_db'"), e.getMessage());
        assertTrue(e.getMessage().contains("24.0 to 24.0 °F"), e.getMessage());
        assertTrue(e.getMessage().contains("°C"), e.getMessage());
    }

    @Test
    @DisplayName("a °F file under °C settings is refused the same way (75 °C return air is not a house)")
    void fahrenheitUnderCelsiusRefused() {
        LogRefusedException e = assertThrows(LogRefusedException.class, () -> read(
                rows("seconds,return_db,return_rh,supply_db,supply_rh", "", 75.0, 55.0), UnitSystem.SI, DateOrder.AUTO,
                null));
        assertTrue(e.getMessage().contains("75.0 to 75.0 °C"), e.getMessage());
    }

    @Test
    @DisplayName("near miss: 41 °F return air (cold but possible) is read under °F settings")
    void plausibleColdReturnKept() throws Exception {
        LogImport r = read(rows("seconds,return_db,return_rh,supply_db,supply_rh", "", 41.0, 38.0), UnitSystem.IP,
                DateOrder.AUTO, null);
        assertEquals(5.0, r.series().value(Channel.RETURN_DB, 0), 1e-9);
        assertFalse(r.report().unitFromHeader());
    }

    @Test
    @DisplayName("headers that state °C are read in °C under °F settings, and the report says which unit was used")
    void headerUnitsWin() throws Exception {
        LogImport r = read(rows("seconds,return_db [°C],return_rh,supply_db (degC),supply_rh", "", 24.0, 13.0),
                UnitSystem.IP, DateOrder.AUTO, null);
        assertEquals(24.0, r.series().value(Channel.RETURN_DB, 0), 1e-9);
        assertEquals(13.0, r.series().value(Channel.SUPPLY_DB, 0), 1e-9);
        assertEquals(UnitSystem.SI, r.report().temperatureUnit());
        assertEquals("°C, as the headers state", r.report().temperatureUnitText());
        LogImport f = read(rows("seconds,return_db degF,return_rh,supply_db,supply_rh", "", 75.0, 55.0),
                UnitSystem.SI, DateOrder.AUTO, null);
        assertEquals((75.0 - 32) / 1.8, f.series().value(Channel.RETURN_DB, 0), 1e-9);
    }

    @Test
    @DisplayName("headers stating two units are refused")
    void mixedUnitsRefused() {
        assertThrows(LogRefusedException.class, () -> read(
                rows("seconds,return_db [°C],return_rh,supply_db [°F],supply_rh", "", 24.0, 13.0), UnitSystem.IP,
                DateOrder.AUTO, null));
    }

    private static String clock(String... times) {
        StringBuilder b = new StringBuilder("time,return_db,return_rh\n");
        for (String t : times) {
            b.append(t).append(",75,50\n");
        }
        return b.toString();
    }

    @Test
    @DisplayName("US M/d/yyyy h:mm:ss a: 12 AM is midnight, 12 PM noon (the 12-hour clock's convention)")
    void usDates() throws Exception {
        LogImport r = read(clock("7/14/2026 11:59:00 PM", "7/14/2026 11:59:30 PM", "7/15/2026 12:00:00 AM",
                "7/15/2026 12:00:30 AM"), UnitSystem.IP, DateOrder.AUTO, ZoneId.of("UTC"));
        assertEquals(60.0, r.series().timeS(2), 1e-9);
        assertEquals("2026-07-15T00:00:30Z", r.series().origin().label(90));
        assertEquals(DateOrder.MDY, r.report().dateOrder());
        SlashedTimes.Parsed p = new SlashedTimes.Parsed();
        assertTrue(SlashedTimes.parse("7/15/2026 12:00:30 PM", p));
        assertEquals(12 * 3600 + 30, p.secondOfDay, 1e-9);
        assertTrue(SlashedTimes.parse("7/15/2026 1:05 am", p));
        assertEquals(3900, p.secondOfDay, 1e-9);
        assertFalse(SlashedTimes.parse("7/15/2026 13:05 PM", p));
    }

    @Test
    @DisplayName("day-first dates found from a day above 12; an ambiguous one-day file asks for the order")
    void dayFirstAndAmbiguous() throws Exception {
        LogImport r = read(clock("14/07/2026 13:00", "14/07/2026 13:01"), UnitSystem.IP, DateOrder.AUTO, null);
        assertEquals(DateOrder.DMY, r.report().dateOrder());
        LogRefusedException e = assertThrows(LogRefusedException.class,
                () -> read(clock("7/3/2026 13:00", "7/3/2026 13:01"), UnitSystem.IP, DateOrder.AUTO, null));
        assertTrue(e.getMessage().contains("mdy or dmy"), e.getMessage());
        LogImport given = read(clock("7/3/2026 13:00", "7/3/2026 13:01"), UnitSystem.IP, DateOrder.DMY, null);
        assertEquals("2026-03-07T13:00:00", given.series().origin().label(0));
    }

    @Test
    @DisplayName("ambiguous dates resolved by continuity: 7/3 → 7/4 is a day under month/day, a month under day/month")
    void continuity() throws Exception {
        LogImport r = read(clock("7/3/2026 23:59", "7/4/2026 00:00"), UnitSystem.IP, DateOrder.AUTO, null);
        assertEquals(DateOrder.MDY, r.report().dateOrder());
        assertEquals(60.0, r.series().timeS(1), 1e-9);
    }

    @Test
    @DisplayName("local clock times in a zone: the offset comes from the zone's rules (America/New_York in July: −04:00)")
    void zone() throws Exception {
        LogImport r = read(clock("2026-07-14T13:00:00", "2026-07-14T13:00:10"), UnitSystem.IP, DateOrder.AUTO,
                ZoneId.of("America/New_York"));
        assertEquals("2026-07-14T13:00:00-04:00", r.series().origin().label(0));
        assertEquals("America/New_York", r.report().timeZone());
        long expected = LocalDateTime.of(2026, 7, 14, 13, 0).atZone(ZoneId.of("America/New_York")).toEpochSecond();
        assertEquals(expected, r.series().origin().firstEpochSecond(), 1e-9);
        LogImport none = read(clock("2026-07-14T13:00:00", "2026-07-14T13:00:10"), UnitSystem.IP, DateOrder.AUTO, null);
        assertFalse(none.series().origin().hasOffset());
        assertEquals("", none.report().timeZone());
        assertNull(none.report().dateOrder());
    }
}
