package app.latentledger.core.cycles;

import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.Psychrometrics;

/**
 * Return and supply air per sample as the analysis needs it: dry bulb, humidity ratio, enthalpy
 * and the return air's specific volume, all SI and on the SI handbook edition (so enthalpies are
 * comparable with each other). NaN where a reading is missing or impossible.
 *
 * <p>Humidity ratio from RH by ASHRAE Handbook—Fundamentals 2017 ch. 1 eqs. 24 and 20 (pw = φ·pws,
 * W = 0.621945·pw/(p − pw)), or from a wet bulb by eq. 33/35 when no RH was logged; enthalpy by
 * eq. 32; specific volume by eq. 28. Valid for −50 to 95 °C, the core's input limits.
 */
public final class AirSeries {
    private static final HandbookEdition EDITION = HandbookEdition.SI;

    final int size;
    final double[] returnDbC;
    final double[] supplyDbC;
    final double[] returnW;
    final double[] supplyW;
    final double[] returnH;
    final double[] supplyH;
    /** 1 / v of the return air, kg dry air per m³: turns airflow into dry-air mass flow. */
    final double[] returnDryAirDensity;
    final boolean humidity;
    private final double pressurePa;
    /** Saturation pressures already worked out, by dry bulb (exact reuse, see the class). */
    private final SaturationMemo saturation = new SaturationMemo();

    /** Per-sample air of {@code log} at {@code pressurePa}, as the analysis sees it (before any probe-offset correction). */
    public static AirSeries of(LogSeries log, double pressurePa) {
        return new AirSeries(log, pressurePa);
    }

    /** Return humidity ratio per sample, kg/kg (NaN where missing), or null without return humidity. */
    public double[] returnHumidityRatio() {
        return returnW;
    }

    /** Supply humidity ratio per sample, kg/kg (NaN where missing), or null without supply humidity. */
    public double[] supplyHumidityRatio() {
        return supplyW;
    }

    /** Return dry bulb per sample, °C. */
    public double[] returnDryBulbC() {
        return returnDbC;
    }

    /** Supply dry bulb per sample, °C. */
    public double[] supplyDryBulbC() {
        return supplyDbC;
    }

    AirSeries(LogSeries log, double pressurePa) {
        this.pressurePa = pressurePa;
        size = log.size();
        returnDbC = column(log, Channel.RETURN_DB);
        supplyDbC = column(log, Channel.SUPPLY_DB);
        returnW = humidityRatios(log, Channel.RETURN_DB, Channel.RETURN_RH, Channel.RETURN_WB, pressurePa, saturation);
        supplyW = humidityRatios(log, Channel.SUPPLY_DB, Channel.SUPPLY_RH, Channel.SUPPLY_WB, pressurePa, saturation);
        humidity = returnW != null && supplyW != null;
        returnH = enthalpies(returnDbC, returnW);
        supplyH = enthalpies(supplyDbC, supplyW);
        returnDryAirDensity = new double[size];
        for (int i = 0; i < size; i++) {
            double w = returnW == null ? Double.NaN : returnW[i];
            returnDryAirDensity[i] = Double.isNaN(w) || Double.isNaN(returnDbC[i]) ? Double.NaN
                    : 1.0 / EDITION.specificVolumeM3PerKg(returnDbC[i], w, pressurePa);
        }
    }

    private static double[] column(LogSeries log, Channel c) {
        double[] v = new double[log.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = log.value(c, i);
        }
        return v;
    }

    private static double[] humidityRatios(LogSeries log, Channel db, Channel rh, Channel wb, double p,
                                           SaturationMemo saturation) {
        boolean hasRh = log.has(rh);
        boolean hasWb = log.has(wb);
        if (!log.has(db) || !hasRh && !hasWb) {
            return null;
        }
        double[] w = new double[log.size()];
        for (int i = 0; i < w.length; i++) {
            double t = log.value(db, i);
            double r = hasRh ? log.value(rh, i) : Double.NaN;
            double x = Double.NaN;
            if (!Double.isNaN(t) && !Double.isNaN(r)) {
                double pw = r / 100.0 * saturation.pascals(t);
                x = Psychrometrics.humidityRatio(pw, p);
            } else if (!Double.isNaN(t) && hasWb) {
                double b = log.value(wb, i);
                if (!Double.isNaN(b) && b <= t) {
                    x = Math.min(EDITION.humidityRatioFromWetBulb(t, b, p), Psychrometrics.saturationHumidityRatio(t, p));
                }
            }
            w[i] = x >= 0 ? x : Double.NaN;
        }
        return w;
    }

