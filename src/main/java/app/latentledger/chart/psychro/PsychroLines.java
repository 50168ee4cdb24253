package app.latentledger.chart.psychro;

import app.latentledger.chart.axis.NiceTicks;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.Psychrometrics;
import app.latentledger.core.psychro.SaturationPressure;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

/**
 * Computes the chart's line families at one pressure, all from {@code core.psychro} (ASHRAE
 * Handbook—Fundamentals 2017, ch. 1):
 * <ul>
 *   <li>saturation curve: Ws(t) from eq. 23 with pws from eqs. 5/6;</li>
 *   <li>relative humidity φ: W = 0.621945 φ pws(t) / (p − φ pws(t)), eqs. 20 and 24;</li>
 *   <li>wet bulb t*: W(t) from the psychrometer equation of the chart's edition, eq. 33 (eq. 35 below
 *       freezing), via {@link HandbookEdition#humidityRatioFromWetBulb};</li>
 *   <li>enthalpy h: W = (h − h(t, 0)) / (h(t, 1) − h(t, 0)), exact because eq. 32 is linear in W;</li>
 *   <li>specific volume v: likewise from eq. 28, linear in W.</li>
 * </ul>
 * Wet-bulb and enthalpy lines use {@code HandbookEdition.of(units)} so the chart agrees with the
 * tables the tech reads. Valid wherever the core is: −50…95 °C, 50–110 kPa.
 */
public final class PsychroLines {
    /** Least spacing wanted between neighbouring lines of a family, device units. */
    static final double MIN_DB_TICK_PX = 60;
    static final double MIN_ENTHALPY_PX = 70;
    static final double MIN_VOLUME_PX = 100;

    private final UnitSystem units;
    private final double pressurePa;
    private final HandbookEdition edition;
    private final CurveSampler sampler;

    public PsychroLines(UnitSystem units, double pressurePa) {
        this.units = units;
        this.pressurePa = pressurePa;
        this.edition = HandbookEdition.of(units);
        this.sampler = new CurveSampler(pressurePa);
    }

    public UnitSystem units() {
        return units;
    }

    public double pressurePa() {
        return pressurePa;
    }

    public HandbookEdition edition() {
        return edition;
    }

    /** Every family over the visible window, sampled finely enough for a plot this many pixels wide. */
    public List<ChartCurve> compute(ChartRange visible, double plotWidthPx) {
        int samples = (int) Math.max(48, Math.min(400, plotWidthPx / 5));
        double from = visible.dbMinC();
        double to = visible.dbMaxC();
        List<ChartCurve> out = new ArrayList<>();
        out.add(saturation(from, to, samples));
        for (int rh = 10; rh <= 90; rh += 10) {
            add(out, ChartCurve.Kind.RELATIVE_HUMIDITY, rh, rh + " %", relativeHumidity(rh), from, to, samples);
        }
        double dbStep = dryBulbStepDisplay(visible, plotWidthPx);
        for (double wbShown : NiceTicks.values(toDisplayTemp(from) - dbStep * 8, toDisplayTemp(to), dbStep)) {
            double wbC = Quantity.TEMPERATURE.fromDisplay(units, wbShown);
            if (wbC < -40 || wbC > to) {
                continue;
            }
            add(out, ChartCurve.Kind.WET_BULB, wbC, NiceTicks.label(wbShown, dbStep), wetBulb(wbC),
                    Math.max(wbC, from), to, samples);
        }
        double hStep = enthalpyStepDisplay(visible, plotWidthPx);
        double hLow = Quantity.ENTHALPY.toDisplay(units, edition.enthalpyJPerKg(from, visible.wMin()));
        double hHigh = Quantity.ENTHALPY.toDisplay(units, edition.enthalpyJPerKg(to, visible.wMax()));
        for (double hShown : NiceTicks.values(hLow, hHigh, hStep)) {
            double hSi = Quantity.ENTHALPY.fromDisplay(units, hShown);
            add(out, ChartCurve.Kind.ENTHALPY, hSi, NiceTicks.label(hShown, hStep), enthalpy(hSi), from, to, samples);
        }
        double vStep = volumeStepDisplay(visible, plotWidthPx);
        double vLow = Quantity.SPECIFIC_VOLUME.toDisplay(units, edition.specificVolumeM3PerKg(from, visible.wMin(),
                pressurePa));
        double vHigh = Quantity.SPECIFIC_VOLUME.toDisplay(units, edition.specificVolumeM3PerKg(to, visible.wMax(),
                pressurePa));
        for (double vShown : NiceTicks.values(vLow, vHigh, vStep)) {
            double vSi = Quantity.SPECIFIC_VOLUME.fromDisplay(units, vShown);
            add(out, ChartCurve.Kind.SPECIFIC_VOLUME, vSi, NiceTicks.label(vShown, vStep), volume(vSi), from, to,
                    samples);
        }
        return out;
    }

