package app.latentledger.core.cycles;

import java.util.List;

/**
 * How much later the supply humidity probe answers than the supply thermistor, found from the log
 * itself, and taken out of the supply humidity ratio so both describe the same air.
 *
 * <p>Capacitive RH sensors answer in 30–60 s, thermistors in 10–20 s (common practice, no source).
 * Right after the compressor stops with the blower running, the air leaving the coil moves along a
 * line of constant enthalpy (adiabatic evaporation, ASHRAE Handbook—Fundamentals 2017 ch. 1): its
 * dry bulb rises and its humidity ratio rises together. A humidity reading that lags the
 * temperature makes the supply enthalpy dip and recover over those minutes; the lag that makes it
 * flattest is the probe's extra lag. The supply humidity ratio is then sharpened by first-order
 * inversion, W = W_m + τ·dW_m/dt (the inverse of a first-order sensor, e.g. Doebelin, Measurement
 * Systems, ch. 3), with the derivative taken over ±{@link #HALF_WINDOW_S} to keep noise down.
 * Without such a rest (blower off at every stop) nothing is changed: no water is counted in the
 * rests then, and over a run the lag moves water from its start to its end without changing the sum.
 */
final class HumidityLag {
    static final double MAX_LAG_S = 60.0;
    static final double STEP_S = 5.0;
    static final double HALF_WINDOW_S = 20.0;
    /** Part of each blower-on rest used: its first minutes, where the probes move most. */
    static final double WINDOW_S = 300.0;
    static final int MIN_SAMPLES = 20;
    /** The flattest enthalpy must have at most this share of the spread without any correction. */
    static final double CLEAR_GAIN = 0.6;
    /** Shorter lags are left alone: they move little water and a sharp coil transient can mimic them. */
    static final double MIN_LAG_S = 25.0;
    /** Logs sampled more coarsely than this cannot show a lag of tens of seconds. */
    static final double MAX_INTERVAL_S = 15.0;

    private HumidityLag() {
    }

    /** The supply humidity probe's lag behind its thermistor, s (0 when it cannot be found). */
    static double estimate(LogSeries log, AirSeries air, List<Cycle> cycles, byte[] blower) {
        if (!air.humidity || !(log.nominalIntervalS() <= MAX_INTERVAL_S)) {
            return 0.0;
        }
        int[] idx = new int[log.size()];
        int[] group = new int[log.size()];
        int m = 0;
        int g = 0;
        for (Cycle c : cycles) {
            double t0 = log.timeS(c.stopIndex());
            int first = m;
            for (int i = c.stopIndex(); i < c.endIndex() && blower[i] == 1 && log.timeS(i) - t0 <= WINDOW_S; i++) {
                idx[m] = i;
                group[m++] = g;
            }
            if (m - first < 3) {
                m = first;
            } else {
                g++;
            }
        }
        if (m < MIN_SAMPLES || g < 2) {
            return 0.0;
        }
        double best = 0;
        double bestCost = Double.POSITIVE_INFINITY;
        double none = Double.NaN;
        double[] hh = new double[m];
        // the slope at a sample does not depend on the lag tried: found once, not once per lag
        double[] slope = new double[m];
        for (int k = 0; k < m; k++) {
            slope[k] = slope(log, air.supplyW, idx[k]);
        }
        for (double tau = 0; tau <= MAX_LAG_S; tau += STEP_S) {
            for (int k = 0; k < m; k++) {
                int i = idx[k];
                double w = Double.isNaN(air.supplyW[i]) ? Double.NaN
                        : tau == 0 || Double.isNaN(slope[k]) ? air.supplyW[i] : air.supplyW[i] + tau * slope[k];
                hh[k] = Double.isNaN(w) || Double.isNaN(air.supplyDbC[i]) ? Double.NaN
                        : AirSeries.enthalpy(air.supplyDbC[i], w) - air.returnH[i];
            }
            double cost = spread(hh, group, m, g);
            if (tau == 0) {
                none = cost;
            }
            if (cost < bestCost * 0.98) {
                bestCost = cost;
                best = tau;
            }
        }
        // only a lag that clearly flattens the enthalpy is taken out (noise alone must not sharpen)
        return bestCost < CLEAR_GAIN * none && best >= MIN_LAG_S ? best : 0.0;
    }

    /** Σ squared deviation from each rest's own mean. */
    private static double spread(double[] v, int[] group, int m, int groups) {
        double[] sum = new double[groups];
        int[] n = new int[groups];
        for (int k = 0; k < m; k++) {
            if (!Double.isNaN(v[k])) {
                sum[group[k]] += v[k];
                n[group[k]]++;
            }
        }
        double s = 0;
        for (int k = 0; k < m; k++) {
            if (!Double.isNaN(v[k]) && n[group[k]] > 0) {
                double d = v[k] - sum[group[k]] / n[group[k]];
                s += d * d;
            }
        }
        return s;
    }

    /** dW_m/dt at sample i over ±HALF_WINDOW_S (at least one sample each side); NaN when not known. */
    static double slope(LogSeries log, double[] w, int i) {
        int a = i;
        while (a > 0 && log.timeS(i) - log.timeS(a) < HALF_WINDOW_S) {
            a--;
        }
        return slope(log, w, a, windowEnd(log, i, i));
    }

    /** The slope between window ends a and b; NaN when they are one sample or either is unknown. */
    static double slope(LogSeries log, double[] w, int a, int b) {
        if (a == b || Double.isNaN(w[a]) || Double.isNaN(w[b])) {
            return Double.NaN;
        }
        return (w[b] - w[a]) / (log.timeS(b) - log.timeS(a));
    }

    /**
     * First sample of the window before i: the last at least HALF_WINDOW_S earlier, else sample 0.
     * {@code from} is the answer for an earlier sample (the start never moves back as i moves on), so a
     * caller going through the log in order walks it once.
     */
    static int windowStart(LogSeries log, int i, int from) {
        int a = Math.max(0, Math.min(from, i));
        while (a < i && log.timeS(i) - log.timeS(a + 1) >= HALF_WINDOW_S) {
            a++;
        }
        return log.timeS(i) - log.timeS(a) >= HALF_WINDOW_S ? a : 0;
    }

    /**
     * Last sample of the window after i: the first at least HALF_WINDOW_S later, else the last sample.
     * {@code from} is the answer for an earlier sample, as for {@link #windowStart}.
     */
    static int windowEnd(LogSeries log, int i, int from) {
        int b = Math.max(from, i);
        while (b + 1 < log.size() && log.timeS(b) - log.timeS(i) < HALF_WINDOW_S) {
            b++;
        }
        return b;
    }
}
