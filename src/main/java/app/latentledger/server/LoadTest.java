package app.latentledger.server;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintStream;
import java.net.ServerSocket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.UUID;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.CyclicBarrier;
import java.util.concurrent.ThreadLocalRandom;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * {@code serve loadtest}: simulated tablets against a server on this machine's loopback, bounded in
 * count and time, in a schema of its own (dropped at the end).
 *
 * <ol>
 *   <li>Sync: N tablets at once each sync one visit with a 24 h log (push, samples, pull), timed;
 *       the reference is the same number of requests to {@code /health} in the same run, timed the
 *       same way. Then every acknowledged record is counted in the database: lost and duplicated.</li>
 *   <li>Faults: a server in a child process is killed with SIGKILL K times while tablets push
 *       visits (retrying what failed, as a tablet does) and restarted; afterwards every acknowledged
 *       record must be there exactly once.</li>
 * </ol>
 */
public final class LoadTest {
    /** Figures of one run. */
    public record Result(int tablets, double syncP50Ms, double syncP99Ms, double healthP50Ms, double healthP99Ms,
                         int acknowledged, int lost, int duplicated, int busyRetried, int kills, int killAcknowledged,
                         int killLost, int killDuplicated, int retried, double weekOfflineMs, int weekOfflineLost,
                         double seconds) {
    }

