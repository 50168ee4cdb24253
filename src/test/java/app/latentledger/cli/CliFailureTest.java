package app.latentledger.cli;

import org.junit.jupiter.api.Test;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

/** A command that fails unexpectedly exits 1 with a sentence; the exception's class stays off the screen. */
class CliFailureTest {
    private static String failWith(Exception e) {
        Command broken = new Command() {
            @Override
            public String name() {
                return "broken";
            }

            @Override
            public String summary() {
                return "fails";
            }

            @Override
            public String usage() {
                return "usage: broken";
            }

            @Override
            public int run(Args args, CliContext context) throws Exception {
                throw e;
            }
        };
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = new Cli(List.of(broken)).run(List.of("broken"), new PrintStream(new ByteArrayOutputStream()),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        assertEquals(Cli.FAILED, code);
        return err.toString(StandardCharsets.UTF_8).strip();
    }

    @Test
    void withoutAMessageTheTechReadsWhatHappened() {
        String shown = failWith(new IllegalStateException());
        assertEquals("latent-ledger: unexpected failure: the command stopped before it finished; nothing saved was"
                + " changed", shown);
    }

    @Test
    void withAMessageOnlyTheMessageIsShown() {
        String shown = failWith(new java.io.IOException("disk full"));
        assertEquals("latent-ledger: unexpected failure: disk full", shown);
        assertFalse(shown.contains("IOException"));
    }
}
