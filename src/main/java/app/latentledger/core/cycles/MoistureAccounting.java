package app.latentledger.core.cycles;

import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.findings.ThresholdSettings;

import java.util.ArrayList;
import java.util.List;

/**
 * Moisture removed and returned per cycle, from the humidity-ratio difference across the coil:
 * m = ∫ ṁ_da·(W_return − W_supply) dt with ṁ_da = V̇ / v_return (mass balance on the dry air,
 * ASHRAE Handbook—Fundamentals 2017 ch. 1 eq. 28 for v; docs/methods.md §9.9). Integration
 * is by the trapezoid rule inside each run or rest, with the last sample held to the period's end
 * (a logger sample stands for the interval it starts); intervals longer than the gap limit count
 * nothing.
 */
final class MoistureAccounting {
    private final ThresholdSettings settings;

    MoistureAccounting(ThresholdSettings settings) {
        this.settings = settings;
    }

    List<CycleMoisture> account(LogSeries log, AirSeries air, List<Cycle> cycles, double gapS, double steadyW) {
        double floor = settings.valueSi(Thresholds.MOISTURE_REMOVAL_FLOOR);
        List<CycleMoisture> out = new ArrayList<>(cycles.size());
        for (Cycle c : cycles) {
            if (!air.humidity) {
                out.add(new CycleMoisture(Double.NaN, Double.NaN, Double.NaN, false, Double.NaN, Double.NaN));
                continue;
            }
            double removed = integrate(log, air, c.startIndex(), c.stopIndex(), gapS, null, 1.0);
            double returned = 0.0;
            if (c.offBlower() == BlowerState.ON || log.has(Channel.FAN) && c.blowerOnSeconds() > 0) {
                byte[] mask = log.has(Channel.FAN) ? fanMask(log, c) : null;
                returned = integrate(log, air, c.stopIndex(), c.endIndex(), gapS, mask, -1.0);
            } else if (c.offBlower() == BlowerState.UNKNOWN) {
                returned = Double.NaN;
            }
            double[] late = lateDrying(log, air, c);
            double reference = !Double.isNaN(steadyW) ? steadyW : late[0];
            double onset = onset(log, air, c, reference, floor);
            out.add(new CycleMoisture(removed, returned, onset, isWet(air, c, floor), late[0], late[1]));
        }
        return out;
    }

    private static byte[] fanMask(LogSeries log, Cycle c) {
        byte[] m = new byte[c.endIndex() - c.stopIndex()];
        for (int i = c.stopIndex(); i < c.endIndex(); i++) {
            m[i - c.stopIndex()] = log.status(Channel.FAN, i) == 1 ? (byte) 1 : 0;
        }
        return m;
    }

    /**
     * ∫ sign·(W_r − W_s)/v_r dt over samples [from, to), only where mask (relative to from) is 1.
     */
    static double integrate(LogSeries log, AirSeries air, int from, int to, double gapS, byte[] mask, double sign) {
        double sum = 0.0;
        for (int i = from; i < to; i++) {
            if (mask != null && mask[i - from] != 1) {
                continue;
            }
            if (i + 1 >= log.size()) {
                break;
            }
            double dt = log.timeS(i + 1) - log.timeS(i);
            if (dt > gapS) {
                continue;
            }
            double f = flux(air, i);
            if (Double.isNaN(f)) {
                continue;
            }
            boolean nextInside = i + 1 < to && (mask == null || mask[i + 1 - from] == 1);
            double g = nextInside ? flux(air, i + 1) : Double.NaN;
            sum += sign * dt * (Double.isNaN(g) ? f : 0.5 * (f + g));
        }
        return sum;
    }

    private static double flux(AirSeries air, int i) {
        return air.dryingW(i) * air.returnDryAirDensity[i];
    }

    /** {median ΔW, median ΔW/v} over the last quarter of the run. */
    private static double[] lateDrying(LogSeries log, AirSeries air, Cycle c) {
        double from = log.timeS(c.startIndex()) + 0.75 * c.onSeconds();
        int n = c.stopIndex() - c.startIndex();
        double[] w = new double[n];
        double[] f = new double[n];
        int m = 0;
        for (int i = c.startIndex(); i < c.stopIndex(); i++) {
            if (log.timeS(i) < from) {
                continue;
            }
            double d = air.dryingW(i);
            double g = flux(air, i);
            if (!Double.isNaN(d) && !Double.isNaN(g)) {
                w[m] = d;
                f[m++] = g;
            }
        }
        return new double[] {Stats.median(w, m), Stats.median(f, m)};
    }

    /** Time from start to half the steady drop, linearly interpolated between samples. */
    private static double onset(LogSeries log, AirSeries air, Cycle c, double reference, double floor) {
        if (!(reference > floor)) {
            return Double.NaN;
        }
        double half = 0.5 * reference;
        double t0 = log.timeS(c.startIndex());
        double prevD = Double.NaN;
        double prevT = Double.NaN;
        for (int i = c.startIndex(); i < c.stopIndex(); i++) {
            double d = air.dryingW(i);
            if (Double.isNaN(d)) {
                continue;
            }
            double t = log.timeS(i) - t0;
            if (d >= half) {
                if (Double.isNaN(prevD)) {
                    return t;
                }
                return prevT + (half - prevD) / (d - prevD) * (t - prevT);
            }
            prevD = d;
            prevT = t;
        }
        return Double.NaN;
    }

    private static boolean isWet(AirSeries air, Cycle c, double floor) {
        int run = 0;
        for (int i = c.startIndex(); i < c.stopIndex(); i++) {
            double d = air.dryingW(i);
            run = d > floor ? run + 1 : 0;
            if (run >= 2) {
                return true;
            }
        }
        return false;
    }
}
