package app.latentledger.core.coil;

import app.latentledger.core.findings.Evidence;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.FindingCode;
import app.latentledger.core.findings.Severity;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;

/**
 * The findings of a coil check, each with a stable code. Thresholds come from
 * {@link Thresholds} (coil section); the uncertainty rule is {@link CoilVerdict}'s. The list a
 * screen or report shows must end with {@link app.latentledger.core.findings.Cautions#SAFETY_LINE}.
 *
 * <p><b>Severity follows the house.</b> A coil running above the dew point, a low latent share and
 * high airflow per ton are faults only while the indoor air is above the RH target or the dew-point
 * benchmark; in a dry house they are how an efficient system is designed to run, reported as a note.
 *
 * <p>With outdoor air mixed in, findings about the <i>coil</i> (dew-point margin, moisture drop,
 * consistency, SHR) use the mixed air that actually enters it; findings about the <i>house</i>
 * ({@code indoor-humidity-high}, and the gate on the severities above) use the return air.
 *
 * <p>Next checks never ask for a reading already in the check (a coil temperature, a probe
 * comparison, a condensate catch). Checks marked "common practice" are the trade's usual order of
 * work on a humidity call, not a published procedure.
 */
public final class CoilFindings {
    private static final String CP = " (common practice)";

    private CoilFindings() {
    }

    /** All findings for {@code r}, most urgent first, worded in {@code units}. */
    public static List<Finding> of(CoilResult r, ThresholdSettings t, UnitSystem units) {
        List<Finding> out = new ArrayList<>();
        Context c = new Context(r, t, units);
        coilAboveDewPoint(c, out);
        marginInconclusive(c, out);
        dropInconclusive(c, out);
        addingMoisture(c, out);
        inconsistent(c, out);
        capacityBelowNameplate(c, out);
        airflowPerTon(c, out);
        lowLatentShare(c, out);
        indoorHumidity(c, out);
        condensate(c, out);
        supplyNearSaturation(c, out);
        return List.copyOf(out);
    }

    /** What every finding needs to know about the check, worked out once. */
    private record Context(CoilResult r, ThresholdSettings t, UnitSystem units, boolean indoorHigh, boolean measured,
                           CoilTemperatureKind kind, boolean sameProbe, boolean hasCatch, String coilWord,
                           String enteringWord, String enteringDp) {
        Context(CoilResult r, ThresholdSettings t, UnitSystem units) {
            this(r, t, units, indoorHumidityHigh(r, t), r.coilTemperatureSource() == CoilTemperatureSource.MEASURED,
                    r.coilTemperatureSource() == CoilTemperatureSource.MEASURED ? r.readings().coilKind() : null,
                    r.readings().probes().sameInstrument(), r.readings().condensate() != null,
                    r.coilTemperatureSource() == CoilTemperatureSource.MEASURED ? r.readings().coilKind().label()
                            : "apparatus dew point (worked out from the same two readings as the drop)",
                    r.mixed() ? "the mixed air entering the coil" : "return",
                    r.mixed() ? "entering (mixed-air) dew point " : "entering dew point ");
        }

        Estimate e(Measurand m) {
            return r.estimate(m);
        }

        boolean saturation() {
            return kind == CoilTemperatureKind.EVAPORATOR_SATURATION;
        }

        String allowance() {
            return Shown.of(Quantity.TEMPERATURE_DIFFERENCE, units, t.valueSi(Thresholds.COIL_SATURATION_ALLOWANCE), 0);
        }
    }

