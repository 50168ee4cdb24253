package app.latentledger.core.coil;

/**
 * Is the coil dehumidifying? Three answers, one of them honest doubt.
 *
 * <p>Two calls are made first, each against its own expanded uncertainty U (k = 2):
 * <ul>
 *   <li>the dew-point margin M = entering dew point − coil temperature: <i>below</i> (coil colder
 *       than the dew point) when M &gt; U(M), <i>above</i> when M &lt; −U(M), <i>within</i> otherwise,
 *       <i>unknown</i> without a coil temperature (none measured and no apparatus dew point);</li>
 *   <li>the humidity-ratio drop ΔW = W_entering − W_leaving: <i>removing</i> when ΔW &gt; U(ΔW),
 *       <i>adding</i> when ΔW &lt; −U(ΔW), <i>within</i> otherwise.</li>
 * </ul>
 * Then: margin within its uncertainty → {@link #CANT_TELL} (as the issue demands). Below and
 * removing → {@link #DEHUMIDIFYING}. Above and not removing → {@link #NOT_DEHUMIDIFYING}. No coil
 * temperature and adding → {@link #NOT_DEHUMIDIFYING}. Every other pairing (a cold coil with no
 * measurable drop, a warm coil with a drop, a cold coil with the air gaining water) →
 * {@link #CANT_TELL}: the readings disagree with each other, and the findings say how. This is the
 * three-state rule of docs/methods.md §9.7 (a design proposal built on the GUM).
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

    /** The margin's call: BELOW, ABOVE, WITHIN or UNKNOWN. */
    public static Call marginCall(Estimate margin) {
        if (!margin.exists() || !Double.isFinite(margin.expandedSi())) {
            return Call.UNKNOWN;
        }
        return margin.clearlyPositive() ? Call.BELOW : margin.clearlyNegative() ? Call.ABOVE : Call.WITHIN;
    }

    /** The drop's call: REMOVING, ADDING, WITHIN or UNKNOWN. */
    public static Call dropCall(Estimate drop) {
        if (!drop.exists() || !Double.isFinite(drop.expandedSi())) {
            return Call.UNKNOWN;
        }
        return drop.clearlyPositive() ? Call.REMOVING : drop.clearlyNegative() ? Call.ADDING : Call.WITHIN;
    }

    /** The verdict from the two calls, by the rule in the class comment. */
    public static CoilVerdict decide(Call margin, Call drop) {
        if (drop == Call.UNKNOWN || margin == Call.WITHIN) {
            return CANT_TELL;
        }
        if (margin == Call.BELOW) {
            return drop == Call.REMOVING ? DEHUMIDIFYING : CANT_TELL;
        }
        if (margin == Call.ABOVE) {
            return drop == Call.REMOVING ? CANT_TELL : NOT_DEHUMIDIFYING;
        }
        return drop == Call.ADDING ? NOT_DEHUMIDIFYING : CANT_TELL;
    }
}