    /** Dry-bulb tick step in display degrees; wet-bulb lines use the same step. */
    public double dryBulbStepDisplay(ChartRange visible, double plotWidthPx) {
        double span = toDisplayTemp(visible.dbMaxC()) - toDisplayTemp(visible.dbMinC());
        return NiceTicks.step(span, plotWidthPx, MIN_DB_TICK_PX);
    }

    double enthalpyStepDisplay(ChartRange visible, double plotWidthPx) {
        double span = Quantity.ENTHALPY.toDisplay(units, edition.enthalpyJPerKg(visible.dbMaxC(), visible.wMax())
                - edition.enthalpyJPerKg(visible.dbMinC(), visible.wMin()));
        return NiceTicks.step(span, plotWidthPx, MIN_ENTHALPY_PX);
    }

    double volumeStepDisplay(ChartRange visible, double plotWidthPx) {
        double span = Quantity.SPECIFIC_VOLUME.toDisplay(units,
                edition.specificVolumeM3PerKg(visible.dbMaxC(), visible.wMax(), pressurePa)
                        - edition.specificVolumeM3PerKg(visible.dbMinC(), visible.wMin(), pressurePa));
        return NiceTicks.step(span, plotWidthPx, MIN_VOLUME_PX);
    }

    /** Humidity ratio at saturation, eq. 23. */
    public double saturationHumidityRatio(double dryBulbC) {
        return Psychrometrics.saturationHumidityRatio(dryBulbC, pressurePa);
    }

    /** W along a constant-RH line, eqs. 20 and 24. */
    public DoubleUnaryOperator relativeHumidity(double rhPct) {
        return t -> Psychrometrics.humidityRatio(rhPct / 100.0 * SaturationPressure.pascals(t), pressurePa);
    }

    /** W along a constant-wet-bulb line, eq. 33/35 of the chart's edition. */
    public DoubleUnaryOperator wetBulb(double wetBulbC) {
        return t -> edition.humidityRatioFromWetBulb(t, wetBulbC, pressurePa);
    }

    /** W along a constant-enthalpy line; eq. 32 is linear in W, so two evaluations give it exactly. */
    public DoubleUnaryOperator enthalpy(double enthalpyJPerKg) {
        return t -> {
            double h0 = edition.enthalpyJPerKg(t, 0.0);
            return (enthalpyJPerKg - h0) / (edition.enthalpyJPerKg(t, 1.0) - h0);
        };
    }

    /** W along a constant-specific-volume line; eq. 28 is linear in W. */
    public DoubleUnaryOperator volume(double volumeM3PerKg) {
        return t -> {
            double v0 = edition.specificVolumeM3PerKg(t, 0.0, pressurePa);
            return (volumeM3PerKg - v0) / (edition.specificVolumeM3PerKg(t, 1.0, pressurePa) - v0);
        };
    }

    private ChartCurve saturation(double from, double to, int samples) {
        // denser than the other lines: it is the chart's strongest line and curves the most
        int n = samples * 2;
        double[] db = new double[n];
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            db[i] = from + (to - from) * i / (n - 1);
            w[i] = saturationHumidityRatio(db[i]);
        }
        return new ChartCurve(ChartCurve.Kind.SATURATION, Double.NaN, "100 %", db, w);
    }

    private void add(List<ChartCurve> out, ChartCurve.Kind kind, double valueSi, String label, DoubleUnaryOperator f,
                     double from, double to, int samples) {
        if (!(to > from)) {
            return;
        }
        double[][] line = sampler.sample(f, from, to, samples);
        if (line != null && line[0].length >= 2) {
            out.add(new ChartCurve(kind, valueSi, label, line[0], line[1]));
        }
    }

    private double toDisplayTemp(double c) {
        return Quantity.TEMPERATURE.toDisplay(units, c);
    }
}