    private static void coilAboveDewPoint(Context c, List<Finding> out) {
        CoilResult r = c.r();
        if (!(r.marginCall() == CoilVerdict.Call.ABOVE && r.dropCall() != CoilVerdict.Call.REMOVING)) {
            return;
        }
        Estimate margin = c.e(Measurand.DEW_POINT_MARGIN);
        Estimate dp = c.e(Measurand.ENTERING_DEW_POINT);
        String technical = "Coil " + Shown.of(Quantity.TEMPERATURE, c.units(), r.coilTemperatureC(), 1) + " ("
                + c.coilWord() + ") is above the " + c.enteringDp()
                + Shown.of(Measurand.ENTERING_DEW_POINT, c.units(), dp, 1) + " by "
                + Shown.of(Measurand.DEW_POINT_MARGIN, c.units(), neg(margin), 1) + " (k = 2)"
                + (c.saturation() ? "; the coil surface runs warmer still than the refrigerant" : "")
                + (c.indoorHigh() ? "; indoor air is above the humidity target." : "; indoor air is below the humidity"
                        + " target and the dew-point benchmark.");
        List<Evidence> evidence = List.of(evidence(Measurand.DEW_POINT_MARGIN, margin),
                evidence(Measurand.ENTERING_DEW_POINT, dp),
                evidence(Measurand.COIL_TEMPERATURE, c.e(Measurand.COIL_TEMPERATURE)));
        if (c.indoorHigh()) {
            out.add(new Finding(FindingCode.COIL_ABOVE_DEW_POINT, Severity.FIX,
                    "The cooling coil is not cold enough to pull water out of the air, and the house is humid.",
                    technical, evidence,
                    List.of("Check the filter and the coil face" + CP + ": a dirty filter or coil lowers airflow and makes"
                                    + " the coil colder, so a warm coil points instead at high airflow, a light load or"
                                    + " low charge",
                            "Measure total external static pressure and note the blower speed setting against the"
                                    + " manufacturer's cooling table" + CP,
                            "Check whether a dehumidification mode or humid-climate airflow setting exists and is on" + CP,
                            "Certified technician: superheat and subcooling against the manufacturer's charging"
                                    + " targets, and the metering device",
                            "Confirm the compressor was running for at least 15 minutes before the readings")));
        } else {
            out.add(new Finding(FindingCode.COIL_ABOVE_DEW_POINT, Severity.NOTE,
                    "The coil runs above the dew point of this air, so it cools without drying; in a house this dry"
                            + " that is a design trait of many efficient systems, not a fault.",
                    technical, evidence,
                    List.of("Nothing to fix while indoor humidity stays below the target; check again if the house"
                                    + " turns humid",
                            "If drying is wanted later, look for a dehumidification mode or lower cooling airflow within"
                                    + " the manufacturer's range" + CP)));
        }
    }

