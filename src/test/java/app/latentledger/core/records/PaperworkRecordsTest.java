package app.latentledger.core.records;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.settings.InstrumentTolerances;
import org.junit.jupiter.api.Test;

import java.time.OffsetDateTime;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The paperwork records: labels, instruments and their stated accuracy, sign-offs, deletions. */
class PaperworkRecordsTest {
    @Test
    void setLabelsAreTheThreeWords() {
        assertEquals(SetLabel.BEFORE, SetLabel.parse("label", " Before "));
        assertEquals("after", SetLabel.AFTER.key());
        InvalidRecordException e = assertThrows(InvalidRecordException.class, () -> SetLabel.parse("label", "during"));
        assertTrue(e.getMessage().contains("before, after, other"), e.getMessage());
    }

    @Test
    void statedAccuracyFillsOnlyWhatItStates() {
        InstrumentTolerances base = InstrumentTolerances.DEFAULTS;
        StatedAccuracy probe = new StatedAccuracy(0.2, 1.5, null, null, null, null);
        InstrumentTolerances t = probe.over(base);
        assertEquals(0.2, t.dryBulbK());
        assertEquals(1.5, t.relativeHumidityPct());
        assertEquals(base.wetBulbK(), t.wetBulbK());
        assertEquals(base.airflowFraction(), t.airflowFraction());
        assertEquals(base.condensateFraction(), t.condensateFraction());
        assertEquals(base, StatedAccuracy.NONE.over(base));
    }

    @Test
    void twoInstrumentsStatingTheSameQuantityGiveTheWider() {
        Instrument a = new Instrument("a", "v", "Probe A", "", null, new StatedAccuracy(0.2, 2.0, null, null, null, null));
        Instrument b = new Instrument("b", "v", "Probe B", "", null, new StatedAccuracy(0.4, null, null, null, 0.3, 0.05));
        StatedAccuracy both = Instrument.accuracyOf(List.of(a, b));
        assertEquals(0.4, both.dryBulbK());
        assertEquals(2.0, both.relativeHumidityPct());
        assertEquals(0.3, both.coilK());
        assertEquals(0.05, both.airflowFraction());
        assertNull(both.wetBulbK());
        assertEquals(StatedAccuracy.NONE, Instrument.accuracyOf(List.of()));
    }

    @Test
    void impossibleAccuraciesAreRefusedWithTheirRange() {
        assertThrows(InvalidInputException.class, () -> new StatedAccuracy(0.0, null, null, null, null, null));
        assertThrows(InvalidInputException.class, () -> new StatedAccuracy(null, 60.0, null, null, null, null));
        assertThrows(InvalidInputException.class, () -> new StatedAccuracy(null, null, null, null, null, 0.9));
        assertThrows(InvalidRecordException.class, () -> new Instrument("i", "v", " ", "", null, null));
    }

    @Test
    void paperworkKeepsWhatIsNotChanged() {
        OffsetDateTime at = OffsetDateTime.parse("2026-07-16T10:05:07.5-04:00");
        VisitPaperwork w = VisitPaperwork.blank("v").withNotes("Sticky", "").withTechnician(new SignOff("R T", at, null));
        assertEquals("Sticky", w.withCustomer(new SignOff("A M", at, "ok")).customerWords());
        assertEquals(7, w.technician().signedAt().getSecond());
        assertEquals(0, w.technician().signedAt().getNano(), "kept to the second");
        assertTrue(VisitPaperwork.blank("v").isBlank());
        assertThrows(InvalidRecordException.class, () -> new SignOff("", at, ""));
    }

    @Test
    void recordKindsReadTheCommandLineWords() {
        assertEquals(RecordKind.READINGS, RecordKind.parse("KIND", "reading-set"));
        assertEquals(RecordKind.SITE, RecordKind.parse("KIND", "sites"));
        assertThrows(InvalidRecordException.class, () -> RecordKind.parse("KIND", "instrument"));
    }
}
