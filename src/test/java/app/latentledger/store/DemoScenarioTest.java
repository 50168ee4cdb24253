package app.latentledger.store;

import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.MoistAirState;
import app.latentledger.core.psychro.StandardAtmosphere;
import app.latentledger.core.records.HumidityReading;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The invented demo tells the story it claims. Checked with the project's moist-air core
 * (ASHRAE Handbook—Fundamentals ch. 1 equations, tested against the handbook elsewhere); the
 * thresholds are the trade's: coil below the entering dew point dehumidifies, 350–400 cfm/ton is
 * usual design airflow and above 450 cfm/ton is high (common practice, no source).
 */
class DemoScenarioTest {
    @TempDir
    Path dir;

    @Test
    void seededOnceOnFirstOpen() {
        try (Ledger ledger = Ledger.open(dir, Ledger.FirstRun.SEED_DEMO)) {
            assertEquals(2, ledger.sites().all().size());
            assertEquals(2, ledger.visits().all().size());
            assertEquals(3, ledger.readings().count());
        }
        try (Ledger ledger = Ledger.open(dir, Ledger.FirstRun.SEED_DEMO)) {
            assertEquals(2, ledger.visits().all().size(), "not seeded twice");
        }
    }

    @Test
    void openingAddsNothingUnlessTheCallerAsksForTheDemo() {
        try (Ledger ledger = Ledger.open(dir)) {
            assertEquals(0, ledger.sites().all().size());
        }
        try (Ledger ledger = Ledger.open(dir, Ledger.FirstRun.SEED_DEMO)) {
            assertEquals(2, ledger.sites().all().size(), "an empty ledger is on its first run");
        }
    }

    @Test
    void beforeTheCoilRunsAboveTheReturnDewPointAndAfterWellBelowIt() {
        try (Ledger ledger = Ledger.open(dir, Ledger.FirstRun.SEED_DEMO)) {
            HvacSystem system = ledger.systems().find(DemoScenario.SYSTEM_HERON).orElseThrow();
            double p = StandardAtmosphere.pressurePa(ledger.sites().find(DemoScenario.SITE_HERON).orElseThrow().elevationM());
            ReadingSet before = ledger.readings().find(DemoScenario.READINGS_BEFORE).orElseThrow();
            ReadingSet after = ledger.readings().find(DemoScenario.READINGS_AFTER).orElseThrow();

            MoistAirState returnBefore = state(p, before.returnDryBulb(), before.returnHumidity());
            MoistAirState supplyBefore = state(p, before.supplyDryBulb(), before.supplyHumidity());
            double coilBefore = before.coilTemperature().value().valueSi();
            assertTrue(coilBefore > returnBefore.dewPointC(), "before: coil above the return dew point");
            assertEquals(returnBefore.humidityRatio(), supplyBefore.humidityRatio(), 0.15e-3,
                    "before: supply about as moist as return (within 1 gr/lb)");
            assertEquals(470, cfmPerTon(before, system), 5);

            MoistAirState returnAfter = state(p, after.returnDryBulb(), after.returnHumidity());
            MoistAirState supplyAfter = state(p, after.supplyDryBulb(), after.supplyHumidity());
            double marginK = returnAfter.dewPointC() - after.coilTemperature().value().valueSi();
            assertTrue(marginK > 5, "after: coil well below the return dew point, margin " + marginK + " K");
            double dropGrains = Quantity.HUMIDITY_RATIO_FINE.toDisplay(UnitSystem.IP,
                    returnAfter.humidityRatio() - supplyAfter.humidityRatio());
            assertTrue(dropGrains > 10, "after: clear humidity-ratio drop, " + dropGrains + " gr/lb");
            assertEquals(360, cfmPerTon(after, system), 5);
            assertEquals(15 * 60, after.condensate().seconds().valueSi());

            // the catch (a lower bound: drain lag) is below the air-side removal over the same 15 min
            double dryAirKgPerS = after.airflow().volume().valueSi() / returnAfter.specificVolumeM3PerKg();
            double airSideLitres = dryAirKgPerS * (returnAfter.humidityRatio() - supplyAfter.humidityRatio()) * 900;
            double caughtLitres = after.condensate().volume().valueSi() * 1000;
            assertTrue(caughtLitres < airSideLitres && caughtLitres > 0.7 * airSideLitres,
                    "caught " + caughtLitres + " L vs air side " + airSideLitres + " L");
        }
    }

    @Test
    void commissioningReadingsAreHealthy() {
        try (Ledger ledger = Ledger.open(dir, Ledger.FirstRun.SEED_DEMO)) {
            HvacSystem system = ledger.systems().find(DemoScenario.SYSTEM_QUAY).orElseThrow();
            double p = StandardAtmosphere.pressurePa(ledger.sites().find(DemoScenario.SITE_QUAY).orElseThrow().elevationM());
            ReadingSet r = ledger.readings().find(DemoScenario.READINGS_COMMISSIONING).orElseThrow();
            MoistAirState ret = state(p, r.returnDryBulb(), r.returnHumidity());
            MoistAirState sup = state(p, r.supplyDryBulb(), r.supplyHumidity());
            assertTrue(ret.dewPointC() - r.coilTemperature().value().valueSi() > 3);
            assertTrue(ret.humidityRatio() - sup.humidityRatio() > 0.7e-3);
            double perTon = cfmPerTon(r, system);
            assertTrue(perTon >= 350 && perTon <= 400, perTon + " cfm/ton");
        }
    }

    private static double cfmPerTon(ReadingSet r, HvacSystem s) {
        return Quantity.AIRFLOW_PER_CAPACITY.toDisplay(UnitSystem.IP, r.airflow().volume().valueSi() / s.nominalCapacityW());
    }

    private static MoistAirState state(double p, Measurement db, HumidityReading h) {
        return switch (h.kind()) {
            case WET_BULB -> MoistAirState.fromWetBulb(p, db.valueSi(), h.value().valueSi(), HandbookEdition.IP);
            case RELATIVE_HUMIDITY -> MoistAirState.fromRelativeHumidity(p, db.valueSi(), h.value().valueSi(), HandbookEdition.IP);
            case DEW_POINT -> MoistAirState.fromDewPoint(p, db.valueSi(), h.value().valueSi(), HandbookEdition.IP);
        };
    }
}