    private static double[] enthalpies(double[] db, double[] w) {
        double[] h = new double[db.length];
        for (int i = 0; i < h.length; i++) {
            h[i] = w == null || Double.isNaN(w[i]) || Double.isNaN(db[i]) ? Double.NaN : EDITION.enthalpyJPerKg(db[i], w[i]);
        }
        return h;
    }

    /**
     * Zeroes the probe pair: takes {@code offsetRhPct} off every supply RH and recomputes the supply
     * humidity ratio and enthalpy (eqs. 24, 20, 32). The offset is removed in RH because capacitive
     * probes err in RH: a constant W offset found over a dry coil at room temperature would
     * over-correct the cold on-cycle supply about twofold. (docs/methods.md §9.9 suggests W;
     * this is the reasoned departure.)
     */
    void correctSupplyRh(double offsetRhPct, double pressurePa) {
        if (supplyW == null) {
            return;
        }
        for (int i = 0; i < size; i++) {
            double t = supplyDbC[i];
            if (Double.isNaN(supplyW[i]) || Double.isNaN(t)) {
                continue;
            }
            double pws = saturation.pascals(t);
            // Psychrometrics.relativeHumidityPct's own expression, with the remembered pws
            double rh = 100.0 * Psychrometrics.vaporPressurePa(supplyW[i], pressurePa) / pws;
            double corrected = Math.max(0.0, Math.min(100.0, rh - offsetRhPct));
            supplyW[i] = Psychrometrics.humidityRatio(corrected / 100.0 * pws, pressurePa);
            supplyH[i] = EDITION.enthalpyJPerKg(t, supplyW[i]);
        }
    }

    /** Enthalpy by the edition the series uses (eq. 32), J/kg. */
    static double enthalpy(double dryBulbC, double w) {
        return EDITION.enthalpyJPerKg(dryBulbC, w);
    }

    /**
     * Takes a humidity probe's lag of {@code lagS} out of the supply humidity ratio (see
     * {@link HumidityLag}) and recomputes the supply enthalpy; gaps longer than {@code gapS} are not
     * bridged.
     */
    void sharpenSupplyHumidity(LogSeries log, double lagS, double gapS) {
        if (supplyW == null || !(lagS > 0)) {
            return;
        }
        double[] w = supplyW.clone();
        // the derivative's window slides along the log: each end only moves forward
        int a = 0;
        int b = 0;
        for (int i = 0; i < size; i++) {
            boolean gapNear = i > 0 && log.timeS(i) - log.timeS(i - 1) > gapS
                    || i + 1 < size && log.timeS(i + 1) - log.timeS(i) > gapS;
            a = HumidityLag.windowStart(log, i, a);
            b = HumidityLag.windowEnd(log, i, b);
            double d = Double.isNaN(w[i]) ? Double.NaN : HumidityLag.slope(log, w, a, b);
            double x = gapNear || Double.isNaN(d) ? w[i] : w[i] + lagS * d;
            double cap = Double.isNaN(supplyDbC[i]) ? Double.NaN : saturationHumidityRatio(supplyDbC[i]);
            supplyW[i] = Double.isNaN(x) ? x : Math.max(0.0, Double.isNaN(cap) ? x : Math.min(cap, x));
            supplyH[i] = Double.isNaN(supplyW[i]) || Double.isNaN(supplyDbC[i]) ? Double.NaN
                    : EDITION.enthalpyJPerKg(supplyDbC[i], supplyW[i]);
        }
    }

    /** Saturation pressure at {@code dryBulbC}, Pa, remembered per value (see {@link SaturationMemo}). */
    double saturationPascals(double dryBulbC) {
        return saturation.pascals(dryBulbC);
    }

    /** {@link Psychrometrics#saturationHumidityRatio} with the remembered saturation pressure. */
    private double saturationHumidityRatio(double dryBulbC) {
        double pws = saturation.pascals(dryBulbC);
        return pws >= pressurePa ? Double.POSITIVE_INFINITY : Psychrometrics.humidityRatio(pws, pressurePa);
    }

    /** W_return − W_supply at sample i (positive while the coil removes moisture), NaN if unknown. */
    double dryingW(int i) {
        return humidity ? returnW[i] - supplyW[i] : Double.NaN;
    }
}
