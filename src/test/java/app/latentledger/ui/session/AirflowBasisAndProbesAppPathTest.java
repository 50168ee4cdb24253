package app.latentledger.ui.session;

import app.latentledger.core.coil.Measurand;
import app.latentledger.core.measure.AirflowBasis;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.entry.EntryViewModel;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static app.latentledger.ui.entry.Typing.type;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The airflow basis, the "same instrument" switch and the supply probe's dew-point offset on the
 * app's whole path: the pad's switches, the draft file, the current check, the stored reading set,
 * and a restart (a new session on the same data folder, as after the app was killed).
 *
 * <p>Outside values: standard air is 0.075 lb/ft³ (ASHRAE Handbook—Fundamentals, IP edition,
 * "standard air"), so 1,200 standard cfm is 1,200 × 0.075 × 60 = 5,400 lb/h of moist air; a dew
 * point is a property of the vapour alone, so a supply read as a 55 °F dew point with a +1 °F probe
 * offset is a 54 °F dew point (°F = °C × 1.8 + 32, exact).
 */
class AirflowBasisAndProbesAppPathTest {
    @TempDir
    Path dir;

    private static void fillSet(EntryViewModel vm) {
        type(vm, Slot.RETURN_DRY_BULB, "75");
        vm.select(Slot.RETURN_HUMIDITY);
        vm.choose("dew-point");
        type(vm, Slot.RETURN_HUMIDITY, "60");
        type(vm, Slot.SUPPLY_DRY_BULB, "57");
        vm.select(Slot.SUPPLY_HUMIDITY);
        vm.choose("dew-point");
        type(vm, Slot.SUPPLY_HUMIDITY, "55");
        type(vm, Slot.AIRFLOW, "1200");
    }