    private static void marginInconclusive(Context c, List<Finding> out) {
        CoilResult r = c.r();
        boolean marginOpen = r.marginCall() == CoilVerdict.Call.WITHIN || r.marginCall() == CoilVerdict.Call.UNKNOWN;
        if (!(marginOpen && r.verdict() == CoilVerdict.CANT_TELL)) {
            return;
        }
        Estimate margin = c.e(Measurand.DEW_POINT_MARGIN);
        Estimate drop = c.e(Measurand.HUMIDITY_RATIO_DROP);
        String technical;
        if (r.marginCall() == CoilVerdict.Call.UNKNOWN) {
            technical = "No coil temperature to compare: none measured and " + r.adp().explanation()
                    + "; humidity-ratio drop " + Shown.of(Measurand.HUMIDITY_RATIO_DROP, c.units(), drop, 1) + ".";
        } else if (c.saturation()) {
            technical = (r.mixed() ? "Entering (mixed-air) dew point minus " : "Entering dew point minus ")
                    + c.coilWord() + " = " + Shown.of(Measurand.DEW_POINT_MARGIN, c.units(), margin, 1)
                    + " (k = 2): a saturation temperature shows the surface below the dew point only with its"
                    + " uncertainty plus an allowance of " + c.allowance() + " to spare (the surface runs warmer than"
                    + " the refrigerant).";
        } else {
            technical = (r.mixed() ? "Entering (mixed-air) dew point minus " : "Entering dew point minus ")
                    + c.coilWord() + " = " + Shown.of(Measurand.DEW_POINT_MARGIN, c.units(), margin, 1)
                    + " (k = 2): the margin lies within the instruments' uncertainty, and so does the"
                    + " humidity-ratio drop " + Shown.of(Measurand.HUMIDITY_RATIO_DROP, c.units(), drop, 1) + ".";
        }
        List<String> next = new ArrayList<>();
        if (!c.measured()) {
            next.add("Measure the coil temperature with a probe on the coil fins (or, by a certified technician,"
                    + " the evaporator saturation temperature)");
        } else if (c.saturation()) {
            next.add("Add a probe on the coil fins: a saturation temperature only bounds how cold the surface can be");
        }
        if (!c.sameProbe()) {
            next.add("Compare the two humidity probes side by side in the return, then enter them as one instrument"
                    + " (or enter the supply probe's dew-point offset)");
        }
        if (!c.hasCatch()) {
            next.add("Time a condensate catch at the drain after 15–20 minutes of running: water in the cup is"
                    + " direct evidence");
        }
        next.add("Repeat after 15 minutes of steady running");
        out.add(new Finding(FindingCode.COIL_MARGIN_INCONCLUSIVE, Severity.CHECK,
                "The readings cannot yet show whether the coil is removing moisture.",
                technical,
                List.of(evidence(Measurand.DEW_POINT_MARGIN, margin),
                        evidence(Measurand.ENTERING_DEW_POINT, c.e(Measurand.ENTERING_DEW_POINT)),
                        evidence(Measurand.HUMIDITY_RATIO_DROP, drop)),
                next));
    }

    private static void dropInconclusive(Context c, List<Finding> out) {
        CoilResult r = c.r();
        if (!(r.marginCall() == CoilVerdict.Call.BELOW && r.dropCall() == CoilVerdict.Call.WITHIN
                && r.verdict() == CoilVerdict.CANT_TELL)) {
            return;
        }
        Estimate margin = c.e(Measurand.DEW_POINT_MARGIN);
        Estimate drop = c.e(Measurand.HUMIDITY_RATIO_DROP);
        List<String> next = new ArrayList<>(List.of(
                "Check that the coil has run long enough to wet and drain (about 15–20 minutes)",
                "Read supply humidity with an aspirated wet bulb; RH sensors read poorly near saturation"));
        if (!c.sameProbe()) {
            next.add("Compare the two humidity probes side by side and enter them as one instrument");
        }
        if (!c.hasCatch()) {
            next.add("Time a condensate catch at the drain");
        }
        out.add(new Finding(FindingCode.MOISTURE_DROP_INCONCLUSIVE, Severity.CHECK,
                "The coil is cold enough, but the readings cannot show water leaving the air.",
                "Coil is " + Shown.of(Measurand.DEW_POINT_MARGIN, c.units(), margin, 1)
                        + " below the " + c.enteringDp().trim() + ", but the humidity-ratio drop "
                        + Shown.of(Measurand.HUMIDITY_RATIO_DROP, c.units(), drop, 1) + " is within its uncertainty.",
                List.of(evidence(Measurand.HUMIDITY_RATIO_DROP, drop), evidence(Measurand.DEW_POINT_MARGIN, margin)),
                next));
    }

    private static void addingMoisture(Context c, List<Finding> out) {
        CoilResult r = c.r();
        if (r.dropCall() != CoilVerdict.Call.ADDING) {
            return;
        }
        Estimate drop = c.e(Measurand.HUMIDITY_RATIO_DROP);
        out.add(new Finding(FindingCode.COIL_ADDING_MOISTURE, Severity.CHECK,
                "Air leaving the coil carries more water than the air going in.",
                "Humidity-ratio drop " + Shown.of(Measurand.HUMIDITY_RATIO_DROP, c.units(), drop, 1)
                        + " (k = 2): supply is wetter than " + c.enteringWord() + ".",
                List.of(evidence(Measurand.HUMIDITY_RATIO_DROP, drop)),
                List.of("Was the compressor off while the fan ran? Coil water re-evaporates",
                        "Look for a humidifier, or a wet pan or duct upstream of the supply probe",
                        c.sameProbe() ? "Dry the supply probe out of the airstream and read again: a wetted probe reads high"
                                : "Swap the probes and repeat to rule out a probe offset")));
    }

