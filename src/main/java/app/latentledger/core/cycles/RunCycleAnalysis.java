package app.latentledger.core.cycles;

import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.psychro.InputLimits;
import app.latentledger.core.psychro.Psychrometrics;
import app.latentledger.core.units.Quantity;

import java.util.ArrayList;
import java.util.List;

/**
 * Turns a logged record into cycles, moisture numbers, the part-load latent model's prediction
 * and findings. Pure: the log arrives as a {@link LogSeries}, nothing is read or written here.
 */
public final class RunCycleAnalysis {
    /** Airflow accepted: 0.02–10 m³/s (≈ 42–21 000 cfm), residential and light-commercial air handlers. */
    public static final double MIN_AIRFLOW_M3_PER_S = 0.02;
    public static final double MAX_AIRFLOW_M3_PER_S = 10.0;
    private static final double SENSOR_CHECK_MAX_SPLIT_K = 1.0;
    private static final int SENSOR_CHECK_MIN_SAMPLES = 5;

    private final ThresholdSettings settings;

    public RunCycleAnalysis(ThresholdSettings settings) {
        this.settings = settings;
    }

    /**
     * @param log           the record, SI
     * @param pressurePa    site pressure, Pa
     * @param airflowM3PerS air handler airflow, m³/s, or NaN when not known (masses are then NaN;
     *                      fractions do not need it)
     * @throws LogNotAnalysableException when the log cannot give runs (no compressor column and not
     *                                   both return and supply dry bulbs)
     * @throws app.latentledger.core.InvalidInputException for a pressure or airflow out of range
     */
    public RunCycleReport analyse(LogSeries log, double pressurePa, double airflowM3PerS) {
        InputLimits.checkPressure("pressure", pressurePa);
        if (!Double.isNaN(airflowM3PerS)) {
            InputLimits.check("airflow", Quantity.AIRFLOW, airflowM3PerS, MIN_AIRFLOW_M3_PER_S, MAX_AIRFLOW_M3_PER_S, null);
        }
        if (!log.has(Channel.COMPRESSOR) && !(log.has(Channel.RETURN_DB) && log.has(Channel.SUPPLY_DB))) {
            throw new LogNotAnalysableException("cannot time the compressor: the log needs a compressor column,"
                    + " or both return_db and supply_db (has " + log.channels() + ")");
        }
        if (log.size() < 2) {
            throw new LogNotAnalysableException("the log has " + log.size() + " sample(s); at least 2 are needed");
        }
        AirSeries air = new AirSeries(log, pressurePa);
        CycleDetector detector = new CycleDetector(settings);
        List<Cycle> cycles = detector.detect(log, air);
        double gapS = detector.gapS(log);
        // a probe pair that disagrees over a dry coil would bias every moisture figure: zero it first
        double[] sensor = sensorOffset(log, air, cycles, pressurePa);
        boolean corrected = Math.abs(sensor[0]) > settings.valueSi(Thresholds.SENSOR_OFFSET_RH);
        if (corrected) {
            air.correctSupplyRh(sensor[0], pressurePa);
            cycles = detector.detect(log, air);
        }
        MoistureAccounting accounting = new MoistureAccounting(settings);
        List<CycleMoisture> first = accounting.account(log, air, cycles, gapS, Double.NaN);
        double longRunS = settings.valueSi(Thresholds.LONG_CYCLE_ON_TIME);
        double floor = settings.valueSi(Thresholds.MOISTURE_REMOVAL_FLOOR);
        double[] steady = steadyDrying(cycles, first, longRunS, floor);
        List<CycleMoisture> moisture = Double.isNaN(steady[0]) ? first
                : accounting.account(log, air, cycles, gapS, steady[0]);

        double[] fit = new ModelFit(longRunS).fit(log, air, cycles, steady[0], gapS);
        LatentDegradationModel model = Double.isNaN(fit[0]) ? LatentDegradationModel.DEFAULTS
                : LatentDegradationModel.DEFAULTS.withFitted(fit[0], fit[1]);

        boolean masses = !Double.isNaN(airflowM3PerS);
        List<CycleResult> results = new ArrayList<>(cycles.size());
        double removed = 0;
        double returned = 0;
        double netPerFlow = 0;
        double onForMeasured = 0;
        double predictedWeighted = 0;
        double onForPredicted = 0;
        int blowerOnRests = 0;
        for (int k = 0; k < cycles.size(); k++) {
            Cycle c = cycles.get(k);
            CycleMoisture m = moisture.get(k);
            if (c.blowerOnSeconds() > 0) {
                blowerOnRests++;
            }
            double evapS = evaporationBefore(cycles, k);
            double predicted = Double.isNaN(evapS) ? Double.NaN : model.netOverSteadyOnTime(c.onSeconds(), evapS);
            double measured = Double.NaN;
            if (steady[1] > 0 && !Double.isNaN(m.removedPerFlow()) && !Double.isNaN(m.returnedPerFlow())) {
                measured = m.netPerFlow() / (steady[1] * c.onSeconds());
                netPerFlow += m.netPerFlow();
                onForMeasured += c.onSeconds();
            }
            if (!Double.isNaN(predicted)) {
                predictedWeighted += predicted * c.onSeconds();
                onForPredicted += c.onSeconds();
            }
            if (!Double.isNaN(m.removedPerFlow())) {
                removed += m.removedPerFlow();
            }
            if (!Double.isNaN(m.returnedPerFlow())) {
                returned += m.returnedPerFlow();
            }
            results.add(new CycleResult(c, m, masses ? m.removedPerFlow() * airflowM3PerS : Double.NaN,
                    masses ? m.returnedPerFlow() * airflowM3PerS : Double.NaN, predicted, measured));
        }
        double duration = log.durationS();
        double[] on = new double[cycles.size()];
        double onTotal = 0;
        // the time the counted cycles cover (each run and its rest, gaps left out): the run-time
        // share and the net rate are taken over it, so a log started or stopped mid-run, or broken
        // by a gap, does not dilute them with minutes whose runs and water were not counted
        double coveredS = 0;
        for (int k = 0; k < on.length; k++) {
            on[k] = cycles.get(k).onSeconds();
            onTotal += on[k];
            coveredS += cycles.get(k).onSeconds() + cycles.get(k).offSeconds();
        }
        double flow = masses ? airflowM3PerS : Double.NaN;
        boolean anyHumidity = air.humidity && !cycles.isEmpty();
        RunCycleReport draft = new RunCycleReport(log.size(), duration, log.has(Channel.COMPRESSOR), results,
                duration > 0 ? cycles.size() / (duration / 3600.0) : Double.NaN,
                Stats.median(on, on.length), coveredS > 0 ? onTotal / coveredS : Double.NaN, flow,
                anyHumidity ? removed * flow : Double.NaN, anyHumidity ? returned * flow : Double.NaN,
                anyHumidity && coveredS > 0 ? (removed - returned) * flow / coveredS : Double.NaN,
                steady[0], steady[1] * flow,
                onForMeasured > 0 ? netPerFlow / (steady[1] * onForMeasured) : Double.NaN,
                onForPredicted > 0 ? predictedWeighted / onForPredicted : Double.NaN,
                model, (int) fit[2], anyHumidity && removed > 0 ? returned / removed : Double.NaN, blowerOnRests,
                sensor[0], (int) sensor[1], corrected ? sensor[0] : 0.0, List.of());
        return withFindings(draft, new CycleFindings(settings).find(draft));
    }

