package app.latentledger.server;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import java.util.concurrent.CountDownLatch;

/**
 * What {@code serve} does: run the office server, or an administration step on its database
 * ({@code serve admin create-company | enrol-code | revoke-device}). The command-line face hands
 * over the words and options already parsed; refusals are {@link ConfigException}s (exit 2).
 */
public final class ServeLauncher {
    public static final int OK = 0;

    /** Options beyond the server settings, by the step that reads them. */
    public static final List<String> ADMIN_OPTIONS = List.of("name", "office-email", "office-password-file", "company",
            "technician", "role", "device", "tablets", "kills", "kill-tablets");

    /**
     * The libraries' own INFO lines (pool started, schema validated) say nothing an office needs on
     * every admin step; warnings and errors still show. Held here: java.util.logging keeps loggers
     * only weakly, and a collected logger would forget its level.
     */
    private static final List<java.util.logging.Logger> QUIET = List.of(
            java.util.logging.Logger.getLogger("com.zaxxer.hikari"),
            java.util.logging.Logger.getLogger("org.flywaydb"),
            java.util.logging.Logger.getLogger("org.eclipse.jetty"));

    private ServeLauncher() {
    }

    /** Every option name {@code serve} reads. */
    public static List<String> optionNames() {
        List<String> all = new ArrayList<>(ServerConfig.NAMES);
        all.add("config");
        all.addAll(ADMIN_OPTIONS);
        return all;
    }

    public static String usage() {
        return "usage: latent-ledger serve [--config FILE] [--listen HOST:PORT] [--database-url URL]\n"
                + "                            [--database-user NAME] [--database-password TEXT]\n"
                + "                            [--keystore FILE.p12 --keystore-password TEXT]\n"
                + "       latent-ledger serve admin create-company --name NAME --office-email E --office-password-file F\n"
                + "       latent-ledger serve admin enrol-code --company NAME --technician \"NAME\" [--role office]\n"
                + "       latent-ledger serve admin revoke-device --device ID\n"
                + "       latent-ledger serve loadtest --database-url URL [--tablets 200] [--kills 20] [--kill-tablets 20]\n"
                + "  Runs the office server (tablets sync to it) on PostgreSQL; see docs/office-server.md.\n"
                + "  Defaults: --listen " + ServerConfig.DEFAULT_LISTEN + " (plain HTTP on loopback: put a TLS proxy"
                + " in front, or give --keystore).\n"
                + "  Environment: LATENT_LEDGER_DB_URL, LATENT_LEDGER_DB_USER, LATENT_LEDGER_DB_PASSWORD,\n"
                + "  LATENT_LEDGER_LISTEN, LATENT_LEDGER_KEYSTORE, LATENT_LEDGER_KEYSTORE_PASSWORD.\n"
                + "  --config FILE: the same settings as KEY=VALUE lines (listen, database-url, database-user,\n"
                + "  database-password, keystore, keystore-password, trust-forwarded-for, enrol-per-minute,\n"
                + "  token-days, pool-size). Options win over the environment, the environment over the file.\n";
    }

    public static int run(List<String> words, Map<String, String> options, Map<String, String> env, PrintStream out,
                          PrintStream err) throws Exception {
        QUIET.forEach(l -> l.setLevel(java.util.logging.Level.WARNING));
        if (words.isEmpty()) {
            for (String admin : ADMIN_OPTIONS) {
                if (options.containsKey(admin)) {
                    throw new ConfigException("--" + admin + " belongs to a 'serve admin' step");
                }
            }
            return serve(ServerConfig.load(options, env), out, err);
        }
        if (words.equals(List.of("loadtest"))) {
            return loadtest(options, env, out);
        }
        if (!words.get(0).equals("admin") || words.size() != 2) {
            throw new ConfigException("unexpected words '" + String.join(" ", words) + "'; serve takes none, or"
                    + " 'admin create-company', 'admin enrol-code', 'admin revoke-device'");
        }
        Map<String, String> settings = new java.util.HashMap<>(options);
        settings.keySet().removeAll(ADMIN_OPTIONS);
        ServerConfig config = ServerConfig.load(settings, env);
        try (OfficeDatabase db = OfficeDatabase.open(config, null)) {
            return admin(words.get(1), options, db, config, out);
        }
    }

