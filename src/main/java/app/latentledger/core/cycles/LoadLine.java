package app.latentledger.core.cycles;

import java.util.ArrayList;
import java.util.List;

/**
 * How the unit's runtime follows the outdoor temperature: the house's load line. A cooling load
 * that grows about linearly with the outdoor temperature (the basis of the variable-base
 * degree-day and bin methods, ASHRAE Handbook—Fundamentals 2017 ch. 19) makes the runtime fraction
 * of a single-speed unit grow linearly too, from zero at the balance temperature to one where the
 * unit would run continuously.
 *
 * <p>The log is cut into whole hours from its first sample; each hour with its compressor state known
 * for at least 90 % of it gives one point (mean outdoor dry bulb, runtime fraction). The points are
 * binned by outdoor temperature ({@link #BIN_K} wide) for display, and a straight line is fitted by
 * least squares to the hours that are neither fully off nor fully on (those are clipped and carry no
 * slope). The hottest hours are the top {@link #HOT_SHARE} of hours by outdoor temperature (at least
 * {@link #MIN_HOT_HOURS}); their mean runtime fraction carries an expanded uncertainty
 * U = 2·s/√n (k = 2, type A, GUM 4.2) from hour to hour.
 *
 * @param hours               hours the line rests on
 * @param bins                runtime fraction per outdoor bin, hottest last
 * @param slopePerK           fitted runtime fraction per kelvin (NaN when it cannot be fitted)
 * @param interceptAt0C       fitted runtime fraction at 0 °C
 * @param balanceC            outdoor temperature at which the fit reaches zero runtime, °C
 * @param continuousC         outdoor temperature at which it reaches continuous running, °C
 * @param hotOutdoorC         mean outdoor temperature of the hottest hours, °C
 * @param hotRuntimeFraction  mean runtime fraction over them
 * @param hotRuntimeU         its expanded uncertainty (k = 2)
 * @param hotHours            how many hours that is
 */
public record LoadLine(int hours, List<Bin> bins, double slopePerK, double interceptAt0C, double balanceC,
                       double continuousC, double hotOutdoorC, double hotRuntimeFraction, double hotRuntimeU,
                       int hotHours) {
    static final double BIN_K = 2.0;
    static final double HOT_SHARE = 0.10;
    static final int MIN_HOT_HOURS = 3;
    static final int MIN_HOURS = 6;

    public LoadLine {
        bins = List.copyOf(bins);
    }

    /**
     * One outdoor-temperature bin.
     *
     * @param fromC           lower edge, °C
     * @param toC             upper edge, °C
     * @param hours           hours in it
     * @param runtimeFraction mean runtime fraction
     */
    public record Bin(double fromC, double toC, int hours, double runtimeFraction) {
    }

    /**
     * @param compressor per sample 1 running, 0 off, {@link LogSeries#UNKNOWN}
     * @return null without an outdoor column or with fewer than {@link #MIN_HOURS} usable hours
     */
    static LoadLine of(LogSeries log, byte[] compressor, double gapS) {
        if (!log.has(Channel.OUTDOOR_DB) || log.size() < 2) {
            return null;
        }
        int blocks = (int) Math.floor(log.durationS() / 3600.0);
        double[] on = new double[blocks];
        double[] known = new double[blocks];
        double[] tSum = new double[blocks];
        double[] tWeight = new double[blocks];
        for (int i = 0; i + 1 < log.size(); i++) {
            int b = (int) Math.floor(log.timeS(i) / 3600.0);
            if (b >= blocks) {
                break;
            }
            double dt = log.timeS(i + 1) - log.timeS(i);
            if (dt > gapS) {
                continue;
            }
            if (compressor[i] != LogSeries.UNKNOWN) {
                known[b] += dt;
                if (compressor[i] == 1) {
                    on[b] += dt;
                }
            }
            double t = log.value(Channel.OUTDOOR_DB, i);
            if (!Double.isNaN(t)) {
                tSum[b] += t * dt;
                tWeight[b] += dt;
            }
        }
        List<double[]> pts = new ArrayList<>();
        for (int b = 0; b < blocks; b++) {
            if (known[b] >= 0.9 * 3600 && tWeight[b] >= 0.9 * 3600) {
                pts.add(new double[] {tSum[b] / tWeight[b], on[b] / known[b]});
            }
        }
        if (pts.size() < MIN_HOURS) {
            return null;
        }
        pts.sort((x, y) -> Double.compare(x[0], y[0]));
        List<Bin> bins = new ArrayList<>();
        double lo = Math.floor(pts.get(0)[0] / BIN_K) * BIN_K;
        for (double from = lo; from <= pts.get(pts.size() - 1)[0]; from += BIN_K) {
            int k = 0;
            double sum = 0;
            for (double[] p : pts) {
                if (p[0] >= from && p[0] < from + BIN_K) {
                    k++;
                    sum += p[1];
                }
            }
            if (k > 0) {
                bins.add(new Bin(from, from + BIN_K, k, sum / k));
            }
        }
        double sx = 0;
        double sy = 0;
        int k = 0;
        for (double[] p : pts) {
            if (p[1] > 0.02 && p[1] < 0.98) {
                sx += p[0];
                sy += p[1];
                k++;
            }
        }
        double slope = Double.NaN;
        double intercept = Double.NaN;
        if (k >= 3) {
            double mx = sx / k;
            double my = sy / k;
            double num = 0;
            double den = 0;
            for (double[] p : pts) {
                if (p[1] > 0.02 && p[1] < 0.98) {
                    num += (p[0] - mx) * (p[1] - my);
                    den += (p[0] - mx) * (p[0] - mx);
                }
            }
            if (den > 0) {
                slope = num / den;
                intercept = my - slope * mx;
            }
        }
        boolean rising = slope > 0;
        int hot = Math.max(MIN_HOT_HOURS, (int) Math.ceil(HOT_SHARE * pts.size()));
        double ht = 0;
        double hr = 0;
        for (int i = pts.size() - hot; i < pts.size(); i++) {
            ht += pts.get(i)[0];
            hr += pts.get(i)[1];
        }
        ht /= hot;
        hr /= hot;
        double ss = 0;
        for (int i = pts.size() - hot; i < pts.size(); i++) {
            ss += (pts.get(i)[1] - hr) * (pts.get(i)[1] - hr);
        }
        double u = 2 * Math.sqrt(ss / (hot - 1)) / Math.sqrt(hot);
        return new LoadLine(pts.size(), bins, slope, intercept, rising ? -intercept / slope : Double.NaN,
                rising ? (1 - intercept) / slope : Double.NaN, ht, hr, u, hot);
    }
}