    private static RunCycleReport withFindings(RunCycleReport r, List<app.latentledger.core.findings.Finding> f) {
        return new RunCycleReport(r.samples(), r.durationS(), r.compressorFromStatus(), r.cycles(), r.cyclesPerHour(),
                r.medianOnS(), r.runtimeFraction(), r.airflowM3PerS(), r.removedKg(), r.returnedKg(),
                r.netRemovalKgPerS(), r.steadyDryingW(), r.steadyRemovalKgPerS(), r.latentFractionMeasured(),
                r.latentFractionPredicted(), r.model(), r.fitRests(), r.reevaporationShare(), r.blowerOnRests(),
                r.sensorOffsetRhPct(), r.sensorCheckSamples(), r.supplyCorrectionRhPct(), f);
    }

    /**
     * Blower-on time of the rest before run k (the one whose evaporation the run must refill); for
     * the first run, or after a break, its own following rest (the model's periodic assumption).
     */
    private static double evaporationBefore(List<Cycle> cycles, int k) {
        Cycle c = cycles.get(k);
        if (k > 0) {
            Cycle p = cycles.get(k - 1);
            if (p.offComplete() && p.endIndex() == c.startIndex()) {
                return p.blowerOnSeconds();
            }
        }
        return c.blowerOnSeconds();
    }

