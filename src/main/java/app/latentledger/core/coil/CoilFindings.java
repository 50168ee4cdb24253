package app.latentledger.core.coil;

import app.latentledger.core.findings.Evidence;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.FindingCode;
import app.latentledger.core.findings.Severity;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;

/**
 * The findings of a coil check, each with a stable code. Thresholds come from
 * {@link Thresholds} (coil section); the uncertainty rule is {@link CoilVerdict}'s. The list a
 * screen or report shows must end with {@link app.latentledger.core.findings.Cautions#SAFETY_LINE}.
 *
 * <p>With outdoor air mixed in, findings about the <i>coil</i> (dew-point margin, moisture drop,
 * consistency, SHR) use the mixed air that actually enters it; findings about the <i>house</i>
 * ({@code indoor-humidity-high}, and the "indoor air above target" gate of {@code low-latent-share})
 * use the return air, the indoor air.
 */
public final class CoilFindings {

    private CoilFindings() {
    }

    /** All findings for {@code r}, most urgent first, worded in {@code units}. */
    public static List<Finding> of(CoilResult r, ThresholdSettings t, UnitSystem units) {
        List<Finding> out = new ArrayList<>();
        Estimate margin = r.estimate(Measurand.DEW_POINT_MARGIN);
        Estimate drop = r.estimate(Measurand.HUMIDITY_RATIO_DROP);
        Estimate dp = r.estimate(Measurand.ENTERING_DEW_POINT);
        boolean measured = CoilResult.SOURCE_MEASURED.equals(r.coilTemperatureSource());
        String coilWord = measured ? r.readings().coilKind().label() : "apparatus dew point";
        String enteringWord = r.mixed() ? "the mixed air entering the coil" : "return";
        String enteringDp = r.mixed() ? "entering (mixed-air) dew point " : "entering dew point ";

        if (r.marginCall() == CoilVerdict.Call.ABOVE && r.dropCall() != CoilVerdict.Call.REMOVING) {
            out.add(new Finding(FindingCode.COIL_ABOVE_DEW_POINT, Severity.FIX,
                    "The cooling coil is not cold enough to pull water out of the air.",
                    "Coil " + Shown.of(Quantity.TEMPERATURE, units, r.coilTemperatureC(), 1) + " (" + coilWord
                            + ") is above the " + enteringDp + Shown.of(Measurand.ENTERING_DEW_POINT, units, dp, 1)
                            + " by " + Shown.of(Measurand.DEW_POINT_MARGIN, units, neg(margin), 1) + " (k = 2).",
                    List.of(evidence(Measurand.DEW_POINT_MARGIN, margin), evidence(Measurand.ENTERING_DEW_POINT, dp),
                            evidence(Measurand.COIL_TEMPERATURE, r.estimate(Measurand.COIL_TEMPERATURE))),
                    List.of("Check airflow per ton: high airflow raises coil temperature",
                            "Certified technician: check evaporator saturation temperature, charge and metering device",
                            "Confirm the compressor was running for at least 15 minutes before the readings")));
        }
        if ((r.marginCall() == CoilVerdict.Call.WITHIN || r.marginCall() == CoilVerdict.Call.UNKNOWN)
                && r.verdict() == CoilVerdict.CANT_TELL) {
            String technical = r.marginCall() == CoilVerdict.Call.UNKNOWN
                    ? "No coil temperature to compare: none measured and " + r.adp().explanation()
                      + "; humidity-ratio drop " + Shown.of(Measurand.HUMIDITY_RATIO_DROP, units, drop, 1) + "."
                    : (r.mixed() ? "Entering (mixed-air) dew point minus " : "Entering dew point minus ") + coilWord + " = "
                      + Shown.of(Measurand.DEW_POINT_MARGIN, units, margin, 1)
                      + " (k = 2): the margin lies within the instruments' uncertainty.";
            out.add(new Finding(FindingCode.COIL_MARGIN_INCONCLUSIVE, Severity.CHECK,
                    "The readings cannot yet show whether the coil is cold enough to remove moisture.",
                    technical,
                    List.of(evidence(Measurand.DEW_POINT_MARGIN, margin), evidence(Measurand.ENTERING_DEW_POINT, dp),
                            evidence(Measurand.HUMIDITY_RATIO_DROP, drop)),
                    List.of("Measure the coil temperature (surface probe, or evaporator saturation by a certified technician)",
                            "Compare the two probes side by side in the return first to cancel their offset",
                            "Repeat after 15 minutes of steady running")));
        }
        if (r.marginCall() == CoilVerdict.Call.BELOW && r.dropCall() == CoilVerdict.Call.WITHIN) {
            out.add(new Finding(FindingCode.MOISTURE_DROP_INCONCLUSIVE, Severity.CHECK,
                    "The coil is cold enough, but the readings cannot show water leaving the air.",
                    "Coil is " + Shown.of(Measurand.DEW_POINT_MARGIN, units, margin, 1)
                            + " below the " + enteringDp.trim() + ", but the humidity-ratio drop "
                            + Shown.of(Measurand.HUMIDITY_RATIO_DROP, units, drop, 1) + " is within its uncertainty.",
                    List.of(evidence(Measurand.HUMIDITY_RATIO_DROP, drop), evidence(Measurand.DEW_POINT_MARGIN, margin)),
                    List.of("Check that the coil has run long enough to wet and drain (about 15–20 minutes)",
                            "Read supply humidity with an aspirated wet bulb; RH sensors read poorly near saturation",
                            "Time a condensate catch at the drain")));
        }
        if (r.dropCall() == CoilVerdict.Call.ADDING && r.marginCall() != CoilVerdict.Call.BELOW) {
            out.add(new Finding(FindingCode.COIL_ADDING_MOISTURE, Severity.CHECK,
                    "Air leaving the coil carries more water than the air going in.",
                    "Humidity-ratio drop " + Shown.of(Measurand.HUMIDITY_RATIO_DROP, units, drop, 1)
                            + " (k = 2): supply is wetter than " + enteringWord + ".",
                    List.of(evidence(Measurand.HUMIDITY_RATIO_DROP, drop)),
                    List.of("Was the compressor off while the fan ran? Coil water re-evaporates",
                            "Look for a humidifier, or a wet pan or duct upstream of the supply probe",
                            "Swap the probes and repeat to rule out a probe offset")));
        }
        List<String> inconsistent = new ArrayList<>();
        if (r.marginCall() == CoilVerdict.Call.BELOW && r.dropCall() == CoilVerdict.Call.ADDING) {
            inconsistent.add("supply humidity ratio above " + enteringWord + " while the coil is below the dew point");
        }
        if (r.process().temperatureDropK() < 0) {
            inconsistent.add("supply warmer than " + enteringWord + " in cooling");
        }
        if (measured && r.marginCall() == CoilVerdict.Call.ABOVE && r.dropCall() == CoilVerdict.Call.REMOVING) {
            inconsistent.add("measured coil temperature above the dew point while the air loses moisture");
        }
        if (r.adp().status() == ApparatusDewPoint.Status.LINE_MISSES_SATURATION) {
            inconsistent.add("the process line never meets the saturation curve");
        }
        if (!inconsistent.isEmpty()) {
            out.add(new Finding(FindingCode.READINGS_INCONSISTENT, Severity.CHECK,
                    "Some readings disagree with each other, so one of them is probably off.",
                    "Inconsistent: " + String.join("; ", inconsistent) + ".",
                    List.of(evidence(Measurand.TEMPERATURE_DROP, r.estimate(Measurand.TEMPERATURE_DROP)),
                            evidence(Measurand.HUMIDITY_RATIO_DROP, drop), evidence(Measurand.DEW_POINT_MARGIN, margin)),
                    List.of("Check which probe is in the return and which in the supply",
                            "Check the probes against each other side by side, and against an ice bath",
                            "Confirm the system is in cooling with the compressor running")));
        }
        airflowPerTon(r, t, units, out);
        boolean indoorHigh = indoorHumidityHigh(r, t);
        Estimate shr = r.estimate(Measurand.SHR);
        double shrLimit = t.valueSi(Thresholds.COIL_HIGH_SHR);
        if (indoorHigh && r.process().totalW() > 0 && shr.exists() && shr.valueSi() > shrLimit) {
            out.add(new Finding(FindingCode.LOW_LATENT_SHARE, Severity.FIX,
                    "The system spends too little of its effort removing moisture while the house is humid.",
                    "SHR " + Shown.of(Measurand.SHR, units, shr, 2) + " above " + Shown.of(Quantity.DIMENSIONLESS, units, shrLimit, 2)
                            + " with indoor air above target; latent " + Shown.of(Measurand.LATENT, units,
                            r.estimate(Measurand.LATENT), 0) + ".",
                    List.of(evidence(Measurand.SHR, shr), evidence(Measurand.LATENT, r.estimate(Measurand.LATENT)),
                            Evidence.of(Thresholds.COIL_HIGH_SHR.key(), Thresholds.COIL_HIGH_SHR.label(),
                                    Quantity.DIMENSIONLESS, shrLimit)),
                    List.of("Lower the cooling airflow toward 350 cfm/ton within the manufacturer's range",
                            "Set the fan to AUTO and remove any fan-off delay",
                            "Enable the equipment's dehumidification mode if it has one; consider supplemental dehumidification")));
        }
        if (indoorHigh) {
            Estimate indoorDp = r.estimate(Measurand.RETURN_DEW_POINT);
            Estimate rh = r.estimate(Measurand.RETURN_RELATIVE_HUMIDITY);
            Estimate outdoorDp = r.estimate(Measurand.OUTDOOR_DEW_POINT);
            double dpLimit = t.valueSi(Thresholds.INDOOR_DEW_POINT_MAX);
            double rhLimit = t.valueSi(Thresholds.INDOOR_RH_TARGET);
            List<Evidence> evidence = new ArrayList<>(List.of(evidence(Measurand.RETURN_DEW_POINT, indoorDp),
                    evidence(Measurand.RETURN_RELATIVE_HUMIDITY, rh),
                    Evidence.of(Thresholds.INDOOR_DEW_POINT_MAX.key(), Thresholds.INDOOR_DEW_POINT_MAX.label(),
                            Quantity.TEMPERATURE, dpLimit),
                    Evidence.of(Thresholds.INDOOR_RH_TARGET.key(), Thresholds.INDOOR_RH_TARGET.label(),
                            Quantity.RELATIVE_HUMIDITY, rhLimit)));
            String outdoorPart = "";
            if (outdoorDp.exists()) {
                evidence.add(evidence(Measurand.OUTDOOR_DEW_POINT, outdoorDp));
                outdoorPart = "; outdoor dew point " + Shown.of(Measurand.OUTDOOR_DEW_POINT, units, outdoorDp, 1);
            }
            out.add(new Finding(FindingCode.INDOOR_HUMIDITY_HIGH, Severity.CHECK,
                    "The air in the house is more humid than recommended.",
                    "Return dew point " + Shown.of(Measurand.RETURN_DEW_POINT, units, indoorDp, 1) + " (limit "
                            + Shown.of(Quantity.TEMPERATURE, units, dpLimit, 0) + ", ASHRAE 62.1-2022 §5.12), RH "
                            + Shown.of(Measurand.RETURN_RELATIVE_HUMIDITY, units, rh, 0) + " (target "
                            + Shown.of(Quantity.RELATIVE_HUMIDITY, units, rhLimit, 0) + ")" + outdoorPart + ".",
                    evidence,
                    List.of("Compare indoor and outdoor dew points: higher indoors points to an indoor moisture source",
                            "Check return ducts in attic or crawlspace for leaks (dew point rise from grille to plenum)",
                            "Log indoor humidity for 24–72 hours")));
        }
        condensate(r, t, units, out);
        return List.copyOf(out);
    }