    static int admin(String step, Map<String, String> o, OfficeDatabase db, ServerConfig config, PrintStream out) {
        Accounts accounts = new Accounts(db, java.time.Duration.ofDays(config.tokenDays()));
        switch (step) {
            case "create-company" -> {
                String file = need(o, "office-password-file");
                String password;
                try {
                    password = Files.readString(Path.of(file), StandardCharsets.UTF_8).strip();
                } catch (IOException e) {
                    throw new ConfigException("--office-password-file " + file + " cannot be read: " + e.getMessage());
                }
                UUID id = accounts.createCompany(need(o, "name"), need(o, "office-email"), password);
                out.println("company " + o.get("name").strip() + " created (" + id + ")");
                return OK;
            }
            case "enrol-code" -> {
                String code = accounts.createEnrolCode(need(o, "company"), need(o, "technician"),
                        o.getOrDefault("role", "technician"));
                out.println(code);
                return OK;
            }
            case "revoke-device" -> {
                UUID device;
                try {
                    device = UUID.fromString(need(o, "device"));
                } catch (IllegalArgumentException e) {
                    throw new ConfigException("--device '" + o.get("device") + "' is not a device id (a UUID)");
                }
                if (!accounts.revokeDevice(device)) {
                    throw new ConfigException("no device " + device + " that is not already revoked");
                }
                out.println("device " + device + " revoked");
                return OK;
            }
            default -> throw new ConfigException("unknown admin step '" + step
                    + "'; known: create-company, enrol-code, revoke-device");
        }
    }

    /** Simulated tablets against a server on loopback, in a schema of its own (see {@link LoadTest}). */
    private static int loadtest(Map<String, String> options, Map<String, String> env, PrintStream out) throws Exception {
        int tablets = whole(options, "tablets", 200, 1, 500);
        int kills = whole(options, "kills", 20, 0, 50);
        int killTablets = whole(options, "kill-tablets", 20, 1, 200);
        Map<String, String> settings = new java.util.HashMap<>(options);
        settings.keySet().removeAll(ADMIN_OPTIONS);
        ServerConfig config = ServerConfig.load(settings, env);
        LoadTest.Result r = new LoadTest(config.databaseUrl(), out).run(tablets, kills, killTablets);
        out.println(Reply.GSON.toJson(r));
        return r.lost() + r.duplicated() + r.killLost() + r.killDuplicated() + r.weekOfflineLost() == 0 ? OK : 1;
    }

    private static int whole(Map<String, String> o, String name, int fallback, int min, int max) {
        String v = o.get(name);
        if (v == null) {
            return fallback;
        }
        try {
            int n = Integer.parseInt(v.strip());
            if (n >= min && n <= max) {
                return n;
            }
        } catch (NumberFormatException e) {
            // refused below
        }
        throw new ConfigException("--" + name + " '" + v + "' must be a whole number from " + min + " to " + max);
    }

    private static String need(Map<String, String> o, String name) {
        String v = o.get(name);
        if (v == null || v.isBlank()) {
            throw new ConfigException("this step needs --" + name);
        }
        return v;
    }

    private static int serve(ServerConfig config, PrintStream out, PrintStream err) throws Exception {
        OfficeServer server = OfficeServer.start(config, null, out);
        CountDownLatch stopped = new CountDownLatch(1);
        Runtime.getRuntime().addShutdownHook(new Thread(() -> {
            try {
                server.close();
            } catch (Exception e) {
                // stopping anyway
            }
            stopped.countDown();
        }, "office-stop"));
        err.println("latent-ledger: office server listening on " + (config.keystore() == null ? "http" : "https")
                + "://" + config.listenHost() + ":" + server.port() + " (" + config.databaseShown() + ")");
        stopped.await();
        return OK;
    }
}
