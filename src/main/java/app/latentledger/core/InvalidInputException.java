package app.latentledger.core;

import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

/**
 * A reading or setting the core refuses. It names the field, the value and the accepted range,
 * and can say so in either unit system, because the core itself only knows SI.
 */
public final class InvalidInputException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final String field;
    private final Quantity quantity;
    private final double valueSi;
    private final double minSi;
    private final double maxSi;
    private final String reason;

    /**
     * @param field    the field as a tech names it, e.g. "return wet bulb"
     * @param quantity how to show the value and range in the tech's units
     * @param valueSi  the refused value, SI
     * @param minSi    lowest accepted value, SI (may depend on other fields, e.g. dry bulb)
     * @param maxSi    highest accepted value, SI
     * @param reason   optional plain reason beyond the range, or null
     */
    public InvalidInputException(String field, Quantity quantity, double valueSi,
                                 double minSi, double maxSi, String reason) {
        super(format(field, quantity, valueSi, minSi, maxSi, reason, UnitSystem.SI));
        this.field = field;
        this.quantity = quantity;
        this.valueSi = valueSi;
        this.minSi = minSi;
        this.maxSi = maxSi;
        this.reason = reason;
    }

    /** The message in the tech's unit system. */
    public String message(UnitSystem units) {
        return format(field, quantity, valueSi, minSi, maxSi, reason, units);
    }

    public String field() {
        return field;
    }

    public Quantity quantity() {
        return quantity;
    }

    public double valueSi() {
        return valueSi;
    }

    public double minSi() {
        return minSi;
    }

    public double maxSi() {
        return maxSi;
    }

    /** The plain reason beyond the range, or null. */
    public String reason() {
        return reason;
    }

    /** The same refusal for a field named in a wider context, e.g. "return" + "wet bulb". */
    public InvalidInputException within(String context) {
        return new InvalidInputException(context + " " + field, quantity, valueSi, minSi, maxSi, reason);
    }

    private static String format(String field, Quantity q, double value, double min, double max,
                                 String reason, UnitSystem units) {
        String unit = q.symbol(units);
        String shown = Double.isNaN(value) ? "not a number" : number(q.toDisplay(units, value)) + " " + unit;
        String range = number(q.toDisplay(units, min)) + " to " + number(q.toDisplay(units, max)) + " " + unit;
        StringBuilder b = new StringBuilder(field).append(' ').append(shown).append(" refused: ");
        if (reason != null) {
            b.append(reason).append("; ");
        }
        return b.append("accepted range ").append(range).toString();
    }

    private static String number(double v) {
        return DisplayNumber.exact(v);
    }
}
