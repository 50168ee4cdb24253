package app.latentledger.core.coil;

import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.FindingCode;
import app.latentledger.core.findings.Severity;
import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.units.Conversions;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Optional;
import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Field situations a senior tech would recognise, each with the answer he would sign and the
 * published source of the expected value. Expected figures come from {@link Handbook}, a small
 * calculator written here from ASHRAE Handbook—Fundamentals 2017 ch. 1 (not from the code under
 * test), or from the source named beside the check.
 */
class ReviewCasesTest {

    /** An independent calculator from ASHRAE Handbook—Fundamentals 2017 (SI) ch. 1. Test support. */
    static final class Handbook {
        private Handbook() {
        }

        /** Eq. 6 (Hyland–Wexler, over liquid water, 0–200 °C), Pa. */
        static double pws(double tC) {
            double t = tC + 273.15;
            return Math.exp(-5.8002206e3 / t + 1.3914993 - 4.8640239e-2 * t + 4.1764768e-5 * t * t
                    - 1.4452093e-8 * t * t * t + 6.5459673 * Math.log(t));
        }

        /** Eq. 20: W = 0.621945 p_w / (p − p_w). */
        static double w(double pw, double p) {
            return 0.621945 * pw / (p - pw);
        }

        /** Eq. 3: standard atmosphere, Pa, at elevation in metres. */
        static double pressure(double elevationM) {
            return 101_325 * Math.pow(1 - 2.25577e-5 * elevationM, 5.2559);
        }

        /** Eq. 28: specific volume, m³ per kg dry air. */
        static double v(double tC, double w, double p) {
            return 287.042 * (tC + 273.15) * (1 + 1.607858 * w) / p;
        }

        /** Eq. 32: enthalpy, J per kg dry air. */
        static double h(double tC, double w) {
            return 1006 * tC + w * (2_501_000 + 1860 * tC);
        }
    }

    private static double c(double f) {
        return (f - 32) / 1.8;
    }

    private static Optional<Finding> finding(CoilResult r, FindingCode code) {
        return r.findings().stream().filter(f -> f.code() == code).findFirst();
    }

    @Nested
    @DisplayName("MH1: a flow hood reads 1,200 standard cfm on a house at 8,000 ft")
    class StandardCfmAtAltitude {
        private final double p = Handbook.pressure(8000 * Conversions.M_PER_FT);

        private IpCase readings() {
            // return 75 °F with a 55 °F dew point, supply 55 °F with a 52 °F dew point (dew-point meter both sides)
            return IpCase.returnDp(75, 55).supplyDp(55, 52).cfm(1200).pressurePa(p);
        }

        @Test
        @DisplayName("Mass flow is 1,200 × 0.075 × 60 lb/h within the 1.5 % between the dry- and moist-air conventions")
        void massFlow() {
            // standard air 0.075 lb/ft³ (ASHRAE Handbook—Fundamentals, IP edition, "standard air")
            double expectedLbPerH = 1200 * 0.075 * 60;
            double kgPerS = readings().standardCfm().run().process().massFlowKgPerS();
            double lbPerH = kgPerS * 3600 / Conversions.KG_PER_LB;
            assertEquals(expectedLbPerH, lbPerH, 0.015 * expectedLbPerH);
            // the same number read as actual cfm would be 27 % low at this altitude
            double actualLbPerH = readings().run().process().massFlowKgPerS() * 3600 / Conversions.KG_PER_LB;
            assertTrue(actualLbPerH < 0.78 * expectedLbPerH, "actual-cfm reading: " + actualLbPerH);
        }

        @Test
        @DisplayName("Capacities equal those of the actual airflow it stands for (eq. 28 and 20 worked by hand)")
        void sameCapacitiesAsTheActualAirflow() {
            double w1 = Handbook.w(Handbook.pws(c(55)), p);
            // 1,200 standard cfm = a moist-air mass of 1,200 × 0.075 lb/min; as actual volume at the return:
            // V = ṁ_da · v with ṁ_da = V_std · ρ_std / (1 + W)
            double vStd = 1200 * Conversions.M3_PER_FT3 / 60;
            double massDry = vStd * 1.2014 / (1 + w1);
            double actualCfm = massDry * Handbook.v(c(75), w1, p) * 60 / Conversions.M3_PER_FT3;
            CoilResult standard = readings().standardCfm().run();
            CoilResult actual = IpCase.returnDp(75, 55).supplyDp(55, 52).cfm(actualCfm).pressurePa(p).run();
            assertEquals(actual.process().totalW(), standard.process().totalW(), 1e-3 * actual.process().totalW());
            assertEquals(actual.process().latentW(), standard.process().latentW(), 1e-3 * actual.process().latentW());
            assertEquals(actual.process().sensibleW(), standard.process().sensibleW(),
                    1e-3 * actual.process().sensibleW());
            // and the total itself is the handbook's mass-flow balance (eq. 43 with h_w2 = 4.186 t₂)
            double w2 = Handbook.w(Handbook.pws(c(52)), p);
            double total = massDry * ((Handbook.h(c(75), w1) - Handbook.h(c(55), w2)) - (w1 - w2) * 4186 * c(55));
            assertEquals(total, standard.process().totalW(), 2e-3 * total);
        }
    }