    @Test
    void theSwitchesAndTheOffsetReachTheStoredSetAndSurviveARestart() throws Exception {
        String setId;
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel vm = new EntryViewModel(s);
            // switched before any airflow is typed: the draft keeps the meaning for the number to come
            vm.standardAirflowProperty().set(true);
            vm.sameProbeProperty().set(true);
            assertEquals(AirflowBasis.STANDARD, s.draft().airflowBasis());
            fillSet(vm);
            type(vm, Slot.SUPPLY_DEW_POINT_OFFSET, "1");
            assertFalse(vm.refusedProperty().get(), vm.messageProperty().get());
            setId = s.draft().readingSetId();
            ReadingSet stored = s.ledger().readings().find(setId).orElseThrow();
            assertEquals(AirflowBasis.STANDARD, stored.airflow().basis());
            assertTrue(stored.probes().sameInstrument());
            assertEquals(1 / 1.8, stored.probes().supplyDewPointOffsetK(), 1e-12);
            String file = Files.readString(dir.resolve("drafts").resolve(setId + ".json"), StandardCharsets.UTF_8);
            assertTrue(file.contains("\"airflowBasis\":\"standard\"") && file.contains("\"sameProbe\":true"), file);
        }
        // restart on the same folder: the visit with a draft in progress opens with its switches
        try (AppSession again = TestSessions.open(dir)) {
            assertEquals(setId, again.draft().readingSetId());
            assertEquals(AirflowBasis.STANDARD, again.draft().airflowBasis());
            assertTrue(again.draft().sameProbe());
            assertEquals(1 / 1.8, again.draft().value(Slot.SUPPLY_DEW_POINT_OFFSET).valueSi(), 1e-12);
            EntryViewModel vm = new EntryViewModel(again);
            assertTrue(vm.standardAirflowProperty().get());
            assertTrue(vm.sameProbeProperty().get());
            assertEquals("Return, standard", vm.tileTitle(Slot.AIRFLOW));
            assertTrue(again.currentCheck().checked(), again.currentCheck().refusal());
            // the results screen shows what was switched, beside the figures it changes
            var sheet = again.currentCheck().sheet();
            assertEquals("standard cfm", sheet.performance("airflow").unit());
            assertEquals("1,200", sheet.performance("airflow").value());
            assertEquals("one instrument", sheet.performance("probes").value());
            assertEquals("1.0", sheet.performance("supply-dew-point-offset").value());
        }
    }

    @Test
    void aVisitBundleCarriesTheSwitchesAndTheOffsetToAnotherTablet() throws Exception {
        Path bundle = dir.resolve("visit.zip");
        ReadingSet made;
        try (AppSession s = TestSessions.withNewVisit(dir.resolve("tablet-a"))) {
            EntryViewModel vm = new EntryViewModel(s);
            vm.standardAirflowProperty().set(true);
            vm.sameProbeProperty().set(true);
            fillSet(vm);
            type(vm, Slot.SUPPLY_DEW_POINT_OFFSET, "-0.5");
            made = s.ledger().readings().find(s.draft().readingSetId()).orElseThrow();
            app.latentledger.bundle.Bundles.exportVisit(s.ledger(), s.visit().id(), bundle);
        }
        try (app.latentledger.store.Ledger other = app.latentledger.store.Ledger.open(dir.resolve("tablet-b"),
                app.latentledger.store.Ledger.FirstRun.NOTHING)) {
            app.latentledger.bundle.Bundles.importBundle(other, bundle);
            ReadingSet arrived = other.readings().find(made.id()).orElseThrow();
            assertEquals(AirflowBasis.STANDARD, arrived.airflow().basis());
            assertTrue(arrived.probes().sameInstrument());
            assertEquals(made.probes().supplyDewPointOffsetK(), arrived.probes().supplyDewPointOffsetK(), 1e-12);
            assertEquals(made, arrived);
        }
    }

    @Test
    void standardCfmIsAMassFlowAtStandardAirDensity() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel vm = new EntryViewModel(s);
            fillSet(vm);
            double actualKgPerS = s.currentCheck().coil().process().massFlowKgPerS();
            vm.standardAirflowProperty().set(true);
            CurrentCheck c = s.currentCheck();
            assertNotNull(c.coil(), c.refusal());
            double w = c.coil().entering().humidityRatio();
            // 1,200 × 0.075 lb/ft³ × 60 min/h = 5,400 lb/h of moist air; dry air is 1/(1 + W) of it
            double lbPerH = c.coil().process().massFlowKgPerS() * 3600 / 0.45359237;
            assertEquals(5400 / (1 + w), lbPerH, 5400 * 1e-9);
            assertTrue(Math.abs(actualKgPerS - c.coil().process().massFlowKgPerS()) > 1e-6,
                    "the switch changes the mass flow the capacities use");
            // switching back gives the actual-volume figures again
            vm.standardAirflowProperty().set(false);
            assertEquals(actualKgPerS, s.currentCheck().coil().process().massFlowKgPerS(), 0);
        }
    }

    @Test
    void oneInstrumentForBothSidesShrinksTheMoistureDropsUncertainty() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel vm = new EntryViewModel(s);
            fillSet(vm);
            double independent = s.currentCheck().coil().estimate(Measurand.HUMIDITY_RATIO_DROP).expandedSi();
            double drop = s.currentCheck().coil().estimate(Measurand.HUMIDITY_RATIO_DROP).valueSi();
            vm.sameProbeProperty().set(true);
            double same = s.currentCheck().coil().estimate(Measurand.HUMIDITY_RATIO_DROP).expandedSi();
            // correlated offsets cancel in the difference (JCGM 100:2008 §5.2): the value stays, U shrinks
            assertEquals(drop, s.currentCheck().coil().estimate(Measurand.HUMIDITY_RATIO_DROP).valueSi(), 0);
            assertTrue(same < independent, same + " vs " + independent);
        }
    }

    @Test
    void theSupplyOffsetIsTakenOffTheSupplyDewPoint() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel vm = new EntryViewModel(s);
            fillSet(vm);
            type(vm, Slot.SUPPLY_DEW_POINT_OFFSET, "1");
            double leavingDpF = s.currentCheck().coil().leaving().dewPointC() * 1.8 + 32;
            assertEquals(54.0, leavingDpF, 1e-6, "55 °F read, the probe reads 1 °F high");
            // a negative offset is typed with the ± key
            type(vm, Slot.SUPPLY_DEW_POINT_OFFSET, "-1");
            assertEquals(56.0, s.currentCheck().coil().leaving().dewPointC() * 1.8 + 32, 1e-6);
            // out of range: refused with its range, the kept offset unchanged
            type(vm, Slot.SUPPLY_DEW_POINT_OFFSET, "20");
            assertTrue(vm.refusedProperty().get());
            assertTrue(vm.messageProperty().get().contains("offset"), vm.messageProperty().get());
            assertEquals(-1 / 1.8, s.draft().value(Slot.SUPPLY_DEW_POINT_OFFSET).valueSi(), 1e-12);
        }
    }

    @Test
    void aDraftKeptBeforeTheSwitchesExistedOpensAsActualAirflowAndSeparateProbes() throws Exception {
        Path drafts = dir.resolve("drafts");
        Files.createDirectories(drafts);
        Files.writeString(drafts.resolve("set-1.json"), "{\"readingSetId\":\"set-1\",\"visitId\":\"visit-1\","
                + "\"takenAt\":null,\"values\":{\"return-dry-bulb\":{\"valueSi\":24.0,\"toleranceSi\":0.3}},"
                + "\"choices\":{}}", StandardCharsets.UTF_8);
        Draft d = new FileDraftStore(dir).find("set-1").orElseThrow();
        assertEquals(AirflowBasis.ACTUAL, d.airflowBasis());
        assertFalse(d.sameProbe());
        assertTrue(d.toleranceTyped(Slot.RETURN_DRY_BULB), "its ± is kept as it was, never re-ruled");
    }
}
