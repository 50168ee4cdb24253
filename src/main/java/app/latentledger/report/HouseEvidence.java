package app.latentledger.report;

import app.latentledger.core.coil.AirReading;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.house.HouseFacts;
import app.latentledger.core.house.HouseInputs;
import app.latentledger.core.house.HouseVisitReadings;
import app.latentledger.core.house.SystemRemoval;
import app.latentledger.store.Ledger;

import java.util.List;
import java.util.Optional;

/**
 * A visit's house budget inputs from what is stored: the site's house facts, the visit's house
 * readings, the coil check of the visit's latest reading set labelled "after" (else its latest
 * checked set), and the runtime from the visit's first analysed log (else the typed runtime
 * fraction). The house air is the return grille reading when there is one, else the coil check's
 * return reading.
 *
 * @param inputs  the budget's inputs, or null when something is missing
 * @param refusal what is missing, in plain words, or "" with inputs
 * @param readingSetName which reading set the coil figures come from
 */
public record HouseEvidence(HouseInputs inputs, String refusal, String readingSetName) {

    public boolean ready() {
        return inputs != null;
    }

    /** From the ledger and the visit's evidence (coil checks and analysed logs). */
    public static HouseEvidence of(Ledger ledger, VisitEvidence ev, ThresholdSettings thresholds,
                                   double typedRuntimeFraction) {
        Optional<HouseFacts> facts = ledger.houses().facts(ev.site().id());
        HouseVisitReadings hr = ledger.houses().readings(ev.visit().id());
        return of(facts.orElse(null), hr, ev, thresholds, typedRuntimeFraction);
    }

    /** From stored facts and readings and the visit's evidence; a typed runtime fraction (or NaN) wins. */
    public static HouseEvidence of(HouseFacts facts, HouseVisitReadings hr, VisitEvidence ev,
                                   ThresholdSettings thresholds, double typedRuntimeFraction) {
        if (facts == null) {
            return refused("no house facts stored for this site (floor area, ceiling height, bedrooms …)");
        }
        if (hr.outdoor() == null) {
            return refused("no outdoor reading stored for this visit");
        }
        CheckedReadings pick = pick(ev.checkedReadings());
        if (pick == null || !pick.result().adp().found()) {
            return refused("no complete reading set with a coil process line (apparatus dew point) on this visit");
        }
        CoilResult coil = pick.result();
        AnalysedLog log = ev.firstAnalysedLog();
        SystemRemoval system;
        try {
            if (Double.isFinite(typedRuntimeFraction)) {
                system = SystemRemoval.typed(coil, typedRuntimeFraction);
            } else if (log != null && log.report().runtimeFraction() > 0) {
                system = SystemRemoval.logged(coil, log.report());
            } else if (Double.isFinite(hr.runtimeFraction())) {
                system = SystemRemoval.typed(coil, hr.runtimeFraction());
            } else {
                return refused("no runtime: keep a log on this visit or type the compressor runtime fraction");
            }
            // the house air: the return grille when the leak check has it (the coil's return reading may
            // be taken in the plenum, after the leak), else the coil's return reading
            AirReading ret = hr.grille() != null ? hr.grille() : coil.readings().entering();
            AirReading indoor = new AirReading("indoor", ret.dryBulbC(), ret.dryBulbTolK(), ret.humidityKind(),
                    ret.humiditySi(), ret.humidityTolSi());
            return new HouseEvidence(new HouseInputs(facts, hr.forBudget(indoor), system,
                    coil.readings().pressurePa(), thresholds), "", pick.name());
        } catch (IllegalArgumentException e) { // InvalidInputException included
            return refused(e.getMessage());
        }
    }

    private static CheckedReadings pick(List<CheckedReadings> checked) {
        CheckedReadings last = null;
        CheckedReadings after = null;
        for (CheckedReadings c : checked) {
            last = c;
            if ("after".equalsIgnoreCase(c.set().label())) {
                after = c;
            }
        }
        return after != null ? after : last;
    }

    private static HouseEvidence refused(String why) {
        return new HouseEvidence(null, why, "");
    }
}
