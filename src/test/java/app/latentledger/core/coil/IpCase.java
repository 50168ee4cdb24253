package app.latentledger.core.coil;

import app.latentledger.core.measure.AirflowBasis;
import app.latentledger.core.measure.AirflowPoint;
import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.measure.ProbeMatch;
import app.latentledger.core.psychro.SitePressure;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

/** Builds coil readings from inch-pound field numbers, with the default tolerances. Test support. */
final class IpCase {
    private double pressurePa = 101_325.0;
    private AirReading entering;
    private AirReading leaving;
    private double airflow;
    private AirflowPoint at = AirflowPoint.ENTERING;
    private double coilC = Double.NaN;
    private CoilTemperatureKind coilKind;
    private double nominalW = Double.NaN;
    private Condensate condensate;
    private OutdoorAir outdoor;
    private AirflowBasis basis = AirflowBasis.ACTUAL;
    private ProbeMatch probes = ProbeMatch.INDEPENDENT;

    static double c(double f) {
        return (f - 32) / 1.8;
    }

    static IpCase returnRh(double dbF, double rh) {
        IpCase k = new IpCase();
        k.entering = new AirReading("return", c(dbF), Tolerances.DRY_BULB_K, HumidityKind.RELATIVE_HUMIDITY, rh,
                Tolerances.RELATIVE_HUMIDITY_PCT);
        return k;
    }

    static IpCase returnDp(double dbF, double dpF) {
        IpCase k = new IpCase();
        k.entering = new AirReading("return", c(dbF), Tolerances.DRY_BULB_K, HumidityKind.DEW_POINT, c(dpF),
                Tolerances.DEW_POINT_K);
        return k;
    }

    /** The airflow is standard cfm. */
    IpCase standardCfm() {
        basis = AirflowBasis.STANDARD;
        return this;
    }

    /** One instrument read both points (or the probes were compared side by side); supply dew-point offset in °F. */
    IpCase probes(boolean same, double supplyDewPointOffsetF) {
        probes = new ProbeMatch(same, supplyDewPointOffsetF / 1.8);
        return this;
    }

    IpCase pressurePa(double pa) {
        pressurePa = pa;
        return this;
    }

    static IpCase returnWb(double dbF, double wbF) {
        IpCase k = new IpCase();
        k.entering = new AirReading("return", c(dbF), Tolerances.DRY_BULB_K, HumidityKind.WET_BULB, c(wbF),
                Tolerances.WET_BULB_K);
        return k;
    }

    IpCase supplyRh(double dbF, double rh) {
        leaving = new AirReading("supply", c(dbF), Tolerances.DRY_BULB_K, HumidityKind.RELATIVE_HUMIDITY, rh,
                Tolerances.RELATIVE_HUMIDITY_PCT);
        return this;
    }

    IpCase supplyWb(double dbF, double wbF) {
        leaving = new AirReading("supply", c(dbF), Tolerances.DRY_BULB_K, HumidityKind.WET_BULB, c(wbF),
                Tolerances.WET_BULB_K);
        return this;
    }

    IpCase supplyDp(double dbF, double dpF) {
        leaving = new AirReading("supply", c(dbF), Tolerances.DRY_BULB_K, HumidityKind.DEW_POINT, c(dpF),
                Tolerances.DEW_POINT_K);
        return this;
    }

    IpCase cfm(double cfm) {
        airflow = Quantity.AIRFLOW.fromDisplay(UnitSystem.IP, cfm);
        return this;
    }

    IpCase airflowAtSupply() {
        at = AirflowPoint.LEAVING;
        return this;
    }

    IpCase elevationFt(double ft) {
        pressurePa = SitePressure.fromElevation(ft * 0.3048).pressurePa();
        return this;
    }

    IpCase coilF(double f, CoilTemperatureKind kind) {
        coilC = c(f);
        coilKind = kind;
        return this;
    }

    IpCase coilF(double f) {
        return coilF(f, CoilTemperatureKind.COIL_SURFACE);
    }

    IpCase nominalTons(double tons) {
        nominalW = Quantity.POWER_LARGE.fromDisplay(UnitSystem.IP, tons);
        return this;
    }

    IpCase condensate(double mL, double minutes) {
        condensate = new Condensate(mL * 1e-6, Tolerances.CONDENSATE_FRACTION, minutes * 60, Tolerances.CONDENSATE_TIMING_S);
        return this;
    }

    /** Outdoor air at {@code dbF} / {@code rh} %, {@code pct} % of the airflow by volume, default tolerances. */
    IpCase outdoorRh(double dbF, double rh, double pct) {
        outdoor = new OutdoorAir(new AirReading("outdoor", c(dbF), Tolerances.DRY_BULB_K, HumidityKind.RELATIVE_HUMIDITY,
                rh, Tolerances.RELATIVE_HUMIDITY_PCT), pct / 100, Tolerances.OUTDOOR_FRACTION);
        return this;
    }

    /** Outdoor air at {@code dbF} / {@code wbF} wet bulb, {@code pct} % of the airflow by volume, default tolerances. */
    IpCase outdoorWb(double dbF, double wbF, double pct) {
        outdoor = new OutdoorAir(new AirReading("outdoor", c(dbF), Tolerances.DRY_BULB_K, HumidityKind.WET_BULB,
                c(wbF), Tolerances.WET_BULB_K), pct / 100, Tolerances.OUTDOOR_FRACTION);
        return this;
    }

    CoilReadings readings() {
        return new CoilReadings(pressurePa, entering, leaving, airflow, Tolerances.AIRFLOW_FRACTION, at, coilC,
                Tolerances.COIL_K, coilKind, nominalW, condensate, outdoor, basis, probes);
    }

    CoilResult run() {
        return CoilCheck.run(readings(), app.latentledger.core.findings.ThresholdSettings.DEFAULTS, UnitSystem.IP);
    }
}
