package app.latentledger.core.coil;

import app.latentledger.core.measure.CoilTemperatureKind;

/**
 * Is the coil dehumidifying? Three answers, one of them honest doubt.
 *
 * <p>Two calls are made first, each against its own expanded uncertainty U (k = 2, JCGM 100:2008):
 * <ul>
 *   <li>the humidity-ratio drop ΔW = W_entering − W_leaving: <i>removing</i> when ΔW &gt; U(ΔW),
 *       <i>adding</i> when ΔW &lt; −U(ΔW), <i>within</i> otherwise;</li>
 *   <li>the dew-point margin M = entering dew point − coil temperature: <i>below</i> (coil colder
 *       than the dew point) when M &gt; U(M), <i>above</i> when M &lt; −U(M), <i>within</i> otherwise,
 *       <i>unknown</i> without a coil temperature. An evaporator saturation temperature bounds how
 *       cold the surface can be, not where it is: the surface runs warmer by fin and air-film
 *       resistance, so "below" needs M &gt; U(M) + allowance, while "above" needs only M &lt; −U(M)
 *       (a surface is never colder than its refrigerant).</li>
 * </ul>
 * <b>Direct evidence first.</b> Water leaving the air is the thing asked about, so the drop decides
 * whenever it is clear: removing → {@link #DEHUMIDIFYING}, adding → {@link #NOT_DEHUMIDIFYING},
 * whatever the coil probe says (a disagreeing probe earns a consistency note in the findings, not a
 * veto). A steady condensate catch that is clearly above zero and more certain than the air side is
 * direct evidence too. Only when the drop is within its uncertainty does the coil temperature speak:
 * above the dew point → {@link #NOT_DEHUMIDIFYING} (the drop is consistent with zero and the coil
 * is not below the dew point); anything else → {@link #CANT_TELL}. This is the three-state rule of
 * docs/methods.md §"Coil verdict", built on the GUM.
 */
public enum CoilVerdict {
    DEHUMIDIFYING("dehumidifying"),
    NOT_DEHUMIDIFYING("not-dehumidifying"),
    CANT_TELL("cant-tell");

    /** Where the margin or the drop stands against its uncertainty. */
    public enum Call { BELOW, ABOVE, REMOVING, ADDING, WITHIN, UNKNOWN }

    private final String key;

    CoilVerdict(String key) {
        this.key = key;
    }

    /** JSON key: "dehumidifying" | "not-dehumidifying" | "cant-tell". */
    public String key() {
        return key;
    }

    /** The margin's call for a coil-surface reading or the apparatus dew point: BELOW, ABOVE, WITHIN or UNKNOWN. */
    public static Call marginCall(Estimate margin) {
        return marginCall(margin, null, 0);
    }

    /**
     * The margin's call for a coil temperature of {@code kind} (null: a surface reading or the
     * apparatus dew point).
     *
     * @param saturationAllowanceK how much warmer than an evaporator saturation temperature the
     *                             surface is taken to run at least, K (used only for that kind)
     */
    public static Call marginCall(Estimate margin, CoilTemperatureKind kind, double saturationAllowanceK) {
        if (!margin.exists() || !Double.isFinite(margin.expandedSi())) {
            return Call.UNKNOWN;
        }
        if (margin.clearlyNegative()) {
            return Call.ABOVE;
        }
        double needed = kind == CoilTemperatureKind.EVAPORATOR_SATURATION ? saturationAllowanceK : 0;
        return margin.valueSi() - needed > margin.expandedSi() ? Call.BELOW : Call.WITHIN;
    }

    /** The drop's call: REMOVING, ADDING, WITHIN or UNKNOWN. */
    public static Call dropCall(Estimate drop) {
        if (!drop.exists() || !Double.isFinite(drop.expandedSi())) {
            return Call.UNKNOWN;
        }
        return drop.clearlyPositive() ? Call.REMOVING : drop.clearlyNegative() ? Call.ADDING : Call.WITHIN;
    }

    /** The verdict from the two calls alone, by the rule in the class comment. */
    public static CoilVerdict decide(Call margin, Call drop) {
        return decide(margin, drop, false);
    }

    /**
     * @param condensateShowsDrying true when a steady condensate catch, more certain than the air
     *                              side, is clearly above zero
     */
    public static CoilVerdict decide(Call margin, Call drop, boolean condensateShowsDrying) {
        if (drop == Call.REMOVING || condensateShowsDrying) {
            return DEHUMIDIFYING;
        }
        if (drop == Call.ADDING) {
            return NOT_DEHUMIDIFYING;
        }
        if (drop == Call.WITHIN && margin == Call.ABOVE) {
            return NOT_DEHUMIDIFYING;
        }
        return CANT_TELL;
    }
}
