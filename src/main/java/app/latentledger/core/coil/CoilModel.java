package app.latentledger.core.coil;

import app.latentledger.core.psychro.Psychrometrics;
import app.latentledger.core.psychro.SaturationPressure;
import app.latentledger.core.units.Quantity;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * The coil check as a function of its readings, for uncertainty propagation: the same equations as
 * {@link CoilProcess} and {@link ApparatusDewPoint}, evaluated at any perturbed set of readings.
 * The site pressure is held exact (it is common to both states; its effect is discussed in
 * docs/methods.md §2). Probes are treated as independent (return and supply read by different
 * instruments); a single probe moved between the two would make the errors correlated and the
 * humidity-ratio drop markedly more certain (docs/methods.md §9.7). With outdoor air the
 * entering state is the {@link MixedAir mix} of the return and outdoor readings, so the outdoor
 * dry bulb, humidity and the outdoor-air fraction enter the budget too (independent of the rest).
 */
public final class CoilModel implements Propagation.Model {
    static final int ENTERING_DB = 0;
    static final int ENTERING_HUMIDITY = 1;
    static final int LEAVING_DB = 2;
    static final int LEAVING_HUMIDITY = 3;
    static final int AIRFLOW = 4;
    static final int COIL = 5;
    static final int CONDENSATE_VOLUME = 6;
    static final int CONDENSATE_TIME = 7;
    static final int OUTDOOR_DB = 8;
    static final int OUTDOOR_HUMIDITY = 9;
    static final int OUTDOOR_FRACTION = 10;

    private final CoilReadings readings;
    private final List<UncertainInput> inputs;

    public CoilModel(CoilReadings readings) {
        this.readings = readings;
        AirReading e = readings.entering();
        AirReading l = readings.leaving();
        List<UncertainInput> in = new ArrayList<>();
        in.add(new UncertainInput("enteringDryBulb", e.where() + " dry bulb", Quantity.TEMPERATURE_DIFFERENCE,
                e.dryBulbC(), e.dryBulbTolK()));
        in.add(new UncertainInput("enteringHumidity", e.where() + " " + e.humidityKind().label(),
                e.humidityKind().toleranceQuantity(), e.humiditySi(), e.humidityTolSi()));
        in.add(new UncertainInput("leavingDryBulb", l.where() + " dry bulb", Quantity.TEMPERATURE_DIFFERENCE,
                l.dryBulbC(), l.dryBulbTolK()));
        in.add(new UncertainInput("leavingHumidity", l.where() + " " + l.humidityKind().label(),
                l.humidityKind().toleranceQuantity(), l.humiditySi(), l.humidityTolSi()));
        in.add(new UncertainInput("airflow", "airflow", Quantity.AIRFLOW, readings.airflowM3PerS(),
                readings.airflowTolFraction() * readings.airflowM3PerS()));
        boolean coil = readings.hasCoilTemperature();
        in.add(new UncertainInput("coilTemperature", "coil temperature", Quantity.TEMPERATURE_DIFFERENCE,
                coil ? readings.coilTemperatureC() : Double.NaN, coil ? readings.coilTolK() : 0));
        Condensate c = readings.condensate();
        in.add(new UncertainInput("condensateVolume", "condensate volume", Quantity.WATER_VOLUME,
                c != null ? c.volumeM3() : Double.NaN, c != null ? c.volumeTolFraction() * c.volumeM3() : 0));
        in.add(new UncertainInput("condensateTime", "condensate time", Quantity.DURATION_SECONDS,
                c != null ? c.seconds() : Double.NaN, c != null ? c.secondsTolS() : 0));
        OutdoorAir o = readings.outdoor();
        AirReading oa = o != null ? o.air() : null;
        in.add(new UncertainInput("outdoorDryBulb", "outdoor dry bulb", Quantity.TEMPERATURE_DIFFERENCE,
                oa != null ? oa.dryBulbC() : Double.NaN, oa != null ? oa.dryBulbTolK() : 0));
        in.add(new UncertainInput("outdoorHumidity", oa != null ? "outdoor " + oa.humidityKind().label() : "outdoor humidity",
                oa != null ? oa.humidityKind().toleranceQuantity() : Quantity.RELATIVE_HUMIDITY,
                oa != null ? oa.humiditySi() : Double.NaN, oa != null ? oa.humidityTolSi() : 0));
        in.add(new UncertainInput("outdoorAirFraction", "outdoor-air fraction (by volume)", Quantity.FRACTION_PERCENT,
                o != null ? o.fraction() : Double.NaN, o != null ? o.fractionTol() : 0));
        this.inputs = Collections.unmodifiableList(in);
    }

