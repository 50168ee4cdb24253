package app.latentledger.core.coil;

import app.latentledger.core.units.Conversions;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

class CoilProcessTest {
    private static final double BTU_H_PER_W = 3600 / Conversions.J_PER_BTU;

    @Test
    @DisplayName("ASHRAE HoF 2021 SI ch. 1 Example 3: 30 °C / 50 % at 5 m³/s to saturated 10 °C needs 197 kW")
    void handbookCoilExample() {
        // Published answer 197 kW (ṁ_da 5.70 kg/s, W1 13.3 g/kg, W2 7.66 g/kg), as read from the 2021 SI text
        // in docs/methods.md §9.4, HoF 2021 SI ch. 1; the handbook reads h and W from Table 2 (real gas), the equations
        // give 197.7 kW, hence ±1.5 %.
        AirReading in = new AirReading("return", 30, 0, HumidityKind.RELATIVE_HUMIDITY, 50, 0);
        AirReading out = new AirReading("supply", 10, 0, HumidityKind.RELATIVE_HUMIDITY, 100, 0);
        CoilReadings r = new CoilReadings(101_325, in, out, 5.0, 0, AirflowLocation.ENTERING, Double.NaN, 0, null,
                Double.NaN, null);
        CoilResult res = CoilCheck.run(r, app.latentledger.core.findings.ThresholdSettings.DEFAULTS, UnitSystem.SI);
        assertEquals(197_000, res.process().totalW(), 197_000 * 0.015);
        assertEquals(5.70, res.process().massFlowKgPerS(), 0.03);
        // condensate 0.0324 kg/s: ṁ_da (W1 − W2) with the handbook's rounded W1 13.3, W2 7.66 g/kg → 0.0321
        assertEquals(0.0324, res.process().moistureRemovalKgPerS(), 0.0324 * 0.02);
        // saturated leaving air: the process line meets saturation at the leaving state itself
        assertEquals(10.0, res.adp().temperatureC(), 1e-6);
        assertEquals(0.0, res.adp().bypassFactor(), 1e-6);
    }