    private static void inconsistent(Context c, List<Finding> out) {
        CoilResult r = c.r();
        List<String> inconsistent = new ArrayList<>();
        if (r.marginCall() == CoilVerdict.Call.BELOW && r.dropCall() == CoilVerdict.Call.ADDING) {
            inconsistent.add("supply humidity ratio above " + c.enteringWord() + " while the coil is below the dew point");
        }
        if (r.process().temperatureDropK() < 0) {
            inconsistent.add("supply warmer than " + c.enteringWord() + " in cooling");
        }
        if (c.measured() && r.marginCall() == CoilVerdict.Call.ABOVE && r.dropCall() == CoilVerdict.Call.REMOVING) {
            inconsistent.add("the air clearly loses moisture (so the verdict is dehumidifying) while the measured "
                    + c.kind().label() + " reads above the dew point: the coil probe is the weaker evidence");
        }
        if (r.adp().status() == ApparatusDewPoint.Status.LINE_MISSES_SATURATION) {
            inconsistent.add("the process line never meets the saturation curve");
        }
        if (inconsistent.isEmpty()) {
            return;
        }
        List<String> next = new ArrayList<>(List.of("Check which probe is in the return and which in the supply"));
        if (c.measured() && c.kind().isSurface()) {
            next.add("Move the coil probe to the leaving face of the coil, in firm contact with the fins, out of any"
                    + " bypass air");
        }
        next.add(c.sameProbe() ? "Check the probe against an ice bath"
                : "Check the probes against each other side by side, and against an ice bath");
        next.add("Confirm the system is in cooling with the compressor running");
        out.add(new Finding(FindingCode.READINGS_INCONSISTENT, Severity.CHECK,
                "Some readings disagree with each other, so one of them is probably off.",
                "Inconsistent: " + String.join("; ", inconsistent) + ".",
                List.of(evidence(Measurand.TEMPERATURE_DROP, c.e(Measurand.TEMPERATURE_DROP)),
                        evidence(Measurand.HUMIDITY_RATIO_DROP, c.e(Measurand.HUMIDITY_RATIO_DROP)),
                        evidence(Measurand.DEW_POINT_MARGIN, c.e(Measurand.DEW_POINT_MARGIN))),
                next));
    }

