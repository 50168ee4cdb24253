package app.latentledger.core.house;

import app.latentledger.core.coil.ApparatusDewPoint;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.Psychrometrics;

/**
 * A DX cooling coil at another airflow by the EnergyPlus apparatus-dew-point / bypass-factor
 * method (EnergyPlus Engineering Reference, "Single-Speed Electric DX Air Cooling Coil"; routines
 * CalcCBF, AdjustCBF and CalcDoe2DXCoil of EnergyPlus DXCoils.cc), with the handbook's moist-air
 * properties (ASHRAE HoF 2017 ch. 1, SI edition) in place of EnergyPlus's own.
 *
 * <ol>
 *   <li>Bypass factor at another flow: the coil is a heat exchanger with C_min/C_max = 0, so
 *       BF = exp(−A₀/ṁ) with A₀ = −ln(BF₀)·ṁ₀ calibrated at a known point — here the
 *       <i>measured</i> bypass factor and dry-air mass flow.</li>
 *   <li>Total capacity with the flow-fraction curve CapFFF(ff) = 0.8 + 0.2·ff (EnergyPlus example
 *       curve WindACCoolCapFFF), ff = ṁ/ṁ_rated: Q = Q₀·CapFFF(ff)/CapFFF(ff₀); the entering state is
 *       held fixed.</li>
 *   <li>h_ADP = h_in − (Q/ṁ)/(1 − BF); T_ADP on saturation at h_ADP; SHR = (h(T_in, W_ADP) − h_ADP)
 *       /(h_in − h_ADP), at most 1; a dry coil (W_ADP ≥ W_in) has SHR = 1.</li>
 *   <li>Leaving humidity W_out from h(T_in, W_out) = h_in − (1 − SHR)·Q/ṁ; water = ṁ·(W_in − W_out);
 *       latent = (1 − SHR)·Q.</li>
 * </ol>
 * Mass flows are dry air (V̇/v at the entering state). Valid for 200–500 cfm per nominal ton
 * (2.684e−5 to 6.713e−5 m³/s per W, EnergyPlus's operating limits); outside, the result is flagged.
 */
public final class DxCoilWhatIf {
    /** EnergyPlus operating limits of airflow per rated capacity, m³/s per W (200 and 500 cfm/ton). */
    public static final double MIN_FLOW_PER_W = 2.684e-5;
    public static final double MAX_FLOW_PER_W = 6.713e-5;
    /** Rated airflow per nominal capacity used when no rated flow is known: 400 cfm/ton (common practice). */
    public static final double RATED_FLOW_PER_W = 5.369e-5;

    private static final HandbookEdition SI = HandbookEdition.SI;

    /**
     * The coil at one flow.
     *
     * @param massFlowKgPerS dry air, kg/s
     * @param bypassFactor   BF
     * @param totalW         total capacity, W
     * @param shr            sensible heat ratio
     * @param adpC           apparatus dew point, °C
     * @param wAdp           humidity ratio at the ADP, kg/kg
     * @param waterKgPerS    water removed, kg/s
     * @param latentW        latent capacity, W
     * @param dry            true when the coil runs dry (SHR = 1)
     */
    public record Point(double massFlowKgPerS, double bypassFactor, double totalW, double shr, double adpC,
                        double wAdp, double waterKgPerS, double latentW, boolean dry) {
    }

    private final double pressurePa;
    private final double tInC;
    private final double wIn;
    private final double a0;
    private final double q0W;
    private final double m0;
    private final double mRated;

    /**
     * @param pressurePa    barometric pressure, Pa
     * @param tInC          entering dry bulb, °C
     * @param wIn           entering humidity ratio, kg/kg
     * @param m0KgPerS      dry-air mass flow at the known point, kg/s
     * @param bf0           bypass factor at the known point (0 &lt; BF &lt; 1)
     * @param q0W           total capacity at the known point, W
     * @param mRatedKgPerS  rated dry-air mass flow (for the flow fraction), kg/s
     */
    public DxCoilWhatIf(double pressurePa, double tInC, double wIn, double m0KgPerS, double bf0, double q0W,
                        double mRatedKgPerS) {
        this.pressurePa = pressurePa;
        this.tInC = tInC;
        this.wIn = wIn;
        this.m0 = m0KgPerS;
        this.a0 = -Math.log(Math.max(1e-9, Math.min(bf0, 1 - 1e-9))) * m0KgPerS;
        this.q0W = q0W;
        this.mRated = mRatedKgPerS;
    }

