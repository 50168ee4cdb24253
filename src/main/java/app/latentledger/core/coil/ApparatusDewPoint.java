package app.latentledger.core.coil;

import app.latentledger.core.psychro.Psychrometrics;

/**
 * Apparatus dew point and bypass factor from the entering and leaving states.
 *
 * <p>ADP (ASHRAE Terminology, "apparatus dew point"): where the straight line from the entering
 * state through the leaving state, on the humidity-ratio–dry-bulb plane, meets the saturation
 * curve W_s(t) (ASHRAE HoF 2017 ch. 1, eq. 23). Bypass factor BF = (t₂ − ADP)/(t₁ − ADP), the
 * textbook definition (contact factor 1 − BF). Valid for a cooling coil that removes water
 * (t₂ &lt; t₁, W₂ &lt; W₁) at or above −40 °C.
 *
 * <p>Method: from the leaving dry bulb downward in 0.25 K steps until W_s(t) falls to the line,
 * then bisection to 1e−9 K. The nearest crossing below the leaving state is the one the handbook's
 * chart construction reads. When the line reaches W = 0 or −40 °C without meeting the curve, there
 * is no ADP; the readings are then inconsistent with a coil (for example a huge drop in humidity
 * ratio with almost no drop in temperature).
 *
 * @param status       what was found
 * @param temperatureC ADP, °C, or NaN
 * @param bypassFactor BF, or NaN
 */
public record ApparatusDewPoint(Status status, double temperatureC, double bypassFactor) {
    /** Why there is, or is not, an ADP. */
    public enum Status {
        FOUND("found"),
        /** The supply is not colder than the entering air: no cooling process to draw a line for. */
        NOT_COOLING("not-cooling"),
        /** The supply holds as much water or more than the entering air: the coil removed none. */
        NO_MOISTURE_REMOVED("no-moisture-removed"),
        /** The coil added moisture (supply humidity ratio above entering). */
        COIL_ADDED_MOISTURE("coil-added-moisture"),
        /** The line through the two states never meets the saturation curve. */
        LINE_MISSES_SATURATION("line-misses-saturation");

        private final String key;

        Status(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }
    }

    private static final double STEP_K = 0.25;
    private static final double LOWEST_C = -40.0;

    /** True when an ADP was found. */
    public boolean found() {
        return status == Status.FOUND;
    }

    /** Plain words for a result without a number. */
    public String explanation() {
        switch (status) {
            case FOUND: return "found";
            case NOT_COOLING: return "supply is not colder than the entering air; no apparatus dew point";
            case NO_MOISTURE_REMOVED: return "the coil removed no moisture; no apparatus dew point";
            case COIL_ADDED_MOISTURE: return "the coil added moisture; no apparatus dew point";
            case LINE_MISSES_SATURATION:
                return "the line through the entering and leaving states does not meet the saturation curve";
            default: throw new IllegalStateException(status.name());
        }
    }

    /**
     * @param pressurePa barometric pressure, Pa
     * @param t1C        entering dry bulb, °C
     * @param w1         entering humidity ratio, kg/kg
     * @param t2C        leaving dry bulb, °C
     * @param w2         leaving humidity ratio, kg/kg
     */
    public static ApparatusDewPoint find(double pressurePa, double t1C, double w1, double t2C, double w2) {
        if (w2 > w1) {
            return none(Status.COIL_ADDED_MOISTURE);
        }
        if (w2 == w1) {
            return none(Status.NO_MOISTURE_REMOVED);
        }
        if (!(t2C < t1C)) {
            return none(Status.NOT_COOLING);
        }
        double slope = (w1 - w2) / (t1C - t2C);
        double upper = t2C;
        if (gap(pressurePa, upper, t2C, w2, slope) <= 0) {
            return found(t2C, t1C, t2C);
        }
        for (double t = t2C - STEP_K; t >= LOWEST_C; t -= STEP_K) {
            double line = w2 + slope * (t - t2C);
            if (line <= 0) {
                break;
            }
            if (gap(pressurePa, t, t2C, w2, slope) <= 0) {
                double lo = t;
                double hi = upper;
                while (hi - lo > 1e-9) {
                    double mid = 0.5 * (lo + hi);
                    if (gap(pressurePa, mid, t2C, w2, slope) <= 0) {
                        lo = mid;
                    } else {
                        hi = mid;
                    }
                }
                return found(0.5 * (lo + hi), t1C, t2C);
            }
            upper = t;
        }
        return none(Status.LINE_MISSES_SATURATION);
    }

    // saturation humidity ratio minus the process line: positive above the line's crossing
    private static double gap(double p, double t, double t2C, double w2, double slope) {
        return Psychrometrics.saturationHumidityRatio(t, p) - (w2 + slope * (t - t2C));
    }

    private static ApparatusDewPoint found(double adpC, double t1C, double t2C) {
        return new ApparatusDewPoint(Status.FOUND, adpC, (t2C - adpC) / (t1C - adpC));
    }

    private static ApparatusDewPoint none(Status status) {
        return new ApparatusDewPoint(status, Double.NaN, Double.NaN);
    }
}
