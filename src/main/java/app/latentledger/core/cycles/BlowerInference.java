package app.latentledger.core.cycles;

/**
 * Where the blower stopped after a run, from the air alone (no blower status column).
 *
 * <p>With the blower running over a stopped, wet coil, the air picks up the coil's water at
 * constant enthalpy (adiabatic saturation, ASHRAE Handbook—Fundamentals 2017 ch. 1): the supply
 * comes out cooler and more humid than the return but with the same enthalpy, plus the blower's
 * own heat. Once the coil is dry the supply matches the return, still at the same enthalpy. When
 * the blower stops, the supply probe sits in still air that no longer follows the return, and its
 * enthalpy leaves the return's. So the blower is taken as running from the compressor stop for as
 * long as the supply-minus-return enthalpy stays on its plateau within the band
 * ({@link app.latentledger.core.findings.Thresholds#BLOWER_ENTHALPY_BAND}), and as stopped from the
 * sample where it began to leave it. The plateau need not sit at zero: blower heat (about 1 kJ/kg per
 * kelvin) or a probe offset moves it, so it is accepted within twice the band of zero.
 *
 * <p>The plateau must be reached within {@link #ACQUIRE_S} of the stop (probes and coil take about
 * a minute to settle after the compressor stops) and stay flat, within half the band, for
 * {@link #HOLD_S}: still air drifting through on its way elsewhere is not flat. Excursions shorter than {@link #TOLERATE_S}
 * (probe noise, a gust) do not end it. The end is dated back to the last sample within a quarter of
 * the band of the plateau's median, so a lagging probe does not make the blower run on longer than
 * it did. Rule derived from the adiabatic-saturation signature; the time constants are common
 * practice, no source.
 */
final class BlowerInference {
    static final double ACQUIRE_S = 180.0;
    static final double HOLD_S = 60.0;
    static final double TOLERATE_S = 60.0;
    static final double SMOOTH_S = 20.0;
    /** Supply drier than the return by more than this is still air by a cold coil, not evaporation, kg/kg. */
    static final double STILL_AIR_DRYING = 0.0008;
    /** The plateau followed over this past window, ending {@link #FOLLOW_LAG_S} before the sample judged. */
    static final double FOLLOW_S = 300.0;
    static final double FOLLOW_LAG_S = 90.0;
    static final double END_GRACE_S = 120.0;
    /** The kink is looked for over at most this much before the departure (the fit is quadratic in samples). */
    static final double KINK_WINDOW_S = 600.0;
    /** Departure from the plateau, as a share of the band, that ends it (the mean is steadier than one sample). */
    static final double DEPART = 0.5;

    private BlowerInference() {
    }

    /**
     * @return one past the last sample of the rest [from, to) with the blower on: {@code from} when it
     *         stopped with the compressor, {@code to} when it ran all through, -1 when it cannot be told
     *         (no humidity on both sides)
     */
    static int blowerEnd(LogSeries log, AirSeries air, int from, int to, double band, double gapS) {
        if (!air.humidity || to <= from) {
            return -1;
        }
        double[] d = smoothed(log, air, from, to);
        // a coarse log needs a few samples before one stray reading can end the plateau
        double tolerate = Math.max(TOLERATE_S, 3 * log.nominalIntervalS());
        double hold = Math.max(HOLD_S, 3 * log.nominalIntervalS());
        double t0 = log.timeS(from);
        int start = -1;
        double ref = Double.NaN;
        for (int i = from; i < to && log.timeS(i) - t0 <= ACQUIRE_S; i++) {
            if (i > from && log.timeS(i) - log.timeS(i - 1) > gapS) {
                break;
            }
            double x = d[i - from];
            // moving air over the stopped coil gains water (or matches the return over a dry coil);
            // still air next to a cold coil loses it
            boolean gaining = air.supplyW[i] - air.returnW[i] >= -STILL_AIR_DRYING;
            if (!Double.isNaN(x) && gaining && Math.abs(x) <= 2 * band
                    && holds(log, d, from, i, to, x, 0.5 * band, gapS, hold)) {
                start = i;
                ref = x;
                break;
            }
        }
        if (start < 0) {
            return from;
        }
        // the plateau may drift slowly (the coil drying, the house warming): follow it over the last
        // minutes, so only a change as quick as a blower stopping ends it
        double[] prefix = new double[d.length + 1];
        int[] counts = new int[d.length + 1];
        for (int k = 0; k < d.length; k++) {
            prefix[k + 1] = prefix[k] + (Double.isNaN(d[k]) ? 0 : d[k]);
            counts[k + 1] = counts[k] + (Double.isNaN(d[k]) ? 0 : 1);
        }
        int lastIn = start;
        int i = start;
        int lo = start;
        int hi = start;
        for (; i < to; i++) {
            if (i > start && log.timeS(i) - log.timeS(i - 1) > gapS) {
                break;
            }
            while (hi < i && log.timeS(i) - log.timeS(hi) > FOLLOW_LAG_S) {
                hi++;
            }
            while (lo < hi && log.timeS(i) - log.timeS(lo) > FOLLOW_S) {
                lo++;
            }
            int k = counts[hi - from] - counts[lo - from];
            double following = k >= 3 ? (prefix[hi - from] - prefix[lo - from]) / k : ref;
            double x = d[i - from];
            if (!Double.isNaN(x) && Math.abs(x - following) <= DEPART * band) {
                lastIn = i;
            } else if (!Double.isNaN(x) && log.timeS(i) - log.timeS(lastIn) > tolerate) {
                break;
            }
        }
        // a departure in the last minutes of the rest is the next run starting under a lagging probe
        if (i >= to || log.timeS(to - 1) - log.timeS(i) <= END_GRACE_S) {
            return to;
        }
        double plateau = plateau(d, start - from, lastIn - from);
        int end = lastIn;
        while (end > start && (Double.isNaN(d[end - from]) || Math.abs(d[end - from] - plateau) > 0.25 * band)) {
            end--;
        }
        // a slow still-air drift crosses the band well after the stop: date the stop where the drift began
        int kinkFrom = start;
        while (kinkFrom < i && log.timeS(i) - log.timeS(kinkFrom) > KINK_WINDOW_S) {
            kinkFrom++;
        }
        int kink = kink(log, d, from, kinkFrom, i);
        return Math.min(end, kink) + 1;
    }

