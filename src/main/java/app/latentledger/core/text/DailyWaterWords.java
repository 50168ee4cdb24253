package app.latentledger.core.text;

import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

/**
 * The one way the air-side moisture removal is put as water per day, on the screen, in the report
 * and on the command line. A rate per day reads like a dehumidifier's rating unless it says that it
 * assumes a whole day of running, so every such figure carries "if it ran all day". A coil whose air
 * leaves wetter than it came (water re-evaporating from a wet coil, or a probe error) does not
 * remove a negative amount: the words say it adds water to the air, and the number is positive.
 * The conversion to volume is {@link Quantity#WATER_RATE_DAILY}'s (water at 1 kg/L).
 */
public final class DailyWaterWords {
    private static final Quantity Q = Quantity.WATER_RATE_DAILY;

    private DailyWaterWords() {
    }

    /** True when the air leaves wetter by at least what the figure shows at {@code decimals}. */
    public static boolean addsWater(double removalKgPerS, UnitSystem units, int decimals) {
        double perDay = Q.toDisplay(units, removalKgPerS);
        return perDay < 0 && !DisplayNumber.number(-perDay, decimals).equals(DisplayNumber.number(0, decimals));
    }

    /** A row's name: "Water removed if it ran all day" or "Water added to the air if it ran all day". */
    public static String label(double removalKgPerS, UnitSystem units) {
        return addsWater(removalKgPerS, units, DisplayNumber.decimals(Q, units))
                ? "Water added to the air if it ran all day" : "Water removed if it ran all day";
    }

    /** The figure without a sign, at the quantity's decimals, no unit: "2.1". */
    public static String number(double removalKgPerS, UnitSystem units) {
        return DisplayNumber.number(Math.abs(Q.toDisplay(units, removalKgPerS)), DisplayNumber.decimals(Q, units));
    }

    /** "317.3 pints/day if it ran all day" or "96.0 pints/day added to the air if it ran all day". */
    public static String phrase(double removalKgPerS, UnitSystem units) {
        return number(removalKgPerS, units) + " " + unitAndWords(removalKgPerS, units);
    }

    /** What follows the number: "pints/day if it ran all day" or "pints/day added to the air if it ran all day". */
    public static String unitAndWords(double removalKgPerS, UnitSystem units) {
        return Q.symbol(units) + (addsWater(removalKgPerS, units, DisplayNumber.decimals(Q, units))
                ? " added to the air if it ran all day" : " if it ran all day");
    }
}
