package app.latentledger.core.cycles;

import app.latentledger.core.findings.Evidence;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.FindingCode;
import app.latentledger.core.findings.Severity;
import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.units.Quantity;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

/**
 * Findings from logged run cycles. Codes are stable: {@code short-cycling},
 * {@code short-cycling-limits-latent}, {@code off-cycle-reevaporation},
 * {@code fan-off-delay-reevaporation}, {@code coil-never-wet}, {@code sensor-offset},
 * {@code humid-while-off}, {@code oversized-for-load}. Each threshold and its source is in the "logged run cycles" section of
 * {@link Thresholds}.
 */
final class CycleFindings {
    private final ThresholdSettings settings;

    CycleFindings(ThresholdSettings settings) {
        this.settings = settings;
    }

    List<Finding> find(RunCycleReport r) {
        List<Finding> out = new ArrayList<>();
        if (r.cycles().isEmpty()) {
            humidWhileOff(r, out);
            return out;
        }
        boolean shortCycling = shortCycling(r, out);
        if (shortCycling) {
            limitsLatent(r, out);
        }
        reevaporation(r, out);
        coilNeverWet(r, out);
        sensorOffset(r, out);
        humidWhileOff(r, out);
        oversizedForLoad(r, out);
        out.sort(Comparator.comparing(Finding::severity).reversed());
        return out;
    }

    private boolean shortCycling(RunCycleReport r, List<Finding> out) {
        double maxCph = settings.valueSi(Thresholds.CYCLES_PER_HOUR_MAX);
        double minOn = settings.valueSi(Thresholds.MEDIAN_ON_TIME_MIN);
        boolean often = r.cyclesPerHour() > maxCph;
        boolean brief = r.medianOnS() < minOn;
        if (!often && !brief) {
            return false;
        }
        out.add(new Finding(FindingCode.SHORT_CYCLING, Severity.CHECK,
                String.format(Locale.ROOT, "The air conditioner starts and stops too often: %.1f starts an hour,"
                        + " with runs of about %.0f minutes.", r.cyclesPerHour(), r.medianOnS() / 60.0),
                String.format(Locale.ROOT, "%.2f cycles/h (limit %.1f) and median on-time %.1f min (limit %.1f),"
                                + " %d runs in %.1f h, runtime fraction %.2f; limits common practice, no source",
                        r.cyclesPerHour(), maxCph, r.medianOnS() / 60.0, minOn / 60.0, r.cycles().size(),
                        r.durationS() / 3600.0, r.runtimeFraction()),
                List.of(Evidence.of("cyclesPerHour", "compressor starts per hour", Quantity.DIMENSIONLESS, r.cyclesPerHour()),
                        Evidence.of("medianOnTime", "median compressor on-time", Quantity.DURATION_MINUTES, r.medianOnS()),
                        Evidence.of("runtimeFraction", "share of the time the compressor ran",
                                Quantity.FRACTION_PERCENT, r.runtimeFraction())),
                List.of("Check the thermostat's cycle-rate setting and where it hangs (supply air or sun on it)",
                        "Compare the equipment's capacity with the house's cooling load: an oversized unit satisfies"
                                + " the thermostat before the coil drains",
                        "Have a certified technician check safety switches and the anti-short-cycle timer")));
        return true;
    }

    private void limitsLatent(RunCycleReport r, List<Finding> out) {
        double min = settings.valueSi(Thresholds.LATENT_FRACTION_MIN);
        double measured = r.latentFractionMeasured();
        double predicted = r.latentFractionPredicted();
        double judged = Double.isNaN(measured) ? predicted : measured;
        if (!(judged < min)) {
            return;
        }
        String which = Double.isNaN(measured) ? "expected" : "measured";
        String sentence = judged < 0
                ? "The runs are too short to dry the house: over the logged cycles the system put back at least as"
                        + " much moisture as it removed."
                : String.format(Locale.ROOT, "The runs are too short to dry the house: the system removes about"
                        + " %.0f %% of the moisture it removes when it runs steadily.", 100 * judged);
        out.add(new Finding(FindingCode.SHORT_CYCLING_LIMITS_LATENT, Severity.FIX, sentence,
                // trade words on screen and paper; the model's name and symbols stay in the Methods guide
                // and in the log command's model line and JSON
                String.format(Locale.ROOT, "share of steady moisture removal %s %s (measured %s; expected %s for"
                                + " these run lengths from a published part-load model, Methods guide §3.6: the"
                                + " coil starts to drain after about %.0f s of running (%s)) below %.2f"
                                + " (common practice, no source)", which, fraction(judged), fraction(measured),
                        fraction(predicted), r.model().twetS(),
                        r.model().source() == LatentDegradationModel.Source.FITTED ? "timed from this log"
                                : "a published typical value", min),
                List.of(Evidence.of("latentFractionMeasured", "measured share of steady moisture removal",
                                Quantity.FRACTION_PERCENT, measured),
                        Evidence.of("latentFractionPredicted", "expected share of steady moisture removal for these run lengths",
                                Quantity.FRACTION_PERCENT, predicted),
                        Evidence.of("medianOnTime", "median compressor on-time", Quantity.DURATION_MINUTES, r.medianOnS())),
                List.of("Lengthen the runs: lower the thermostat's cycle rate or widen its differential",
                        "Consider a lower capacity stage, variable-speed equipment or a dehumidifier if the unit"
                                + " is oversized",
                        "Keep the blower from running on after the compressor stops (fan AUTO, short fan-off delay)")));
    }

