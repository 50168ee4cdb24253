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
        String range = range(q, units, min, max) + " " + unit;
        StringBuilder b = new StringBuilder(field).append(' ').append(shown).append(" refused: ");
        if (reason != null) {
            b.append(reason).append("; ");
        }
        return b.append("accepted range ").append(range).toString();
    }

    private static String number(double v) {
        return DisplayNumber.exact(v);
    }

    /**
     * The accepted range at the precision the value is shown with, rounded inwards so every number
     * it shows is itself accepted: 0.00944 m³/s is "20 cfm", not "19.9175 cfm". A range too narrow
     * for that precision keeps its exact ends. The one rule for a range a tech reads: refusals, the
     * settings screen's hints and the {@code settings} command's table all print it.
     */
    public static String range(Quantity q, UnitSystem units, double minSi, double maxSi) {
        double min = q.toDisplay(units, minSi);
        double max = q.toDisplay(units, maxSi);
        double step = Math.pow(10, -DisplayNumber.decimals(q, units));
        // a hair of slack so a limit that is a round number after conversion (−58 °F) stays itself
        double lo = Math.ceil(min / step - 1e-6) * step;
        double hi = Math.floor(max / step + 1e-6) * step;
        if (!(lo <= hi) || Double.isInfinite(min) || Double.isInfinite(max)) {
            return number(min) + " to " + number(max);
        }
        return number(lo) + " to " + number(hi);
    }
}