    /** A₀ = −ln(BF₀)·ṁ₀, kg/s. */
    public double a0() {
        return a0;
    }

    /** Flow-fraction curve CapFFF(ff) = 0.8 + 0.2·ff. */
    public static double capacityFlowFraction(double ff) {
        return 0.8 + 0.2 * ff;
    }

    /** The coil at dry-air mass flow {@code mKgPerS}. */
    public Point at(double mKgPerS) {
        double bf = Math.exp(-a0 / mKgPerS);
        double q = q0W * capacityFlowFraction(mKgPerS / mRated) / capacityFlowFraction(m0 / mRated);
        double hIn = SI.enthalpyJPerKg(tInC, wIn);
        double hAdp = hIn - (q / mKgPerS) / (1 - bf);
        double tAdp = saturationTemperatureC(hAdp, pressurePa);
        double wAdp = Psychrometrics.saturationHumidityRatio(tAdp, pressurePa);
        boolean dry = wAdp >= wIn;
        double shr = dry ? 1.0 : Math.min(1.0, (SI.enthalpyJPerKg(tInC, wAdp) - hAdp) / (hIn - hAdp));
        double hOutAtTin = hIn - (1 - shr) * q / mKgPerS;
        double wOut = humidityRatioAt(tInC, hOutAtTin);
        return new Point(mKgPerS, bf, q, shr, tAdp, wAdp, mKgPerS * (wIn - wOut), q * (1 - shr), dry);
    }

    /**
     * EnergyPlus CalcCBF: the bypass factor of a coil at its rating point from the rated total
     * capacity and SHR — the leaving state from the capacity split, the ADP where the entering–leaving
     * line meets saturation ({@link ApparatusDewPoint}), then BF = (h_out − h_ADP)/(h_in − h_ADP).
     *
     * @return {BF, ADP °C, leaving dry bulb °C, leaving W}
     */
    public static double[] ratedBypassFactor(double pressurePa, double tInC, double wIn, double mKgPerS,
                                             double totalW, double shr) {
        double hIn = SI.enthalpyJPerKg(tInC, wIn);
        double dh = totalW / mKgPerS;
        double wOut = humidityRatioAt(tInC, hIn - (1 - shr) * dh);
        double hOut = hIn - dh;
        double tOut = dryBulbAt(hOut, wOut);
        ApparatusDewPoint adp = ApparatusDewPoint.find(pressurePa, tInC, wIn, tOut, wOut);
        double wAdp = Psychrometrics.saturationHumidityRatio(adp.temperatureC(), pressurePa);
        double hAdp = SI.enthalpyJPerKg(adp.temperatureC(), wAdp);
        return new double[] {Math.min(1.0, (hOut - hAdp) / (hIn - hAdp)), adp.temperatureC(), tOut, wOut};
    }

    /** The saturation temperature whose saturated enthalpy is {@code hJPerKg}, °C (bisection). */
    public static double saturationTemperatureC(double hJPerKg, double pressurePa) {
        // 2⁻⁴⁰ of the 90 K bracket is below 10⁻¹⁰ K
        double lo = -30.0;
        double hi = 60.0;
        for (int i = 0; i < 40; i++) {
            double mid = 0.5 * (lo + hi);
            double h = SI.enthalpyJPerKg(mid, Psychrometrics.saturationHumidityRatio(mid, pressurePa));
            if (h < hJPerKg) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /** W from dry bulb and enthalpy, inverting the SI-edition eq. 32. */
    static double humidityRatioAt(double tC, double hJPerKg) {
        double hDry = SI.enthalpyJPerKg(tC, 0.0);
        double perW = SI.enthalpyJPerKg(tC, 1.0) - hDry;
        return (hJPerKg - hDry) / perW;
    }

    /** Dry bulb from enthalpy and W (eq. 32 solved for t by bisection; monotone in t). */
    static double dryBulbAt(double hJPerKg, double w) {
        double lo = -40.0;
        double hi = 80.0;
        for (int i = 0; i < 60; i++) {
            double mid = 0.5 * (lo + hi);
            if (SI.enthalpyJPerKg(mid, w) < hJPerKg) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }
}