    private void reevaporation(RunCycleReport r, List<Finding> out) {
        double share = r.reevaporationShare();
        double min = settings.valueSi(Thresholds.REEVAPORATION_SHARE);
        if (r.blowerOnRests() == 0 && !(r.returnedKg() > 0) || !(share >= min)) {
            return;
        }
        // one count of each kind of rest, the cycle table's (RestBlower): left on through the rest
        // (continuous fan) or ran on after the compressor and stopped by itself (fan-off delay)
        int through = r.blowerLeftOnRests();
        int ranOn = r.fanOffDelayRests();
        int rests = r.cycles().size();
        boolean delay = ranOn > through;
        List<Evidence> evidence = List.of(Evidence.of("reevaporationShare", "share of removed moisture put back",
                        Quantity.FRACTION_PERCENT, share),
                Evidence.of("moistureReturned", "water put back while the blower ran in rests", Quantity.WATER_MASS,
                        r.returnedKg()),
                Evidence.of("moistureRemoved", "water removed during runs", Quantity.WATER_MASS, r.removedKg()));
        String source = r.blowerInferred() ? "blower stop found from the air (end of the constant-enthalpy"
                + " signature)" : "blower from its status column";
        if (delay) {
            List<Evidence> withDelay = new ArrayList<>(evidence);
            withDelay.add(Evidence.of("fanOffDelay", "median blower run-on after the compressor stops",
                    Quantity.DURATION_MINUTES, r.fanOffDelayMedianS()));
            out.add(new Finding(FindingCode.FAN_OFF_DELAY_REEVAPORATION, Severity.FIX,
                    String.format(Locale.ROOT, "After the compressor stops, the blower runs on for about %.1f minutes"
                            + " and blows water from the wet coil back into the house: about %.0f %% of what it"
                            + " removed.", r.fanOffDelayMedianS() / 60.0, 100 * share),
                    String.format(Locale.ROOT, "blower ran on after the compressor stopped in %d of %d rests"
                                    + " (fan-off delay median %.0f s%s; %s); rests returned %.0f %% of the moisture"
                                    + " removed; limit %.0f %% (common practice, no source)",
                            ranOn, rests, r.fanOffDelayMedianS(), through == 0 ? ""
                                    : String.format(Locale.ROOT, "; left on through %d more", through),
                            source, 100 * share, 100 * min),
                    List.copyOf(withDelay),
                    List.of("Shorten the air handler's or thermostat's fan-off delay (the fan is already on AUTO"
                                    + " if the blower stops by itself)",
                            "Where the equipment allows, choose a dehumidifying or no-delay blower profile",
                            "Check that the condensate pan drains freely (standing water re-evaporates too)")));
            return;
        }
        double medianLeftOn = r.blowerLeftOnMedianS();
        // the blower ran through the rests, so the figure to give is how long it ran in such a rest;
        // a fan-off delay (the blower stopping by itself) is a different thing and is named apart
        List<Evidence> throughRests = new ArrayList<>(evidence);
        throughRests.add(Evidence.of("blowerOnInRests", "median blower time in a rest it was left on through",
                Quantity.DURATION_MINUTES, medianLeftOn));
        out.add(new Finding(FindingCode.OFF_CYCLE_REEVAPORATION, Severity.FIX,
                String.format(Locale.ROOT, "After the compressor stops, the blower is left running and blows water"
                        + " from the wet coil back into the house: about %.0f %% of what it removed.", 100 * share),
                // the masses themselves go in the evidence, which every display shows in the tech's units
                String.format(Locale.ROOT, "blower-on rests returned %.0f %% of the moisture removed;"
                                + " blower left on through %d of %d rests (median %.1f min of blower in such a rest%s;"
                                + " %s); limit %.0f %% (common practice, no source)",
                        100 * share, through, rests, medianLeftOn / 60.0, ranOn == 0 ? ""
                                : String.format(Locale.ROOT, "; ran on after the compressor stopped in %d more,"
                                        + " fan-off delay median %.0f s", ranOn, r.fanOffDelayMedianS()),
                        source, 100 * min),
                List.copyOf(throughRests),
                List.of("Set the thermostat fan to AUTO rather than ON",
                        "Check the air handler's fan-off delay and shorten it if the complaint persists",
                        "Check that the condensate pan drains freely (standing water re-evaporates too)")));
    }