    /**
     * Measured total clearly below a share of the nameplate at near-rating conditions: the entering
     * wet bulb within a band of AHRI 210/240's 67 °F. Outdoor temperature is not known to the check;
     * above the 95 °F rating outdoor temperature a unit delivers less, which the wording says.
     */
    private static void capacityBelowNameplate(Context c, List<Finding> out) {
        CoilResult r = c.r();
        if (!r.readings().hasNominalCapacity()) {
            return;
        }
        Estimate total = c.e(Measurand.TOTAL);
        double nominal = r.readings().nominalCapacityW();
        double fraction = c.t().valueSi(Thresholds.CAPACITY_BELOW_NAMEPLATE_FRACTION);
        double ratingWb = Quantity.TEMPERATURE.fromDisplay(UnitSystem.IP, 67);
        boolean nearRating = Math.abs(r.entering().wetBulbC() - ratingWb)
                <= c.t().valueSi(Thresholds.NEAR_RATING_WET_BULB_BAND);
        if (!(nearRating && total.exists() && Double.isFinite(total.expandedSi())
                && total.valueSi() + total.expandedSi() < fraction * nominal)) {
            return;
        }
        out.add(new Finding(FindingCode.CAPACITY_BELOW_NAMEPLATE, Severity.CHECK,
                "The system delivers clearly less cooling than its nameplate size.",
                "Total " + Shown.of(Measurand.TOTAL, c.units(), total, 0) + " (k = 2) against a nameplate "
                        + Shown.of(Quantity.POWER_LARGE, c.units(), nominal, 1) + ": below "
                        + Shown.of(Quantity.FRACTION_PERCENT, c.units(), fraction, 0) + " of nominal even at the top of"
                        + " its uncertainty, with the entering wet bulb "
                        + Shown.of(Quantity.TEMPERATURE, c.units(), r.entering().wetBulbC(), 1)
                        + " near the 67 °F rating point (AHRI 210/240). Capacity also falls on hotter days than the"
                        + " 95 °F rating outdoor temperature.",
                List.of(evidence(Measurand.TOTAL, total),
                        Evidence.of("nominalCapacity", "nameplate capacity", Quantity.POWER, nominal),
                        Evidence.of(Thresholds.CAPACITY_BELOW_NAMEPLATE_FRACTION.key(),
                                Thresholds.CAPACITY_BELOW_NAMEPLATE_FRACTION.label(), Quantity.FRACTION_PERCENT, fraction)),
                List.of("Certified technician: refrigerant charge (superheat and subcooling against the"
                                + " manufacturer's targets) and the metering device",
                        "Check airflow: filter, coil face, blower speed setting and external static pressure" + CP,
                        "Inspect the coil for dirt or ice" + CP,
                        "Confirm the compressor had run 15 minutes and the outdoor unit's coil is clean")));
    }

    /** Airflow per nominal ton, with its uncertainty; without a nameplate there is nothing to judge against. */
    private static void airflowPerTon(Context c, List<Finding> out) {
        Estimate perTon = c.e(Measurand.AIRFLOW_PER_NOMINAL_CAPACITY);
        if (!perTon.exists()) {
            return;
        }
        double u = Double.isFinite(perTon.expandedSi()) ? perTon.expandedSi() : 0;
        double high = c.t().valueSi(Thresholds.COIL_HIGH_AIRFLOW_PER_TON);
        double low = c.t().valueSi(Thresholds.COIL_LOW_AIRFLOW_PER_TON);
        String basis = c.r().readings().airflowBasis().label();
        if (perTon.valueSi() - u > high) {
            String technical = "Airflow " + Shown.of(Measurand.AIRFLOW_PER_NOMINAL_CAPACITY, c.units(), perTon, 0)
                    + " (" + basis + ") of nameplate capacity (k = 2), above "
                    + Shown.of(Quantity.AIRFLOW_PER_CAPACITY, c.units(), high, 0) + ".";
            List<Evidence> evidence = List.of(evidence(Measurand.AIRFLOW_PER_NOMINAL_CAPACITY, perTon),
                    Evidence.of(Thresholds.COIL_HIGH_AIRFLOW_PER_TON.key(),
                            Thresholds.COIL_HIGH_AIRFLOW_PER_TON.label(), Quantity.AIRFLOW_PER_CAPACITY, high));
            if (c.indoorHigh()) {
                out.add(new Finding(FindingCode.HIGH_AIRFLOW_PER_TON, Severity.FIX,
                        "So much air moves over the coil that it cannot dry the air well, and the house is humid.",
                        technical, evidence,
                        List.of("Confirm the airflow measurement method and whether it reads standard or actual cfm",
                                "Check the blower speed setting against the manufacturer's table for cooling, and"
                                        + " measure external static pressure" + CP,
                                "Lower airflow toward 350 cfm/ton in humid climates, within the manufacturer's range,"
                                        + " or turn on a dehumidification mode if there is one")));
            } else {
                out.add(new Finding(FindingCode.HIGH_AIRFLOW_PER_TON, Severity.NOTE,
                        "Airflow is on the high side for drying; with the house this dry it favours efficiency and is"
                                + " a design choice, not a fault.",
                        technical, evidence,
                        List.of("Nothing to change while indoor humidity stays below the target",
                                "If the house turns humid, lower the cooling airflow within the manufacturer's range"
                                        + CP)));
            }
        } else if (perTon.valueSi() + u < low) {
            out.add(new Finding(FindingCode.LOW_AIRFLOW_PER_TON, Severity.CHECK,
                    "Too little air moves over the coil; it may ice up and cool poorly.",
                    "Airflow " + Shown.of(Measurand.AIRFLOW_PER_NOMINAL_CAPACITY, c.units(), perTon, 0) + " (" + basis
                            + ") of nameplate capacity (k = 2), below "
                            + Shown.of(Quantity.AIRFLOW_PER_CAPACITY, c.units(), low, 0) + ".",
                    List.of(evidence(Measurand.AIRFLOW_PER_NOMINAL_CAPACITY, perTon),
                            Evidence.of(Thresholds.COIL_LOW_AIRFLOW_PER_TON.key(),
                                    Thresholds.COIL_LOW_AIRFLOW_PER_TON.label(), Quantity.AIRFLOW_PER_CAPACITY, low)),
                    List.of("Check the filter, coil face and return grilles for restriction",
                            "Measure total external static pressure",
                            "Check the blower speed setting")));
        }
    }

