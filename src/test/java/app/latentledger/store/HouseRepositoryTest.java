package app.latentledger.store;

import app.latentledger.core.coil.AirReading;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.house.HouseFacts;
import app.latentledger.core.house.HouseVisitReadings;
import app.latentledger.core.house.VentilationType;
import org.junit.jupiter.api.Test;

import java.util.Optional;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/** House facts with the site and house readings with the visit read back as saved, NaN and null kept. */
class HouseRepositoryTest extends OneVisitLedger {
    @Test
    void factsReadBackEqual() {
        HouseFacts f = new HouseFacts(185.8, 2.44, 2, 3, 0, 0.62926, Double.NaN, 3, Double.NaN, VentilationType.ERV,
                0.0425, 0.6);
        assertEquals(Optional.empty(), ledger.houses().facts("s1"));
        ledger.houses().saveFacts("s1", f);
        assertEquals(Optional.of(f), ledger.houses().facts("s1"));
        HouseFacts g = new HouseFacts(100, 2.5, 1, 1, 2, Double.NaN, 5, 0, 4, VentilationType.NONE, 0, Double.NaN);
        ledger.houses().saveFacts("s1", g);
        assertEquals(Optional.of(g), ledger.houses().facts("s1"), "a second save replaces the first");
    }

    @Test
    void readingsAreStoredOneAtATime() {
        assertEquals(HouseVisitReadings.EMPTY, ledger.houses().readings("v1"));
        AirReading out = new AirReading("outdoor", 31, 0.3, HumidityKind.DEW_POINT, 23, 0.6);
        HouseVisitReadings r = HouseVisitReadings.EMPTY.withOutdoor(out);
        ledger.houses().saveReadings("v1", r);
        assertEquals(r, ledger.houses().readings("v1"));
        HouseVisitReadings all = r.withGrille(new AirReading("grille", 24, 0.3, HumidityKind.RELATIVE_HUMIDITY, 52, 2))
                .withPlenum(new AirReading("plenum", 25, 0.3, HumidityKind.WET_BULB, 18.9, 0.3))
                .withSpace(new AirReading("space", 45, 0.3, HumidityKind.DEW_POINT, 23, 0.6)).withRuntimeFraction(0.5);
        ledger.houses().saveReadings("v1", all);
        assertEquals(all, ledger.houses().readings("v1"));
    }

    @Test
    void readingsForAnUnknownVisitAreRefused() {
        assertThrows(StoreException.class, () -> ledger.houses().saveReadings("nope", HouseVisitReadings.EMPTY));
    }
}
