package app.latentledger.core.coil;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.psychro.AdiabaticMixing;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.MoistAirState;
import app.latentledger.core.psychro.Psychrometrics;
import app.latentledger.core.units.Quantity;

/**
 * The air entering the coil when outdoor air joins the return: {@link AdiabaticMixing} of the two
 * streams (ASHRAE HoF 2017/2021 ch. 1, "Adiabatic mixing of two streams of moist air"), the
 * outdoor share by volume turned into a dry-air mass share with each stream's specific volume
 * (eq. 28, SI edition, as every coil figure is). The check and its uncertainty model both use
 * this, so the value and its propagation come from one formula.
 */
final class MixedAir {
    private MixedAir() {
    }

    /**
     * @param volumeFraction outdoor air's share of the coil airflow by volume, 0…1
     * @return the mix; stream 1 is the return, stream 2 the outdoor air
     */
    static AdiabaticMixing.Mix of(double pressurePa, double returnDbC, double returnW, double outdoorDbC,
                                  double outdoorW, double volumeFraction) {
        HandbookEdition si = HandbookEdition.SI;
        double x = AdiabaticMixing.massFractionFromVolumeFraction(volumeFraction,
                si.specificVolumeM3PerKg(returnDbC, returnW, pressurePa),
                si.specificVolumeM3PerKg(outdoorDbC, outdoorW, pressurePa));
        return AdiabaticMixing.of(pressurePa, returnDbC, returnW, outdoorDbC, outdoorW, x, si);
    }

    /**
     * The mixed state, in {@code edition}.
     *
     * @throws InvalidInputException when the two readings mix past saturation (fog in the mixing
     *                               box): real in cold weather, but more often a sign of a bad reading
     */
    static MoistAirState state(double pressurePa, AdiabaticMixing.Mix mix, HandbookEdition edition) {
        if (mix.supersaturated()) {
            throw new InvalidInputException("mixed air humidity ratio", Quantity.HUMIDITY_RATIO, mix.humidityRatio(),
                    0, Psychrometrics.saturationHumidityRatio(mix.dryBulbC(), pressurePa),
                    "the return and outdoor readings mix past saturation (fog): check both readings");
        }
        return MoistAirState.fromHumidityRatio(pressurePa, mix.dryBulbC(), mix.humidityRatio(), edition);
    }
}