    private static void lowLatentShare(Context c, List<Finding> out) {
        CoilResult r = c.r();
        CondensateCheck catchCheck = r.condensate();
        boolean fromCatch = catchCheck != null && catchCheck.usable() && c.e(Measurand.SHR_FROM_CONDENSATE).exists();
        Measurand shrM = fromCatch ? Measurand.SHR_FROM_CONDENSATE : Measurand.SHR;
        Measurand latentM = fromCatch ? Measurand.LATENT_FROM_CONDENSATE : Measurand.LATENT;
        Estimate shr = c.e(shrM);
        double shrLimit = c.t().valueSi(Thresholds.COIL_HIGH_SHR);
        if (!(shr.exists() && shr.valueSi() > shrLimit)) {
            return;
        }
        String technical = "SHR " + Shown.of(shrM, c.units(), shr, 2) + (fromCatch ? " (latent from the condensate caught)" : "")
                + " above " + Shown.of(Quantity.DIMENSIONLESS, c.units(), shrLimit, 2)
                + (c.indoorHigh() ? " with indoor air above target" : " with indoor air below target") + "; latent "
                + Shown.of(latentM, c.units(), c.e(latentM), 0) + ".";
        List<Evidence> evidence = List.of(evidence(shrM, shr), evidence(latentM, c.e(latentM)),
                Evidence.of(Thresholds.COIL_HIGH_SHR.key(), Thresholds.COIL_HIGH_SHR.label(),
                        Quantity.DIMENSIONLESS, shrLimit));
        if (c.indoorHigh()) {
            out.add(new Finding(FindingCode.LOW_LATENT_SHARE, Severity.FIX,
                    "The system spends too little of its effort removing moisture while the house is humid.",
                    technical, evidence,
                    List.of("Lower the cooling airflow toward 350 cfm/ton within the manufacturer's range",
                            "Set the fan to AUTO and remove any fan-off delay",
                            "Enable the equipment's dehumidification mode if it has one",
                            "Oversized or high-efficiency coil: consider a lower stage or airflow at the manufacturer's"
                                    + " limits, or a supplemental dehumidifier" + CP,
                            "Check that supply air does not blow on the thermostat, cutting runs short" + CP)));
        } else {
            out.add(new Finding(FindingCode.LOW_LATENT_SHARE, Severity.NOTE,
                    "Most of the cooling goes to temperature rather than moisture; in a house this dry that is a"
                            + " design trait, not a fault.",
                    technical, evidence,
                    List.of("Nothing to change while indoor humidity stays below the target")));
        }
    }

