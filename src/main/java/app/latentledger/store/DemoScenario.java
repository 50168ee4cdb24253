package app.latentledger.store;

import app.latentledger.core.measure.AirflowPoint;
import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.records.Airflow;
import app.latentledger.core.records.CoilTemperature;
import app.latentledger.core.records.Condensate;
import app.latentledger.core.records.HumidityReading;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.SystemType;
import app.latentledger.core.records.Visit;
import app.latentledger.core.records.VisitPurpose;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.nio.charset.StandardCharsets;
import java.time.OffsetDateTime;
import java.util.UUID;

/**
 * The demo a new tablet opens with. Entirely invented: the contractor, the people, the town of
 * Saltreed (a humid coastal town that does not exist), the addresses and every reading. The
 * numbers were chosen with the app's own {@code state} command so the story holds:
 *
 * <ul>
 * <li>Heron Spit Road, complaint visit, 3-ton single-stage system. Before: 1410 cfm (470 cfm/ton),
 *     return 76 °F / 66 °F wb (dew point 60.8 °F, 79.6 gr/lb), supply 66.5 °F / 62.8 °F wb
 *     (79.5 gr/lb, the same moisture), evaporator saturation 64 °F, 3.2 °F above the return dew
 *     point — more than the ±2.3 °F the instruments allow, so the coil check says
 *     not-dehumidifying: the coil cools but does not dry. After the blower tap was lowered: 1080 cfm
 *     (360 cfm/ton), return 75 °F / 65 °F wb (dew point 59.6 °F, 76.4 gr/lb), supply 57 °F /
 *     55 °F wb (61.2 gr/lb, 15 gr/lb drier), evaporator saturation 46 °F, 1000 mL of condensate
 *     caught in 15 min (the air side says about 1160 mL; a catch reads low, the drain lags).</li>
 * <li>Tidewater Quay, commissioning, 2.5-ton variable-capacity system: 900 cfm (360 cfm/ton),
 *     return 74 °F / 50 % (dew point 54.2 °F, 62.6 gr/lb), supply 54 °F / 52 °F wb (54.5 gr/lb),
 *     coil surface 47 °F, 480 mL in 15 min.</li>
 * </ul>
 * Elevations of a few tens of feet: 12 m (39 ft) and 6 m (20 ft).
 */
public final class DemoScenario {
    public static final String CONTRACTOR = "Brinewater Comfort Services";
    public static final String SITE_HERON = id("site/heron-spit");
    public static final String SITE_QUAY = id("site/tidewater-quay");
    public static final String SYSTEM_HERON = id("system/heron-spit/main");
    public static final String SYSTEM_QUAY = id("system/tidewater-quay/office");
    public static final String VISIT_COMPLAINT = id("visit/heron-spit/complaint");
    public static final String VISIT_COMMISSIONING = id("visit/tidewater-quay/commissioning");
    public static final String READINGS_BEFORE = id("readings/heron-spit/before");
    public static final String READINGS_AFTER = id("readings/heron-spit/after");
    public static final String READINGS_COMMISSIONING = id("readings/tidewater-quay/commissioning");

    /** 1 ton of refrigeration = 12 000 Btu/h = 3516.85 W. */
    private static final double W_PER_TON = Quantity.POWER_LARGE.fromDisplay(UnitSystem.IP, 1);

    private DemoScenario() {
    }

    /** Saltreed keeps Eastern time (its visits are at −04:00 in summer): its loggers' clocks read in it. */
    public static final String SALTREED_ZONE = "America/New_York";

    /** Adds the scenario in one transaction when the ledger has no site at all. */
    static void seedIfEmpty(Ledger ledger) {
        // looked at first in a read transaction: opening a ledger that has sites never waits for a writer
        if (!ledger.sites().all().isEmpty()) {
            return;
        }
        ledger.inTransaction(() -> {
            if (ledger.sites().all().isEmpty()) {
                seed(ledger);
            }
        });
    }

