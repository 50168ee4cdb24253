package app.latentledger.core.psychro;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.units.Quantity;

/**
 * The full psychrometric state of a sample of moist air, SI inside.
 *
 * @param pressurePa            total (barometric) pressure, Pa
 * @param dryBulbC              dry bulb, °C
 * @param wetBulbC              thermodynamic wet bulb, °C (see {@link WetBulb} for the convention near freezing)
 * @param dewPointC             dew point, or frost point below the triple point, °C
 * @param relativeHumidityPct   relative humidity, % (over ice below the triple point)
 * @param humidityRatio         kg water per kg dry air (= lb/lb)
 * @param degreeOfSaturation    W / Ws, dimensionless
 * @param vaporPressurePa       partial pressure of water vapor, Pa
 * @param enthalpyJPerKg        per kg of dry air, on the datum of {@code edition}
 * @param specificVolumeM3PerKg per kg of dry air
 * @param densityKgPerM3        moist air (dry air plus vapor) per m³
 * @param edition               which handbook edition's coefficients produced the numbers
 */
public record MoistAirState(
        double pressurePa,
        double dryBulbC,
        double wetBulbC,
        double dewPointC,
        double relativeHumidityPct,
        double humidityRatio,
        double degreeOfSaturation,
        double vaporPressurePa,
        double enthalpyJPerKg,
        double specificVolumeM3PerKg,
        double densityKgPerM3,
        HandbookEdition edition) {

    /**
     * State from dry bulb and wet bulb: W by eq. 33 or 35, limited to saturation (the IP ice-bulb
     * coefficients would otherwise give up to 100.007 % RH at −20 °F).
     *
     * @throws InvalidInputException when a value is out of range, the wet bulb is above the dry
     *                               bulb, or the wet bulb is too low for any real air
     */
    public static MoistAirState fromWetBulb(double pressurePa, double dryBulbC, double wetBulbC,
                                            HandbookEdition edition) {
        checkCommon(pressurePa, dryBulbC);
        InputLimits.checkTemperature("wet bulb", wetBulbC);
        if (wetBulbC > dryBulbC) {
            throw new InvalidInputException("wet bulb", Quantity.TEMPERATURE, wetBulbC,
                    InputLimits.MIN_TEMP_C, dryBulbC, "a wet bulb cannot be above the dry bulb");
        }
        if (wetBulbC > 80.0) {
            double boiling = Psychrometrics.boilingPointC(pressurePa);
            if (wetBulbC >= boiling) {
                throw new InvalidInputException("wet bulb", Quantity.TEMPERATURE, wetBulbC,
                        InputLimits.MIN_TEMP_C, boiling, "water boils below it at this pressure");
            }
        }
        double w = edition.humidityRatioFromWetBulb(dryBulbC, wetBulbC, pressurePa);
        if (!(w >= 0)) {
            double lowest = lowestWetBulbC(pressurePa, dryBulbC, edition);
            throw new InvalidInputException("wet bulb", Quantity.TEMPERATURE, wetBulbC, lowest, dryBulbC,
                    "even bone-dry air has a higher wet bulb at this dry bulb and pressure");
        }
        double pws = SaturationPressure.pascals(dryBulbC);
        double ws = saturationOf(pws, pressurePa);
        w = Math.min(w, ws);
        double pw = Psychrometrics.vaporPressurePa(w, pressurePa);
        return finish(pressurePa, dryBulbC, wetBulbC, dewPointOf(w, pw, dryBulbC), 100.0 * pw / pws, w, pw, ws,
                edition);
    }

    /**
     * State from dry bulb and relative humidity (eq. 24 for pw, eq. 20 for W, {@link WetBulb}).
     */
    public static MoistAirState fromRelativeHumidity(double pressurePa, double dryBulbC, double relativeHumidityPct,
                                                     HandbookEdition edition) {
        checkCommon(pressurePa, dryBulbC);
        InputLimits.checkRelativeHumidity("relative humidity", relativeHumidityPct);
        double pws = SaturationPressure.pascals(dryBulbC);
        double pw = relativeHumidityPct / 100.0 * pws;
        if (pw >= 0.99 * pressurePa) {
            // only above the boiling point for the pressure: the vapor alone would exceed the barometer
            throw new InvalidInputException("relative humidity", Quantity.RELATIVE_HUMIDITY, relativeHumidityPct,
                    0.0, 99.0 * pressurePa / pws,
                    "at this dry bulb and pressure the vapor would exceed the barometric pressure");
        }
        double w = Psychrometrics.humidityRatio(pw, pressurePa);
        return fromKnownHumidityRatio(pressurePa, dryBulbC, w, pw, pws, edition);
    }

    /** State from dry bulb and dew point (frost point below 0.01 °C), via eqs. 5/6 and 20. */
    public static MoistAirState fromDewPoint(double pressurePa, double dryBulbC, double dewPointC,
                                             HandbookEdition edition) {
        checkCommon(pressurePa, dryBulbC);
        InputLimits.checkTemperature("dew point", dewPointC);
        if (dewPointC > dryBulbC) {
            throw new InvalidInputException("dew point", Quantity.TEMPERATURE, dewPointC,
                    InputLimits.MIN_TEMP_C, dryBulbC, "a dew point cannot be above the dry bulb");
        }
        double pw = SaturationPressure.pascals(dewPointC);
        double w = Psychrometrics.humidityRatio(pw, pressurePa);
        MoistAirState s = fromKnownHumidityRatio(pressurePa, dryBulbC, w, pw,
                SaturationPressure.pascals(dryBulbC), edition);
        // keep the entered dew point exactly rather than its round trip through W
        return new MoistAirState(s.pressurePa, s.dryBulbC, s.wetBulbC, dewPointC, s.relativeHumidityPct,
                s.humidityRatio, s.degreeOfSaturation, s.vaporPressurePa, s.enthalpyJPerKg,
                s.specificVolumeM3PerKg, s.densityKgPerM3, edition);
    }

    /** State from dry bulb and humidity ratio (kg/kg = lb/lb), at most saturation. */
    public static MoistAirState fromHumidityRatio(double pressurePa, double dryBulbC, double humidityRatio,
                                                  HandbookEdition edition) {
        checkCommon(pressurePa, dryBulbC);
        double pws = SaturationPressure.pascals(dryBulbC);
        InputLimits.check("humidity ratio", Quantity.HUMIDITY_RATIO, humidityRatio, 0.0, saturationOf(pws, pressurePa),
                "air cannot hold more water than saturation at its dry bulb");
        double pw = Psychrometrics.vaporPressurePa(humidityRatio, pressurePa);
        return fromKnownHumidityRatio(pressurePa, dryBulbC, humidityRatio, pw, pws, edition);
    }

    private static MoistAirState fromKnownHumidityRatio(double p, double db, double w, double pw, double pws,
                                                        HandbookEdition edition) {
        double dp = dewPointOf(w, pw, db);
        double wb = WetBulb.fromHumidityRatio(db, w, p, edition, pws, dp);
        return finish(p, db, wb, dp, 100.0 * pw / pws, w, pw, saturationOf(pws, p), edition);
    }

    private static double dewPointOf(double w, double pw, double db) {
        return w > 0 ? Math.min(SaturationPressure.dewPointC(pw), db) : Double.NEGATIVE_INFINITY;
    }

    /** Eq. 23 from a known pws; +∞ at or above the boiling point for the pressure. */
    private static double saturationOf(double pws, double p) {
        return pws >= p ? Double.POSITIVE_INFINITY : Psychrometrics.humidityRatio(pws, p);
    }

    private static MoistAirState finish(double p, double db, double wb, double dp, double rhPct, double w, double pw,
                                        double ws, HandbookEdition edition) {
        double v = edition.specificVolumeM3PerKg(db, w, p);
        // W never exceeds Ws here, so an RH a rounding error above 100 % is 100 %
        return new MoistAirState(p, db, wb, dp, Math.min(rhPct, 100.0), w, w / ws, pw, edition.enthalpyJPerKg(db, w), v,
                Psychrometrics.densityKgPerM3(w, v), edition);
    }

    private static void checkCommon(double pressurePa, double dryBulbC) {
        InputLimits.checkPressure("pressure", pressurePa);
        InputLimits.checkTemperature("dry bulb", dryBulbC);
    }

    /** The wet bulb of perfectly dry air (W = 0) at this dry bulb: the lowest a reading can be. */
    static double lowestWetBulbC(double pressurePa, double dryBulbC, HandbookEdition edition) {
        return WetBulb.fromHumidityRatio(dryBulbC, 0.0, pressurePa, edition);
    }

    /** Saturation humidity ratio at this state's dry bulb and pressure, kg/kg. */
    public double saturationHumidityRatio() {
        return Psychrometrics.saturationHumidityRatio(dryBulbC, pressurePa);
    }
}
