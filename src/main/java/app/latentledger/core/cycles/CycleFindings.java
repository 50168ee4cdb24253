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
 * {@code short-cycling-limits-latent}, {@code off-cycle-reevaporation}, {@code coil-never-wet},
 * {@code sensor-offset}. Each threshold and its source is in the "logged run cycles" section of
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
            return out;
        }
        boolean shortCycling = shortCycling(r, out);
        if (shortCycling) {
            limitsLatent(r, out);
        }
        reevaporation(r, out);
        coilNeverWet(r, out);
        sensorOffset(r, out);
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
        String which = Double.isNaN(measured) ? "predicted" : "measured";
        out.add(new Finding(FindingCode.SHORT_CYCLING_LIMITS_LATENT, Severity.FIX,
                String.format(Locale.ROOT, "The runs are too short to dry the house: the system removes about"
                        + " %.0f %% of the moisture it removes when it runs steadily.", 100 * judged),
                String.format(Locale.ROOT, "latent fraction %s %.2f (measured %s, predicted %s by Henderson &"
                                + " Rengarajan 1996 with t_wet %.0f s, gamma %.2f, tau %.0f s, %s) below %.2f"
                                + " (common practice, no source)", which, judged, fraction(measured),
                        fraction(predicted), r.model().twetS(), r.model().gamma(), r.model().tauS(),
                        r.model().source(), min),
                List.of(Evidence.of("latentFractionMeasured", "measured share of steady moisture removal",
                                Quantity.FRACTION_PERCENT, measured),
                        Evidence.of("latentFractionPredicted", "model share of steady moisture removal",
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
        double[] blower = r.cycles().stream().mapToDouble(c -> c.cycle().blowerOnSeconds())
                .filter(v -> v > 0).sorted().toArray();
        double medianBlower = blower.length == 0 ? Double.NaN : blower[blower.length / 2];
        out.add(new Finding(FindingCode.OFF_CYCLE_REEVAPORATION, Severity.FIX,
                String.format(Locale.ROOT, "After the compressor stops, the blower keeps running and blows water"
                        + " from the wet coil back into the house: about %.0f %% of what it removed.", 100 * share),
                // the masses themselves go in the evidence, which every display shows in the tech's units
                String.format(Locale.ROOT, "blower-on rests returned %.0f %% of the moisture removed;"
                                + " blower ran on after the compressor in %d of %d rests (median %.1f min);"
                                + " limit %.0f %% (common practice, no source)",
                        100 * share,
                        r.blowerOnRests(), r.cycles().size(), medianBlower / 60.0, 100 * min),
                List.of(Evidence.of("reevaporationShare", "share of removed moisture put back",
                                Quantity.FRACTION_PERCENT, share),
                        Evidence.of("moistureReturned", "water put back in blower-on rests", Quantity.WATER_MASS,
                                r.returnedKg()),
                        Evidence.of("moistureRemoved", "water removed during runs", Quantity.WATER_MASS, r.removedKg())),
                List.of("Set the thermostat fan to AUTO rather than ON",
                        "Check the air handler's fan-off delay and shorten it if the complaint persists",
                        "Check that the condensate pan drains freely (standing water re-evaporates too)")));
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
                String.format(Locale.ROOT, "no run kept W_return − W_supply above %.4f kg/kg for two samples;"
                                + " %d runs, longest %.1f min; floor common practice (docs/methods.md §9.9)",
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
                        + " same; the moisture numbers were corrected for it but are less certain.", Math.abs(offset)),
                String.format(Locale.ROOT, "median supply − return RH %+.1f %% RH over %d samples with the blower on,"
                                + " compressor off ≥ %.0f min and dry bulbs within 1 K; tolerance %.1f %% RH"
                                + " (common practice, no source); supply RH corrected by %+.1f %% RH",
                        offset, r.sensorCheckSamples(), settings.valueSi(Thresholds.SENSOR_CHECK_AFTER) / 60.0, tol,
                        -r.supplyCorrectionRhPct()),
                List.of(new Evidence("sensorOffsetRh", "supply minus return RH over a dry coil",
                        Quantity.RELATIVE_HUMIDITY, offset, Double.NaN)),
                List.of("Put both probes side by side for 15 minutes and note the difference",
                        "Replace or recalibrate the probe that disagrees with a reference hygrometer",
                        "Repeat the log; treat this log's moisture figures as approximate")));
    }

    private static String fraction(double v) {
        return Double.isNaN(v) ? "unknown" : String.format(Locale.ROOT, "%.2f", v);
    }
}