    @Nested
    @DisplayName("M1: water clearly leaves the air but the coil probe sits near the dew point")
    class DirectEvidenceFirst {
        @Test
        @DisplayName("75/55 → 55/90, 1,200 cfm, surface probe 57 °F: dehumidifying, and no request for a coil reading")
        void surfaceProbeNearDewPoint() {
            CoilResult r = IpCase.returnRh(75, 55).supplyRh(55, 90).cfm(1200).coilF(57).run();
            // ΔW from eq. 20 with eq. 6 by hand: 13.4 gr/lb, about 10 lb/h at 1,200 cfm
            double p = 101_325;
            double dw = Handbook.w(0.55 * Handbook.pws(c(75)), p) - Handbook.w(0.90 * Handbook.pws(c(55)), p);
            assertEquals(dw, r.estimate(Measurand.HUMIDITY_RATIO_DROP).valueSi(), 1e-6);
            // JCGM 100:2008 §6: the drop lies beyond its expanded uncertainty, so water is leaving the air
            assertTrue(r.estimate(Measurand.HUMIDITY_RATIO_DROP).clearlyPositive());
            assertEquals(CoilVerdict.DEHUMIDIFYING, r.verdict());
            for (Finding f : r.findings()) {
                assertTrue(f.nextChecks().stream().noneMatch(s -> s.startsWith("Measure the coil temperature")),
                        f.code() + " asks again for a coil temperature");
            }
        }

        @Test
        @DisplayName("76/62 → 60/80 at 1,400 cfm: the process line misses saturation, yet the 21.6 gr drop says dehumidifying")
        void noApparatusDewPoint() {
            CoilResult r = IpCase.returnRh(76, 62).supplyRh(60, 80).cfm(1400).run();
            assertFalse(r.adp().found());
            assertEquals(CoilVerdict.DEHUMIDIFYING, r.verdict());
            assertTrue(finding(r, FindingCode.READINGS_INCONSISTENT).isPresent(), "the missed line is still noted");
        }
    }

    @Nested
    @DisplayName("M2: a gauge reading of the evaporator saturation stands in for the coil")
    class EvaporatorSaturation {
        @Test
        @DisplayName("Saturation 50 °F under a 52.2 °F dew point (75/45 → 60/75) does not make the coil 'cold enough'")
        void saturationIsNotTheSurface() {
            CoilResult r = IpCase.returnRh(75, 45).supplyRh(60, 75).cfm(1200).nominalTons(3)
                    .coilF(50, CoilTemperatureKind.EVAPORATOR_SATURATION).run();
            // the surface runs warmer than the refrigerant (fin and air-film resistance; ADP definition, ASHRAE
            // Terminology): a 2.2 °F margin over saturation cannot show the surface below the dew point
            assertTrue(r.marginCall() != CoilVerdict.Call.BELOW, "margin call " + r.marginCall());
            assertTrue(finding(r, FindingCode.MOISTURE_DROP_INCONCLUSIVE).isEmpty(), "'the coil is cold enough' is gone");
        }

        @Test
        @DisplayName("Saturation 60 °F above a 55 °F dew point: the surface is surely above it too")
        void saturationAboveDewPointIsConclusive() {
            CoilResult r = IpCase.returnRh(75, 50).supplyRh(62, 78).cfm(1200).nominalTons(3)
                    .coilF(60, CoilTemperatureKind.EVAPORATOR_SATURATION).run();
            assertEquals(CoilVerdict.Call.ABOVE, r.marginCall());
        }