    private static void airflowPerTon(CoilResult r, ThresholdSettings t, UnitSystem units, List<Finding> out) {
        boolean nominal = r.readings().hasNominalCapacity();
        double perCapacity = nominal ? r.airflowPerNominalCapacity() : r.process().airflowPerCapacity();
        if (!Double.isFinite(perCapacity)) {
            return;
        }
        String basis = nominal ? "nominal capacity" : "measured total capacity";
        Evidence shown = nominal
                ? Evidence.of("airflowPerNominalTon", "airflow per unit of nominal capacity",
                        Quantity.AIRFLOW_PER_CAPACITY, perCapacity)
                : evidence(Measurand.AIRFLOW_PER_CAPACITY, r.estimate(Measurand.AIRFLOW_PER_CAPACITY));
        double high = t.valueSi(Thresholds.COIL_HIGH_AIRFLOW_PER_TON);
        double low = t.valueSi(Thresholds.COIL_LOW_AIRFLOW_PER_TON);
        if (perCapacity > high) {
            out.add(new Finding(FindingCode.HIGH_AIRFLOW_PER_TON, Severity.CHECK,
                    "So much air moves over the coil that it cannot dry the air well.",
                    "Airflow " + Shown.of(Quantity.AIRFLOW_PER_CAPACITY, units, perCapacity, 0) + " of " + basis
                            + ", above " + Shown.of(Quantity.AIRFLOW_PER_CAPACITY, units, high, 0) + ".",
                    List.of(shown, Evidence.of(Thresholds.COIL_HIGH_AIRFLOW_PER_TON.key(),
                            Thresholds.COIL_HIGH_AIRFLOW_PER_TON.label(), Quantity.AIRFLOW_PER_CAPACITY, high)),
                    List.of("Confirm the airflow measurement method and its accuracy",
                            "Check the blower speed setting against the manufacturer's table for cooling",
                            "Consider lowering airflow toward 350 cfm/ton in humid climates, within the manufacturer's range")));
        } else if (perCapacity < low) {
            out.add(new Finding(FindingCode.LOW_AIRFLOW_PER_TON, Severity.CHECK,
                    "Too little air moves over the coil; it may ice up and cool poorly.",
                    "Airflow " + Shown.of(Quantity.AIRFLOW_PER_CAPACITY, units, perCapacity, 0) + " of " + basis
                            + ", below " + Shown.of(Quantity.AIRFLOW_PER_CAPACITY, units, low, 0) + ".",
                    List.of(shown, Evidence.of(Thresholds.COIL_LOW_AIRFLOW_PER_TON.key(),
                            Thresholds.COIL_LOW_AIRFLOW_PER_TON.label(), Quantity.AIRFLOW_PER_CAPACITY, low)),
                    List.of("Check the filter, coil face and return grilles for restriction",
                            "Measure total external static pressure",
                            "Check the blower speed setting")));
        }
    }

