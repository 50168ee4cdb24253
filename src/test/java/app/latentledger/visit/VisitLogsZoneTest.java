package app.latentledger.visit;

import app.latentledger.core.cycles.LogSeries;
import app.latentledger.core.cycles.TimeOrigin;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.io.logcsv.DateOrder;
import app.latentledger.store.Ledger;
import app.latentledger.store.TestLedgers;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

/**
 * A logger file whose clock times carry no UTC offset is read in the zone chosen, else the visit's
 * site's zone, else this machine's; the zone used is kept with the log, so reopening it shows the
 * same clock times at the same instants whatever the machine's zone is then. The machine's zone is
 * given through {@link VisitLogs.ReadOptions#machineZone()}, never by changing the JVM's default.
 */
class VisitLogsZoneTest {
    /** A machine far from the site: Tokyo keeps UTC+9 all year (no daylight saving). */
    private static final ZoneId MACHINE = ZoneId.of("Asia/Tokyo");
    /**
     * Mountain Daylight Time: Denver is UTC−6 in July (US daylight saving from the second Sunday of
     * March to the first Sunday of November, Energy Policy Act of 2005; from memory).
     */
    private static final ZoneOffset DENVER_JULY = ZoneOffset.ofHours(-6);

    @TempDir
    Path dir;
    Ledger ledger;
    Visit visit;
    Path file;
    /** The file's clock times, as written, and read as local date-times. */
    List<String> written;
    List<LocalDateTime> clock;

    @BeforeEach
    void setUp() throws Exception {
        ledger = TestLedgers.withOneVisit(dir.resolve("t.db"));
        visit = ledger.visits().find("v1").orElseThrow();
        // the committed field sample with its offsets taken off: local clock times, as many loggers write
        List<String> lines = Files.readAllLines(Path.of("field-data-samples/oversized-short-cycling.csv"));
        List<String> local = lines.stream().map(l -> l.replaceFirst("^(\\d{4}-\\d\\d-\\d\\dT\\d\\d:\\d\\d:\\d\\d)-04:00,", "$1,"))
                .toList();
        assertNotEquals(lines.get(1), local.get(1), "the offsets were taken off");
        file = dir.resolve("no-offset.csv");
        Files.write(file, local, StandardCharsets.UTF_8);
        written = local.stream().skip(1).map(l -> l.substring(0, l.indexOf(','))).toList();
        clock = written.stream().map(LocalDateTime::parse).toList();
    }

    @AfterEach
    void tearDown() {
        ledger.close();
    }

    private VisitLogs.ReadOptions options(ZoneId chosen) {
        return new VisitLogs.ReadOptions(UnitSystem.IP, Map.of(), DateOrder.AUTO, chosen, MACHINE);
    }

    private VisitLog importIt(ZoneId chosen) throws LogProblem {
        return VisitLogs.importAndKeep(ledger, visit, file, options(chosen), Double.NaN, Double.NaN,
                ThresholdSettings.DEFAULTS, null);
    }

    @Test
    void theSitesZoneIsUsedAndKeptAndReopeningShowsTheSameClockTimesAndInstants() throws Exception {
        ledger.sites().save(ledger.sites().find("s1").orElseThrow().withTimeZone("America/Denver"));
        VisitLogs.ClockZone z = VisitLogs.clockZone(ledger, visit, options(null));
        assertEquals(VisitLogs.ClockZone.From.SITE, z.from());
        assertEquals("the site's zone America/Denver", z.words("tablet"));

        VisitLog imported = importIt(null);
        ImportedLog kept = ledger.logs().find(imported.logId()).orElseThrow();
        assertEquals("America/Denver", kept.kept().timeZone(), "the zone used is kept with the log");
        assertEquals("America/Denver", imported.importReport().timeZone());

        // reopened on a machine in yet another zone: the kept zone, not the machine's, sets the clock
        VisitLog reopened = VisitLogs.analyseKept(ledger, kept, ThresholdSettings.DEFAULTS, UnitSystem.IP);
        for (LogSeries s : List.of(imported.series(), reopened.series())) {
            TimeOrigin o = s.origin();
            assertEquals(DENVER_JULY.getTotalSeconds(), o.offsetSeconds());
            for (int i : new int[] {0, s.size() / 2, s.size() - 1}) {
                long instant = Math.round(o.firstEpochSecond() + s.timeS(i));
                assertEquals(clock.get(i).toEpochSecond(DENVER_JULY), instant, "sample " + i + " instant");
                assertEquals(written.get(i) + "-06:00", o.label(s.timeS(i)), "sample " + i + " clock time");
            }
        }
    }

    @Test
    void withoutASiteZoneTheMachinesIsUsedAndAChosenZoneWinsOverTheSites() throws Exception {
        VisitLogs.ClockZone machine = VisitLogs.clockZone(ledger, visit, options(null));
        assertEquals("this tablet's zone Asia/Tokyo", machine.words("tablet"));
        VisitLog a = importIt(null);
        assertEquals("Asia/Tokyo", ledger.logs().find(a.logId()).orElseThrow().kept().timeZone());
        // Tokyo is UTC+9 all year (no daylight saving since 1951; from memory)
        assertEquals(clock.get(0).toEpochSecond(ZoneOffset.ofHours(9)), Math.round(a.series().origin().firstEpochSecond()));

        Site denver = ledger.sites().find("s1").orElseThrow().withTimeZone("America/Denver");
        ledger.sites().save(denver);
        ZoneId chicago = ZoneId.of("America/Chicago");
        assertEquals(VisitLogs.ClockZone.From.CHOSEN, VisitLogs.clockZone(ledger, visit, options(chicago)).from());
        VisitLog b = importIt(chicago);
        assertEquals("America/Chicago", ledger.logs().find(b.logId()).orElseThrow().kept().timeZone());
        // Central Daylight Time, UTC−5 in July (US daylight saving; from memory)
        assertEquals(clock.get(0).toEpochSecond(ZoneOffset.ofHours(-5)), Math.round(b.series().origin().firstEpochSecond()));
    }
}