    @Test
    @DisplayName("Issue 3 case: 1200 cfm, 75 °F/50 % to 55 °F/90 %, sea level (hand-computed from HoF ch. 1 eqs.)")
    void issueCase1200Cfm() {
        // Expected values computed by hand from HoF 2017 ch. 1, IP edition (docs/methods.md §9.5 case A):
        // W1 = 0.621945·pw/(p − pw) with pw = 0.5·pws(75 °F) → 0.00924 (64.6 gr); W2 at 55 °F/90 % → 0.00826;
        // v1 = 0.370486·534.67·(1 + 1.607858·W1)/14.696 = 13.679 ft³/lb → ṁ_da = 60·1200/13.679 = 5263 lb/h;
        // q_s = 5263·(0.240 + 0.444·W1)·20 = 25 694; q = ṁ[(h1 − h2) − ΔW·(55 − 32)] = 31 135 Btu/h;
        // water 5263·0.00098 = 5.12 lb/h. The core uses the SI edition's coefficients (c_p 1.006 vs
        // 0.240·4.1868), ≈ 0.1 % higher, hence the tolerances.
        CoilResult res = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).run();
        CoilProcess q = res.process();
        assertEquals(25_694, q.sensibleW() * BTU_H_PER_W, 25_694 * 0.003);
        assertEquals(31_135, q.totalW() * BTU_H_PER_W, 31_135 * 0.003);
        // latent = 31 135 − 25 694 = 5441 = 5.12 lb/h × h_fg(55 °F) ≈ 5.12 × 1062
        assertEquals(5_441, q.latentW() * BTU_H_PER_W, 5_441 * 0.01);
        assertEquals(25_694.0 / 31_135, q.sensibleHeatRatio(), 0.002);
        assertEquals(5.12, Quantity.WATER_RATE.toDisplay(UnitSystem.IP, q.moistureRemovalKgPerS()), 0.02);
        assertEquals(117.8, Quantity.WATER_RATE_DAILY.toDisplay(UnitSystem.IP, q.moistureRemovalKgPerS()), 0.5);
        assertEquals(6.81, q.humidityRatioDrop() * 7000, 0.02);
        assertEquals(4.53, Quantity.POWER_PER_AIRFLOW.toDisplay(UnitSystem.IP, q.latentPerAirflow()), 0.07);
        assertEquals(51.6, Quantity.TEMPERATURE.toDisplay(UnitSystem.IP, res.adp().temperatureC()), 0.05);
        assertEquals(0.146, res.adp().bypassFactor(), 0.001);
        // the issue's rounded figures (its SHR 0.82 took c_p at the leaving W, 0.2 % of the total lower
        // in sensible; see CoilProcess)
        assertEquals(25.7, q.sensibleW() * BTU_H_PER_W / 1000, 0.05);
        assertEquals(31.2, q.totalW() * BTU_H_PER_W / 1000, 0.1);
        assertEquals(0.82, q.sensibleHeatRatio(), 0.01);
    }

    @Test
    @DisplayName("Sensible + latent is the total; SHR is sensible over total")
    void splitAddsUp() {
        CoilProcess q = IpCase.returnWb(80, 67).supplyWb(58, 56).cfm(1000).run().process();
        assertEquals(q.totalW(), q.sensibleW() + q.latentW(), 1e-9 * q.totalW());
        assertEquals(q.sensibleW() / q.totalW(), q.sensibleHeatRatio(), 1e-12);
    }

    @Test
    @DisplayName("Airflow measured in the supply gives the mass flow at the supply's specific volume")
    void airflowLocation() {
        CoilResult atReturn = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).run();
        CoilResult atSupply = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).airflowAtSupply().run();
        double ratio = atSupply.process().massFlowKgPerS() / atReturn.process().massFlowKgPerS();
        // ratio of specific volumes v(75 °F, W1)/v(55 °F, W2) = (534.67·(1 + 1.607858·0.00924))
        // /(514.67·(1 + 1.607858·0.00826)) = 1.0404 by hand from HoF eq. 28
        assertEquals(1.0404, ratio, 0.0005);
    }

    @Test
    @DisplayName("Trade facts: 1 Btu/lb·°F for water, ~1060 Btu/lb at coil temperatures, ~970 at 212 °F (common practice, no source)")
    void tradeFacts() {
        // liquid water specific heat 4.186 kJ/(kg·K) is 1 Btu/(lb·°F) within 0.02 %
        assertEquals(1.0, CoilProcess.CP_LIQUID_WATER / (Conversions.J_PER_KG_PER_BTU_PER_LB * 1.8), 0.001);
        // latent per pound of water removed, case A (coil leaving 55 °F): the split's latent heat
        CoilProcess q = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).run().process();
        double hfgBtuPerLb = q.latentW() / q.moistureRemovalKgPerS() / Conversions.J_PER_KG_PER_BTU_PER_LB;
        assertEquals(1060, hfgBtuPerLb, 10);
        // and latent = water removed × that latent heat, exactly, by construction of the split
        assertEquals(q.latentW(), q.moistureRemovalKgPerS() * (2501e3 + (1860 - 4186) * IpCase.c(55)), 1e-6 * q.latentW());
        // the same expression between vapour and liquid at 212 °F (100 °C): 2501 + 1.86·100 − 4.186·100 kJ/kg
        double at212 = (2501 + 1.86 * 100 - 4.186 * 100) / 2.326;
        assertEquals(970, at212, 970 * 0.01);
        // 7000 grains per pound
        assertEquals(7000, Quantity.HUMIDITY_RATIO_FINE.toDisplay(UnitSystem.IP, 1.0), 1e-9);
    }

    @Test
    @DisplayName("The display edition (IP or SI handbook) never leaks into capacities")
    void unitsDoNotChangeCapacities() {
        CoilReadings r = IpCase.returnRh(78, 60).supplyRh(56, 93).cfm(1350).readings();
        CoilResult ip = CoilCheck.run(r, app.latentledger.core.findings.ThresholdSettings.DEFAULTS, UnitSystem.IP);
        CoilResult si = CoilCheck.run(r, app.latentledger.core.findings.ThresholdSettings.DEFAULTS, UnitSystem.SI);
        assertEquals(si.process().totalW(), ip.process().totalW(), 1e-9 * si.process().totalW());
        assertEquals(si.process().latentW(), ip.process().latentW(), 1e-9 * si.process().totalW());
    }
}