    /** The uncertainty budget's inputs, in model order. */
    public List<UncertainInput> inputs() {
        return inputs;
    }

    @Override
    public double[] evaluate(double[] x, boolean clamp) {
        double p = readings.pressurePa();
        double[] y = new double[Measurand.values().length];
        double tr = x[ENTERING_DB];
        double t2 = x[LEAVING_DB];
        double wr = AirReading.humidityRatio(readings.entering().humidityKind(), p, tr, x[ENTERING_HUMIDITY], clamp);
        double w2 = AirReading.humidityRatio(readings.leaving().humidityKind(), p, t2, x[LEAVING_HUMIDITY], clamp);
        double t1 = tr;
        double w1 = wr;
        double wo = Double.NaN;
        if (readings.hasOutdoorAir()) {
            double to = x[OUTDOOR_DB];
            wo = AirReading.humidityRatio(readings.outdoor().air().humidityKind(), p, to, x[OUTDOOR_HUMIDITY], clamp);
            double f = x[OUTDOOR_FRACTION];
            if (f < 0 || f > 1) {
                // a share beyond 0…100 % cannot be the true value: held at the limit (Monte Carlo) or absent
                f = clamp ? Math.max(0, Math.min(1, f)) : Double.NaN;
            }
            if (Double.isFinite(wr) && Double.isFinite(wo) && Double.isFinite(f)) {
                var mix = MixedAir.of(p, tr, wr, to, wo, f);
                t1 = mix.dryBulbC();
                w1 = mix.humidityRatio();
            } else {
                w1 = Double.NaN;
            }
        }
        if (!(Double.isFinite(w1) && Double.isFinite(w2))) {
            java.util.Arrays.fill(y, Double.NaN);
            return y;
        }
        CoilProcess q = CoilProcess.of(p, t1, w1, t2, w2, x[AIRFLOW], readings.airflowAt());
        ApparatusDewPoint adp = ApparatusDewPoint.find(p, t1, w1, t2, w2);
        double dp1 = dewPoint(w1, p);
        double coil = readings.hasCoilTemperature() ? x[COIL] : adp.temperatureC();
        set(y, Measurand.ENTERING_DEW_POINT, dp1);
        set(y, Measurand.LEAVING_DEW_POINT, dewPoint(w2, p));
        set(y, Measurand.ENTERING_RELATIVE_HUMIDITY,
                Psychrometrics.relativeHumidityPct(Psychrometrics.vaporPressurePa(w1, p), t1));
        set(y, Measurand.RETURN_DEW_POINT, dewPoint(wr, p));
        set(y, Measurand.RETURN_RELATIVE_HUMIDITY,
                Psychrometrics.relativeHumidityPct(Psychrometrics.vaporPressurePa(wr, p), tr));
        set(y, Measurand.OUTDOOR_DEW_POINT, dewPoint(wo, p));
        set(y, Measurand.HUMIDITY_RATIO_DROP, q.humidityRatioDrop());
        set(y, Measurand.TEMPERATURE_DROP, q.temperatureDropK());
        set(y, Measurand.SENSIBLE, q.sensibleW());
        set(y, Measurand.LATENT, q.latentW());
        set(y, Measurand.TOTAL, q.totalW());
        set(y, Measurand.SHR, q.sensibleHeatRatio());
        set(y, Measurand.MOISTURE_REMOVAL, q.moistureRemovalKgPerS());
        set(y, Measurand.LATENT_PER_AIRFLOW, q.latentPerAirflow());
        set(y, Measurand.APPARATUS_DEW_POINT, adp.temperatureC());
        set(y, Measurand.BYPASS_FACTOR, adp.bypassFactor());
        set(y, Measurand.COIL_TEMPERATURE, coil);
        set(y, Measurand.DEW_POINT_MARGIN, dp1 - coil);
        set(y, Measurand.AIRFLOW_PER_CAPACITY, q.airflowPerCapacity());
        double rate = readings.condensate() == null ? Double.NaN
                : Condensate.rateKgPerS(x[CONDENSATE_VOLUME], x[CONDENSATE_TIME]);
        set(y, Measurand.CONDENSATE_RATE, rate);
        set(y, Measurand.CONDENSATE_MINUS_AIRSIDE, rate - q.moistureRemovalKgPerS());
        return y;
    }

    private static double dewPoint(double w, double p) {
        return w > 0 ? SaturationPressure.dewPointC(Psychrometrics.vaporPressurePa(w, p)) : Double.NaN;
    }

    private static void set(double[] y, Measurand m, double v) {
        y[m.ordinal()] = v;
    }
}
