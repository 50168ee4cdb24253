package app.latentledger.server;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class ServerConfigTest {
    private static final String URL = "jdbc:postgresql://127.0.0.1:5432/office";

    @Test
    void optionsWinOverTheEnvironmentAndTheEnvironmentOverTheFile(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("office.properties");
        Files.writeString(file, "listen = 0.0.0.0:9000\ndatabase-url = jdbc:postgresql://db/file\n"
                + "database-user = fromfile\nenrol-per-minute = 4\n");
        ServerConfig c = ServerConfig.load(Map.of("config", file.toString()),
                Map.of("LATENT_LEDGER_DB_URL", URL, "LATENT_LEDGER_DB_PASSWORD", "pw"));
        assertEquals("0.0.0.0", c.listenHost());
        assertEquals(9000, c.listenPort());
        assertEquals(URL, c.databaseUrl(), "the environment wins over the file");
        assertEquals("fromfile", c.databaseUser());
        assertEquals("pw", c.databasePassword());
        assertEquals(4, c.enrolPerMinute());
        ServerConfig o = ServerConfig.load(Map.of("config", file.toString(), "listen", "[::1]:8781"),
                Map.of("LATENT_LEDGER_LISTEN", "127.0.0.1:1"));
        assertEquals("::1", o.listenHost(), "the option wins over the environment");
        assertEquals(8781, o.listenPort());
        assertTrue(!o.toString().contains("pw"));
        ServerConfig withPassword = ServerConfig.load(Map.of("database-url", URL + "?user=a&password=secret"), Map.of());
        assertTrue(!withPassword.toString().contains("secret") && !withPassword.databaseShown().contains("secret"),
                "a password in the URL is never shown");
    }

    @Test
    void defaultsAreLoopbackPlainHttp() {
        ServerConfig c = ServerConfig.load(Map.of("database-url", URL), Map.of());
        assertEquals("127.0.0.1", c.listenHost());
        assertEquals(8780, c.listenPort());
        assertNull(c.keystore());
        assertEquals(10, c.enrolPerMinute());
    }

    @Test
    void badSettingsAreRefusedNamingThem() {
        assertTrue(assertThrows(ConfigException.class, () -> ServerConfig.load(Map.of(), Map.of()))
                .getMessage().contains("--database-url"));
        assertTrue(assertThrows(ConfigException.class, () -> ServerConfig.load(Map.of("database-url",
                "jdbc:sqlite:x.db"), Map.of())).getMessage().contains("jdbc:sqlite:x.db"));
        assertTrue(assertThrows(ConfigException.class, () -> ServerConfig.load(Map.of("database-url", URL,
                "listen", "8780"), Map.of())).getMessage().contains("HOST:PORT"));
        assertTrue(assertThrows(ConfigException.class, () -> ServerConfig.load(Map.of("database-url", URL,
                "listen", "127.0.0.1:70000"), Map.of())).getMessage().contains("0 to 65535"));
        assertTrue(assertThrows(ConfigException.class, () -> ServerConfig.load(Map.of("database-url", URL,
                "token-dayz", "3"), Map.of())).getMessage().contains("token-dayz"));
    }
}