    static boolean indoorHumidityHigh(CoilResult r, ThresholdSettings t) {
        // the house's air is the return air, not the mix the coil sees
        double dp = r.estimate(Measurand.RETURN_DEW_POINT).valueSi();
        double rh = r.estimate(Measurand.RETURN_RELATIVE_HUMIDITY).valueSi();
        return dp > t.valueSi(Thresholds.INDOOR_DEW_POINT_MAX) || rh > t.valueSi(Thresholds.INDOOR_RH_TARGET);
    }

    private static void condensate(CoilResult r, ThresholdSettings t, UnitSystem units, List<Finding> out) {
        CondensateCheck c = r.condensate();
        if (c == null) {
            return;
        }
        double limit = t.valueSi(Thresholds.CONDENSATE_MISMATCH_FRACTION);
        double rel = c.relativeDifference();
        boolean beyondFraction = !Double.isFinite(rel) || Math.abs(rel) > limit;
        if (c.disagreeBeyondUncertainty() && beyondFraction) {
            boolean less = c.difference().valueSi() < 0;
            out.add(new Finding(FindingCode.CONDENSATE_MISMATCH, Severity.CHECK,
                    less ? "Less water reached the drain than the air readings say the coil removed."
                         : "More water reached the drain than the air readings say the coil removed.",
                    "Condensate " + Shown.of(Measurand.CONDENSATE_RATE, units, c.condensate(), 2) + " vs air side "
                            + Shown.of(Measurand.MOISTURE_REMOVAL, units, c.airside(), 2) + "; difference "
                            + Shown.of(Measurand.CONDENSATE_MINUS_AIRSIDE, units, c.difference(), 2) + " (k = 2).",
                    List.of(evidence(Measurand.CONDENSATE_RATE, c.condensate()),
                            evidence(Measurand.MOISTURE_REMOVAL, c.airside()),
                            evidence(Measurand.CONDENSATE_MINUS_AIRSIDE, c.difference())),
                    less ? List.of("Run 15–20 minutes before catching: a coil holds water before it drains",
                                   "Check the trap is primed and nothing else shares the drain or leaks to a secondary pan",
                                   "Check the humidity probes; an air-side figure too high points at the supply reading")
                         : List.of("Check that nothing else (humidifier, furnace condensate) drains into the line",
                                   "Check the airflow figure and the humidity probes",
                                   "Catch for longer to cut the timing error")));
        }
    }

    private static Estimate neg(Estimate e) {
        return new Estimate(-e.valueSi(), e.expandedSi());
    }

    private static Evidence evidence(Measurand m, Estimate e) {
        return new Evidence(m.key(), m.label(), m.quantity(), e.valueSi(), e.expandedSi());
    }
}