        @Test
        @DisplayName("1.63 measured tons on a 3-ton nameplate gets capacity-below-nameplate, for a certified technician")
        void capacityBelowNameplate() {
            CoilResult r = IpCase.returnRh(75, 45).supplyRh(60, 75).cfm(1200).nominalTons(3)
                    .coilF(50, CoilTemperatureKind.EVAPORATOR_SATURATION).run();
            Finding f = finding(r, FindingCode.CAPACITY_BELOW_NAMEPLATE).orElseThrow();
            assertEquals("capacity-below-nameplate", f.code().key());
            assertTrue(f.nextChecks().get(0).startsWith("Certified technician"));
        }

        @Test
        @DisplayName("Case A (2.6 measured tons on 3 nominal, AHRI 210/240 rating 67 °F wb nearby) is not called low")
        void healthyCapacityIsQuiet() {
            CoilResult r = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).nominalTons(3).coilF(45).run();
            assertTrue(finding(r, FindingCode.CAPACITY_BELOW_NAMEPLATE).isEmpty());
        }
    }

    @Nested
    @DisplayName("M3: a warm coil in a dry house")
    class SeverityFollowsTheHouse {
        @Test
        @DisplayName("75 °F / 40 % indoors (dp 49 °F), surface probe 52 °F: a note, worded as a design trait")
        void dryHouseNote() {
            CoilResult r = IpCase.returnRh(75, 40).supplyRh(58, 70).cfm(1200).nominalTons(3).coilF(52).run();
            Finding f = finding(r, FindingCode.COIL_ABOVE_DEW_POINT).orElseThrow();
            // below the US EPA 60 % RH target and the 60 °F dew-point benchmark (ASHRAE 62.1-2022 §5.12)
            assertEquals(Severity.NOTE, f.severity());
            assertTrue(f.message().contains("design trait"), f.message());
        }

        @Test
        @DisplayName("The same warm coil with the house at 75 °F / 62 % is a fix")
        void humidHouseFix() {
            CoilResult r = IpCase.returnRh(75, 62).supplyRh(66, 82).cfm(1200).nominalTons(3).coilF(66).run();
            assertEquals(Severity.FIX, finding(r, FindingCode.COIL_ABOVE_DEW_POINT).orElseThrow().severity());
        }
    }

    @Nested
    @DisplayName("M4: airflow per ton without a nameplate")
    class AirflowPerNominalTon {
        @Test
        @DisplayName("Case A without a nameplate: no 'too much air', and no airflow per ton to show")
        void noNameplate() {
            CoilResult r = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).coilF(45).run();
            assertTrue(finding(r, FindingCode.HIGH_AIRFLOW_PER_TON).isEmpty());
            assertFalse(r.estimate(Measurand.AIRFLOW_PER_NOMINAL_CAPACITY).exists());
        }

        @Test
        @DisplayName("1,200 cfm on 3 nominal tons is 400 ± 46 cfm/ton, inside FSEC-PF-321-97's 350–450")
        void withNameplate() {
            CoilResult r = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).nominalTons(3).coilF(45).run();
            Estimate perTon = r.estimate(Measurand.AIRFLOW_PER_NOMINAL_CAPACITY);
            assertEquals(400, perTon.valueSi() / (Conversions.M3_PER_FT3 / 60) * Conversions.BTU_PER_H_PER_TON
                    * Conversions.J_PER_BTU / 3600, 1e-6);
            // rectangular ±10 % airflow (Title 24 RA3.7.2.2): U = 2 × 40 / √3 = 46.2 cfm/ton
            assertEquals(2 * 40 / Math.sqrt(3), perTon.expandedSi() / perTon.valueSi() * 400, 0.05);
            assertTrue(finding(r, FindingCode.HIGH_AIRFLOW_PER_TON).isEmpty());
        }
    }

    @Nested
    @DisplayName("M6: one probe moved from return to supply")
    class CorrelatedProbes {
        private IpCase caseA() {
            return IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200);
        }

        @Test
        @DisplayName("U(ΔW) shrinks from about 3.8 gr to what the GUM's correlated formula gives by hand (§5.2.2, r = 1)")
        void shrinks() {
            double independent = caseA().run().estimate(Measurand.HUMIDITY_RATIO_DROP).expandedSi();
            double same = caseA().probes(true, 0).run().estimate(Measurand.HUMIDITY_RATIO_DROP).expandedSi();
            // by hand: c = ∂W/∂RH and ∂W/∂t at each point (eq. 20 with eq. 6), offsets shared (r = 1):
            // u(ΔW)² = ((c_RH,r − c_RH,s) u_RH)² + ((c_t,r − c_t,s) u_t)², u = a/√3 (JCGM 100:2008 §4.3.7, §5.2.2)
            double p = 101_325;
            double uRh = 2 / Math.sqrt(3);
            double uT = (0.5 / 1.8) / Math.sqrt(3);
            double cRhR = dwdRh(c(75), 50, p);
            double cRhS = dwdRh(c(55), 90, p);
            double cTR = dwdT(c(75), 50, p);
            double cTS = dwdT(c(55), 90, p);
            double byHand = 2 * Math.hypot((cRhR - cRhS) * uRh, (cTR - cTS) * uT);
            assertEquals(byHand, same, 0.02 * byHand);
            assertEquals(3.8, independent * Conversions.GRAINS_PER_LB, 0.1);
            assertTrue(same < 0.5 * independent, "one instrument: " + same * 7000 + " gr vs " + independent * 7000);
        }

        @Test
        @DisplayName("Monte Carlo sampling (JCGM 101:2008) of shared probe errors matches the correlated budget within 10 %")
        void monteCarloAgrees() {
            CoilReadings r = caseA().probes(true, 0).condensate(560, 15).readings();
            CoilModel model = new CoilModel(r);
            int i = Measurand.HUMIDITY_RATIO_DROP.ordinal();
            double gum = Propagation.firstOrder(model.inputs(), model).expanded()[i];
            double mc = Propagation.monteCarlo(model.inputs(), model, 20_000, 20241203L).expanded()[i];
            assertEquals(mc, gum, 0.10 * mc);
            // and an independent sampler written here: one shared draw per probe error
            SplittableRandom rnd = new SplittableRandom(7);
            double p = 101_325;
            double sum = 0;
            double sumSq = 0;
            int n = 20_000;
            for (int k = 0; k < n; k++) {
                double dRh = 2 * (2 * rnd.nextDouble() - 1);
                double dT = 0.5 / 1.8 * (2 * rnd.nextDouble() - 1);
                double wr = Handbook.w((50 + dRh) / 100 * Handbook.pws(c(75) + dT), p);
                double ws = Handbook.w(Math.min(100, 90 + dRh) / 100 * Handbook.pws(c(55) + dT), p);
                double dw = wr - ws;
                sum += dw;
                sumSq += dw * dw;
            }
            double sd = Math.sqrt((sumSq - sum * sum / n) / (n - 1));
            assertEquals(2 * sd, gum, 0.10 * 2 * sd);
        }

        @Test
        @DisplayName("A supply probe that reads 1 °F of dew point high: the offset comes off the supply dew point")
        void offset() {
            CoilResult plain = caseA().run();
            CoilResult corrected = caseA().probes(false, 1.0).run();
            double p = 101_325;
            double w2 = Handbook.w(0.90 * Handbook.pws(c(55)), p);
            // dew point of w2 by inverting eq. 6 numerically, then 1 °F lower
            double dp = bisect(w2, p) - 1 / 1.8;
            double expected = Handbook.w(Handbook.pws(dp), p);
            double dropGain = corrected.estimate(Measurand.HUMIDITY_RATIO_DROP).valueSi()
                    - plain.estimate(Measurand.HUMIDITY_RATIO_DROP).valueSi();
            assertEquals(w2 - expected, dropGain, 2e-7);
        }

        private double bisect(double w, double p) {
            double lo = -20;
            double hi = 40;
            for (int k = 0; k < 100; k++) {
                double mid = (lo + hi) / 2;
                if (Handbook.w(Handbook.pws(mid), p) > w) {
                    hi = mid;
                } else {
                    lo = mid;
                }
            }
            return (lo + hi) / 2;
        }

        private double dwdRh(double t, double rh, double p) {
            double h = 1e-4;
            return (Handbook.w((rh + h) / 100 * Handbook.pws(t), p) - Handbook.w((rh - h) / 100 * Handbook.pws(t), p))
                    / (2 * h);
        }

        private double dwdT(double t, double rh, double p) {
            double h = 1e-5;
            return (Handbook.w(rh / 100 * Handbook.pws(t + h), p) - Handbook.w(rh / 100 * Handbook.pws(t - h), p))
                    / (2 * h);
        }
    }

    @Nested
    @DisplayName("M7: a steady condensate catch is the better latent figure")
    class CondensateLatent {
        @Test
        @DisplayName("Case A with 560 mL in 15 min: latent = catch × h_fg(t₂) (eq. 32 constants), ±2–3 % against ±57 % air side")
        void latentFromCatch() {
            CoilResult r = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).condensate(560, 15).run();
            assertTrue(r.condensate().usable());
            double t2 = c(55);
            double expected = 560e-6 * 1000 / 900 * (2_501_000 + 1860 * t2 - 4186 * t2);
            Estimate fromCatch = r.estimate(Measurand.LATENT_FROM_CONDENSATE);
            assertEquals(expected, fromCatch.valueSi(), 1e-6 * expected);
            assertTrue(fromCatch.expandedSi() / fromCatch.valueSi() < 0.04);
            assertTrue(r.estimate(Measurand.LATENT).expandedSi() / r.estimate(Measurand.LATENT).valueSi() > 0.5);
            Estimate shr = r.estimate(Measurand.SHR_FROM_CONDENSATE);
            double sensible = r.estimate(Measurand.SENSIBLE).valueSi();
            assertEquals(sensible / (sensible + expected), shr.valueSi(), 1e-9);
        }

        @Test
        @DisplayName("A 2 °F split shows no measurable drop, but 30 mL caught steadily in 10 min says dehumidifying")
        void catchDecidesTheVerdict() {
            CoilResult without = IpCase.returnRh(75, 50).supplyRh(73, 53).cfm(1200).run();
            assertEquals(CoilVerdict.CANT_TELL, without.verdict());
            CoilResult with = IpCase.returnRh(75, 50).supplyRh(73, 53).cfm(1200).condensate(30, 10).run();
            assertTrue(with.condensate().usable());
            assertEquals(CoilVerdict.DEHUMIDIFYING, with.verdict());
        }

        @Test
        @DisplayName("A 3-minute catch is too short to stand for the latent (near miss of the 5-minute rule)")
        void shortCatchNotUsed() {
            CoilResult r = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).condensate(112, 3).run();
            assertFalse(r.condensate().usable());
        }
    }

    @Nested
    @DisplayName("L1: supply wetter than return (fan running, compressor off)")
    class UndefinedRatios {
        @Test
        @DisplayName("75/50 → 68/75: total ≈ 0, so the SHR (q_s/q, ASHRAE HoF ch. 1) is not measurable, not −16")
        void shrWithheld() {
            CoilResult r = IpCase.returnRh(75, 50).supplyRh(68, 75).cfm(1200).run();
            assertFalse(r.estimate(Measurand.SHR).exists());
            assertTrue(r.process().totalW() < 0);
        }

        @Test
        @DisplayName("Across 1,500 return/supply pairs no SHR or bypass factor is negative or infinite")
        void neverNegativeOrInfinite() {
            for (double dbS = 50; dbS <= 80; dbS += 2) {
                for (double rhS = 30; rhS <= 100; rhS += 7) {
                    for (double rhR = 30; rhR <= 70; rhR += 5) {
                        CoilResult r = IpCase.returnRh(75, rhR).supplyRh(dbS, rhS).cfm(1200).run();
                        for (Measurand m : List.of(Measurand.SHR, Measurand.BYPASS_FACTOR, Measurand.SHR_FROM_CONDENSATE)) {
                            double v = r.estimate(m).valueSi();
                            assertTrue(Double.isNaN(v) || (Double.isFinite(v) && v >= 0),
                                    m + " " + v + " at supply " + dbS + "/" + rhS + ", return 75/" + rhR);
                        }
                    }
                }
            }
        }
    }

    @Nested
    @DisplayName("L2: a supply probe reading at saturation")
    class WettedProbe {
        @Test
        @DisplayName("55 °F / 100 %: the bypass factor falls to 0 and a wetted-probe note appears")
        void saturated() {
            CoilResult r = IpCase.returnRh(75, 50).supplyRh(55, 100).cfm(1200).run();
            Finding f = finding(r, FindingCode.SUPPLY_NEAR_SATURATION).orElseThrow();
            assertEquals(Severity.NOTE, f.severity());
        }

        @Test
        @DisplayName("97 % fires; 96 % (capacitive sensors ±3 % RH above 90 %) stays quiet")
        void threshold() {
            assertTrue(finding(IpCase.returnRh(75, 50).supplyRh(55, 97).cfm(1200).run(),
                    FindingCode.SUPPLY_NEAR_SATURATION).isPresent());
            assertTrue(finding(IpCase.returnRh(75, 50).supplyRh(55, 96).cfm(1200).run(),
                    FindingCode.SUPPLY_NEAR_SATURATION).isEmpty());
        }
    }
}
