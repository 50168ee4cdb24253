package app.latentledger.report;

import app.latentledger.core.coil.Estimate;
import app.latentledger.core.house.HouseBudget;
import app.latentledger.core.house.ScenarioResult;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

/** The house budget said in sentences a homeowner reads, figures in pints (litres) per day. */
final class PlainHouseWords {
    private PlainHouseWords() {
    }

    static String summary(HouseBudget b, UnitSystem units) {
        ScenarioResult s = b.asFound();
        String[] names = {"air leaking in from outdoors", "mechanical ventilation", "people, cooking and bathing",
                "a leaking return duct"};
        Estimate[] terms = {s.infiltration(), s.ventilation(), s.internal(), s.returnLeak()};
        int largest = 0;
        for (int i = 1; i < terms.length; i++) {
            if (terms[i].valueSi() > terms[largest].valueSi()) {
                largest = i;
            }
        }
        StringBuilder w = new StringBuilder();
        w.append("On a day like this visit's, the house takes in about ").append(pints(s.gains(), units))
                .append(" of water, the largest part from ").append(names[largest]).append(" (")
                .append(pints(terms[largest], units)).append("). The air conditioner removes about ")
                .append(pints(s.removal(), units)).append(" at ")
                .append(DisplayNumber.number(100 * s.runtimeFraction().valueSi(), 0)).append(" % runtime. ");
        if (s.hasEquilibrium()) {
            boolean above = s.equilibriumRhPct().valueSi() > b.inputs().rhTargetPct();
            w.append("Left as it is, the indoor air settles where the two balance: a dew point of ")
                    .append(Numbers.estimate(Quantity.TEMPERATURE, units, s.equilibriumDewPointC())).append(", ")
                    .append(DisplayNumber.number(s.equilibriumRhPct().valueSi(), 0)).append(" % relative humidity — ")
                    .append(above ? "above" : "within").append(" the ")
                    .append(DisplayNumber.number(b.inputs().rhTargetPct(), 0)).append(" % target.");
        } else {
            w.append("The system cannot keep up: the indoor humidity keeps rising on days like this.");
        }
        return w.toString();
    }

    static String leak(ScenarioResult s) {
        if (!s.leakFraction().exists()) {
            return "Return-duct leak: not checked (needs readings at the return grille, the return plenum and the"
                    + " attic or crawlspace air around the duct).";
        }
        return "Return-duct leak: about " + DisplayNumber.number(100 * s.leakFraction().valueSi(), 0) + " ± "
                + DisplayNumber.number(100 * s.leakFraction().expandedSi(), 0) + " % of the air reaching the system comes"
                + " from the attic or crawlspace (from the water content at the grille, in the return plenum and"
                + " around the duct).";
    }

    static String dehumidifier(HouseBudget b, UnitSystem units) {
        var d = b.dehumidifier();
        if (!(d.needed() > 0)) {
            return "A supplemental dehumidifier is not needed to hold the humidity target on a day like this.";
        }
        Quantity q = Quantity.WATER_RATE_DAILY;
        return "To hold the target without other changes a dehumidifier would remove "
                + DisplayNumber.withUnit(q, units, d.needed()) + " at the house's condition; shop by rating: "
                + DisplayNumber.withUnit(q, units, d.portable65F()) + " for a portable unit (US DOE, 65 °F / 60 %), "
                + DisplayNumber.withUnit(q, units, d.wholeHome73F()) + " for a whole-home unit (73 °F / 60 %), or "
                + DisplayNumber.withUnit(q, units, d.rated80F()) + " on the older 80 °F / 60 % rating"
                + (d.extrapolated() ? " (the conversion is an extrapolation at this indoor temperature)" : "") + ".";
    }

    private static String pints(Estimate e, UnitSystem units) {
        return Numbers.estimate(Quantity.WATER_RATE_DAILY, units, e);
    }
}
