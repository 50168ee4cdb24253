package app.latentledger.core.visit;

import app.latentledger.core.coil.AirReading;
import app.latentledger.core.coil.CoilCheck;
import app.latentledger.core.coil.CoilReadings;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.Condensate;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.measure.AirflowPoint;
import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.psychro.StandardAtmosphere;
import app.latentledger.core.records.HumidityReading;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;

/**
 * A stored reading set as a coil check: the one place the field record (what the tech typed, as
 * saved) becomes the coil check's inputs. The app, the report and the commands all go through it,
 * so a visit shows the same numbers everywhere.
 */
public final class ReadingSetCheck {
    private ReadingSetCheck() {
    }

    /** What the coil check still needs from this reading set, as a tech names it; empty when complete. */
    public static List<String> missing(ReadingSet readings) {
        List<String> missing = new ArrayList<>();
        if (readings.airflow() == null) {
            missing.add("airflow");
        }
        return missing;
    }

    /**
     * The coil-check inputs for a reading set taken on {@code system} at {@code site}. The site
     * pressure is the measured station pressure when one was entered, else the standard atmosphere
     * at the site's elevation (ASHRAE HoF 2017 ch. 1, eq. 3).
     *
     * @throws IllegalStateException when {@link #missing} is not empty
     */
    public static CoilReadings inputs(ReadingSet rs, HvacSystem system, Site site) {
        List<String> missing = missing(rs);
        if (!missing.isEmpty()) {
            throw new IllegalStateException("reading set " + rs.id() + " lacks " + String.join(", ", missing));
        }
        double pressurePa = pressurePa(rs, site);
        AirReading entering = air("return", rs.returnDryBulb(), rs.returnHumidity());
        AirReading leaving = air("supply", rs.supplyDryBulb(), rs.supplyHumidity());
        Measurement flow = rs.airflow().volume();
        AirflowPoint at = rs.airflow().point();
        double coilC = Double.NaN;
        double coilTolK = 0;
        CoilTemperatureKind coilKind = null;
        if (rs.coilTemperature() != null) {
            coilC = rs.coilTemperature().value().valueSi();
            coilTolK = rs.coilTemperature().value().toleranceSi();
            coilKind = rs.coilTemperature().kind();
        }
        Condensate condensate = null;
        if (rs.condensate() != null) {
            Measurement volume = rs.condensate().volume();
            Measurement seconds = rs.condensate().seconds();
            condensate = new Condensate(volume.valueSi(), fraction(volume), seconds.valueSi(), seconds.toleranceSi());
        }
        return new CoilReadings(pressurePa, entering, leaving, flow.valueSi(), fraction(flow), at, coilC, coilTolK,
                coilKind, system.nominalCapacityW(), condensate, null, rs.airflow().basis(), rs.probes());
    }

    /**
     * The barometric pressure a reading set is worked out at: its measured station pressure when
     * one was entered, else the standard atmosphere at the site's elevation (ASHRAE HoF 2017 ch. 1,
     * eq. 3), Pa.
     */
    public static double pressurePa(ReadingSet rs, Site site) {
        return rs.stationPressurePa() != null ? rs.stationPressurePa().valueSi()
                : StandardAtmosphere.pressurePa(site.elevationM());
    }

    /** Runs the coil check on a stored reading set. */
    public static CoilResult run(ReadingSet rs, HvacSystem system, Site site, ThresholdSettings thresholds,
                                 UnitSystem units) {
        return CoilCheck.run(inputs(rs, system, site), thresholds, units);
    }

    private static AirReading air(String where, Measurement dryBulb, HumidityReading humidity) {
        return new AirReading(where, dryBulb.valueSi(), dryBulb.toleranceSi(), humidity.kind(), humidity.value().valueSi(),
                humidity.value().toleranceSi());
    }

    private static double fraction(Measurement m) {
        return m.valueSi() == 0 ? 0 : m.toleranceSi() / Math.abs(m.valueSi());
    }
}
