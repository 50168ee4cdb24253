package app.latentledger.core.cycles;

import java.util.ArrayList;
import java.util.List;

/**
 * Fits t_wet and γ of {@link LatentDegradationModel} to blower-on rests that follow a long run
 * (docs/methods.md §3.6, derived from Henderson & Rengarajan 1996's linear decay).
 *
 * <p>With the coil draining at the stop, the linear-decay law puts moisture back at the rate
 * (W_s − W_r)(s) = γ·ΔW_ss·(1 − γ·s/(2·t_wet)) until the coil is dry at s = 2·t_wet/γ. A straight
 * line A − B·s fitted by least squares from 30 s after the stop (the coil is still cold before that)
 * until the rate falls to 15 % of its start gives γ = A/ΔW_ss. When the rest outlasts the dry-out,
 * t_wet is the whole amount put back, ∫(W_s − W_r) ds / ΔW_ss (the coil's inventory in seconds of
 * steady removal; docs/methods.md §9.9); otherwise t_wet = A²/(2·B·ΔW_ss). Medians over all usable rests are
 * kept when they fall in the EnergyPlus input ranges (t_wet 0–3000 s, γ 0–5).
 */
final class ModelFit {
    /** A rest must follow a run at least this long for the coil to be taken as draining at the stop. */
    private final double longRunS;
    private static final double MIN_REST_S = 900.0;
    private static final double SETTLE_S = 30.0;
    private static final double END_FRACTION = 0.15;

    ModelFit(double longRunS) {
        this.longRunS = longRunS;
    }

    /** t_wet, γ and the number of rests used; NaN pair when the log does not allow a fit. */
    double[] fit(LogSeries log, AirSeries air, List<Cycle> cycles, double steadyW, double gapS) {
        if (!air.humidity || !(steadyW > 0)) {
            return new double[] {Double.NaN, Double.NaN, 0};
        }
        List<Double> twets = new ArrayList<>();
        List<Double> gammas = new ArrayList<>();
        for (Cycle c : cycles) {
            if (c.onSeconds() < longRunS || c.offBlower() != BlowerState.ON) {
                continue;
            }
            int end = blowerEnd(log, c);
            double restS = log.timeS(end - 1) - log.timeS(c.stopIndex());
            if (restS < MIN_REST_S) {
                continue;
            }
            double[] g = fitRest(log, air, c.stopIndex(), end, steadyW, gapS);
            if (g != null) {
                twets.add(g[0]);
                gammas.add(g[1]);
            }
        }
        if (twets.isEmpty()) {
            return new double[] {Double.NaN, Double.NaN, 0};
        }
        double twet = median(twets);
        double gamma = median(gammas);
        if (!(twet > 0 && twet <= 3000 && gamma > 0 && gamma <= 5)) {
            return new double[] {Double.NaN, Double.NaN, 0};
        }
        return new double[] {twet, gamma, twets.size()};
    }

    /** One past the last sample of the rest with the blower on. */
    private static int blowerEnd(LogSeries log, Cycle c) {
        if (!log.has(Channel.FAN)) {
            return c.endIndex();
        }
        int i = c.stopIndex();
        while (i < c.endIndex() && log.status(Channel.FAN, i) == 1) {
            i++;
        }
        return i;
    }

    private static double[] fitRest(LogSeries log, AirSeries air, int from, int to, double steadyW, double gapS) {
        double t0 = log.timeS(from);
        double peak = 0;
        for (int i = from; i < to && log.timeS(i) - t0 <= 120; i++) {
            double r = -air.dryingW(i);
            if (r > peak) {
                peak = r;
            }
        }
        if (!(peak > 0)) {
            return null;
        }
        double sx = 0;
        double sy = 0;
        double sxx = 0;
        double sxy = 0;
        int n = 0;
        boolean driedOut = false;
        for (int i = from; i < to; i++) {
            double s = log.timeS(i) - t0;
            double r = -air.dryingW(i);
            if (Double.isNaN(r) || s < SETTLE_S) {
                continue;
            }
            if (r <= END_FRACTION * peak) {
                driedOut = true;
                break;
            }
            sx += s;
            sy += r;
            sxx += s * s;
            sxy += s * r;
            n++;
        }
        if (n < 5) {
            return null;
        }
        double slope = (n * sxy - sx * sy) / (n * sxx - sx * sx);
        double intercept = (sy - slope * sx) / n;
        double gamma = intercept / steadyW;
        double twet;
        if (driedOut) {
            double returned = 0;
            for (int i = from; i + 1 < to; i++) {
                double dt = log.timeS(i + 1) - log.timeS(i);
                double r = -air.dryingW(i);
                if (dt <= gapS && !Double.isNaN(r)) {
                    double r1 = -air.dryingW(i + 1);
                    returned += dt * (Double.isNaN(r1) ? r : 0.5 * (r + r1));
                }
            }
            twet = returned / steadyW;
        } else if (slope < 0) {
            twet = intercept * intercept / (2.0 * -slope * steadyW);
        } else {
            return null;
        }
        return new double[] {twet, gamma};
    }

    private static double median(List<Double> v) {
        double[] a = new double[v.size()];
        for (int i = 0; i < a.length; i++) {
            a[i] = v.get(i);
        }
        return Stats.median(a, a.length);
    }
}
