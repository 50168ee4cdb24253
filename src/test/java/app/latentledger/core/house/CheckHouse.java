package app.latentledger.core.house;

import app.latentledger.core.coil.AirReading;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.psychro.Psychrometrics;
import app.latentledger.core.psychro.SaturationPressure;

/**
 * The worked "check house" of the tests: 2000 ft², one story, 8 ft ceilings (16 000 ft³), three
 * bedrooms, 5 ACH50; a humid day at 85 °F with a 72 °F dew point outdoors, 75 °F / 50 % indoors;
 * a 3-ton system moving 1200 cfm with a straight process line to a 58.42 gr/lb apparatus dew point
 * and bypass factor 0.1319 (the EnergyPlus rating-point coil of DXCoils.cc CalcCBF at 75 °F entering),
 * running 55 % of the day at a part-load latent fraction of 0.80. Invented, round numbers.
 */
final class CheckHouse {
    static final double P = 101_325;
    static final double FT = 0.3048;
    static final double CFM = FT * FT * FT / 60;
    static final double LB = 0.45359237;
    static final double LB_PER_DAY = LB / 86_400;
    static final double LB_PER_H = LB / 3600;

    private CheckHouse() {
    }

    static double c(double f) {
        return (f - 32) / 1.8;
    }

    static AirReading dp(String where, double dbF, double dpF) {
        return new AirReading(where, c(dbF), 0.5 / 1.8, HumidityKind.DEW_POINT, c(dpF), 1.0 / 1.8);
    }

    static AirReading rh(String where, double dbF, double rh) {
        return new AirReading(where, c(dbF), 0.5 / 1.8, HumidityKind.RELATIVE_HUMIDITY, rh, 2.0);
    }

    static HouseFacts facts(int shelter, VentilationType type, double ventCfm, double erv) {
        return new HouseFacts(2000 * FT * FT, 8 * FT, 1, 3, 0, Double.NaN, 5.0, shelter, Double.NaN, type,
                ventCfm * CFM, erv);
    }

    static HouseFacts facts() {
        return facts(0, VentilationType.NONE, 0, Double.NaN);
    }

    static HouseReadings readings() {
        return new HouseReadings(rh("indoor", 75, 50), dp("outdoor", 85, 72), null, null, null);
    }

    static double wAt(double tC, double rhPct) {
        return Psychrometrics.humidityRatio(rhPct / 100 * SaturationPressure.pascals(tC), P);
    }

    /** The linear coil of the check house with its entering air at {@code wIn}. */
    static SystemRemoval system(double wIn, double shareReevaporated) {
        double wAdp = 58.42 / 7000;
        double adpC = SaturationPressure.dewPointC(Psychrometrics.vaporPressurePa(wAdp, P));
        double massFlowLbPerH = 5263.0;
        double steady = massFlowLbPerH * LB_PER_H * (1 - 0.1319) * (wIn - wAdp);
        return new SystemRemoval(c(75), wIn, 1200 * CFM, 0.1 * 1200 * CFM, massFlowLbPerH * LB_PER_H, steady,
                0.1 * steady, adpC, 0.3, 0.1319, 0.02, 10_550, 7_700, 10_550.56, 0.55, 0.05, "typed", 0.80, 0.10,
                "henderson-rengarajan", shareReevaporated);
    }

    static HouseInputs inputs(HouseFacts f, HouseReadings r, SystemRemoval s) {
        return new HouseInputs(f, r, s, P, ThresholdSettings.DEFAULTS);
    }

    static HouseInputs inputs() {
        return inputs(facts(), readings(), system(wAt(c(75), 50), 0));
    }
}