    /**
     * Where a flat stretch turns into a ramp over [start, stop): the sample c that best fits
     * d = level + slope·max(0, t − t_c) by least squares (a continuous two-piece line, the usual
     * change-point model for a change of slope, e.g. Hudson, J. Am. Stat. Assoc. 61, 1966). With the
     * blower on the supply-minus-return enthalpy sits on its plateau; in still air it drifts away at
     * once, if slowly, so the kink is the stop even when the band is crossed minutes later. The flat
     * part keeps at least {@link #HOLD_S}; {@code stop - 1} when no kink fits better than one level.
     */
    static int kink(LogSeries log, double[] d, int from, int start, int stop) {
        int best = stop - 1;
        double flat = Double.NaN;
        double bestSse = Double.POSITIVE_INFINITY;
        double t0 = log.timeS(start);
        for (int c = start; c < stop; c++) {
            if (log.timeS(c) - t0 < HOLD_S) {
                continue;
            }
            double tc = log.timeS(c);
            // least squares of d on [1, x] with x = max(0, t − t_c)
            double n = 0;
            double sx = 0;
            double sy = 0;
            double sxx = 0;
            double sxy = 0;
            double syy = 0;
            for (int k = start; k < stop; k++) {
                double y = d[k - from];
                if (Double.isNaN(y)) {
                    continue;
                }
                double x = Math.max(0, log.timeS(k) - tc);
                n++;
                sx += x;
                sy += y;
                sxx += x * x;
                sxy += x * y;
                syy += y * y;
            }
            if (n < 3) {
                return stop - 1;
            }
            double den = n * sxx - sx * sx;
            double sse;
            if (den <= 0) {
                sse = syy - sy * sy / n;
                flat = sse;
            } else {
                double slope = (n * sxy - sx * sy) / den;
                double level = (sy - slope * sx) / n;
                sse = syy - level * sy - slope * sxy;
            }
            if (sse < bestSse) {
                bestSse = sse;
                best = c;
            }
        }
        return best;
    }

    private static double d(AirSeries air, int i) {
        return air.supplyH[i] - air.returnH[i];
    }

    /** Within {@code tol} of {@code ref} from i for HOLD_S, with at least two samples: a plateau, not a drift. */
    private static boolean holds(LogSeries log, double[] d, int from, int i, int to, double ref, double tol,
                                 double gapS, double holdS) {
        double t = log.timeS(i);
        int seen = 0;
        for (int j = i; j < to; j++) {
            if (j > i && log.timeS(j) - log.timeS(j - 1) > gapS) {
                return false;
            }
            if (log.timeS(j) - t > holdS) {
                return seen >= 3;
            }
            double x = d[j - from];
            if (Double.isNaN(x)) {
                continue;
            }
            if (Math.abs(x - ref) > tol) {
                return false;
            }
            seen++;
        }
        return false;
    }

    private static double plateau(double[] d, int from, int to) {
        double[] v = new double[to - from + 1];
        int m = 0;
        for (int i = from; i <= to; i++) {
            if (!Double.isNaN(d[i])) {
                v[m++] = d[i];
            }
        }
        return Stats.median(v, m);
    }

    /**
     * Supply-minus-return enthalpy over [from, to), as a running mean over ±{@link #SMOOTH_S} (probe
     * noise and a sharpened humidity reading would otherwise cross the band by chance).
     */
    private static double[] smoothed(LogSeries log, AirSeries air, int from, int to) {
        int n = to - from;
        double[] out = new double[n];
        double sum = 0;
        int count = 0;
        int a = from;
        int b = from;
        for (int i = from; i < to; i++) {
            while (b < to && log.timeS(b) - log.timeS(i) <= SMOOTH_S) {
                double x = d(air, b++);
                if (!Double.isNaN(x)) {
                    sum += x;
                    count++;
                }
            }
            while (log.timeS(i) - log.timeS(a) > SMOOTH_S) {
                double x = d(air, a++);
                if (!Double.isNaN(x)) {
                    sum -= x;
                    count--;
                }
            }
            out[i - from] = Double.isNaN(d(air, i)) || count == 0 ? Double.NaN : sum / count;
        }
        return out;
    }
}
