package app.latentledger.core.coil;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.measure.FieldLimits;
import app.latentledger.core.measure.ProbeMatch;
import app.latentledger.core.psychro.AdiabaticMixing;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.MoistAirState;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.Ratio;
import app.latentledger.core.units.UnitSystem;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * Runs a coil check: states, mass-flow capacities, apparatus dew point, coil temperature against
 * the entering dew point with first-order (GUM) uncertainty, verdict, condensate cross-check and
 * findings. With outdoor air the entering state is the adiabatic mix of the return and outdoor
 * readings ({@link MixedAir}). Pure: no I/O.
 */
public final class CoilCheck {
    private CoilCheck() {
    }

    /**
     * @param readings   the readings
     * @param thresholds thresholds in force
     * @param units      the tech's units: states are shown in that edition and findings worded in them
     *                   (capacities always use SI-edition arithmetic)
     * @throws app.latentledger.core.InvalidInputException when a reading is refused
     */
    public static CoilResult run(CoilReadings readings, ThresholdSettings thresholds, UnitSystem units) {
        HandbookEdition display = HandbookEdition.of(units);
        double p = readings.pressurePa();
        MoistAirState ret = readings.entering().state(p, HandbookEdition.SI);
        MoistAirState outdoor = null;
        AdiabaticMixing.Mix mix = null;
        MoistAirState e = ret;
        if (readings.hasOutdoorAir()) {
            outdoor = readings.outdoor().air().state(p, HandbookEdition.SI);
            mix = MixedAir.of(p, ret.dryBulbC(), ret.humidityRatio(), outdoor.dryBulbC(), outdoor.humidityRatio(),
                    readings.outdoor().fraction());
            e = MixedAir.state(p, mix, HandbookEdition.SI);
        }
        MoistAirState l = leaving(readings, p, HandbookEdition.SI);
        CoilProcess process = CoilProcess.of(p, e.dryBulbC(), e.humidityRatio(), l.dryBulbC(), l.humidityRatio(),
                readings.airflowM3PerS(), readings.airflowAt(), readings.airflowBasis());
        ApparatusDewPoint adp = ApparatusDewPoint.find(p, e.dryBulbC(), e.humidityRatio(), l.dryBulbC(),
                l.humidityRatio());
        CoilModel model = new CoilModel(readings);
        Propagation.Result u = Propagation.firstOrder(model.inputs(), model);
        Map<Measurand, Estimate> estimates = new EnumMap<>(Measurand.class);
        for (Measurand m : Measurand.values()) {
            estimates.put(m, new Estimate(u.values()[m.ordinal()], u.expanded()[m.ordinal()]));
        }
        withholdUndefinedRatios(estimates, e.dryBulbC());
        double coil;
        CoilTemperatureSource source;
        if (readings.hasCoilTemperature()) {
            coil = readings.coilTemperatureC();
            source = CoilTemperatureSource.MEASURED;
        } else if (adp.found()) {
            coil = adp.temperatureC();
            source = CoilTemperatureSource.APPARATUS_DEW_POINT;
        } else {
            coil = Double.NaN;
            source = CoilTemperatureSource.NONE;
        }
        CoilVerdict.Call margin = CoilVerdict.marginCall(estimates.get(Measurand.DEW_POINT_MARGIN),
                source == CoilTemperatureSource.MEASURED ? readings.coilKind() : null,
                thresholds.valueSi(Thresholds.COIL_SATURATION_ALLOWANCE));
        CoilVerdict.Call drop = CoilVerdict.dropCall(estimates.get(Measurand.HUMIDITY_RATIO_DROP));
        CondensateCheck condensate = readings.condensate() == null ? null : condensate(readings, estimates, thresholds);
        CoilVerdict verdict = CoilVerdict.decide(margin, drop, condensate != null && condensate.showsDrying());
        MoistAirState shownReturn = display == HandbookEdition.SI ? ret : readings.entering().state(p, display);
        MoistAirState shownOutdoor = outdoor == null || display == HandbookEdition.SI ? outdoor
                : readings.outdoor().air().state(p, display);
        MoistAirState shownEntering = mix == null ? shownReturn
                : display == HandbookEdition.SI ? e : MixedAir.state(p, mix, display);
        MoistAirState shownLeaving = display == HandbookEdition.SI ? l : leaving(readings, p, display);
        CoilResult partial = new CoilResult(readings, shownEntering, shownLeaving, process, adp, coil, source,
                estimates, margin, drop, verdict, condensate, List.of(), shownReturn, shownOutdoor, mix);
        return new CoilResult(readings, shownEntering, shownLeaving, process, adp, coil, source, estimates, margin,
                drop, verdict, condensate, CoilFindings.of(partial, thresholds, units), shownReturn, shownOutdoor, mix);
    }

