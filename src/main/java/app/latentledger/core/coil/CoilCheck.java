package app.latentledger.core.coil;

import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.psychro.AdiabaticMixing;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.MoistAirState;
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
        MoistAirState l = readings.leaving().state(p, HandbookEdition.SI);
        CoilProcess process = CoilProcess.of(p, e.dryBulbC(), e.humidityRatio(), l.dryBulbC(), l.humidityRatio(),
                readings.airflowM3PerS(), readings.airflowAt());
        ApparatusDewPoint adp = ApparatusDewPoint.find(p, e.dryBulbC(), e.humidityRatio(), l.dryBulbC(),
                l.humidityRatio());
        CoilModel model = new CoilModel(readings);
        Propagation.Result u = Propagation.firstOrder(model.inputs(), model);
        Map<Measurand, Estimate> estimates = new EnumMap<>(Measurand.class);
        for (Measurand m : Measurand.values()) {
            estimates.put(m, new Estimate(u.values()[m.ordinal()], u.expanded()[m.ordinal()]));
        }
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
        CoilVerdict.Call margin = CoilVerdict.marginCall(estimates.get(Measurand.DEW_POINT_MARGIN));
        CoilVerdict.Call drop = CoilVerdict.dropCall(estimates.get(Measurand.HUMIDITY_RATIO_DROP));
        CoilVerdict verdict = CoilVerdict.decide(margin, drop);
        CondensateCheck condensate = readings.condensate() == null ? null
                : new CondensateCheck(estimates.get(Measurand.CONDENSATE_RATE),
                        estimates.get(Measurand.MOISTURE_REMOVAL), estimates.get(Measurand.CONDENSATE_MINUS_AIRSIDE));
        MoistAirState shownReturn = display == HandbookEdition.SI ? ret : readings.entering().state(p, display);
        MoistAirState shownOutdoor = outdoor == null || display == HandbookEdition.SI ? outdoor
                : readings.outdoor().air().state(p, display);
        MoistAirState shownEntering = mix == null ? shownReturn
                : display == HandbookEdition.SI ? e : MixedAir.state(p, mix, display);
        MoistAirState shownLeaving = display == HandbookEdition.SI ? l : readings.leaving().state(p, display);
        CoilResult partial = new CoilResult(readings, shownEntering, shownLeaving, process, adp, coil, source,
                estimates, margin, drop, verdict, condensate, List.of(), shownReturn, shownOutdoor, mix);
        return new CoilResult(readings, shownEntering, shownLeaving, process, adp, coil, source, estimates, margin,
                drop, verdict, condensate, CoilFindings.of(partial, thresholds, units), shownReturn, shownOutdoor, mix);
    }
}
