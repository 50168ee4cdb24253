package app.latentledger.chart.psychro;

import app.latentledger.core.psychro.Psychrometrics;

import java.util.function.DoubleUnaryOperator;

/**
 * Samples a line W(t) of the chart where it lies on real air: at or above W = 0 and at or below
 * saturation. Every family drawn (RH, wet bulb, enthalpy, volume) meets that region in one
 * unbroken stretch, because each is monotonic in W along the dry bulb while saturation rises, so
 * only the first inside run is kept; its ends are found by bisection so lines meet the saturation
 * curve exactly rather than at the nearest sample.
 */
final class CurveSampler {
    private static final int BISECTIONS = 40;

    private final double pressurePa;

    CurveSampler(double pressurePa) {
        this.pressurePa = pressurePa;
    }

    /**
     * @return {dry bulbs, humidity ratios}, or null when the line misses the region in [fromC, toC]
     */
    double[][] sample(DoubleUnaryOperator wOfDb, double fromC, double toC, int samples) {
        double step = (toC - fromC) / (samples - 1);
        int first = -1;
        int last = -1;
        for (int i = 0; i < samples; i++) {
            double t = fromC + i * step;
            if (inside(wOfDb, t)) {
                if (first < 0) {
                    first = i;
                }
                last = i;
            } else if (first >= 0) {
                break;
            }
        }
        if (first < 0) {
            return null;
        }
        double start = first == 0 ? fromC : edge(wOfDb, fromC + (first - 1) * step, fromC + first * step);
        double end = last == samples - 1 ? toC : edge(wOfDb, fromC + (last + 1) * step, fromC + last * step);
        int inner = last - first + 1;
        double[] db = new double[inner + 2];
        double[] w = new double[inner + 2];
        db[0] = start;
        int n = 1;
        for (int i = first; i <= last; i++) {
            double t = fromC + i * step;
            if (t > start && t < end) {
                db[n++] = t;
            }
        }
        db[n++] = end;
        double[] dbOut = java.util.Arrays.copyOf(db, n);
        double[] wOut = new double[n];
        for (int i = 0; i < n; i++) {
            wOut[i] = Math.max(0, Math.min(wOfDb.applyAsDouble(dbOut[i]), saturation(dbOut[i])));
        }
        return new double[][] {dbOut, wOut};
    }

    double saturation(double dbC) {
        return Psychrometrics.saturationHumidityRatio(dbC, pressurePa);
    }

    private boolean inside(DoubleUnaryOperator wOfDb, double dbC) {
        double w = wOfDb.applyAsDouble(dbC);
        return w >= -1e-12 && w <= saturation(dbC) * (1 + 1e-12) + 1e-15;
    }

    /** Bisects between a point outside and one inside; returns the boundary dry bulb. */
    private double edge(DoubleUnaryOperator wOfDb, double outsideC, double insideC) {
        double out = outsideC;
        double in = insideC;
        for (int k = 0; k < BISECTIONS; k++) {
            double mid = 0.5 * (out + in);
            if (inside(wOfDb, mid)) {
                in = mid;
            } else {
                out = mid;
            }
        }
        return in;
    }
}
