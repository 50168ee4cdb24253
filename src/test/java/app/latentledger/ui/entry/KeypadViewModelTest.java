package app.latentledger.ui.entry;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The pad's text rules (common practice for calculator pads, no source). */
class KeypadViewModelTest {
    @Test
    void digitsPointAndSignMakeANegativeDecimal() {
        KeypadViewModel pad = new KeypadViewModel();
        pad.digit(1);
        pad.point();
        pad.digit(5);
        pad.sign();
        assertEquals("-1.5", pad.text());
        assertEquals(-1.5, pad.value().getAsDouble());
    }

    @Test
    void aSecondPointIsIgnoredAndALeadingPointGetsItsZero() {
        KeypadViewModel pad = new KeypadViewModel();
        pad.point();
        pad.digit(5);
        pad.point();
        assertEquals("0.5", pad.text());
    }

    @Test
    void leadingZeroIsReplacedAndBackspaceAndClearRemove() {
        KeypadViewModel pad = new KeypadViewModel();
        pad.digit(0);
        pad.digit(7);
        assertEquals("7", pad.text());
        pad.digit(2);
        pad.backspace();
        assertEquals("7", pad.text());
        pad.clear();
        assertTrue(pad.value().isEmpty());
    }

    @Test
    void aLoneSignIsNotANumberYetAndLengthIsCapped() {
        KeypadViewModel pad = new KeypadViewModel();
        pad.sign();
        assertTrue(pad.value().isEmpty());
        for (int i = 0; i < 20; i++) {
            pad.digit(9);
        }
        assertEquals("-" + "9".repeat(KeypadViewModel.MAX_CHARACTERS), pad.text());
    }
}