    private static void indoorHumidity(Context c, List<Finding> out) {
        if (!c.indoorHigh()) {
            return;
        }
        Estimate indoorDp = c.e(Measurand.RETURN_DEW_POINT);
        Estimate rh = c.e(Measurand.RETURN_RELATIVE_HUMIDITY);
        Estimate outdoorDp = c.e(Measurand.OUTDOOR_DEW_POINT);
        double dpLimit = c.t().valueSi(Thresholds.INDOOR_DEW_POINT_MAX);
        double rhLimit = c.t().valueSi(Thresholds.INDOOR_RH_TARGET);
        List<Evidence> evidence = new ArrayList<>(List.of(evidence(Measurand.RETURN_DEW_POINT, indoorDp),
                evidence(Measurand.RETURN_RELATIVE_HUMIDITY, rh),
                Evidence.of(Thresholds.INDOOR_DEW_POINT_MAX.key(), Thresholds.INDOOR_DEW_POINT_MAX.label(),
                        Quantity.TEMPERATURE, dpLimit),
                Evidence.of(Thresholds.INDOOR_RH_TARGET.key(), Thresholds.INDOOR_RH_TARGET.label(),
                        Quantity.RELATIVE_HUMIDITY, rhLimit)));
        String outdoorPart = "";
        if (outdoorDp.exists()) {
            evidence.add(evidence(Measurand.OUTDOOR_DEW_POINT, outdoorDp));
            outdoorPart = "; outdoor dew point " + Shown.of(Measurand.OUTDOOR_DEW_POINT, c.units(), outdoorDp, 1);
        }
        out.add(new Finding(FindingCode.INDOOR_HUMIDITY_HIGH, Severity.CHECK,
                "The air in the house is more humid than recommended.",
                "Return dew point " + Shown.of(Measurand.RETURN_DEW_POINT, c.units(), indoorDp, 1) + " (benchmark for homes "
                        + Shown.of(Quantity.TEMPERATURE, c.units(), dpLimit, 0)
                        + ", from ASHRAE 62.1-2022 §5.12 for commercial buildings; not a limit), RH "
                        + Shown.of(Measurand.RETURN_RELATIVE_HUMIDITY, c.units(), rh, 0) + " (target "
                        + Shown.of(Quantity.RELATIVE_HUMIDITY, c.units(), rhLimit, 0) + ")" + outdoorPart + ".",
                evidence,
                List.of("Is the unit running much at all? Note its run time: humidity while the thermostat is"
                                + " satisfied is a load or sizing question, not a coil one" + CP,
                        "Compare indoor and outdoor dew points: higher indoors points to an indoor moisture source",
                        "Ventilation: is an ERV, ventilating fan or fresh-air damper bringing in humid air?" + CP,
                        "Bath and kitchen exhaust, dryer vent, crawlspace or basement moisture" + CP,
                        "Check return ducts in attic or crawlspace for leaks (dew point rise from grille to plenum)",
                        "Log indoor humidity for 24–72 hours")));
    }

