package app.latentledger.ui.session;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.psychro.StandardAtmosphere;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.ReadingSetCheck;
import app.latentledger.ui.present.ResultSheet;
import app.latentledger.ui.present.VisitResults;

import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The draft in hand, worked out: the reading set it makes and its coil check, or what it still
 * waits for, or why it was refused. {@link AppSession} works it out once per change of draft,
 * system or settings and every screen reads the same one, so the results, the readings banner and
 * the compare screen can never disagree and one keypad Enter runs one coil check.
 *
 * @param draft      the draft it was worked out from
 * @param units      the units its refusal is worded in (the settings' units when it was worked out)
 * @param readings   the reading set the draft makes, or null while it is not complete
 * @param coil       the coil check, or null while waiting or refused
 * @param pressurePa the site pressure the draft is worked out at, Pa (measured, else the standard
 *                   atmosphere at the site's elevation)
 * @param waitingFor what the coil check still needs, as a tech names it; empty when it could run
 * @param refusedBy  why the readings were refused, or null
 */
public record CurrentCheck(Draft draft, UnitSystem units, ReadingSet readings, CoilResult coil, double pressurePa,
                           List<String> waitingFor, RuntimeException refusedBy) {
    public CurrentCheck {
        waitingFor = List.copyOf(waitingFor);
    }

    /** Nothing to work out yet (no visit open). */
    static CurrentCheck nothing(UnitSystem units) {
        return new CurrentCheck(null, units, null, null, Double.NaN, List.of(), null);
    }

    /**
     * Works the draft out: its reading set (when complete) and, when nothing the coil check needs is
     * missing, the check itself, run exactly once through {@code checker}.
     *
     * The session calls this once per change; screens read the session's result instead.
     *
     * @param now when the reading set is taken if the draft has no time yet
     */
    public static CurrentCheck of(Draft draft, Site site, HvacSystem system, ThresholdSettings thresholds,
                           UnitSystem units, CoilChecker checker, OffsetDateTime now) {
        double pressurePa = pressurePa(draft, site);
        List<String> waiting = waitingFor(draft);
        ReadingSet rs = null;
        try {
            rs = DraftRecords.toReadingSet(draft, now);
            if (waiting.isEmpty() && rs != null) {
                waiting = ReadingSetCheck.missing(rs);
            }
            CoilResult coil = waiting.isEmpty() && rs != null
                    ? checker.check(rs, system, site, thresholds, units) : null;
            return new CurrentCheck(draft, units, rs, coil, pressurePa, waiting, null);
        } catch (InvalidInputException | InvalidRecordException e) {
            return new CurrentCheck(draft, units, rs, null, pressurePa, waiting, e);
        }
    }

    /** True when the coil check ran and gave a result. */
    public boolean checked() {
        return coil != null;
    }

    /** True when the record or the coil check refused the readings. */
    public boolean refused() {
        return refusedBy != null;
    }

    /** Why the readings were refused, in {@link #units}: field, value and accepted range; "" when not. */
    public String refusal() {
        if (refusedBy instanceof InvalidInputException e) {
            return e.message(Slot.unitsFor(e.quantity(), units)); // the catch is typed in mL
        }
        return refusedBy == null ? "" : refusedBy.getMessage();
    }

    /**
     * The check worded for the results screen and the readings banner: the results when it ran,
     * else what it waits for, else why the readings were refused.
     */
    public ResultSheet sheet() {
        if (checked()) {
            return VisitResults.of(coil, units);
        }
        return refused() && waitingFor.isEmpty() ? VisitResults.refused(refusal()) : VisitResults.waiting(waitingFor);
    }

    /** What the coil check still needs, as a tech names it; empty when it can run. */
    public static List<String> waitingFor(Draft d) {
        List<String> out = new ArrayList<>();
        for (Slot s : List.of(Slot.RETURN_DRY_BULB, Slot.RETURN_HUMIDITY, Slot.SUPPLY_DRY_BULB,
                Slot.SUPPLY_HUMIDITY, Slot.AIRFLOW)) {
            if (!d.has(s)) {
                out.add(s.title(d.choice(s)).toLowerCase(Locale.ROOT).replace("rh", "RH"));
            }
        }
        return out;
    }

    /** The site pressure the draft is worked out at (measured, else the standard atmosphere). */
    public static double pressurePa(Draft d, Site site) {
        ReadingSet b = d.base();
        return b != null ? ReadingSetCheck.pressurePa(b, site) : StandardAtmosphere.pressurePa(site.elevationM());
    }
}
