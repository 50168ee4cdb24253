package app.latentledger.sync.wire;

import app.latentledger.core.coil.AirReading;
import app.latentledger.core.house.HouseFacts;
import app.latentledger.core.house.HouseVisitReadings;
import app.latentledger.core.house.VentilationType;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.SignOff;
import app.latentledger.core.records.StatedAccuracy;
import app.latentledger.core.records.VisitPaperwork;
import app.latentledger.store.TestRecords;

import java.time.LocalDate;

/** Invented records of the kinds only the wire tests need (test data; plausible field values). */
final class WireSamples {
    private WireSamples() {
    }

    static Instrument instrument(String id, String visitId) {
        return new Instrument(id, visitId, "Probe kit A", "SR-1042", LocalDate.parse("2024-05-01"),
                new StatedAccuracy(0.3, 2.0, null, 0.5, null, 0.05));
    }

    static VisitPaperwork paperwork(String visitId) {
        return new VisitPaperwork(visitId, "Sticky upstairs, \"clammy\" at night", "Fan set to auto; drain cleared",
                new SignOff("Ada Marsh", TestRecords.T0.plusHours(1), ""), null);
    }

    static HouseRecord house(String visitId, String siteId) {
        HouseFacts facts = new HouseFacts(180, 2.4, 2, 3, 0, Double.NaN, 6.5, 3, Double.NaN, VentilationType.ERV,
                0.03, 0.4);
        HouseVisitReadings readings = new HouseVisitReadings(
                new AirReading("outdoor", 31.0, 0.3, HumidityKind.DEW_POINT, 23.0, 0.5), null,
                new AirReading("plenum", 25.5, 0.3, HumidityKind.RELATIVE_HUMIDITY, 58, 2), null, 0.62);
        return new HouseRecord(visitId, siteId, facts, readings);
    }
}