    private void humidWhileOff(RunCycleReport r, List<Finding> out) {
        HouseHumidity h = r.house();
        if (h == null || h.longOffPeriods() == 0) {
            return;
        }
        double gain = settings.valueSi(Thresholds.OFF_MOISTURE_GAIN);
        double rhTarget = settings.valueSi(Thresholds.INDOOR_RH_TARGET);
        double dpMax = settings.valueSi(Thresholds.INDOOR_DEW_POINT_MAX);
        boolean humid = h.rhP95Pct() > rhTarget || h.dewPointP95C() > dpMax;
        if (!(h.offTrendPerHour() > gain) || !humid) {
            return;
        }
        out.add(new Finding(FindingCode.HUMID_WHILE_OFF, Severity.CHECK,
                "While the air conditioner was off or satisfied, the house kept getting more humid: the moisture"
                        + " comes in or is made faster than the short runs take it out.",
                String.format(Locale.ROOT, "return humidity ratio rose %.2f g/kg per hour (median of %d off periods"
                                + " ≥ %.0f min, %.1f h in all; limit %.2f g/kg per hour, common practice, no source);"
                                + " return RH p95 %.0f %% (target %.0f %%), dew point p95 %.1f °C (benchmark %.1f °C)"
                                + "%s", 1000 * h.offTrendPerHour(), h.longOffPeriods(),
                        settings.valueSi(Thresholds.LONG_OFF_PERIOD) / 60.0, h.longOffHours(), 1000 * gain,
                        h.rhP95Pct(), rhTarget, h.dewPointP95C(), dpMax,
                        Double.isNaN(h.outdoorDewPointMedianC()) ? ""
                                : String.format(Locale.ROOT, "; indoor dew point %+.1f K against outdoors",
                                h.indoorMinusOutdoorDewPointK())),
                List.of(Evidence.of("offMoistureGain", "rise of the house's humidity ratio per hour while off",
                                Quantity.HUMIDITY_RATIO_FINE, h.offTrendPerHour()),
                        Evidence.of("returnRhP95", "return RH, 95th percentile", Quantity.RELATIVE_HUMIDITY, h.rhP95Pct()),
                        Evidence.of("returnDewPointP95", "return dew point, 95th percentile", Quantity.TEMPERATURE,
                                h.dewPointP95C())),
                List.of("Look for moisture sources while the unit is off: bathroom and kitchen exhaust that is not"
                                + " used, a wet crawlspace or basement, leaky return ducts in a humid attic or crawlspace",
                        "Check the house's air tightness and any outdoor-air intake that runs while the unit is off",
                        "If the house stays humid with the sources dealt with, consider a dehumidifier or equipment"
                                + " that dehumidifies at low load")));
    }

    private void oversizedForLoad(RunCycleReport r, List<Finding> out) {
        LoadLine l = r.loadLine();
        if (l == null) {
            return;
        }
        double hot = settings.valueSi(Thresholds.HOT_OUTDOOR_MIN);
        double min = settings.valueSi(Thresholds.HOT_RUNTIME_MIN);
        if (!(l.hotOutdoorC() >= hot) || !(l.hotRuntimeFraction() + l.hotRuntimeU() < min)) {
            return;
        }
        out.add(new Finding(FindingCode.OVERSIZED_FOR_LOAD, Severity.CHECK,
                String.format(Locale.ROOT, "Even in the hottest logged hours the air conditioner ran only about"
                        + " %.0f %% of the time: it is larger than this house's cooling load, so its runs stay short.",
                        100 * l.hotRuntimeFraction()),
                String.format(Locale.ROOT, "runtime fraction %.2f ± %.2f (k = 2, hour to hour) over the %d hottest of"
                                + " %d logged hours at %.1f °C mean outdoors; limit %.2f at ≥ %.1f °C (common practice,"
                                + " no source); load line %s", l.hotRuntimeFraction(), l.hotRuntimeU(), l.hotHours(),
                        l.hours(), l.hotOutdoorC(), min, hot, Double.isNaN(l.continuousC()) ? "not fitted"
                                : String.format(Locale.ROOT, "would reach continuous running at %.1f °C outdoors",
                                l.continuousC())),
                List.of(new Evidence("hotRuntimeFraction", "runtime fraction over the hottest logged hours",
                                Quantity.FRACTION_PERCENT, l.hotRuntimeFraction(), l.hotRuntimeU()),
                        Evidence.of("hotOutdoor", "mean outdoor temperature of those hours", Quantity.TEMPERATURE,
                                l.hotOutdoorC()),
                        Evidence.of("continuousRunOutdoor", "outdoor temperature of continuous running (load line)",
                                Quantity.TEMPERATURE, l.continuousC())),
                List.of("Compare the equipment's capacity with a room-by-room cooling load calculation",
                        "If oversized: a lower stage or blower setting, or variable-capacity equipment, lengthens runs",
                        "Log again on a hotter week if the hottest logged hours were mild")));
    }