    private static void condensate(Context c, List<Finding> out) {
        CondensateCheck k = c.r().condensate();
        if (k == null) {
            return;
        }
        double limit = c.t().valueSi(Thresholds.CONDENSATE_MISMATCH_FRACTION);
        double rel = k.relativeDifference();
        boolean beyondFraction = !Double.isFinite(rel) || Math.abs(rel) > limit;
        if (!(k.disagreeBeyondUncertainty() && beyondFraction)) {
            return;
        }
        boolean less = k.difference().valueSi() < 0;
        out.add(new Finding(FindingCode.CONDENSATE_MISMATCH, Severity.CHECK,
                less ? "Less water reached the drain than the air readings say the coil removed."
                     : "More water reached the drain than the air readings say the coil removed.",
                "Condensate " + Shown.of(Measurand.CONDENSATE_RATE, c.units(), k.condensate(), 2) + " vs air side "
                        + Shown.of(Measurand.MOISTURE_REMOVAL, c.units(), k.airside(), 2) + "; difference "
                        + Shown.of(Measurand.CONDENSATE_MINUS_AIRSIDE, c.units(), k.difference(), 2) + " (k = 2).",
                List.of(evidence(Measurand.CONDENSATE_RATE, k.condensate()),
                        evidence(Measurand.MOISTURE_REMOVAL, k.airside()),
                        evidence(Measurand.CONDENSATE_MINUS_AIRSIDE, k.difference())),
                less ? List.of("Run 15–20 minutes before catching: a coil holds water before it drains",
                               "Check the trap is primed and nothing else shares the drain or leaks to a secondary pan",
                               "Drain faults: a condensate pump cycling, a secondary pan overflowing, or a trap blown"
                                       + " dry by the drain's negative pressure pulling air in" + CP,
                               "Check the humidity probes; an air-side figure too high points at the supply reading")
                     : List.of("Check that nothing else (humidifier, furnace condensate) drains into the line",
                               "Check the airflow figure and the humidity probes",
                               "Catch for longer to cut the timing error")));
    }

    /** A supply RH at or near 100 % is more often a wetted or slow probe than a measured state. */
    private static void supplyNearSaturation(Context c, List<Finding> out) {
        CoilResult r = c.r();
        double rh = r.leaving().relativeHumidityPct();
        double limit = c.t().valueSi(Thresholds.SUPPLY_NEAR_SATURATION_RH);
        if (!(rh >= limit)) {
            return;
        }
        out.add(new Finding(FindingCode.SUPPLY_NEAR_SATURATION, Severity.NOTE,
                "The supply reading is at or near saturation; a wet or slow humidity probe reads this way, so the"
                        + " figures built on it are less sure than they look.",
                "Supply RH " + Shown.of(Quantity.RELATIVE_HUMIDITY, c.units(), rh, 1) + " ≥ "
                        + Shown.of(Quantity.RELATIVE_HUMIDITY, c.units(), limit, 0) + ": the apparatus dew point sits"
                        + " at the supply dry bulb and the bypass factor near 0; capacitive RH sensors are good to"
                        + " about ±3 % RH above 90 % RH.",
                List.of(Evidence.of("leavingRelativeHumidity", "leaving (supply) relative humidity",
                                Quantity.RELATIVE_HUMIDITY, rh),
                        Evidence.of(Thresholds.SUPPLY_NEAR_SATURATION_RH.key(),
                                Thresholds.SUPPLY_NEAR_SATURATION_RH.label(), Quantity.RELATIVE_HUMIDITY, limit)),
                List.of("Dry the probe out of the airstream and read again once it settles, or read the supply with"
                                + " an aspirated wet bulb" + CP,
                        "Keep the probe out of sight of the coil so no droplets reach it" + CP)));
    }

    static boolean indoorHumidityHigh(CoilResult r, ThresholdSettings t) {
        // the house's air is the return air, not the mix the coil sees
        double dp = r.estimate(Measurand.RETURN_DEW_POINT).valueSi();
        double rh = r.estimate(Measurand.RETURN_RELATIVE_HUMIDITY).valueSi();
        return dp > t.valueSi(Thresholds.INDOOR_DEW_POINT_MAX) || rh > t.valueSi(Thresholds.INDOOR_RH_TARGET);
    }

    private static Estimate neg(Estimate e) {
        return new Estimate(-e.valueSi(), e.expandedSi());
    }

    private static Evidence evidence(Measurand m, Estimate e) {
        return new Evidence(m.key(), m.label(), m.quantity(), e.valueSi(), e.expandedSi());
    }
}
