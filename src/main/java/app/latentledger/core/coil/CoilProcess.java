package app.latentledger.core.coil;

import app.latentledger.core.measure.AirflowBasis;
import app.latentledger.core.measure.AirflowPoint;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.units.Ratio;

/**
 * The air-side energy and moisture balance of a cooling-and-dehumidifying coil, by mass flow.
 *
 * <p><b>Equations</b> (ASHRAE Handbook—Fundamentals 2017/2021 SI, ch. 1, "Moist-air cooling and
 * dehumidification", Example 3; SI-edition coefficients throughout, so the numbers do not depend
 * on the tech's display units):
 * <ul>
 *   <li>dry-air mass flow ṁ_da = V̇ / v, v by eq. 28 at the point where V̇ was measured, for an
 *       actual airflow; ṁ_da = V̇_std ρ_std / (1 + W) for standard cfm ({@link AirflowBasis});</li>
 *   <li>water removed (eq. 42) ṁ_w = ṁ_da (W₁ − W₂);</li>
 *   <li>total (eq. 43) q = ṁ_da [(h₁ − h₂) − (W₁ − W₂) h_w2], h by eq. 32, with the condensate
 *       leaving at the supply dry bulb, h_w2 = 4.186 t₂ kJ/kg (the liquid-water enthalpy the
 *       handbook uses beside eq. 33);</li>
 *   <li><b>sensible</b> q_s = ṁ_da (h(t₁, W₁) − h(t₂, W₁)) = ṁ_da (1.006 + 1.86 W₁)(t₁ − t₂):
 *       cooling the entering air, at its own humidity ratio, from the entering to the leaving dry
 *       bulb — eq. 32 differenced at constant W, i.e. moist-air specific heat, the same c_p form as
 *       HoF ch. 18 §"standard air" (eq. 8);</li>
 *   <li><b>latent</b> q_l = q − q_s = ṁ_da (W₁ − W₂)(2501 + 1.86 t₂ − 4.186 t₂) kJ/kg
 *       = ṁ_w h_fg(t₂): the water condensed at the leaving temperature, with h_fg from the
 *       constants of eq. 32 and the liquid enthalpy above (≈ 2477 kJ/kg, 1065 Btu/lb, at 10 °C).</li>
 * </ul>
 * With this split the two usual definitions of latent capacity — "total minus sensible" and
 * "water removed times latent heat" — are the same number, so sensible + latent is exactly the
 * total and latent ÷ water removed is the latent heat at the coil. (Taking c_p at the leaving W
 * instead moves about 0.2 % of the total from latent to sensible at typical conditions.)
 * SHR = q_s / q (the chart's sensible-heat-ratio protractor, HoF ch. 1). Valid for a coil that
 * cools (t₂ &lt; t₁); the arithmetic is also well defined for warming or wetting air, and then
 * reports negative capacities rather than hiding them.
 *
 * @param massFlowKgPerS        dry air, kg/s
 * @param sensibleW             W, positive when cooling
 * @param latentW               W, positive when removing water
 * @param totalW                W
 * @param sensibleHeatRatio     q_s / q; NaN unless q &gt; 0 and q_s ≥ 0 ({@link Ratio}; the check
 *                              further withholds it unless q is clearly positive)
 * @param moistureRemovalKgPerS water condensed, kg/s
 * @param humidityRatioDrop     W₁ − W₂, kg/kg
 * @param temperatureDropK      t₁ − t₂, K
 * @param enthalpyDropJPerKg    h₁ − h₂ (SI edition), J/kg dry air
 * @param latentPerAirflow      q_l / V̇, W per m³/s
 * @param airflowPerCapacity    V̇ / q, m³/s per W; NaN when q ≤ 0
 */
public record CoilProcess(double massFlowKgPerS, double sensibleW, double latentW, double totalW,
                          double sensibleHeatRatio, double moistureRemovalKgPerS, double humidityRatioDrop,
                          double temperatureDropK, double enthalpyDropJPerKg, double latentPerAirflow,
                          double airflowPerCapacity) {

    /** Specific heat of liquid water, J/(kg·K) (the handbook's 4.186 kJ/(kg·K)). */
    public static final double CP_LIQUID_WATER = 4186.0;

    /**
     * @param pressurePa    barometric pressure, Pa
     * @param t1C           entering dry bulb, °C
     * @param w1            entering humidity ratio, kg/kg
     * @param t2C           leaving dry bulb, °C
     * @param w2            leaving humidity ratio, kg/kg
     * @param airflowM3PerS volumetric airflow at {@code at}
     * @param at            where the airflow was measured
     */
    public static CoilProcess of(double pressurePa, double t1C, double w1, double t2C, double w2,
                                 double airflowM3PerS, AirflowPoint at) {
        return of(pressurePa, t1C, w1, t2C, w2, airflowM3PerS, at, AirflowBasis.ACTUAL);
    }

    /**
     * @param basis actual volume, or standard cfm
     */
    public static CoilProcess of(double pressurePa, double t1C, double w1, double t2C, double w2,
                                 double airflowM3PerS, AirflowPoint at, AirflowBasis basis) {
        HandbookEdition si = HandbookEdition.SI;
        boolean entering = at == AirflowPoint.ENTERING;
        double v = entering
                ? si.specificVolumeM3PerKg(t1C, w1, pressurePa)
                : si.specificVolumeM3PerKg(t2C, w2, pressurePa);
        double m = basis.dryAirMassFlowKgPerS(airflowM3PerS, v, entering ? w1 : w2);
        double h1 = si.enthalpyJPerKg(t1C, w1);
        double h2 = si.enthalpyJPerKg(t2C, w2);
        double dw = w1 - w2;
        double total = m * ((h1 - h2) - dw * CP_LIQUID_WATER * t2C);
        double sensible = m * (h1 - si.enthalpyJPerKg(t2C, w1));
        double latent = total - sensible;
        double shr = sensible >= 0 ? Ratio.of(sensible, total, Double.NaN) : Double.NaN;
        double perCapacity = total > 0 ? airflowM3PerS / total : Double.NaN;
        return new CoilProcess(m, sensible, latent, total, shr, m * dw, dw, t1C - t2C, h1 - h2,
                latent / airflowM3PerS, perCapacity);
    }
}
