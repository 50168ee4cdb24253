package app.latentledger.core.cycles;

import app.latentledger.core.psychro.Psychrometrics;

import java.util.ArrayList;
import java.util.List;

/**
 * What the house's humidity did over the log, from the return air (the house's air as the air
 * handler draws it): dew point and RH median, 95th percentile and maximum; the hours above the RH
 * target and above the dew-point benchmark; how fast the house's humidity ratio rose while the unit
 * was off for a long stretch; and the indoor against the outdoor dew point when the log has outdoor
 * columns.
 *
 * <p>Dew point and RH from the humidity ratio by ASHRAE Handbook—Fundamentals 2017 ch. 1 (eqs. 20,
 * 24 and the dew-point inversion of eqs. 5/6). The off-period trend is the least-squares slope of the
 * return humidity ratio against time over each compressor-off stretch at least
 * {@link app.latentledger.core.findings.Thresholds#LONG_OFF_PERIOD} long, leaving out its first
 * {@link #SETTLE_S} (a wet coil may still be giving water back); the median of those slopes is
 * reported. Samples are time-weighted by the interval they start (a logger sample stands for it).
 *
 * @param dewPointMedianC        return dew point, median, °C (NaN without return humidity)
 * @param dewPointP95C           95th percentile, °C
 * @param dewPointMaxC           maximum, °C
 * @param rhMedianPct            return RH median, %
 * @param rhP95Pct               95th percentile, %
 * @param rhMaxPct               maximum, %
 * @param hoursAboveRhTarget     hours with return RH above the target
 * @param hoursAboveDewPoint     hours with return dew point above the benchmark
 * @param offTrendPerS           median rise of the return humidity ratio during long off periods,
 *                               kg/kg per s (NaN when there is no long off period)
 * @param longOffPeriods         off periods the trend rests on
 * @param longOffHours           their total length, h
 * @param outdoorDewPointMedianC outdoor dew point median, °C (NaN without outdoor humidity)
 */
public record HouseHumidity(double dewPointMedianC, double dewPointP95C, double dewPointMaxC, double rhMedianPct,
                            double rhP95Pct, double rhMaxPct, double hoursAboveRhTarget, double hoursAboveDewPoint,
                            double offTrendPerS, int longOffPeriods, double longOffHours,
                            double outdoorDewPointMedianC) {
    /** First part of an off period left out of the trend, s. */
    static final double SETTLE_S = 600.0;

    /** Indoor minus outdoor median dew point, K (NaN when either is unknown). */
    public double indoorMinusOutdoorDewPointK() {
        return dewPointMedianC - outdoorDewPointMedianC;
    }

    /** Off-period trend in kg/kg per hour. */
    public double offTrendPerHour() {
        return offTrendPerS * 3600.0;
    }

    /**
     * @param off per sample true while the compressor was off (the unit off or satisfied)
     * @return null when the log has no return humidity
     */
    static HouseHumidity of(LogSeries log, AirSeries air, double pressurePa, boolean[] off, double rhTargetPct,
                            double dewPointBenchmarkC, double longOffS, double gapS) {
        if (air.returnW == null) {
            return null;
        }
        int n = log.size();
        // dew point rises with the humidity ratio at a fixed pressure: percentiles of W are the dew
        // point's, so the (iterative) dew point is worked out three times, not once per sample
        double[] ws = new double[n];
        double[] rh = new double[n];
        int m = 0;
        double aboveRh = 0;
        double aboveDp = 0;
        double wBenchmark = Psychrometrics.humidityRatio(
                app.latentledger.core.psychro.SaturationPressure.pascals(dewPointBenchmarkC), pressurePa);
        for (int i = 0; i < n; i++) {
            double w = air.returnW[i];
            double t = air.returnDbC[i];
            if (Double.isNaN(w) || Double.isNaN(t)) {
                continue;
            }
            // Psychrometrics.relativeHumidityPct's own expression, the saturation pressure remembered per dry bulb
            double r = 100.0 * Psychrometrics.vaporPressurePa(w, pressurePa) / air.saturationPascals(t);
            ws[m] = w;
            rh[m++] = r;
            double dt = i + 1 < n ? log.timeS(i + 1) - log.timeS(i) : 0;
            if (dt > gapS) {
                dt = 0;
            }
            if (r > rhTargetPct) {
                aboveRh += dt;
            }
            if (w > wBenchmark) {
                aboveDp += dt;
            }
        }
        if (m == 0) {
            return null;
        }
        // order statistics by selection, not by sorting a week of samples twice
        double[] dps = {Psychrometrics.dewPointC(Stats.median(ws, m), pressurePa),
            Psychrometrics.dewPointC(Stats.percentile(ws, m, 0.95), pressurePa),
            Psychrometrics.dewPointC(Stats.max(ws, m), pressurePa)};
        List<Double> slopes = new ArrayList<>();
        double offS = 0;
        int i = 0;
        while (i < n) {
            if (!off[i]) {
                i++;
                continue;
            }
            int j = i;
            while (j + 1 < n && off[j + 1] && log.timeS(j + 1) - log.timeS(j) <= gapS) {
                j++;
            }
            double len = log.timeS(j) - log.timeS(i);
            if (len >= longOffS) {
                double s = slope(log, air.returnW, i, j, log.timeS(i) + SETTLE_S);
                if (!Double.isNaN(s)) {
                    slopes.add(s);
                    offS += len;
                }
            }
            i = j + 1;
        }
        double[] sl = slopes.stream().mapToDouble(Double::doubleValue).toArray();
        double outdoor = outdoorDewPoint(log, pressurePa);
        return new HouseHumidity(dps[0], dps[1], dps[2], Stats.median(rh, m),
                Stats.percentile(rh, m, 0.95), Stats.max(rh, m), aboveRh / 3600.0, aboveDp / 3600.0, Stats.median(sl, sl.length),
                sl.length, offS / 3600.0, outdoor);
    }

    /** Least-squares slope of v against time over [from, to] from time {@code fromS}. */
    private static double slope(LogSeries log, double[] v, int from, int to, double fromS) {
        double st = 0;
        double sv = 0;
        int k = 0;
        for (int i = from; i <= to; i++) {
            if (log.timeS(i) >= fromS && !Double.isNaN(v[i])) {
                st += log.timeS(i);
                sv += v[i];
                k++;
            }
        }
        if (k < 3) {
            return Double.NaN;
        }
        double mt = st / k;
        double mv = sv / k;
        double num = 0;
        double den = 0;
        for (int i = from; i <= to; i++) {
            if (log.timeS(i) >= fromS && !Double.isNaN(v[i])) {
                double dt = log.timeS(i) - mt;
                num += dt * (v[i] - mv);
                den += dt * dt;
            }
        }
        return den > 0 ? num / den : Double.NaN;
    }

    private static double outdoorDewPoint(LogSeries log, double p) {
        if (!log.has(Channel.OUTDOOR_DB) || !log.has(Channel.OUTDOOR_RH)) {
            return Double.NaN;
        }
        double[] d = new double[log.size()];
        int m = 0;
        for (int i = 0; i < log.size(); i++) {
            double t = log.value(Channel.OUTDOOR_DB, i);
            double r = log.value(Channel.OUTDOOR_RH, i);
            if (!Double.isNaN(t) && !Double.isNaN(r) && r > 0) {
                double w = Psychrometrics.humidityRatio(r / 100.0
                        * app.latentledger.core.psychro.SaturationPressure.pascals(t), p);
                d[m++] = Psychrometrics.dewPointC(w, p);
            }
        }
        return Stats.median(d, m);
    }
}
