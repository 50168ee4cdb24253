package app.latentledger.cli;

import org.junit.jupiter.api.Test;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The progress line redraws itself in place and is cleared at the end; without a terminal there is none. */
class BatchProgressTest {
    @Test
    void theLastCountIsAlwaysShownAndTheLineIsClearedAfter() {
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        BatchProgress p = BatchProgress.to(new PrintStream(b, true, StandardCharsets.UTF_8), "checked", 12_000);
        p.done(1);         // too soon after the start to redraw
        p.done(12_000);    // the end is always drawn
        p.finish();
        String s = b.toString(StandardCharsets.UTF_8);
        assertTrue(s.startsWith("\rchecked 12,000 of 12,000"), s);
        assertTrue(s.endsWith("\r"), "the line is blanked and the cursor put back: " + s);
    }

    @Test
    void withJsonOrWithoutAConsoleNothingIsPrinted() {
        PrintStream was = System.err;
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        System.setErr(new PrintStream(b, true, StandardCharsets.UTF_8));
        try {
            for (boolean wanted : new boolean[] {false, true}) { // the test run has no console either way
                BatchProgress p = BatchProgress.onTerminal(wanted, "checked", 3);
                p.done(3);
                p.finish();
            }
        } finally {
            System.setErr(was);
        }
        assertEquals("", b.toString(StandardCharsets.UTF_8));
    }
}
