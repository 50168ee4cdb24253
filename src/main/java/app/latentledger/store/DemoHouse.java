package app.latentledger.store;

import app.latentledger.core.coil.AirReading;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.house.HouseFacts;
import app.latentledger.core.house.HouseVisitReadings;
import app.latentledger.core.house.VentilationType;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

/**
 * The invented demo house on Heron Spit Road, Saltreed: its facts, and the house readings of the
 * humidity complaint visit (a humid July morning, a return duct in a hot attic drawing a little attic
 * air, a bath fan run continuously as ventilation). Made up to show a plausible budget.
 */
final class DemoHouse {
    private DemoHouse() {
    }

    static void seed(Ledger ledger) {
        ledger.houses().saveFacts(DemoScenario.SITE_HERON, new HouseFacts(ft2(2200), ft(8), 2, 4, 0, Double.NaN, 7.0, 4,
                Double.NaN, VentilationType.EXHAUST, cfm(50), Double.NaN));
        ledger.houses().saveReadings(DemoScenario.VISIT_COMPLAINT, new HouseVisitReadings(
                dp("outdoor", 88, 74), dp("grille", 74.5, 59.5), new AirReading("plenum", c(76), k(0.5),
                HumidityKind.WET_BULB, c(66), k(0.5)), dp("space", 120, 75), 0.45));
    }

    private static AirReading dp(String where, double dbF, double dpF) {
        return new AirReading(where, c(dbF), k(0.5), HumidityKind.DEW_POINT, c(dpF), k(1.0));
    }

    private static double c(double f) {
        return Quantity.TEMPERATURE.fromDisplay(UnitSystem.IP, f);
    }

    private static double k(double f) {
        return Quantity.TEMPERATURE_DIFFERENCE.fromDisplay(UnitSystem.IP, f);
    }

    private static double ft(double v) {
        return Quantity.LENGTH.fromDisplay(UnitSystem.IP, v);
    }

    private static double ft2(double v) {
        return Quantity.AREA.fromDisplay(UnitSystem.IP, v);
    }

    private static double cfm(double v) {
        return Quantity.AIRFLOW.fromDisplay(UnitSystem.IP, v);
    }
}
