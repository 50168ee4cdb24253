package app.latentledger.core.units;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

/** The app's one rule for a typed number (the command line's rule without --decimal-comma). */
class TypedNumberTest {
    @Test
    void aCommaIsRefusedNamingFieldValueAndWhatIsAccepted() {
        NumberFormatException e = assertThrows(NumberFormatException.class,
                () -> TypedNumber.parse("elevation", "5,000"));
        assertEquals("elevation '5,000' refused: type digits with a point for decimals, no thousands separator,"
                + " e.g. 5000", e.getMessage());
        NumberFormatException d = assertThrows(NumberFormatException.class,
                () -> TypedNumber.parse("stated airflow accuracy", " 2,5 "));
        assertEquals("stated airflow accuracy '2,5' refused: type digits with a point for decimals, no thousands"
                + " separator, e.g. 2.5", d.getMessage());
    }

    @Test
    void plainDecimalsPassAndWordsDoNot() {
        assertEquals(5000.0, TypedNumber.parse("elevation", " 5000 "));
        assertEquals(-12.5, TypedNumber.parse("x", "-12.5"));
        assertEquals(0.5, TypedNumber.parse("x", ".5"));
        assertEquals(1500.0, TypedNumber.parse("x", "1.5e3"));
        for (String bad : new String[] {"", "abc", "NaN", "Infinity", "0x10", "1.2.3", "1 000"}) {
            assertThrows(NumberFormatException.class, () -> TypedNumber.parse("x", bad), bad);
        }
        assertNull(TypedNumber.parseOrNull("x", "  "));
    }
}
