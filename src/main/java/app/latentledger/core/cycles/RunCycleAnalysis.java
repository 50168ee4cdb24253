package app.latentledger.core.cycles;

import app.latentledger.core.measure.FieldLimits;
import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.measure.FieldLimits;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.measure.FieldLimits;
import app.latentledger.core.psychro.InputLimits;
import app.latentledger.core.measure.FieldLimits;
import app.latentledger.core.psychro.Psychrometrics;
import app.latentledger.core.measure.FieldLimits;
import app.latentledger.core.units.Quantity;

import app.latentledger.core.measure.FieldLimits;
import java.util.ArrayList;
import app.latentledger.core.measure.FieldLimits;
import java.util.List;

/**
 * Turns a logged record into cycles, moisture numbers, the part-load latent model's prediction
 * and findings. Pure: the log arrives as a {@link LogSeries}, nothing is read or written here.
 */
public final class RunCycleAnalysis {
    /** Airflow accepted: the one airflow range of {@link FieldLimits#AIRFLOW}. */
    public static final double MIN_AIRFLOW_M3_PER_S = FieldLimits.AIRFLOW.minSi();
    public static final double MAX_AIRFLOW_M3_PER_S = FieldLimits.AIRFLOW.maxSi();
    /** Supply and return dry bulbs further apart than this are not compared (air still mixing). */
    private static final double SENSOR_CHECK_MAX_SPLIT_K = 3.0;
    private static final int SENSOR_CHECK_MIN_SAMPLES = 5;

    private final ThresholdSettings settings;

    public RunCycleAnalysis(ThresholdSettings settings) {
        this.settings = settings;
    }

    /** {@link #analyse(LogSeries, double, double, double)} with the same airflow in rests as in runs. */
    public RunCycleReport analyse(LogSeries log, double pressurePa, double airflowM3PerS) {
        return analyse(log, pressurePa, airflowM3PerS, Double.NaN);
    }

