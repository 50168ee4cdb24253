package app.latentledger.server;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.Properties;

/**
 * How one server instance runs. Each setting comes from, in this order of precedence: the command
 * line option, the environment variable, the configuration file ({@code --config FILE}, Java properties
 * with the option names as keys), the default.
 *
 * @param listenHost          address to listen on (default loopback: a reverse proxy or load balancer in front)
 * @param listenPort          port; 0 picks a free one (tests)
 * @param databaseUrl         JDBC URL of the PostgreSQL database
 * @param databaseUser        role name, or null to take it from the URL
 * @param databasePassword    its password, or null
 * @param keystore            PKCS#12 keystore for HTTPS, or null for plain HTTP behind a TLS-terminating proxy
 * @param keystorePassword    the keystore's password
 * @param trustForwardedFor   take the client address from {@code X-Forwarded-For} (only behind a proxy you run)
 * @param enrolPerMinute      enrol attempts allowed per client address per minute, per instance
 * @param tokenDays           days a device token stays valid
 * @param poolSize            database connections of this instance
 */
public record ServerConfig(String listenHost, int listenPort, String databaseUrl, String databaseUser,
                           String databasePassword, Path keystore, String keystorePassword,
                           boolean trustForwardedFor, int enrolPerMinute, int tokenDays, int poolSize) {

    public static final String DEFAULT_LISTEN = "127.0.0.1:8780";

    /** Option name → environment variable. */
    private static final Map<String, String> ENV = Map.of(
            "listen", "LATENT_LEDGER_LISTEN",
            "database-url", "LATENT_LEDGER_DB_URL",
            "database-user", "LATENT_LEDGER_DB_USER",
            "database-password", "LATENT_LEDGER_DB_PASSWORD",
            "keystore", "LATENT_LEDGER_KEYSTORE",
            "keystore-password", "LATENT_LEDGER_KEYSTORE_PASSWORD");

    /** Every setting's name, for the usage text and to refuse a misspelt key in the file. */
    public static final java.util.List<String> NAMES = java.util.List.of("listen", "database-url", "database-user",
            "database-password", "keystore", "keystore-password", "trust-forwarded-for", "enrol-per-minute",
            "token-days", "pool-size");

    /**
     * @param options command-line options by name (without dashes); {@code config} names the file
     * @param env     the environment
     */
    public static ServerConfig load(Map<String, String> options, Map<String, String> env) {
        Map<String, String> merged = new HashMap<>();
        String file = options.get("config");
        if (file != null) {
            merged.putAll(readFile(Path.of(file)));
        }
        ENV.forEach((name, variable) -> {
            String v = env.get(variable);
            if (v != null && !v.isBlank()) {
                merged.put(name, v);
            }
        });
        options.forEach((k, v) -> {
            if (!k.equals("config")) {
                merged.put(k, v);
            }
        });
        for (String k : merged.keySet()) {
            if (!NAMES.contains(k)) {
                throw new ConfigException("unknown setting '" + k + "'; known: " + String.join(", ", NAMES));
            }
        }
        String listen = merged.getOrDefault("listen", DEFAULT_LISTEN);
        int colon = listen.lastIndexOf(':');
        if (colon <= 0) {
            throw new ConfigException("listen '" + listen + "' is not HOST:PORT (e.g. " + DEFAULT_LISTEN + ")");
        }
        String host = listen.substring(0, colon);
        if (host.startsWith("[") && host.endsWith("]")) {
            host = host.substring(1, host.length() - 1);
        }
        int port = integer("listen port", listen.substring(colon + 1), 0, 65535);
        String url = merged.get("database-url");
        if (url == null || url.isBlank()) {
            throw new ConfigException("no database: give --database-url jdbc:postgresql://HOST:PORT/DB"
                    + " (or LATENT_LEDGER_DB_URL, or database-url in the --config file)");
        }
        if (!url.startsWith("jdbc:postgresql:")) {
            throw new ConfigException("database-url '" + url + "' is not a PostgreSQL JDBC URL"
                    + " (jdbc:postgresql://HOST:PORT/DB)");
        }
        String ks = merged.get("keystore");
        return new ServerConfig(host, port, url, merged.get("database-user"), merged.get("database-password"),
                ks == null || ks.isBlank() ? null : Path.of(ks), merged.get("keystore-password"),
                bool("trust-forwarded-for", merged.getOrDefault("trust-forwarded-for", "false")),
                integer("enrol-per-minute", merged.getOrDefault("enrol-per-minute", "10"), 1, 10_000),
                integer("token-days", merged.getOrDefault("token-days", "365"), 1, 3650),
                integer("pool-size", merged.getOrDefault("pool-size", "10"), 1, 200));
    }

    /** The same settings with another enrol limit (tests). */
    public ServerConfig withEnrolPerMinute(int perMinute) {
        return new ServerConfig(listenHost, listenPort, databaseUrl, databaseUser, databasePassword, keystore,
                keystorePassword, trustForwardedFor, perMinute, tokenDays, poolSize);
    }

    private static Map<String, String> readFile(Path file) {
        Properties p = new Properties();
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            p.load(r);
        } catch (IOException e) {
            throw new ConfigException("cannot read the configuration file " + file + ": " + e.getMessage());
        }
        Map<String, String> m = new HashMap<>();
        p.stringPropertyNames().forEach(k -> m.put(k.trim(), p.getProperty(k).trim()));
        return m;
    }

    private static int integer(String name, String text, int min, int max) {
        try {
            int v = Integer.parseInt(text.trim());
            if (v >= min && v <= max) {
                return v;
            }
        } catch (NumberFormatException e) {
            // refused below with the range
        }
        throw new ConfigException(name + " '" + text + "' is not a whole number from " + min + " to " + max);
    }

    private static boolean bool(String name, String text) {
        if (text.equalsIgnoreCase("true") || text.equalsIgnoreCase("false")) {
            return Boolean.parseBoolean(text);
        }
        throw new ConfigException(name + " '" + text + "' must be true or false");
    }

    /** The database URL without its parameters (which may hold a password), for messages. */
    public String databaseShown() {
        int q = databaseUrl.indexOf('?');
        return q < 0 ? databaseUrl : databaseUrl.substring(0, q) + "?…";
    }

    @Override
    public String toString() {
        // never print the passwords
        return "ServerConfig[listen=" + listenHost + ":" + listenPort + ", database=" + databaseShown()
                + ", tls=" + (keystore != null) + "]";
    }
}
