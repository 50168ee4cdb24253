package app.latentledger.ui.session;

import app.latentledger.core.records.Airflow;
import app.latentledger.core.measure.AirflowBasis;
import app.latentledger.core.measure.AirflowPoint;
import app.latentledger.core.records.CoilTemperature;
import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.measure.ProbeMatch;
import app.latentledger.core.records.Condensate;
import app.latentledger.core.records.HumidityReading;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;

import java.time.OffsetDateTime;
import java.util.EnumMap;
import java.util.Map;

/**
 * A draft as a field record and back. The record is what the commands, the bundle and the report
 * read; the draft only adds the boxes that cannot make a record yet (an outdoor humidity without
 * its dry bulb, a catch without its time).
 */
public final class DraftRecords {
    private DraftRecords() {
    }

    /** True when the four readings a reading set cannot lack are in. */
    public static boolean complete(Draft d) {
        return d.has(Slot.RETURN_DRY_BULB) && d.has(Slot.RETURN_HUMIDITY)
                && d.has(Slot.SUPPLY_DRY_BULB) && d.has(Slot.SUPPLY_HUMIDITY);
    }

    /**
     * The reading set this draft makes, or null while it is not {@link #complete}.
     *
     * @param now when it is taken if the draft has no time yet
     * @throws app.latentledger.core.InvalidInputException  when a value is out of the record's range
     * @throws app.latentledger.core.records.InvalidRecordException when the record refuses it
     */
    public static ReadingSet toReadingSet(Draft d, OffsetDateTime now) {
        if (!complete(d)) {
            return null;
        }
        ReadingSet b = d.base();
        Measurement outdoorDb = m(d, Slot.OUTDOOR_DRY_BULB);
        HumidityReading outdoorHum = outdoorDb == null ? null : humidity(d, Slot.OUTDOOR_HUMIDITY);
        CoilTemperature coil = d.has(Slot.COIL_TEMPERATURE) ? new CoilTemperature(
                CoilTemperatureKind.parse("coil temperature kind", d.choice(Slot.COIL_TEMPERATURE)),
                m(d, Slot.COIL_TEMPERATURE)) : null;
        Airflow airflow = null;
        if (d.has(Slot.AIRFLOW)) {
            SlotValue a = d.value(Slot.AIRFLOW);
            airflow = new Airflow(new Measurement(a.valueSi(), a.valueSi() * a.toleranceSi()),
                    AirflowPoint.parse("airflow point", d.choice(Slot.AIRFLOW)),
                    b == null || b.airflow() == null ? "" : b.airflow().method(),
                    d.airflowBasis());
        }
        Condensate condensate = d.has(Slot.CONDENSATE_VOLUME) && d.has(Slot.CONDENSATE_MINUTES)
                ? new Condensate(m(d, Slot.CONDENSATE_VOLUME), m(d, Slot.CONDENSATE_MINUTES)) : null;
        OffsetDateTime taken = d.takenAt() != null ? d.takenAt() : now;
        return new ReadingSet(d.readingSetId(), d.visitId(), taken, b == null ? "" : b.label(),
                b == null ? "" : b.instrument(),
                m(d, Slot.RETURN_DRY_BULB), humidity(d, Slot.RETURN_HUMIDITY),
                m(d, Slot.SUPPLY_DRY_BULB), humidity(d, Slot.SUPPLY_HUMIDITY),
                outdoorDb, outdoorHum, coil, airflow, b == null ? null : b.stationPressurePa(), condensate,
                b == null ? "" : b.notes(), probes(d));
    }

    /**
     * How the two humidity probes relate in this draft: the "same instrument" switch and the typed
     * supply dew-point offset (none typed: no offset).
     *
     * @throws app.latentledger.core.InvalidInputException when the offset is out of its range
     */
    public static ProbeMatch probes(Draft d) {
        SlotValue offset = d.value(Slot.SUPPLY_DEW_POINT_OFFSET);
        return new ProbeMatch(d.sameProbe(), offset == null ? 0 : offset.valueSi());
    }

    /** The draft a stored reading set opens as. */
    public static Draft fromReadingSet(ReadingSet rs) {
        Map<Slot, SlotValue> v = new EnumMap<>(Slot.class);
        Map<Slot, String> c = new EnumMap<>(Slot.class);
        put(v, Slot.RETURN_DRY_BULB, rs.returnDryBulb());
        humidity(v, c, Slot.RETURN_HUMIDITY, rs.returnHumidity());
        put(v, Slot.SUPPLY_DRY_BULB, rs.supplyDryBulb());
        humidity(v, c, Slot.SUPPLY_HUMIDITY, rs.supplyHumidity());
        put(v, Slot.OUTDOOR_DRY_BULB, rs.outdoorDryBulb());
        humidity(v, c, Slot.OUTDOOR_HUMIDITY, rs.outdoorHumidity());
        if (rs.coilTemperature() != null) {
            put(v, Slot.COIL_TEMPERATURE, rs.coilTemperature().value());
            c.put(Slot.COIL_TEMPERATURE, rs.coilTemperature().kind().key());
        }
        if (rs.airflow() != null) {
            Measurement a = rs.airflow().volume();
            v.put(Slot.AIRFLOW, new SlotValue(a.valueSi(), a.valueSi() == 0 ? 0 : a.toleranceSi() / a.valueSi()));
            c.put(Slot.AIRFLOW, rs.airflow().point().key());
        }
        if (rs.condensate() != null) {
            put(v, Slot.CONDENSATE_VOLUME, rs.condensate().volume());
            put(v, Slot.CONDENSATE_MINUTES, rs.condensate().seconds());
        }
        if (rs.probes().hasOffset()) {
            v.put(Slot.SUPPLY_DEW_POINT_OFFSET, new SlotValue(rs.probes().supplyDewPointOffsetK(), 0));
        }
        // a stored set keeps the tolerances it was saved with: opening it never changes a record
        return new Draft(rs.id(), rs.visitId(), v, c, rs, rs.takenAt(),
                rs.airflow() == null ? AirflowBasis.ACTUAL : rs.airflow().basis(), rs.probes().sameInstrument(),
                v.keySet());
    }

    private static Measurement m(Draft d, Slot s) {
        SlotValue v = d.value(s);
        return v == null ? null : new Measurement(v.valueSi(), v.toleranceSi());
    }

    private static HumidityReading humidity(Draft d, Slot s) {
        SlotValue v = d.value(s);
        return v == null ? null : new HumidityReading(Slot.humidityKind(d.choice(s)), m(d, s));
    }

    private static void put(Map<Slot, SlotValue> v, Slot s, Measurement m) {
        if (m != null) {
            v.put(s, new SlotValue(m.valueSi(), m.toleranceSi()));
        }
    }

    private static void humidity(Map<Slot, SlotValue> v, Map<Slot, String> c, Slot s, HumidityReading h) {
        if (h != null) {
            put(v, s, h.value());
            c.put(s, h.kind().key());
        }
    }
}
