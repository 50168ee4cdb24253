package app.latentledger.ui;

import app.latentledger.cli.Cli;
import app.latentledger.core.settings.DisplayTheme;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Screen;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The app open while the command line changes settings: the app's next save (here the header's
 * theme switch) keeps the command line's changes, and a screen change shows them.
 */
class SessionSettingsReloadTest {
    @TempDir
    Path dir;

    @Test
    void theAppKeepsAndShowsSettingsChangedByTheCommandLine() {
        try (AppSession session = TestSessions.open(dir)) {
            PrintStream quiet = new PrintStream(OutputStream.nullOutputStream());
            assertEquals(0, Cli.standard().run(List.of("--data-dir", dir.toString(), "settings", "set", "tolRh", "5"),
                    quiet, quiet));
            assertEquals(0, Cli.standard().run(List.of("--data-dir", dir.toString(), "settings", "set", "units", "si"),
                    quiet, quiet));
            session.darkProperty().set(true);
            var stored = session.ledger().settings().load();
            assertEquals(5, stored.numberSi("tolRh"), 1e-9, "the command line's change survives the app's save");
            assertEquals(UnitSystem.SI, stored.units());
            assertEquals(DisplayTheme.DARK, stored.theme());
            assertEquals(UnitSystem.SI, session.units(), "the app shows what is stored after its save");

            assertEquals(0, Cli.standard().run(List.of("--data-dir", dir.toString(), "settings", "set", "units", "ip"),
                    quiet, quiet));
            session.screenProperty().set(session.screenProperty().get() == Screen.RESULTS ? Screen.SETTINGS : Screen.RESULTS);
            assertEquals(UnitSystem.IP, session.units(), "a screen change takes the stored settings again");
            assertTrue(!session.reloadSettingsIfChanged(), "nothing more to take");
        }
    }
}
