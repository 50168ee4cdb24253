package app.latentledger.core.text;

import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

/**
 * The one way the dew-point margin (the entering air's dew point minus the coil temperature) is put
 * in words, on the screen, in the report and on the command line. A signed difference such as
 * "−3.2" asks the reader to work out which side is which; a tech says which is colder and what
 * that means: "Coil is 3.2 ± 2.3 °F warmer than the return dew point — it cannot dry the air".
 *
 * <p>The consequence follows the physics of a cooling coil (ASHRAE Handbook—Fundamentals, ch. 1,
 * dew-point temperature; a surface below the air's dew point condenses water from it): a coil
 * colder than the dew point can dry the air, a warmer one cannot. When the margin is within its own
 * expanded uncertainty (k = 2) the words say it is too close to tell, the same rule the verdict uses.
 */
public final class MarginWords {
    /** Which side of the dew point the coil is on, as far as the uncertainty lets us say. */
    public enum Side { COLDER, WARMER, TOO_CLOSE }

    private static final Quantity Q = Quantity.TEMPERATURE_DIFFERENCE;

    private MarginWords() {
    }

    /**
     * @param marginK      entering dew point minus coil temperature, K (positive: coil colder)
     * @param uncertaintyK its expanded uncertainty (k = 2), K; NaN when not assessed
     */
    public static Side side(double marginK, double uncertaintyK) {
        if (Double.isFinite(uncertaintyK) && Math.abs(marginK) <= uncertaintyK) {
            return Side.TOO_CLOSE;
        }
        return marginK > 0 ? Side.COLDER : Side.WARMER;
    }

    /** The name of the figure: "Coil against the return dew point". */
    public static String label(String air) {
        return "Coil against the " + air + " dew point";
    }

    /** How far, with its ± and unit, and which way: "3.2 ± 2.3 °F warmer"; "—" when unknown. */
    public static String amount(UnitSystem units, double marginK, double uncertaintyK) {
        if (!Double.isFinite(marginK)) {
            return DisplayNumber.NONE;
        }
        return number(units, marginK, uncertaintyK) + " " + Q.symbol(units) + " " + direction(units, marginK);
    }

    /** As {@link #amount} without the unit (for a table whose unit has its own column): "3.2 ± 2.3". */
    public static String number(UnitSystem units, double marginK, double uncertaintyK) {
        if (!Double.isFinite(marginK)) {
            return DisplayNumber.NONE;
        }
        int d = DisplayNumber.decimals(Q, units);
        return DisplayNumber.valueWithSpread(Q, units, Math.abs(marginK), uncertaintyK, d);
    }

    /** "warmer", "colder", or "" when the shown number is zero. */
    public static String direction(UnitSystem units, double marginK) {
        if (isShownZero(units, marginK)) {
            return "";
        }
        return marginK > 0 ? "colder" : "warmer";
    }

    /** What the side means: "it can dry the air", "it cannot dry the air", or too close to tell. */
    public static String consequence(double marginK, double uncertaintyK) {
        return switch (side(marginK, uncertaintyK)) {
            case COLDER -> "it can dry the air";
            case WARMER -> "it cannot dry the air";
            case TOO_CLOSE -> "too close to tell whether it dries the air";
        };
    }

    /**
     * The whole sentence: "Coil is 3.2 ± 2.3 °F warmer than the return dew point — it cannot dry the air".
     *
     * @param air whose dew point: "return", or "entering" when outdoor air is mixed in
     */
    public static String sentence(UnitSystem units, double marginK, double uncertaintyK, String air) {
        if (!Double.isFinite(marginK)) {
            return "Coil against the " + air + " dew point: not known";
        }
        String where = isShownZero(units, marginK)
                ? "Coil is at the " + air + " dew point (± " + DisplayNumber.value(Q, units, uncertaintyK) + " "
                + Q.symbol(units) + ")"
                : "Coil is " + amount(units, marginK, uncertaintyK) + " than the " + air + " dew point";
        if (!Double.isFinite(uncertaintyK) && isShownZero(units, marginK)) {
            where = "Coil is at the " + air + " dew point";
        }
        return where + " — " + consequence(marginK, uncertaintyK);
    }

    private static boolean isShownZero(UnitSystem units, double marginK) {
        return DisplayNumber.value(Q, units, Math.abs(marginK)).equals(DisplayNumber.number(0, DisplayNumber.decimals(Q,
                units)));
    }
}