    private final String databaseUrl;
    private int busyInSync;
    private final PrintStream out;
    private final HttpClient http = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5))
            .version(HttpClient.Version.HTTP_1_1).build();

    public LoadTest(String databaseUrl, PrintStream out) {
        this.databaseUrl = databaseUrl;
        this.out = out;
    }

    /** Runs both parts; {@code kills} 0 skips the second. */
    public Result run(int tablets, int kills, int killTablets) throws Exception {
        long t0 = System.nanoTime();
        String schema = "loadtest_" + UUID.randomUUID().toString().substring(0, 8);
        String url = databaseUrl + (databaseUrl.contains("?") ? "&" : "?") + "currentSchema=" + schema;
        ServerConfig config = ServerConfig.load(Map.of("listen", "127.0.0.1:0", "database-url", url,
                "pool-size", "20"), Map.of());
        try {
            double[] sync;
            double[] health;
            int[] counted;
            List<String> tokens;
            try (OfficeServer server = OfficeServer.start(config, null, new PrintStream(OutputStream.nullOutputStream()))) {
                tokens = devices(server.database(), tablets);
                String base = "http://127.0.0.1:" + server.port();
                out.println("loadtest: " + tablets + " tablets enrolled; reference run on /health");
                Set<String> acked = ConcurrentHashMap.newKeySet();
                List<LoadTestVisit> visits = new ArrayList<>();
                for (int i = 0; i < tablets; i++) {
                    visits.add(new LoadTestVisit(i, 0));
                }
                // warm both paths up once, then the timed runs
                health = timed(tablets, i -> healthOnly(base, 4));
                health = timed(tablets, i -> healthOnly(base, requestsOf(visits.get(i))));
                out.println("loadtest: sync run");
                sync = timed(tablets, i -> syncOnce(base, tokens.get(i), visits.get(i), acked));
                counted = count(server.database(), acked, visits);
                out.printf(Locale.ROOT, "loadtest: sync p50 %.0f ms, p99 %.0f ms; /health p50 %.0f ms, p99 %.0f ms;"
                        + " %d records acknowledged, %d lost, %d duplicated; %d answers 'busy' retried%n", pct(sync, 50),
                        pct(sync, 99), pct(health, 50), pct(health, 99), acked.size(), counted[0], counted[1], busy.get());
                busyInSync = busy.get();
                weekOffline(base, tokens.get(0), server.database());
            }
            int[] k = {0, 0, 0, 0};
            if (kills > 0) {
                k = kills(url, tokens.subList(0, Math.min(killTablets, tokens.size())), kills);
            }
            return new Result(tablets, pct(sync, 50), pct(sync, 99), pct(health, 50), pct(health, 99),
                    tablets * 6, counted[0], counted[1], busyInSync, kills, k[0], k[1], k[2], k[3], weekMs, weekLost,
                    (System.nanoTime() - t0) / 1e9);
        } finally {
            drop(schema);
        }
    }

    private static int requestsOf(LoadTestVisit v) {
        return 1 + (v.samples.length + LogSamples.MAX_CHUNK - 1) / LogSamples.MAX_CHUNK + 1;
    }

    // ---- setup --------------------------------------------------------------------------------

    /** One company per 20 tablets (a contractor's fleet), one technician and device per tablet. */
    private static List<String> devices(OfficeDatabase db, int tablets) {
        Accounts accounts = new Accounts(db, Duration.ofDays(1));
        List<UUID> companies = new ArrayList<>();
        List<String> tokens = new ArrayList<>();
        for (int i = 0; i < tablets; i++) {
            if (i % 20 == 0) {
                companies.add(accounts.createCompany("Load Test Contractor " + (i / 20), "office" + (i / 20)
                        + "@saltreed.example", "load test office password"));
            }
            tokens.add(accounts.issueDevice(companies.get(companies.size() - 1), "Load Tech " + i, "Tablet " + i));
        }
        return tokens;
    }

    private void drop(String schema) {
        try (Connection c = java.sql.DriverManager.getConnection(databaseUrl); Statement s = c.createStatement()) {
            s.execute("drop schema if exists " + schema + " cascade");
        } catch (SQLException e) {
            out.println("loadtest: could not drop schema " + schema + ": " + e.getMessage());
        }
    }

    // ---- the timed runs -----------------------------------------------------------------------

    @FunctionalInterface
    private interface Work {
        void run(int tablet) throws Exception;
    }

    /** Runs the work for every tablet at once (one thread each, started together); ms per tablet. */
    private static double[] timed(int tablets, Work work) throws Exception {
        double[] ms = new double[tablets];
        CyclicBarrier start = new CyclicBarrier(tablets);
        List<Thread> threads = new ArrayList<>();
        List<Throwable> failures = Collections.synchronizedList(new ArrayList<>());
        for (int i = 0; i < tablets; i++) {
            int tablet = i;
            Thread t = new Thread(() -> {
                try {
                    start.await();
                    long t0 = System.nanoTime();
                    work.run(tablet);
                    ms[tablet] = (System.nanoTime() - t0) / 1e6;
                } catch (Throwable e) {
                    failures.add(e);
                }
            }, "tablet-" + i);
            threads.add(t);
            t.start();
        }
        for (Thread t : threads) {
            t.join(600_000);
        }
        if (!failures.isEmpty()) {
            throw new IllegalStateException("a simulated tablet failed: " + failures.get(0), failures.get(0));
        }
        return ms;
    }

    private void healthOnly(String base, int requests) throws Exception {
        for (int i = 0; i < requests; i++) {
            HttpResponse<byte[]> r = send(HttpRequest.newBuilder(URI.create(base + "/health")).GET(), null);
            if (r.statusCode() != 200) {
                throw new IllegalStateException("/health answered " + r.statusCode());
            }
        }
    }

    /** One tablet's sync of one visit: push, upload the log's samples, pull the changes. */
    private void syncOnce(String base, String token, LoadTestVisit v, Set<String> acked) throws Exception {
        JsonObject pushed = json(send(HttpRequest.newBuilder(URI.create(base + "/api/v1/sync/push"))
                .POST(HttpRequest.BodyPublishers.ofString(v.pushBody())), token), 200);
        for (JsonElement e : pushed.getAsJsonArray("results")) {
            JsonObject o = e.getAsJsonObject();
            if (o.get("status").getAsString().equals("refused")) {
                throw new IllegalStateException("refused: " + o);
            }
            acked.add(o.get("kind").getAsString() + "/" + o.get("id").getAsString());
        }
        for (int at = 0; at < v.samples.length; at += LogSamples.MAX_CHUNK) {
            byte[] chunk = Arrays.copyOfRange(v.samples, at, Math.min(v.samples.length, at + LogSamples.MAX_CHUNK));
            json(send(HttpRequest.newBuilder(URI.create(base + "/api/v1/logs/" + v.logId + "/samples?offset=" + at))
                    .PUT(HttpRequest.BodyPublishers.ofByteArray(chunk)), token), 200);
        }
        String cursor = "0";
        boolean more = true;
        while (more) {
            JsonObject page = json(send(HttpRequest.newBuilder(URI.create(base + "/api/v1/sync/changes?after=" + cursor))
                    .GET(), token), 200);
            cursor = page.get("cursor").getAsString();
            more = page.get("more").getAsBoolean();
        }
    }

    /** Answers of 503 (every connection of the server busy) retried after Retry-After, as a tablet does. */
    private final AtomicInteger busy = new AtomicInteger();

    private double weekMs;
    private int weekLost;

    /**
     * A tablet back after a week offline with 50 visits (each with its 24 h log): all its records in
     * one push (300 of the 500 a push may carry), then the 50 logs' samples, then one pull.
     */
    private void weekOffline(String base, String token, OfficeDatabase db) throws Exception {
        List<LoadTestVisit> week = new ArrayList<>();
        com.google.gson.JsonArray all = new com.google.gson.JsonArray();
        for (int i = 0; i < 50; i++) {
            LoadTestVisit v = new LoadTestVisit(0, 100 + i);
            week.add(v);
            v.records.forEach(r -> all.add(app.latentledger.sync.wire.WireCodec.toJson(r)));
        }
        JsonObject push = new JsonObject();
        push.add("records", all);
        Set<String> acked = ConcurrentHashMap.newKeySet();
        long t0 = System.nanoTime();
        JsonObject pushed = json(send(HttpRequest.newBuilder(URI.create(base + "/api/v1/sync/push"))
                .POST(HttpRequest.BodyPublishers.ofString(Reply.GSON.toJson(push))), token), 200);
        pushed.getAsJsonArray("results").forEach(e -> acked.add(e.getAsJsonObject().get("kind").getAsString() + "/"
                + e.getAsJsonObject().get("id").getAsString()));
        for (LoadTestVisit v : week) {
            json(send(HttpRequest.newBuilder(URI.create(base + "/api/v1/logs/" + v.logId + "/samples?offset=0"))
                    .PUT(HttpRequest.BodyPublishers.ofByteArray(v.samples)), token), 200);
        }
        String cursor = "0";
        boolean more = true;
        while (more) {
            JsonObject page = json(send(HttpRequest.newBuilder(URI.create(base + "/api/v1/sync/changes?after=" + cursor))
                    .GET(), token), 200);
            cursor = page.get("cursor").getAsString();
            more = page.get("more").getAsBoolean();
        }
        weekMs = (System.nanoTime() - t0) / 1e6;
        int[] counted = count(db, acked, week);
        weekLost = acked.size() == 300 ? counted[0] + counted[1] : 300 - acked.size();
        out.printf(Locale.ROOT, "loadtest: a week offline, 50 visits with 24 h logs: %d records in one push, synced in %.1f s;"
                + " %d lost or duplicated%n", acked.size(), weekMs / 1000, weekLost);
    }

    private HttpResponse<byte[]> send(HttpRequest.Builder b, String token) throws IOException, InterruptedException {
        if (token != null) {
            b.header("Authorization", "Bearer " + token);
        }
        HttpRequest request = b.timeout(Duration.ofSeconds(120)).build();
        for (int attempt = 0; ; attempt++) {
            HttpResponse<byte[]> r = http.send(request, HttpResponse.BodyHandlers.ofByteArray());
            if (r.statusCode() != 503 || attempt >= 100) {
                return r;
            }
            busy.incrementAndGet();
            Thread.sleep(1000L * Long.parseLong(r.headers().firstValue("Retry-After").orElse("1")));
        }
    }

    private static JsonObject json(HttpResponse<byte[]> r, int expected) {
        String text = new String(r.body(), StandardCharsets.UTF_8);
        if (r.statusCode() != expected) {
            throw new IllegalStateException(r.request().method() + " " + r.uri().getPath() + " answered "
                    + r.statusCode() + ": " + text);
        }
        return JsonParser.parseString(text).getAsJsonObject();
    }

    static double pct(double[] values, double p) {
        double[] v = values.clone();
        Arrays.sort(v);
        int i = (int) Math.ceil(p / 100 * v.length) - 1;
        return v[Math.max(0, Math.min(v.length - 1, i))];
    }

    // ---- counting -----------------------------------------------------------------------------

    /** {lost, duplicated} among acknowledged records; a log whose samples are not complete counts as lost. */
    private static int[] count(OfficeDatabase db, Set<String> acked, List<LoadTestVisit> visits) throws SQLException {
        int[] lostDup = countRecords(db, acked);
        try (Connection c = db.connection(); PreparedStatement ps = c.prepareStatement(
                "select count(*) from log_samples where log_id = ? and complete")) {
            for (LoadTestVisit v : visits) {
                ps.setString(1, v.logId);
                ResultSet rs = ps.executeQuery();
                rs.next();
                if (rs.getInt(1) != 1) {
                    lostDup[0]++;
                }
            }
        }
        return lostDup;
    }

    private static int[] countRecords(OfficeDatabase db, Set<String> acked) throws SQLException {
        int lost = 0;
        int duplicated = 0;
        try (Connection c = db.connection(); PreparedStatement ps = c.prepareStatement(
                "select count(*), count(*) filter (where current) from record_revision where kind = ? and id = ?")) {
            for (String key : acked) {
                int slash = key.indexOf('/');
                ps.setString(1, key.substring(0, slash));
                ps.setString(2, key.substring(slash + 1));
                ResultSet rs = ps.executeQuery();
                rs.next();
                int n = rs.getInt(1);
                if (n == 0 || rs.getInt(2) != 1) {
                    lost++;
                } else if (n > 1) {
                    duplicated++;
                }
            }
        }
        return new int[] {lost, duplicated};
    }

    // ---- kill and restart ---------------------------------------------------------------------

    /** {acknowledged, lost, duplicated, retried pushes}. */
    private int[] kills(String url, List<String> tokens, int kills) throws Exception {
        int port;
        try (ServerSocket s = new ServerSocket(0, 1, java.net.InetAddress.getLoopbackAddress())) {
            port = s.getLocalPort();
        }
        String base = "http://127.0.0.1:" + port;
        Process child = startChild(url, port, base);
        Set<String> acked = ConcurrentHashMap.newKeySet();
        AtomicBoolean stop = new AtomicBoolean();
        AtomicInteger retried = new AtomicInteger();
        List<Thread> tablets = new ArrayList<>();
        CountDownLatch firstPushes = new CountDownLatch(tokens.size());
        for (int i = 0; i < tokens.size(); i++) {
            String token = tokens.get(i);
            int tablet = i;
            Thread t = new Thread(() -> {
                int visit = 1;
                boolean counted = false;
                while (!stop.get()) {
                    LoadTestVisit v = new LoadTestVisit(tablet, visit++);
                    String body = v.pushBody();
                    // a tablet retries the same content until the server answers; then its records are acknowledged
                    for (int attempt = 0; ; attempt++) {
                        try {
                            JsonObject o = json(send(HttpRequest.newBuilder(URI.create(base + "/api/v1/sync/push"))
                                    .POST(HttpRequest.BodyPublishers.ofString(body)), token), 200);
                            for (JsonElement e : o.getAsJsonArray("results")) {
                                JsonObject r = e.getAsJsonObject();
                                acked.add(r.get("kind").getAsString() + "/" + r.get("id").getAsString());
                            }
                            break;
                        } catch (IOException | IllegalStateException e) {
                            retried.incrementAndGet();
                            sleep(200);
                        } catch (InterruptedException e) {
                            return;
                        }
                        if (attempt > 600) {
                            return; // about two minutes without a server: give up (counted as not acknowledged)
                        }
                    }
                    if (!counted) {
                        counted = true;
                        firstPushes.countDown();
                    }
                }
            }, "kill-tablet-" + i);
            tablets.add(t);
            t.start();
        }
        firstPushes.await();
        for (int k = 1; k <= kills; k++) {
            sleep(300 + ThreadLocalRandom.current().nextInt(1200));
            child.destroyForcibly(); // SIGKILL on Linux: no shutdown hook, no clean close
            child.waitFor();
            out.println("loadtest: server killed (" + k + "/" + kills + "), " + acked.size() + " records acknowledged so far");
            child = startChild(url, port, base);
        }
        stop.set(true);
        for (Thread t : tablets) {
            t.join(300_000);
        }
        child.destroy();
        child.waitFor();
        ServerConfig config = ServerConfig.load(Map.of("database-url", url), Map.of());
        int[] counted;
        try (OfficeDatabase db = OfficeDatabase.open(config, null)) {
            counted = countRecords(db, acked);
        }
        out.printf(Locale.ROOT, "loadtest: %d kills; %d records acknowledged, %d lost, %d duplicated; %d pushes retried%n",
                kills, acked.size(), counted[0], counted[1], retried.get());
        return new int[] {acked.size(), counted[0], counted[1], retried.get()};
    }

    private Process startChild(String url, int port, String base) throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        ProcessBuilder pb = new ProcessBuilder(java, "-Xmx512m", "-cp", System.getProperty("java.class.path"),
                "app.latentledger.Main", "serve", "--listen", "127.0.0.1:" + port, "--database-url", url)
                .redirectOutput(ProcessBuilder.Redirect.DISCARD).redirectError(ProcessBuilder.Redirect.DISCARD);
        Process p = pb.start();
        long deadline = System.nanoTime() + 120_000_000_000L;
        while (System.nanoTime() < deadline) {
            try {
                HttpResponse<byte[]> r = http.send(HttpRequest.newBuilder(URI.create(base + "/ready"))
                        .timeout(Duration.ofSeconds(5)).build(), HttpResponse.BodyHandlers.ofByteArray());
                if (r.statusCode() == 200) {
                    return p;
                }
            } catch (IOException e) {
                // not listening yet
            }
            if (!p.isAlive()) {
                throw new IllegalStateException("the server process ended with " + p.exitValue() + " while starting");
            }
            sleep(200);
        }
        p.destroyForcibly();
        throw new IllegalStateException("the server process did not become ready within 120 s");
    }

    private static void sleep(long ms) {
        try {
            Thread.sleep(ms);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