    /**
     * The supply state, with an entered probe offset taken off its dew point
     * ({@link ProbeMatch#supplyDewPointOffsetK()}).
     *
     * @throws InvalidInputException when the corrected dew point would lie above the supply dry bulb
     */
    private static MoistAirState leaving(CoilReadings readings, double p, HandbookEdition edition) {
        MoistAirState read = readings.leaving().state(p, edition);
        ProbeMatch probes = readings.probes();
        if (!probes.hasOffset()) {
            return read;
        }
        double dp = read.dewPointC() - probes.supplyDewPointOffsetK();
        if (dp > read.dryBulbC()) {
            throw new InvalidInputException("supply dew-point offset", Quantity.TEMPERATURE_DIFFERENCE,
                    probes.supplyDewPointOffsetK(), read.dewPointC() - read.dryBulbC(),
                    FieldLimits.SUPPLY_DEW_POINT_OFFSET.maxSi(),
                    "the corrected supply dew point would lie above the supply dry bulb");
        }
        return MoistAirState.fromDewPoint(p, read.dryBulbC(), dp, edition);
    }

    /**
     * No undefined ratios ({@link Ratio}): the SHR needs a total clearly above zero and a sensible
     * part not below zero; the SHR from the catch the same of its own total; the bypass factor an
     * entering dry bulb clearly above the apparatus dew point.
     */
    private static void withholdUndefinedRatios(Map<Measurand, Estimate> estimates, double enteringDryBulbC) {
        Estimate total = estimates.get(Measurand.TOTAL);
        Estimate sensible = estimates.get(Measurand.SENSIBLE);
        boolean sensibleNotNegative = sensible.exists() && sensible.valueSi() >= 0;
        if (!(sensibleNotNegative && Ratio.measurable(total.valueSi(), total.expandedSi()))) {
            estimates.put(Measurand.SHR, Estimate.NONE);
        }
        Estimate fromCatch = estimates.get(Measurand.LATENT_FROM_CONDENSATE);
        double catchTotal = sensible.valueSi() + fromCatch.valueSi();
        if (!(sensibleNotNegative && Ratio.measurable(catchTotal,
                Math.hypot(sensible.expandedSi(), fromCatch.expandedSi())))) {
            estimates.put(Measurand.SHR_FROM_CONDENSATE, Estimate.NONE);
        }
        Estimate adp = estimates.get(Measurand.APPARATUS_DEW_POINT);
        if (!(adp.exists() && Ratio.measurable(enteringDryBulbC - adp.valueSi(), adp.expandedSi()))) {
            estimates.put(Measurand.BYPASS_FACTOR, Estimate.NONE);
        }
    }

    /** The catch against the air side, and whether it is steady and certain enough to stand for the latent. */
    private static CondensateCheck condensate(CoilReadings readings, Map<Measurand, Estimate> estimates,
                                              ThresholdSettings thresholds) {
        Estimate rate = estimates.get(Measurand.CONDENSATE_RATE);
        Estimate airside = estimates.get(Measurand.MOISTURE_REMOVAL);
        Estimate difference = estimates.get(Measurand.CONDENSATE_MINUS_AIRSIDE);
        Estimate latentAir = estimates.get(Measurand.LATENT);
        boolean steady = readings.condensate().seconds() >= thresholds.valueSi(Thresholds.CONDENSATE_STEADY_MIN_TIME)
                && !difference.clearlyNegative();
        double relCatch = rate.valueSi() > 0 ? rate.expandedSi() / rate.valueSi() : Double.POSITIVE_INFINITY;
        double relAir = latentAir.valueSi() > 0 ? latentAir.expandedSi() / latentAir.valueSi() : Double.POSITIVE_INFINITY;
        boolean moreCertain = relCatch < relAir;
        return new CondensateCheck(rate, airside, difference, estimates.get(Measurand.LATENT_FROM_CONDENSATE),
                estimates.get(Measurand.SHR_FROM_CONDENSATE), steady, moreCertain);
    }
}
