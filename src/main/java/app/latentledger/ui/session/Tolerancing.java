package app.latentledger.ui.session;

import app.latentledger.core.coil.Tolerances;
import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.records.Instrument;
import app.latentledger.core.settings.InstrumentTolerances;

import java.util.List;
import java.util.Map;

/**
 * The one rule for the ± a reading on the pad gets when the tech types none: the stated accuracy
 * of the instruments ticked for the set, part by part, over the tech's instrument settings (which
 * start from the one default table, {@link Tolerances}). A box whose ± the tech typed keeps it.
 * What the rule gives is stored with the reading, so the pad, the results and the report all show
 * the same tolerance, and the {@code coil} and {@code readings add} commands give the same one for
 * the same instruments and readings.
 */
public final class Tolerancing {
    private Tolerancing() {
    }

    /**
     * The tolerances of a set taken with {@code used}: each part an instrument states (the wider
     * when two state it), else the settings' ({@link Instrument#accuracyOf}).
     */
    public static InstrumentTolerances forSet(InstrumentTolerances settings, List<Instrument> used) {
        return Instrument.accuracyOf(used).over(settings);
    }

    /**
     * The ± a value {@code valueSi} typed in {@code slot} (with its {@code choice}) gets under
     * {@code t}, SI as the box keeps it (airflow as a fraction of reading, condensate in m³ and s).
     */
    public static double of(InstrumentTolerances t, Slot slot, String choice, double valueSi) {
        if (slot.isHumidity()) {
            HumidityKind kind = HumidityKind.parse("humidity kind", choice == null ? slot.defaultChoice() : choice);
            return t.humidity(kind, valueSi);
        }
        return switch (slot) {
            case RETURN_DRY_BULB, SUPPLY_DRY_BULB, OUTDOOR_DRY_BULB -> t.dryBulbK();
            case COIL_TEMPERATURE -> t.coil(CoilTemperatureKind.parse("coil temperature kind",
                    choice == null ? slot.defaultChoice() : choice));
            case AIRFLOW -> t.airflowFraction();
            // as the coil command takes a catch: a share of the volume, and the stopwatch's ± up to half the time
            case CONDENSATE_VOLUME -> t.condensateFraction() * Math.abs(valueSi);
            case CONDENSATE_MINUTES -> Math.min(Tolerances.CONDENSATE_TIMING_S, Math.abs(valueSi) / 2);
            case NOMINAL_TONS, SUPPLY_DEW_POINT_OFFSET -> 0;
            default -> throw new IllegalStateException(slot.name());
        };
    }

    /**
     * {@code d} with every box whose ± the tech did not type given the rule's ± under {@code t};
     * the same draft when nothing changes.
     */
    public static Draft apply(Draft d, InstrumentTolerances t) {
        Draft out = d;
        for (Map.Entry<Slot, SlotValue> e : d.values().entrySet()) {
            Slot s = e.getKey();
            if (!s.hasTolerance() || d.toleranceTyped(s)) {
                continue;
            }
            double tol = of(t, s, d.choice(s), e.getValue().valueSi());
            if (tol != e.getValue().toleranceSi()) {
                out = out.with(s, new SlotValue(e.getValue().valueSi(), tol));
            }
        }
        return out;
    }
}
