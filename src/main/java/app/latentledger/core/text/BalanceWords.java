package app.latentledger.core.text;

import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

/**
 * The one way the house's water balance (gains minus removal) is put in words, on the House screen,
 * in the report's house section and by the {@code house} command. A signed "water gained −32.7
 * pints/day" asks the reader to work out that a negative gain means drying; the words say which way
 * the house goes: "The house dries by about 32.7 ± 60.6 pints a day".
 *
 * <p>The balance is a daily budget, not a running rate: the removal in it is already the system's
 * removal while running times its runtime fraction and part-load latent fraction (see
 * {@code core.house.BudgetModel}), and the gains are the day's rates at the visit's conditions. So
 * it needs no "if it ran all day"; it holds for a day like the visit's.
 *
 * <p>When the balance lies within its own expanded uncertainty (k = 2, about 95 %) the readings
 * cannot tell whether the house gains or dries, and the words say so with the range the uncertainty
 * allows: "About in balance: −5.0 to +12.3 pints a day" (the same rule as {@link MarginWords}:
 * a difference within its uncertainty is not called either way; JCGM 100:2008 (GUM) §6, expanded
 * uncertainty as an interval about the result).
 */
public final class BalanceWords {
    /** Which way the house goes, as far as the uncertainty lets us say. */
    public enum Way { GAINS, DRIES, IN_BALANCE }

    private static final Quantity Q = Quantity.WATER_RATE_DAILY;
    /** U+2212, the minus sign of typeset text, for the low end of a range in a sentence. */
    private static final char MINUS = '\u2212';

    private BalanceWords() {
    }

    /**
     * @param balanceKgPerS gains − removal, kg/s (positive: the house is getting wetter)
     * @param uKgPerS       its expanded uncertainty (k = 2), kg/s; NaN when not assessed
     */
    public static Way way(double balanceKgPerS, double uKgPerS) {
        if (Double.isFinite(uKgPerS) && Math.abs(balanceKgPerS) <= uKgPerS) {
            return Way.IN_BALANCE;
        }
        return balanceKgPerS > 0 ? Way.GAINS : balanceKgPerS < 0 ? Way.DRIES : Way.IN_BALANCE;
    }

    /** The unit in words: "pints a day", "litres a day". */
    public static String perDay(UnitSystem units) {
        return units == UnitSystem.IP ? "pints a day" : "litres a day";
    }

    /**
     * The whole sentence, starting with a capital: "The house gains about 32.7 ± 60.6 pints a day",
     * "The house dries by about 12.0 ± 4.1 pints a day", "About in balance: −5.0 to +12.3 pints a
     * day"; "Water balance not known" when it does not exist.
     */
    public static String sentence(UnitSystem units, double balanceKgPerS, double uKgPerS) {
        if (!Double.isFinite(balanceKgPerS)) {
            return "Water balance not known";
        }
        int d = DisplayNumber.decimals(Q, units);
        return switch (way(balanceKgPerS, uKgPerS)) {
            case GAINS -> "The house gains about " + amount(units, balanceKgPerS, uKgPerS, d);
            case DRIES -> "The house dries by about " + amount(units, balanceKgPerS, uKgPerS, d);
            case IN_BALANCE -> Double.isFinite(uKgPerS)
                    ? "About in balance: " + end(units, balanceKgPerS - uKgPerS, d) + " to "
                    + end(units, balanceKgPerS + uKgPerS, d) + " " + perDay(units)
                    : "About in balance: " + DisplayNumber.value(Q, units, 0.0, d) + " " + perDay(units);
        };
    }

    /** "32.7 ± 60.6 pints a day": the size of the balance, without its sign, in words. */
    private static String amount(UnitSystem units, double balanceKgPerS, double uKgPerS, int d) {
        return DisplayNumber.valueWithSpread(Q, units, Math.abs(balanceKgPerS), uKgPerS, d) + " " + perDay(units);
    }

    /** One end of the range, signed ("+12.3", "−5.0", "0.0"), with the typeset minus. */
    private static String end(UnitSystem units, double si, int d) {
        String s = DisplayNumber.signed(Q.toDisplay(units, si), d);
        return s.startsWith("-") ? MINUS + s.substring(1) : s;
    }
}
