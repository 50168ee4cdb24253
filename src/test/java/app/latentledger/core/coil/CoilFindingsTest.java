package app.latentledger.core.coil;

import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.FindingCode;
import app.latentledger.core.findings.Threshold;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

import static app.latentledger.core.findings.FindingCode.*;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Every finding fires on one realistic set of readings and stays quiet on a near miss: readings just
 * on the quiet side of the same threshold or uncertainty, so each quiet test can fail on its own.
 */
class CoilFindingsTest {
    /** Case A (docs/methods.md §9.5) on a 3-ton nameplate with a 45 °F coil: a healthy coil. */
    private static IpCase healthy() {
        return IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).nominalTons(3).coilF(45);
    }

    /**
     * Dew point from dry bulb and RH by the Magnus form with Alduchov & Eskridge's coefficients
     * (J. Appl. Meteor. 35 (1996) 601–609: a = 17.625, b = 243.04 °C; within about 0.4 °C from −40 to
     * 50 °C): an estimate independent of the core's Hyland–Wexler solution, good enough to say on
     * which side of a limit a near miss lies.
     */
    private static double magnusDewPointF(double dryBulbF, double rhPct) {
        double t = (dryBulbF - 32) / 1.8;
        double g = Math.log(rhPct / 100) + 17.625 * t / (243.04 + t);
        return 243.04 * g / (17.625 - g) * 1.8 + 32;
    }

    private static List<FindingCode> codes(CoilResult r) {
        return r.findings().stream().map(Finding::code).collect(Collectors.toList());
    }

    @Test
    @DisplayName("A healthy coil raises no finding")
    void healthyIsQuiet() {
        assertEquals(List.of(), codes(healthy().run()));
    }

    @Test
    @DisplayName("Every finding carries a plain message, a technical line, evidence and next checks")
    void shape() {
        CoilResult r = IpCase.returnRh(78, 62).supplyRh(64, 88).cfm(1500).nominalTons(3).coilF(66).condensate(50, 15).run();
        assertTrue(r.findings().size() >= 3, codes(r).toString());
        for (Finding f : r.findings()) {
            assertFalse(f.message().isBlank());
            assertFalse(f.technical().isBlank());
            assertFalse(f.evidence().isEmpty(), f.code().key());
            assertFalse(f.nextChecks().isEmpty(), f.code().key());
        }
    }

    @Nested
    class CoilAboveDewPoint {
        @Test
        void fires() {
            // dp 55.1 °F, coil surface 59 °F ± 1 °F: margin −3.9 ± 1.8 °F
            assertTrue(codes(IpCase.returnRh(75, 50).supplyRh(62, 78).cfm(1450).nominalTons(3).coilF(59).run())
                    .contains(COIL_ABOVE_DEW_POINT));
        }

        @Test
        void quietWhenTheCoilIsAboveTheDewPointOnlyWithinItsUncertainty() {
            // near miss: dp 55.1 °F (Magnus, below) and the probe at 56 °F ± 1 °F: 0.9 °F above, inside U
            assertTrue(56 > magnusDewPointF(75, 50), "the probe does read above the dew point");
            CoilResult r = IpCase.returnRh(75, 50).supplyRh(62, 78).cfm(1450).nominalTons(3).coilF(56).run();
            assertFalse(codes(r).contains(COIL_ABOVE_DEW_POINT), codes(r).toString());
        }
    }

    @Nested
    class CoilMarginInconclusive {
        @Test
        void fires() {
            // dp 60.2 °F vs coil 59 °F ± 1 °F: margin 1.2 °F inside its U ≈ 1.7 °F
            assertTrue(codes(IpCase.returnRh(76, 58).supplyRh(59, 90).cfm(1200).nominalTons(3).coilF(59).run())
                    .contains(COIL_MARGIN_INCONCLUSIVE));
        }

        @Test
        void firesWithoutAnyCoilTemperature() {
            // supply dew point 55.3 °F vs return 55.1 °F: no ADP, drop within uncertainty
            assertTrue(codes(IpCase.returnRh(75, 50).supplyDp(58, 55.3).cfm(1200).run()).contains(COIL_MARGIN_INCONCLUSIVE));
        }

        @Test
        void quietJustOutsideTheUncertainty() {
            // near miss of fires(): the same air, the coil 1 °F colder: margin ≈ 2.2 °F against U ≈ 1.7 °F
            CoilResult r = IpCase.returnRh(76, 58).supplyRh(59, 90).cfm(1200).nominalTons(3).coilF(58).run();
            Estimate m = r.estimate(Measurand.DEW_POINT_MARGIN);
            assertTrue(m.valueSi() > m.expandedSi() && m.valueSi() < 2 * m.expandedSi(), "a near miss: " + m);
            assertFalse(codes(r).contains(COIL_MARGIN_INCONCLUSIVE));
        }
    }

    @Nested
    class MoistureDropInconclusive {
        @Test
        void fires() {
            // coil 45 °F, 10 °F under the dew point, yet supply dew point 54.5 °F: drop ≈ 1.3 gr ± 3.6 gr
            assertTrue(codes(IpCase.returnRh(75, 50).supplyDp(58, 54.5).cfm(1200).nominalTons(3).coilF(45).run())
                    .contains(MOISTURE_DROP_INCONCLUSIVE));
        }

        @Test
        void quietWhenTheDropIsJustBeyondItsUncertainty() {
            // near miss of fires(): supply dew point 52 °F instead of 54.5 °F; the drop clears its U
            CoilResult r = IpCase.returnRh(75, 50).supplyDp(58, 52).cfm(1200).nominalTons(3).coilF(45).run();
            Estimate d = r.estimate(Measurand.HUMIDITY_RATIO_DROP);
            assertTrue(d.valueSi() > d.expandedSi() && d.valueSi() < 2 * d.expandedSi(), "a near miss: " + d);
            assertFalse(codes(r).contains(MOISTURE_DROP_INCONCLUSIVE));
        }
    }

    @Nested
    class CoilAddingMoisture {
        @Test
        void fires() {
            assertTrue(codes(IpCase.returnRh(75, 50).supplyRh(63, 86).cfm(1200).run()).contains(COIL_ADDING_MOISTURE));
        }

        @Test
        void quietWhenTheSupplyIsWetterOnlyWithinTheUncertainty() {
            // near miss: supply dew point 55.5 °F against the return's 55.1 °F (Magnus): wetter, by less than U
            assertTrue(55.5 > magnusDewPointF(75, 50));
            CoilResult r = IpCase.returnRh(75, 50).supplyDp(63, 55.5).cfm(1200).run();
            assertTrue(r.process().humidityRatioDrop() < 0, "the supply does read wetter");
            assertFalse(codes(r).contains(COIL_ADDING_MOISTURE));
        }
    }

    @Nested
    class ReadingsInconsistent {
        @Test
        void supplyWarmerThanReturn() {
            assertTrue(codes(IpCase.returnRh(75, 50).supplyRh(77, 45).cfm(1200).run()).contains(READINGS_INCONSISTENT));
        }

        @Test
        void coilAboveDewPointWhileAirLosesMoisture() {
            // case A readings (drop 6.8 ± 3.8 gr) with a coil probe at 60 °F, above the 55.1 °F dew point
            CoilResult r = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).coilF(60).run();
            assertTrue(codes(r).contains(READINGS_INCONSISTENT));
            assertEquals(CoilVerdict.CANT_TELL, r.verdict());
        }

        @Test
        void supplyWetterWhileCoilBelowDewPoint() {
            CoilResult r = IpCase.returnRh(75, 50).supplyRh(63, 86).cfm(1200).coilF(45).run();
            assertTrue(codes(r).contains(READINGS_INCONSISTENT));
            assertFalse(codes(r).contains(COIL_ADDING_MOISTURE));
        }

        @Test
        void quietWhenTheCoilProbeIsJustBelowTheDewPoint() {
            // near miss of coilAboveDewPointWhileAirLosesMoisture: the same air, the probe at 54 °F,
            // 1.1 °F under the 55.1 °F dew point (Magnus) instead of 4.9 °F above it
            assertTrue(54 < magnusDewPointF(75, 50));
            CoilResult r = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).coilF(54).run();
            assertFalse(codes(r).contains(READINGS_INCONSISTENT), codes(r).toString());
        }
    }

    @Nested
    class AirflowPerTon {
        @Test
        void highFires() {
            assertTrue(codes(IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).nominalTons(2.5).coilF(45).run())
                    .contains(HIGH_AIRFLOW_PER_TON));
        }

        @Test
        void highFiresOnMeasuredCapacityWithoutNameplate() {
            // case A: 1200 cfm over a measured 2.6 tons = 460 cfm/ton
            assertTrue(codes(IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).coilF(45).run())
                    .contains(HIGH_AIRFLOW_PER_TON));
        }

        @Test
        void lowFires() {
            assertTrue(codes(IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).nominalTons(4.5).coilF(45).run())
                    .contains(LOW_AIRFLOW_PER_TON));
        }

        @Test
        void quietJustInsideTheBand() {
            // 1347 cfm / 3 tons = 449 cfm/ton, under the 450 limit; 903 / 3 = 301, over the 300 limit
            List<FindingCode> high = codes(IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1347).nominalTons(3).coilF(45).run());
            assertFalse(high.contains(HIGH_AIRFLOW_PER_TON), high.toString());
            List<FindingCode> low = codes(IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(903).nominalTons(3).coilF(45).run());
            assertFalse(low.contains(LOW_AIRFLOW_PER_TON), low.toString());
        }

        @Test
        void firesJustOutsideTheBand() {
            // 1353 / 3 = 451 cfm/ton; 897 / 3 = 299 cfm/ton
            assertTrue(codes(IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1353).nominalTons(3).coilF(45).run())
                    .contains(HIGH_AIRFLOW_PER_TON));
            assertTrue(codes(IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(897).nominalTons(3).coilF(45).run())
                    .contains(LOW_AIRFLOW_PER_TON));
        }
    }

    @Nested
    class LowLatentShare {
        @Test
        void fires() {
            // house above the 60 % RH target (72 °F / 61 %) and a coil giving mostly sensible cooling
            CoilResult r = IpCase.returnRh(72, 61).supplyRh(58, 96).cfm(1400).nominalTons(3.5).run();
            assertTrue(r.process().sensibleHeatRatio() > 0.80, "SHR " + r.process().sensibleHeatRatio());
            assertTrue(codes(r).contains(LOW_LATENT_SHARE));
        }

        @Test
        void quietWhenTheHouseIsDry() {
            // case A has SHR 0.825 but the return is at 50 % RH, dp 55 °F: nothing to fix
            CoilResult r = healthy().run();
            assertTrue(r.process().sensibleHeatRatio() > 0.80);
            assertFalse(codes(r).contains(LOW_LATENT_SHARE));
        }
    }

    @Nested
    class IndoorHumidityHigh {
        @Test
        void firesOnRh() {
            assertTrue(codes(IpCase.returnRh(75, 62).supplyRh(55, 92).cfm(1200).nominalTons(3).coilF(45).run())
                    .contains(INDOOR_HUMIDITY_HIGH));
        }

        @Test
        void firesOnDewPointAlone() {
            // 82 °F / 52 %: RH under 60 % but dew point ≈ 62.7 °F, above ASHRAE 62.1-2022's 60 °F
            CoilResult r = IpCase.returnRh(82, 52).supplyRh(60, 90).cfm(1200).nominalTons(3).coilF(45).run();
            assertTrue(codes(r).contains(INDOOR_HUMIDITY_HIGH));
        }

        @Test
        void firesOnALowerTarget() {
            ThresholdSettings lower = new ThresholdSettings(Map.of(Thresholds.INDOOR_RH_TARGET.key(), 45.0));
            CoilResult r = CoilCheck.run(healthy().readings(), lower, UnitSystem.IP);
            assertTrue(codes(r).contains(INDOOR_HUMIDITY_HIGH));
        }

        @Test
        void quietJustUnderTheRhTarget() {
            // 70 °F at 59.5 % RH: under the 60 % target, dew point ≈ 55.2 °F (Magnus), under 60 °F
            assertTrue(magnusDewPointF(70, 59.5) < 59);
            assertFalse(codes(IpCase.returnRh(70, 59.5).supplyRh(55, 92).cfm(1200).nominalTons(3).coilF(45).run())
                    .contains(INDOOR_HUMIDITY_HIGH));
            assertTrue(codes(IpCase.returnRh(70, 60.5).supplyRh(55, 92).cfm(1200).nominalTons(3).coilF(45).run())
                    .contains(INDOOR_HUMIDITY_HIGH), "60.5 % is over the target");
        }

        @Test
        void quietJustUnderTheDewPointLimit() {
            // 80 °F at 50 % RH: dew point ≈ 59.6 °F (Magnus), under ASHRAE 62.1's 60 °F; 51 % gives ≈ 60.2 °F
            assertTrue(magnusDewPointF(80, 50) < 60 && magnusDewPointF(80, 51) > 60);
            assertFalse(codes(IpCase.returnRh(80, 50).supplyRh(58, 92).cfm(1200).nominalTons(3).coilF(45).run())
                    .contains(INDOOR_HUMIDITY_HIGH));
            assertTrue(codes(IpCase.returnRh(80, 51).supplyRh(58, 92).cfm(1200).nominalTons(3).coilF(45).run())
                    .contains(INDOOR_HUMIDITY_HIGH));
        }
    }

    @Nested
    class CondensateMismatch {
        @Test
        void firesWhenLittleReachesTheDrain() {
            // air side 5.12 lb/h ≈ 581 g per 15 min; only 150 mL caught
            assertTrue(codes(healthy().condensate(150, 15).run()).contains(CONDENSATE_MISMATCH));
        }

        @Test
        void quietWhenTheyAgree() {
            CoilResult r = healthy().condensate(560, 15).run();
            assertFalse(codes(r).contains(CONDENSATE_MISMATCH));
            // 560 mL in 15 min = 2.24 kg/h = 4.94 lb/h (1 mL of water ≈ 1 g, common practice, no source)
            assertEquals(4.94, r.condensate().condensate().valueSi() * 3600 / 0.45359237, 0.01);
        }

        @Test
        void quietWithoutACatch() {
            assertFalse(codes(healthy().run()).contains(CONDENSATE_MISMATCH));
        }
    }

    @Test
    @DisplayName("Coil thresholds sit in the one catalogue, each with a source")
    void thresholdsCatalogued() {
        for (Threshold t : List.of(Thresholds.COIL_HIGH_AIRFLOW_PER_TON, Thresholds.COIL_LOW_AIRFLOW_PER_TON,
                Thresholds.COIL_HIGH_SHR, Thresholds.INDOOR_DEW_POINT_MAX, Thresholds.INDOOR_RH_TARGET,
                Thresholds.CONDENSATE_MISMATCH_FRACTION)) {
            assertTrue(Thresholds.all().contains(t), t.key());
            assertFalse(t.source().isBlank(), t.key());
        }
        assertEquals(450, app.latentledger.core.units.Quantity.AIRFLOW_PER_CAPACITY.toDisplay(UnitSystem.IP,
                Thresholds.COIL_HIGH_AIRFLOW_PER_TON.defaultSi()), 1e-9);
        assertEquals(60, Thresholds.INDOOR_DEW_POINT_MAX.defaultSi() * 1.8 + 32, 1e-9);
    }
}
