package app.latentledger.ui.session;

import app.latentledger.core.measure.AirflowBasis;
import app.latentledger.core.records.ReadingSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The draft file keeps what the pad's switches and the tolerance rule need after a kill: the airflow
 * basis, the same-instrument switch, the probe offset and which tolerances the tech typed; and a
 * draft made from a stored set carries the set's basis and probes and freezes its tolerances.
 */
class DraftSwitchesStoreTest {
    @TempDir
    Path dir;

    private static Draft complete() {
        return Draft.empty("set-1", "visit-1")
                .with(Slot.RETURN_DRY_BULB, new SlotValue(24, 0.3))
                .with(Slot.RETURN_HUMIDITY, new SlotValue(17, 0.3))
                .with(Slot.SUPPLY_DRY_BULB, new SlotValue(13, 0.3))
                .withTypedTolerance(Slot.SUPPLY_HUMIDITY, new SlotValue(12, 0.15))
                .with(Slot.AIRFLOW, new SlotValue(0.5, 0.07))
                .with(Slot.SUPPLY_DEW_POINT_OFFSET, new SlotValue(-0.4, 0))
                .withAirflowBasis(AirflowBasis.STANDARD)
                .withSameProbe(true);
    }

    @Test
    void theFileKeepsBasisProbeOffsetAndTypedTolerances() {
        FileDraftStore store = new FileDraftStore(dir);
        store.save(complete());
        Draft back = store.find("set-1").orElseThrow();
        assertEquals(AirflowBasis.STANDARD, back.airflowBasis());
        assertTrue(back.sameProbe());
        assertEquals(-0.4, back.value(Slot.SUPPLY_DEW_POINT_OFFSET).valueSi(), 0);
        assertEquals(Set.of(Slot.SUPPLY_HUMIDITY), back.typedTolerances());
        assertEquals(complete().values(), back.values());
    }

    @Test
    void aStoredSetOpensWithItsBasisAndProbesAndKeepsItsTolerances() {
        ReadingSet rs = DraftRecords.toReadingSet(complete(), OffsetDateTime.parse("2026-07-01T10:00:00Z"));
        assertEquals(AirflowBasis.STANDARD, rs.airflow().basis());
        assertTrue(rs.probes().sameInstrument());
        assertEquals(-0.4, rs.probes().supplyDewPointOffsetK(), 0);
        Draft opened = DraftRecords.fromReadingSet(rs);
        assertEquals(AirflowBasis.STANDARD, opened.airflowBasis());
        assertTrue(opened.sameProbe());
        assertEquals(-0.4, opened.value(Slot.SUPPLY_DEW_POINT_OFFSET).valueSi(), 1e-12);
        assertTrue(opened.toleranceTyped(Slot.RETURN_DRY_BULB), "opening a stored set never changes its tolerances");
        assertEquals(rs, DraftRecords.toReadingSet(opened, OffsetDateTime.now()), "the round trip is exact");
    }

    @Test
    void switchingAHumidityKindDropsItsTypedTolerance() {
        Draft d = complete().withChoice(Slot.SUPPLY_HUMIDITY, "rh");
        assertFalse(d.has(Slot.SUPPLY_HUMIDITY));
        assertFalse(d.toleranceTyped(Slot.SUPPLY_HUMIDITY));
    }
}
