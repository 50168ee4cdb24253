package app.latentledger.server;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Assumptions;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Duration;
import java.util.Locale;
import java.util.Map;
import java.util.UUID;

/**
 * A real office server for one test class: in this JVM on a random loopback port, on the real
 * PostgreSQL named by {@code LATENT_LEDGER_TEST_DB_URL}, in a schema of its own (dropped at the
 * end) so test classes never see each other's data. Without that variable the class is skipped,
 * saying so, unless {@code LATENT_LEDGER_REQUIRE_DB=1} (CI), where it fails.
 */
final class TestServer implements AutoCloseable {
    static final String URL_VARIABLE = "LATENT_LEDGER_TEST_DB_URL";

    final OfficeServer server;
    final Accounts accounts;
    final String schema;
    private final String url;
    private final HttpClient http = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(10)).build();

    private TestServer(OfficeServer server, String schema, String url) {
        this.server = server;
        this.schema = schema;
        this.url = url;
        this.accounts = new Accounts(server.database(), Duration.ofDays(30));
    }

    /** The test database's URL, or the test is skipped (locally) / fails (CI). */
    static String databaseUrl() {
        String url = System.getenv(URL_VARIABLE);
        if (url == null || url.isBlank()) {
            if ("1".equals(System.getenv("LATENT_LEDGER_REQUIRE_DB"))) {
                throw new IllegalStateException(URL_VARIABLE + " is not set, and LATENT_LEDGER_REQUIRE_DB=1: the"
                        + " office-server tests need the PostgreSQL that .ci/postgres.sh starts");
            }
            String why = "office-server tests skipped: no PostgreSQL (" + URL_VARIABLE + " is not set; run"
                    + " `source .ci/postgres.sh` first, as .ci/run does)";
            // said on the console too: an abort in @BeforeAll shows in the report only as "0 tests run"
            System.err.println(why);
            Assumptions.abort(why);
        }
        return url;
    }

    static TestServer start(Class<?> owner) throws Exception {
        return start(owner, 10);
    }

    static TestServer start(Class<?> owner, int enrolPerMinute) throws Exception {
        String url = databaseUrl();
        String schema = ("t_" + owner.getSimpleName() + "_" + UUID.randomUUID().toString().substring(0, 8))
                .toLowerCase(Locale.ROOT);
        ServerConfig config = ServerConfig.load(Map.of("listen", "127.0.0.1:0", "database-url", url), Map.of())
                .withEnrolPerMinute(enrolPerMinute);
        ByteArrayOutputStream log = new ByteArrayOutputStream();
        OfficeServer server = OfficeServer.start(config, schema, new PrintStream(log, true, StandardCharsets.UTF_8));
        TestServer t = new TestServer(server, schema, url);
        t.logSink = log;
        return t;
    }

    private ByteArrayOutputStream logSink;

    String accessLogText() {
        return logSink.toString(StandardCharsets.UTF_8);
    }

    String base() {
        return "http://127.0.0.1:" + server.port();
    }

    /** A company with an office account; returns its name. */
    String company(String name) {
        accounts.createCompany(name, name.toLowerCase(Locale.ROOT).replaceAll("[^a-z]", "") + "@saltreed.example",
                "correct horse battery staple");
        return name;
    }

    /** An enrolled device of a technician of the company: its token and device id. */
    record Device(String token, String deviceId) {
        String bearer() {
            return "Bearer " + token;
        }
    }

    Device enrol(String company, String technician, String deviceName) throws Exception {
        String code = accounts.createEnrolCode(company, technician, "technician");
        JsonObject in = new JsonObject();
        in.addProperty("code", code);
        in.addProperty("deviceName", deviceName);
        Response r = send("POST", "/api/v1/enrol", null, in.toString().getBytes(StandardCharsets.UTF_8), Map.of());
        if (r.status() != 200) {
            throw new AssertionError("enrol failed: " + r.status() + " " + r.text());
        }
        JsonObject o = r.json().getAsJsonObject();
        return new Device(o.get("token").getAsString(), o.get("deviceId").getAsString());
    }

    record Response(int status, byte[] body, java.net.http.HttpHeaders headers) {
        String text() {
            return new String(body, StandardCharsets.UTF_8);
        }

        JsonElement json() {
            return JsonParser.parseString(text());
        }

        JsonObject object() {
            return json().getAsJsonObject();
        }
    }

    Response send(String method, String path, Device device, byte[] body, Map<String, String> headers) throws Exception {
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create(base() + path)).timeout(Duration.ofSeconds(60));
        if (device != null) {
            b.header("Authorization", device.bearer());
        }
        headers.forEach(b::header);
        b.method(method, body == null ? HttpRequest.BodyPublishers.noBody() : HttpRequest.BodyPublishers.ofByteArray(body));
        HttpResponse<byte[]> r = http.send(b.build(), HttpResponse.BodyHandlers.ofByteArray());
        return new Response(r.statusCode(), r.body(), r.headers());
    }

    Response get(String path, Device device) throws Exception {
        return send("GET", path, device, null, Map.of());
    }

    Response post(String path, Device device, String json) throws Exception {
        return send("POST", path, device, json.getBytes(StandardCharsets.UTF_8), Map.of("Content-Type", "application/json"));
    }

    /** Runs SQL in this server's schema (to age a code or a token, or count rows). */
    long sql(String statement) throws SQLException {
        try (Connection c = DriverManager.getConnection(url); Statement s = c.createStatement()) {
            s.execute("set search_path to " + schema);
            if (s.execute(statement)) {
                var rs = s.getResultSet();
                rs.next();
                return rs.getLong(1);
            }
            return s.getUpdateCount();
        }
    }

    /** Runs a query in this server's schema and returns its first column of the first row as text. */
    String sqlText(String query) throws SQLException {
        try (Connection c = DriverManager.getConnection(url); Statement s = c.createStatement()) {
            s.execute("set search_path to " + schema);
            var rs = s.executeQuery(query);
            return rs.next() ? rs.getString(1) : null;
        }
    }

    @Override
    public void close() throws Exception {
        server.close();
        try (Connection c = DriverManager.getConnection(url); Statement s = c.createStatement()) {
            s.execute("drop schema if exists " + schema + " cascade");
        }
    }
}