    private void coilNeverWet(RunCycleReport r, List<Finding> out) {
        boolean measured = r.cycles().stream().allMatch(c -> !Double.isNaN(c.moisture().removedPerFlow()));
        if (!measured || r.cycles().stream().anyMatch(c -> c.moisture().wet())) {
            return;
        }
        double floor = settings.valueSi(Thresholds.MOISTURE_REMOVAL_FLOOR);
        double longest = r.cycles().stream().mapToDouble(c -> c.cycle().onSeconds()).max().orElse(0);
        out.add(new Finding(FindingCode.COIL_NEVER_WET, Severity.CHECK,
                "During every run the air leaving the coil was no drier than the air entering it, so the system"
                        + " removed no moisture.",
                String.format(Locale.ROOT, "no run kept the return-minus-supply humidity ratio above %.4f kg/kg for two samples;"
                                + " %d runs, longest %.1f min; floor common practice (Methods guide §9.9)",
                        floor, r.cycles().size(), longest / 60.0),
                List.of(Evidence.of("longestOnTime", "longest compressor on-time", Quantity.DURATION_MINUTES, longest),
                        Evidence.of("moistureRemovalFloor", "humidity-ratio drop counted as removal",
                                Quantity.HUMIDITY_RATIO_FINE, floor)),
                List.of("Confirm the probes sit in the return and in the supply after the coil",
                        "Measure the airflow: too much air keeps the coil above the entering dew point",
                        "Compare the coil temperature with the return dew point (coil check)",
                        "Refrigerant charge and metering checks by a certified technician")));
    }

    private void sensorOffset(RunCycleReport r, List<Finding> out) {
        double tol = settings.valueSi(Thresholds.SENSOR_OFFSET_RH);
        double offset = r.sensorOffsetRhPct();
        if (!(Math.abs(offset) > tol)) {
            return;
        }
        out.add(new Finding(FindingCode.SENSOR_OFFSET, Severity.CHECK,
                String.format(Locale.ROOT, "The two humidity probes disagree by %.1f %% RH when they should read the"
                        + " same moisture; %s", Math.abs(offset), r.supplyCorrectionRhPct() != 0
                        ? "the moisture numbers were corrected for it but are less certain."
                        : "the blower ran too briefly over a dry coil to correct for it, so the moisture numbers are"
                                + " uncorrected and less certain."),
                String.format(Locale.ROOT, "median supply RH − RH of the return's vapour pressure at the supply dry bulb"
                                + " %+.1f %% RH (dew points %+.2f K) over %d samples, %.0f min with the blower on,"
                                + " compressor off ≥ %.0f min; tolerance %.1f %% RH (common practice, no source);"
                                + " %s", offset, r.sensorOffsetDewPointK(), r.sensorCheckSamples(),
                        r.sensorCheckSeconds() / 60.0, settings.valueSi(Thresholds.SENSOR_CHECK_AFTER) / 60.0, tol,
                        r.supplyCorrectionRhPct() != 0 ? String.format(Locale.ROOT, "supply RH corrected by %+.1f %% RH",
                                -r.supplyCorrectionRhPct()) : String.format(Locale.ROOT, "not corrected (needs %.0f min)",
                                settings.valueSi(Thresholds.SENSOR_CHECK_MIN_TIME) / 60.0)),
                List.of(new Evidence("sensorOffsetRh", "supply minus return RH over a dry coil",
                        Quantity.RELATIVE_HUMIDITY, offset, Double.NaN)),
                List.of("Put both probes side by side for 15 minutes and note the difference",
                        "Replace or recalibrate the probe that disagrees with a reference hygrometer",
                        "Repeat the log; treat this log's moisture figures as approximate")));
    }

    private static String fraction(double v) {
        return app.latentledger.core.units.Ratio.known(v, "not worked out").number(2, "more put back than removed");
    }
}
