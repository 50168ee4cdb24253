package app.latentledger.core.coil;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.measure.FieldLimits;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.MoistAirState;
import app.latentledger.core.psychro.Psychrometrics;
import app.latentledger.core.psychro.SaturationPressure;
import app.latentledger.core.units.Quantity;

/**
 * A dry bulb and one humidity reading at one point of the air stream, each with the instrument's
 * tolerance (the ± a maker states, read as the half-width of a rectangular distribution).
 *
 * @param where          "return", "supply" — used in messages
 * @param dryBulbC       dry bulb, °C
 * @param dryBulbTolK    ± tolerance of the dry bulb, K
 * @param humidityKind   which humidity reading
 * @param humiditySi     the reading: °C for wet bulb and dew point, % for RH
 * @param humidityTolSi  ± tolerance of the humidity reading: K, or points of %RH
 */
public record AirReading(String where, double dryBulbC, double dryBulbTolK, HumidityKind humidityKind,
                         double humiditySi, double humidityTolSi) {

    public AirReading {
        FieldLimits.TEMPERATURE_TOLERANCE.check(where + " dry-bulb tolerance", dryBulbTolK);
        humidityKind.toleranceLimit().check(where + " " + humidityKind.label() + " tolerance", humidityTolSi);
    }

    /**
     * The full state, validated, with the field named for the tech ("return wet bulb").
     *
     * @throws InvalidInputException naming {@code where} and the reading
     */
    public MoistAirState state(double pressurePa, HandbookEdition edition) {
        try {
            switch (humidityKind) {
                case WET_BULB:
                    return MoistAirState.fromWetBulb(pressurePa, dryBulbC, humiditySi, edition);
                case RELATIVE_HUMIDITY:
                    return MoistAirState.fromRelativeHumidity(pressurePa, dryBulbC, humiditySi, edition);
                case DEW_POINT:
                    return MoistAirState.fromDewPoint(pressurePa, dryBulbC, humiditySi, edition);
                default:
                    throw new IllegalStateException(humidityKind.name());
            }
        } catch (InvalidInputException e) {
            throw e.within(where);
        }
    }

    /**
     * Humidity ratio for a dry bulb and humidity reading that may lie off the nominal ones (for
     * uncertainty propagation), without building a whole state. Eq. 33/35 (SI edition) for a wet
     * bulb, eqs. 6 and 20 for a dew point, eqs. 20 and 24 for RH (ASHRAE HoF 2017 ch. 1).
     *
     * @param clamp true: a perturbed reading past saturation (RH above 100 %, wet bulb or dew point
     *              above the dry bulb, RH below 0) is held at the limit, as the true value cannot lie
     *              beyond it; false: such a reading gives NaN
     * @return kg/kg, or NaN
     */
    public static double humidityRatio(HumidityKind kind, double pressurePa, double dryBulbC, double value,
                                       boolean clamp) {
        double ws = Psychrometrics.saturationHumidityRatio(dryBulbC, pressurePa);
        switch (kind) {
            case WET_BULB: {
                double wb = value;
                if (wb > dryBulbC) {
                    if (!clamp) {
                        return Double.NaN;
                    }
                    wb = dryBulbC;
                }
                double w = HandbookEdition.SI.humidityRatioFromWetBulb(dryBulbC, wb, pressurePa);
                if (w < 0) {
                    return clamp ? 0.0 : Double.NaN;
                }
                return Math.min(w, ws);
            }
            case RELATIVE_HUMIDITY: {
                double rh = value;
                if (rh > 100 || rh < 0) {
                    if (!clamp) {
                        return Double.NaN;
                    }
                    rh = Math.max(0, Math.min(100, rh));
                }
                return Psychrometrics.humidityRatio(rh / 100.0 * SaturationPressure.pascals(dryBulbC), pressurePa);
            }
            case DEW_POINT: {
                double dp = value;
                if (dp > dryBulbC) {
                    if (!clamp) {
                        return Double.NaN;
                    }
                    dp = dryBulbC;
                }
                return Psychrometrics.humidityRatio(SaturationPressure.pascals(dp), pressurePa);
            }
            default:
                throw new IllegalStateException(kind.name());
        }
    }
}
