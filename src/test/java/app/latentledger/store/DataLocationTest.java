package app.latentledger.store;

import org.junit.jupiter.api.Test;

import java.io.File;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The order the issue asks for: --data-dir, then the variable, then Attach storage, then the home folder. */
class DataLocationTest {
    private static final Map<String, String> ENV = Map.of(DataLocation.ENV, "/srv/from-env");

    @Test
    void dataDirOptionWins() {
        DataLocation l = DataLocation.resolve(Path.of("/srv/option"), ENV, () -> Optional.of(new File("/a")), "/home/x");
        assertEquals(Path.of("/srv/option"), l.folder());
        assertEquals("--data-dir", l.source());
        assertEquals(Path.of("/srv/option/ledger.db"), l.databaseFile());
    }

    @Test
    void thenTheEnvironmentVariable() {
        DataLocation l = DataLocation.resolve(null, ENV, () -> Optional.of(new File("/a")), "/home/x");
        assertEquals(Path.of("/srv/from-env"), l.folder());
        assertEquals(DataLocation.ENV, l.source());
    }

    @Test
    void thenAttachPrivateStorageThenHome() {
        assertEquals(Path.of("/a/latent-ledger"),
                DataLocation.resolve(null, Map.of(), () -> Optional.of(new File("/a")), "/home/x").folder());
        assertEquals(Path.of("/home/x/.latent-ledger"),
                DataLocation.resolve(null, Map.of(DataLocation.ENV, " "), Optional::empty, "/home/x").folder());
    }

    @Test
    void onThisDesktopAttachGivesDotGluonUnderTheTestHome() {
        // surefire sets user.home to target/test-home; Attach's desktop storage is ${user.home}/.gluon
        // (seen on this stack; Gluon Attach desktop storage). Only meaningful when the variable is not set in the environment.
        if (System.getenv(DataLocation.ENV) == null) {
            Path folder = DataLocation.resolve(null).folder();
            assertEquals(Path.of(System.getProperty("user.home"), ".gluon", "latent-ledger").toAbsolutePath(), folder);
            assertTrue(folder.toString().contains("test-home"), folder.toString());
        }
    }

    @Test
    void theAppReadsTheSameOption() {
        assertEquals(Path.of("/d"), DataLocation.dataDirOption(new String[] {"--data-dir", "/d"}));
        assertEquals(Path.of("/e"), DataLocation.dataDirOption(new String[] {"--data-dir=/e"}));
        assertEquals(null, DataLocation.dataDirOption(new String[] {}));
    }
}
