package app.latentledger.cli;

import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** A batch row's condensate catch is refused in the unit its column is typed in, not the row's units. */
class BatchCondensateUnitsTest {
    @Test
    void theCondensateColumnsSayTheirOwnUnit() {
        // the catch limit is 0.05 m³ = 50000 mL = 1690.7 fl oz (1 US fl oz = 29.5735295625 mL, NIST SP 811)
        assertEquals("0 to 50000 mL", BatchColumns.range("condensate", UnitSystem.IP));
        assertEquals("0 to 50000 mL", BatchColumns.range("condensate", UnitSystem.SI));
        assertEquals("0 to 1690.7 fl oz", BatchColumns.range("condensate-floz", UnitSystem.SI));
        assertEquals("-58 to 203 °F", BatchColumns.range("return-db", UnitSystem.IP), "others keep the row's units");
    }
}