    /** Adds (or restores) the scenario. */
    public static void seed(Ledger ledger) {
        ledger.inTransaction(() -> {
            ledger.sites().save(new Site(SITE_HERON, "Heron Spit Road residence", "14 Heron Spit Road, Saltreed",
                    12, "Two-storey house on the harbor side. Customer of " + CONTRACTOR + ".", SALTREED_ZONE));
            ledger.sites().save(new Site(SITE_QUAY, "Saltreed Marina office", "2 Tidewater Quay, Saltreed",
                    6, "Single-storey office over the boat store. Commissioning for " + CONTRACTOR + ".", SALTREED_ZONE));
            ledger.systems().save(new HvacSystem(SYSTEM_HERON, SITE_HERON, "Main air handler (attic)",
                    SystemType.SINGLE_STAGE, 3 * W_PER_TON, "R-410A", "PSC, 4-speed",
                    "Fan AUTO; blower on the high tap as found", "Cooling 76 °F; no dehumidify setting; fan-off delay 90 s"));
            ledger.systems().save(new HvacSystem(SYSTEM_QUAY, SITE_QUAY, "Office heat pump",
                    SystemType.VARIABLE_CAPACITY, 2.5 * W_PER_TON, "R-410A", "ECM, variable speed",
                    "Fan AUTO; dehumidify airflow profile on", "Cooling 74 °F; dehumidify target 50 %"));
            ledger.visits().save(new Visit(VISIT_COMPLAINT, SITE_HERON, SYSTEM_HERON,
                    OffsetDateTime.parse("2024-07-16T09:40:00-04:00"), "Marisol Teague", VisitPurpose.COMPLAINT,
                    "Owner: house feels sticky and smells musty upstairs although it is cool. "
                            + "Blower tap moved from high to medium-low at 10:55; ran 15 min before the after readings."));
            ledger.visits().save(new Visit(VISIT_COMMISSIONING, SITE_QUAY, SYSTEM_QUAY,
                    OffsetDateTime.parse("2024-08-02T14:00:00-04:00"), "Ivo Brandtner", VisitPurpose.COMMISSIONING,
                    "New install; latent capacity check at design airflow."));
            ledger.readings().save(new ReadingSet(READINGS_BEFORE, VISIT_COMPLAINT,
                    OffsetDateTime.parse("2024-07-16T10:05:00-04:00"), "before", KIT,
                    f(76), wetBulb(66), f(66.5), wetBulb(62.8), f(86), wetBulb(77),
                    saturation(64), cfm(1410, 0.07, "flow grid in filter slot"), null, null,
                    "Ran 20 min before readings. Supply plenum probe 3 ft past the coil."));
            ledger.readings().save(new ReadingSet(READINGS_AFTER, VISIT_COMPLAINT,
                    OffsetDateTime.parse("2024-07-16T11:20:00-04:00"), "after", KIT,
                    f(75), wetBulb(65), f(57), wetBulb(55), f(88), wetBulb(78),
                    saturation(46), cfm(1080, 0.07, "flow grid in filter slot"), null,
                    new Condensate(new Measurement(1000e-6, 20e-6), new Measurement(15 * 60, 5)),
                    "Blower on medium-low. Condensate caught at the drain outlet, trap full."));
            ledger.readings().save(new ReadingSet(READINGS_COMMISSIONING, VISIT_COMMISSIONING,
                    OffsetDateTime.parse("2024-08-02T14:35:00-04:00"), "commissioning", KIT,
                    f(74), new HumidityReading(HumidityKind.RELATIVE_HUMIDITY, new Measurement(50, 2)), f(54), wetBulb(52),
                    f(89), wetBulb(77),
                    new CoilTemperature(CoilTemperatureKind.COIL_SURFACE, new Measurement(c(47), k(1))),
                    cfm(900, 0.05, "flow hood at the return grille"), null,
                    new Condensate(new Measurement(480e-6, 15e-6), new Measurement(15 * 60, 5)),
                    "Full capacity held for the test."));
            DemoHouse.seed(ledger);
        });
    }

    private static final String KIT = "Probe thermometer T-07 (ice-bath check 2024-07-01); aspirated psychrometer P-03;"
            + " digital gauges G-11; flow grid FG-2";

    private static String id(String name) {
        return UUID.nameUUIDFromBytes(("saltreed-demo/" + name).getBytes(StandardCharsets.UTF_8)).toString();
    }

    private static double c(double fahrenheit) {
        return Quantity.TEMPERATURE.fromDisplay(UnitSystem.IP, fahrenheit);
    }

    private static double k(double fahrenheitDifference) {
        return Quantity.TEMPERATURE_DIFFERENCE.fromDisplay(UnitSystem.IP, fahrenheitDifference);
    }

    /** A dry bulb in °F with the typical probe tolerance ±0.5 °F (common practice, no source). */
    private static Measurement f(double fahrenheit) {
        return new Measurement(c(fahrenheit), k(0.5));
    }

    private static HumidityReading wetBulb(double fahrenheit) {
        return new HumidityReading(HumidityKind.WET_BULB, f(fahrenheit));
    }

    /** From suction pressure; ±3.5 psi is about ±1.8 °F for R-410A near 40 °F; R-410A saturation table, from memory. */
    private static CoilTemperature saturation(double fahrenheit) {
        return new CoilTemperature(CoilTemperatureKind.EVAPORATOR_SATURATION, new Measurement(c(fahrenheit), k(1.8)));
    }

    private static Airflow cfm(double cfm, double fraction, String method) {
        double m3s = Quantity.AIRFLOW.fromDisplay(UnitSystem.IP, cfm);
        return new Airflow(new Measurement(m3s, m3s * fraction), AirflowPoint.ENTERING, method);
    }
}