    /** {ΔW_ss, (ΔW/v)_ss}: medians over the last quarter of wet runs at least {@code longRunS} long. */
    private static double[] steadyDrying(List<Cycle> cycles, List<CycleMoisture> m, double longRunS, double floor) {
        double[] w = new double[cycles.size()];
        double[] f = new double[cycles.size()];
        int n = 0;
        for (int k = 0; k < cycles.size(); k++) {
            CycleMoisture x = m.get(k);
            if (cycles.get(k).onSeconds() >= longRunS && x.wet() && x.lateDryingW() > floor) {
                w[n] = x.lateDryingW();
                f[n++] = x.lateDryingPerFlow();
            }
        }
        return new double[] {Stats.median(w, n), Stats.median(f, n)};
    }

    /**
     * Supply minus return RH where they should agree: blower on, compressor off for at least
     * {@link Thresholds#SENSOR_CHECK_AFTER} (coil dry), dry bulbs within 1 K (docs/methods.md §9.9).
     */
    private double[] sensorOffset(LogSeries log, AirSeries air, List<Cycle> cycles, double p) {
        if (!air.humidity) {
            return new double[] {Double.NaN, 0, Double.NaN};
        }
        double after = settings.valueSi(Thresholds.SENSOR_CHECK_AFTER);
        List<Double> d = new ArrayList<>();
        List<Double> dw = new ArrayList<>();
        for (Cycle c : cycles) {
            if (c.offBlower() != BlowerState.ON) {
                continue;
            }
            double t0 = log.timeS(c.stopIndex());
            for (int i = c.stopIndex(); i < c.endIndex(); i++) {
                if (log.timeS(i) - t0 < after || log.has(Channel.FAN) && log.status(Channel.FAN, i) != 1) {
                    continue;
                }
                double tr = air.returnDbC[i];
                double ts = air.supplyDbC[i];
                if (Double.isNaN(tr) || Double.isNaN(ts) || Math.abs(tr - ts) > SENSOR_CHECK_MAX_SPLIT_K
                        || Double.isNaN(air.returnW[i]) || Double.isNaN(air.supplyW[i])) {
                    continue;
                }
                double rhR = Psychrometrics.relativeHumidityPct(Psychrometrics.vaporPressurePa(air.returnW[i], p), tr);
                double rhS = Psychrometrics.relativeHumidityPct(Psychrometrics.vaporPressurePa(air.supplyW[i], p), ts);
                d.add(rhS - rhR);
                dw.add(air.supplyW[i] - air.returnW[i]);
            }
        }
        if (d.size() < SENSOR_CHECK_MIN_SAMPLES) {
            return new double[] {Double.NaN, d.size(), Double.NaN};
        }
        double[] a = d.stream().mapToDouble(Double::doubleValue).toArray();
        double[] b = dw.stream().mapToDouble(Double::doubleValue).toArray();
        return new double[] {Stats.median(a, a.length), a.length, Stats.median(b, b.length)};
    }
}