    /**
     * @param log              the record, SI
     * @param pressurePa       site pressure, Pa
     * @param airflowM3PerS    air handler airflow during runs, m³/s, or NaN when not known (masses are
     *                         then NaN; fractions do not need it)
     * @param fanAirflowM3PerS airflow with the blower alone (fan-only speed), m³/s, for the water blown
     *                         back in rests; NaN when the same as during runs
     * @throws LogNotAnalysableException when the log cannot give runs (no compressor column and not
     *                                   both return and supply dry bulbs)
     * @throws app.latentledger.core.InvalidInputException for a pressure or airflow out of range
     */
    public RunCycleReport analyse(LogSeries log, double pressurePa, double airflowM3PerS, double fanAirflowM3PerS) {
        InputLimits.checkPressure("pressure", pressurePa);
        if (!Double.isNaN(airflowM3PerS)) {
            InputLimits.check("airflow", Quantity.AIRFLOW, airflowM3PerS, MIN_AIRFLOW_M3_PER_S, MAX_AIRFLOW_M3_PER_S, null);
        }
        if (!Double.isNaN(fanAirflowM3PerS)) {
            InputLimits.check("fan-only airflow", Quantity.AIRFLOW, fanAirflowM3PerS, MIN_AIRFLOW_M3_PER_S,
                    MAX_AIRFLOW_M3_PER_S, null);
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
        CycleDetector.Detection found = detector.detect(log, air);
        List<Cycle> cycles = found.cycles();
        double gapS = detector.gapS(log);
        // a probe pair that disagrees over a dry coil would bias every moisture figure: zero it first,
        // but only when the blower ran over a dry coil long enough to tell
        double[] sensor = sensorOffset(log, air, cycles, found.blower(), pressurePa);
        boolean corrected = Math.abs(sensor[0]) > settings.valueSi(Thresholds.SENSOR_OFFSET_RH)
                && sensor[3] >= settings.valueSi(Thresholds.SENSOR_CHECK_MIN_TIME);
        if (corrected) {
            air.correctSupplyRh(sensor[0], pressurePa);
            found = detector.detect(log, air);
            cycles = found.cycles();
        }
        // a supply humidity probe slower than its thermistor: take its extra lag out, then look again
        double humidityLagS = HumidityLag.estimate(log, air, cycles, found.blower());
        if (humidityLagS > 0) {
            air.sharpenSupplyHumidity(log, humidityLagS, gapS);
            found = detector.detect(log, air);
            cycles = found.cycles();
        }
        byte[] blower = found.blower();
        // fan-only airflow ÷ run airflow: evaporation in rests scales with the air moved then
        double restFlow = Double.isNaN(fanAirflowM3PerS) ? airflowM3PerS : fanAirflowM3PerS;
        double flowRatio = !Double.isNaN(fanAirflowM3PerS) && !Double.isNaN(airflowM3PerS)
                ? fanAirflowM3PerS / airflowM3PerS : 1.0;
        MoistureAccounting accounting = new MoistureAccounting(settings);
        List<CycleMoisture> first = accounting.account(log, air, cycles, blower, gapS, Double.NaN);
        double longRunS = settings.valueSi(Thresholds.LONG_CYCLE_ON_TIME);
        double floor = settings.valueSi(Thresholds.MOISTURE_REMOVAL_FLOOR);
        double[] steady = steadyDrying(cycles, first, longRunS, floor);
        List<CycleMoisture> moisture = Double.isNaN(steady[0]) ? first
                : accounting.account(log, air, cycles, blower, gapS, steady[0]);

        double[] fit = new ModelFit(longRunS).fit(log, air, cycles, blower, flowRatio, steady[0], gapS);
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
        double[] delays = new double[cycles.size()];
        int delayed = 0;
        for (int k = 0; k < cycles.size(); k++) {
            Cycle c = cycles.get(k);
            CycleMoisture m = moisture.get(k);
            if (c.blowerOnSeconds() > 0) {
                blowerOnRests++;
                if (c.offBlower() == BlowerState.OFF) {
                    delays[delayed++] = c.blowerOnSeconds();
                }
            }
            double evapS = evaporationBefore(cycles, k);
            double predicted = Double.isNaN(evapS) ? Double.NaN : model.netOverSteadyOnTime(c.onSeconds(), evapS);
            double measured = Double.NaN;
            // returned water in run-airflow units: the rest moved flowRatio times the air
            double returnedRunUnits = m.returnedPerFlow() * flowRatio;
            if (steady[1] > 0 && !Double.isNaN(m.removedPerFlow()) && !Double.isNaN(m.returnedPerFlow())) {
                measured = (m.removedPerFlow() - returnedRunUnits) / (steady[1] * c.onSeconds());
                netPerFlow += m.removedPerFlow() - returnedRunUnits;
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
                returned += returnedRunUnits;
            }
            results.add(new CycleResult(c, m, masses ? m.removedPerFlow() * airflowM3PerS : Double.NaN,
                    masses ? m.returnedPerFlow() * restFlow : Double.NaN, predicted, measured));
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
        // a share needs a clearly positive removal: one below the noise floor held over the run time
        // (in kg per m³/s, with dry air near 1.2 kg/m³) is not measurable, whatever its sign
        double share = anyHumidity && removed > 1.2 * floor * onTotal ? returned / removed : Double.NaN;
        HouseHumidity house = HouseHumidity.of(log, air, pressurePa, offMask(log, found.compressor(), cycles),
                settings.valueSi(Thresholds.INDOOR_RH_TARGET), settings.valueSi(Thresholds.INDOOR_DEW_POINT_MAX),
                settings.valueSi(Thresholds.LONG_OFF_PERIOD), gapS);
        LoadLine load = LoadLine.of(log, found.compressor(), gapS);
        boolean inferred = !log.has(Channel.FAN);
        RunCycleReport draft = new RunCycleReport(log.size(), duration, log.has(Channel.COMPRESSOR), results,
                duration > 0 ? cycles.size() / (duration / 3600.0) : Double.NaN,
                Stats.median(on, on.length), coveredS > 0 ? onTotal / coveredS : Double.NaN, flow,
                anyHumidity ? removed * flow : Double.NaN, anyHumidity ? returned * flow : Double.NaN,
                anyHumidity && coveredS > 0 ? (removed - returned) * flow / coveredS : Double.NaN,
                steady[0], steady[1] * flow,
                onForMeasured > 0 ? netPerFlow / (steady[1] * onForMeasured) : Double.NaN,
                onForPredicted > 0 ? predictedWeighted / onForPredicted : Double.NaN,
                model, (int) fit[2], share, blowerOnRests,
                sensor[0], (int) sensor[1], corrected ? sensor[0] : 0.0, List.of(),
                masses ? restFlow : Double.NaN, Stats.median(delays, delayed), delayed, inferred,
                sensor[2], sensor[3], house, load, new CycleSeries(air, found.compressor(), blower, inferred),
                humidityLagS);
        return draft.withFindings(new CycleFindings(settings).find(draft));
    }

    /** Samples with the compressor off: from its column, else the rests of the cycles found (all, when none). */
    private static boolean[] offMask(LogSeries log, byte[] compressor, List<Cycle> cycles) {
        boolean[] off = new boolean[log.size()];
        boolean status = log.has(Channel.COMPRESSOR);
        for (int i = 0; i < off.length; i++) {
            off[i] = status ? log.status(Channel.COMPRESSOR, i) == 0
                    : cycles.isEmpty() || compressor[i] == 0;
        }
        return off;
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
     * Where the probes should agree: blower on, compressor off for at least
     * {@link Thresholds#SENSOR_CHECK_AFTER} (coil dry). Compared in moisture terms, never as RH at two
     * temperatures: the supply RH against the RH the return's vapour pressure gives at the supply's own
     * dry bulb (100·p_w,return / p_ws(t_supply), ASHRAE Handbook—Fundamentals 2017 ch. 1 eqs. 20, 24),
     * so blower heat or duct gains that warm the supply cannot look like a probe error.
     *
     * @return {median supply − expected RH, % RH; samples; median dew-point difference, K; seconds}
     */
    private double[] sensorOffset(LogSeries log, AirSeries air, List<Cycle> cycles, byte[] blower, double p) {
        if (!air.humidity) {
            return new double[] {Double.NaN, 0, Double.NaN, 0};
        }
        double after = settings.valueSi(Thresholds.SENSOR_CHECK_AFTER);
        // primitive columns, not boxed lists: a week's off-cycles hold a few hundred thousand samples
        double[] a = new double[64];
        double[] b = new double[64];
        int m = 0;
        double seconds = 0;
        double gap = settings.valueSi(Thresholds.GAP_FACTOR) * log.nominalIntervalS();
        for (Cycle c : cycles) {
            double t0 = log.timeS(c.stopIndex());
            for (int i = c.stopIndex(); i < c.endIndex(); i++) {
                if (log.timeS(i) - t0 < after || blower[i] != 1) {
                    continue;
                }
                double tr = air.returnDbC[i];
                double ts = air.supplyDbC[i];
                if (Double.isNaN(tr) || Double.isNaN(ts) || Math.abs(tr - ts) > SENSOR_CHECK_MAX_SPLIT_K
                        || Double.isNaN(air.returnW[i]) || Double.isNaN(air.supplyW[i])) {
                    continue;
                }
                double pwR = Psychrometrics.vaporPressurePa(air.returnW[i], p);
                // Psychrometrics.relativeHumidityPct's own expression, pws remembered per dry bulb
                double pws = air.saturationPascals(ts);
                double expected = 100.0 * pwR / pws;
                double rhS = 100.0 * Psychrometrics.vaporPressurePa(air.supplyW[i], p) / pws;
                if (m == a.length) {
                    a = java.util.Arrays.copyOf(a, 2 * m);
                    b = java.util.Arrays.copyOf(b, 2 * m);
                }
                a[m] = rhS - expected;
                b[m++] = Psychrometrics.dewPointC(air.supplyW[i], p) - Psychrometrics.dewPointC(air.returnW[i], p);
                double dt = i + 1 < log.size() ? log.timeS(i + 1) - log.timeS(i) : 0;
                seconds += dt > gap ? 0 : dt;
            }
        }
        if (m < SENSOR_CHECK_MIN_SAMPLES) {
            return new double[] {Double.NaN, m, Double.NaN, seconds};
        }
        return new double[] {Stats.median(a, m), m, Stats.median(b, m), seconds};
    }
}
