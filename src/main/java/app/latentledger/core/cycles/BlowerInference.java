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
        double t0 = log.timeS(from);
        int start = -1;
        double ref = Double.NaN;
        for (int i = from; i < to && log.timeS(i) - t0 <= ACQUIRE_S; i++) {
            if (i > from && log.timeS(i) - log.timeS(i - 1) > gapS) {
                break;
            }
            double x = d(air, i);
            if (!Double.isNaN(x) && Math.abs(x) <= 2 * band && holds(log, air, i, to, x, 0.5 * band, gapS)) {
                start = i;
                ref = x;
                break;
            }
        }
        if (start < 0) {
            return from;
        }
        int lastIn = start;
        int i = start;
        for (; i < to; i++) {
            if (i > start && log.timeS(i) - log.timeS(i - 1) > gapS) {
                break;
            }
            double x = d(air, i);
            if (!Double.isNaN(x) && Math.abs(x - ref) <= band) {
                lastIn = i;
            } else if (!Double.isNaN(x) && log.timeS(i) - log.timeS(lastIn) > TOLERATE_S) {
                break;
            }
        }
        if (i >= to) {
            return to;
        }
        double plateau = plateau(air, start, lastIn);
        int end = lastIn;
        while (end > start && (Double.isNaN(d(air, end)) || Math.abs(d(air, end) - plateau) > 0.25 * band)) {
            end--;
        }
        return end + 1;
    }

    private static double d(AirSeries air, int i) {
        return air.supplyH[i] - air.returnH[i];
    }

    /** Within {@code tol} of {@code ref} from i for HOLD_S, with at least two samples: a plateau, not a drift. */
    private static boolean holds(LogSeries log, AirSeries air, int i, int to, double ref, double tol, double gapS) {
        double t = log.timeS(i);
        int seen = 0;
        for (int j = i; j < to; j++) {
            if (j > i && log.timeS(j) - log.timeS(j - 1) > gapS) {
                return false;
            }
            if (log.timeS(j) - t > HOLD_S) {
                return seen >= 2;
            }
            double x = d(air, j);
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

    private static double plateau(AirSeries air, int from, int to) {
        double[] v = new double[to - from + 1];
        int m = 0;
        for (int i = from; i <= to; i++) {
            double x = d(air, i);
            if (!Double.isNaN(x)) {
                v[m++] = x;
            }
        }
        return Stats.median(v, m);
    }
}
