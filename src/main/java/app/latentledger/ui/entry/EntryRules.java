package app.latentledger.ui.entry;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.coil.AirReading;
import app.latentledger.core.coil.CoilReadings;
import app.latentledger.core.measure.FieldLimits;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.InputLimits;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.units.Quantity;
import app.latentledger.ui.session.CurrentCheck;
import app.latentledger.ui.session.Draft;
import app.latentledger.ui.session.Slot;
import app.latentledger.ui.session.SlotValue;


/**
 * Whether a value may go into a box. Nothing here is new physics or a new limit: each check is a
 * limit the core or the field record already enforces, asked as soon as the value is typed, so the
 * tech hears "why not" at the box instead of at the end.
 */
public final class EntryRules {
    private EntryRules() {
    }

    /**
     * Refuses {@code candidate} (the draft with the new value in {@code slot}) when the value is out
     * of its box's range or makes its air stream impossible (a wet bulb above the dry bulb). Whether
     * the whole set makes a record and a coil check is the session's question, asked once when it
     * keeps the candidate ({@code AppSession.keep}).
     *
     * @throws app.latentledger.core.InvalidInputException naming field, value and accepted range
     */
    public static void check(Draft candidate, Slot slot, Site site) {
        checkRange(candidate, slot);
        conflict(candidate, site).ifPresent(c -> {
            throw c.why();
        });
    }

    /**
     * Refuses the value in {@code slot} when it is outside its box's own range, whatever the other
     * boxes hold.
     *
     * @throws app.latentledger.core.InvalidInputException naming field, value and accepted range
     */
    public static void checkRange(Draft candidate, Slot slot) {
        String choice = candidate.choice(slot);
        String field = slot.title(choice).toLowerCase(java.util.Locale.ROOT).replace("rh", "RH");
        range(field, slot, choice, candidate.value(slot));
    }

    /**
     * Two boxes of one air stream that cannot both be right (a wet bulb or dew point above its dry
     * bulb): each value alone is in range, the pair is not a state of moist air.
     *
     * @param dryBulb  the stream's dry-bulb box
     * @param humidity the stream's humidity box
     * @param why      the core's refusal of the pair
     */
    public record Conflict(Slot dryBulb, Slot humidity, InvalidInputException why) {
    }

    /** The first air stream of {@code candidate} whose two boxes disagree, if any. */
    public static java.util.Optional<Conflict> conflict(Draft candidate, Site site) {
        double pressurePa = CurrentCheck.pressurePa(candidate, site);
        for (Slot hum : java.util.List.of(Slot.RETURN_HUMIDITY, Slot.SUPPLY_HUMIDITY, Slot.OUTDOOR_HUMIDITY)) {
            try {
                stream(candidate, hum.dryBulb(), hum, hum.where().toLowerCase(java.util.Locale.ROOT), pressurePa);
            } catch (InvalidInputException e) {
                return java.util.Optional.of(new Conflict(hum.dryBulb(), hum, e));
            }
        }
        return java.util.Optional.empty();
    }

    /** Refuses a nameplate size outside what a system record and the coil check accept. */
    public static void checkNominal(double capacityW) {
        FieldLimits.NOMINAL_CAPACITY.check("nominal size", capacityW);
    }

    private static void range(String field, Slot slot, String choice, SlotValue v) {
        Quantity q = slot.quantity(choice);
        Quantity tq = slot.toleranceQuantity(choice);
        switch (slot) {
            case COIL_TEMPERATURE -> {
                FieldLimits.COIL_TEMPERATURE.check(field, v.valueSi());
                FieldLimits.TEMPERATURE_TOLERANCE.check(field + " tolerance", v.toleranceSi());
            }
            case AIRFLOW -> {
                FieldLimits.AIRFLOW.check(field, v.valueSi());
                FieldLimits.AIRFLOW_TOLERANCE.check(field + " tolerance", v.toleranceSi());
            }
            case CONDENSATE_VOLUME -> {
                FieldLimits.CONDENSATE_VOLUME.check(field, v.valueSi());
                InputLimits.check(field + " tolerance", tq, v.toleranceSi(), 0,
                        v.valueSi() * FieldLimits.CONDENSATE_VOLUME_TOLERANCE.maxSi(), null);
            }
            case CONDENSATE_MINUTES -> {
                FieldLimits.COLLECTION_TIME.check(v.valueSi());
                InputLimits.check("condensate collection time tolerance", tq, v.toleranceSi(), 0,
                        v.valueSi() / 2, null);
            }
            case NOMINAL_TONS -> checkNominal(v.valueSi());
            case SUPPLY_DEW_POINT_OFFSET -> FieldLimits.SUPPLY_DEW_POINT_OFFSET.check(field, v.valueSi());
            default -> {
                if (q == Quantity.RELATIVE_HUMIDITY) {
                    FieldLimits.RELATIVE_HUMIDITY.check(field, v.valueSi());
                    FieldLimits.RELATIVE_HUMIDITY_TOLERANCE.check(field + " tolerance", v.toleranceSi());
                } else {
                    FieldLimits.AIR_TEMPERATURE.check(field, v.valueSi());
                    FieldLimits.TEMPERATURE_TOLERANCE.check(field + " tolerance", v.toleranceSi());
                }
            }
        }
    }

    private static void stream(Draft d, Slot dry, Slot hum, String where, double pressurePa) {
        SlotValue db = d.value(dry);
        SlotValue h = d.value(hum);
        if (db == null || h == null) {
            return;
        }
        HumidityKind kind = HumidityKind.parse("humidity kind", d.choice(hum));
        new AirReading(where, db.valueSi(), db.toleranceSi(), kind, h.valueSi(), h.toleranceSi())
                .state(pressurePa, HandbookEdition.SI);
    }
}
