package app.latentledger.sync;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.sync.wire.Refusal;
import app.latentledger.sync.wire.SyncKind;
import app.latentledger.sync.wire.WireCodec;
import app.latentledger.sync.wire.WireHash;
import app.latentledger.sync.wire.WireRecord;
import app.latentledger.sync.wire.WireValidation;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.sun.net.httpserver.HttpExchange;
import com.sun.net.httpserver.HttpServer;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.net.URLDecoder;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;

/**
 * A test double of the office server's HTTP API (SYNC contract v1), in memory, on loopback: one
 * company, enrolment codes, device tokens, revisions with a per-company sequence as the cursor,
 * the recycle bin by flag, and resumable log samples. It checks what the client sends and keeps
 * every breach of the contract in {@link #violations} (tests assert it stays empty): more than 500
 * records in a push, a child before its parent in one push, a hash that is not {@link WireHash}'s,
 * a chunk above 1 MiB or at an offset other than the bytes received.
 */
public final class StubOffice implements AutoCloseable {
    public static final String COMPANY = "Saltreed Comfort Co.";

    /** One stored revision. */
    record Revision(long seq, WireRecord record, String device) {
    }

    private final HttpServer server;
    public final List<String> violations = new CopyOnWriteArrayList<>();
    final List<Integer> pushSizes = new CopyOnWriteArrayList<>();
    /** "logId@offset+bytes" of every chunk received, in order. */
    final List<String> chunks = new CopyOnWriteArrayList<>();
    private final Map<String, String> codes = new HashMap<>();
    private final Map<String, String> tokens = new HashMap<>(); // token → device id
    private final Map<String, List<Revision>> revisions = new LinkedHashMap<>(); // kind/id → history
    private final Map<String, ByteArrayOutputStream> samples = new HashMap<>();
    private final Map<String, Boolean> complete = new HashMap<>();
    private long seq;
    private int devices;
    /** Chunk PUTs to answer with 503 before taking any (simulates a dropped upload). */
    int failChunks;
    /** How many chunk PUTs to take before {@link #failChunks} starts. */
    int failChunksAfter;
    private int chunkPuts;

    public StubOffice() throws IOException {
        server = HttpServer.create(new InetSocketAddress(InetAddress.getLoopbackAddress(), 0), 0);
        server.createContext("/", this::handle);
        server.start();
    }

    public String url() {
        return "http://127.0.0.1:" + server.getAddress().getPort();
    }

    public synchronized String newCode() {
        String code = "SALT-" + String.format("%04d", codes.size() + 1) + "-REED";
        codes.put(code, "open");
        return code;
    }

    synchronized void revokeAll() {
        tokens.clear();
    }

    synchronized Optional<WireRecord> current(SyncKind kind, String id) {
        List<Revision> h = revisions.get(kind.wire() + "/" + id);
        return h == null ? Optional.empty() : Optional.of(currentOf(h).record());
    }

    synchronized int stored() {
        return revisions.size();
    }

    synchronized boolean samplesComplete(String logId) {
        return complete.getOrDefault(logId, false);
    }

    @Override
    public void close() {
        server.stop(0);
    }

    // ---- HTTP ---------------------------------------------------------------------------------

    private void handle(HttpExchange x) throws IOException {
        try {
            String path = x.getRequestURI().getPath();
            Map<String, String> query = query(x.getRequestURI().getRawQuery());
            byte[] in = x.getRequestBody().readAllBytes();
            synchronized (this) {
                if (path.equals("/api/v1/enrol") && x.getRequestMethod().equals("POST")) {
                    enrol(x, json(in));
                    return;
                }
                String auth = x.getRequestHeaders().getFirst("Authorization");
                String device = auth != null && auth.startsWith("Bearer ") ? tokens.get(auth.substring(7)) : null;
                if (device == null) {
                    error(x, 401, "unauthorised", "unknown or revoked token");
                    return;
                }
                if (path.equals("/api/v1/sync/push") && x.getRequestMethod().equals("POST")) {
                    push(x, json(in), device);
                } else if (path.equals("/api/v1/sync/changes") && x.getRequestMethod().equals("GET")) {
                    changes(x, Long.parseLong(query.getOrDefault("after", "0")),
                            Integer.parseInt(query.getOrDefault("limit", "500")));
                } else if (path.matches("/api/v1/logs/[^/]+/samples/status")) {
                    String id = path.split("/")[4];
                    if (current(SyncKind.LOG, id).isEmpty()) {
                        error(x, 404, "not-found", "no such log");
                        return;
                    }
                    send(x, 200, status(id));
                } else if (path.matches("/api/v1/logs/[^/]+/samples") && x.getRequestMethod().equals("PUT")) {
                    chunk(x, path.split("/")[4], Long.parseLong(query.get("offset")), in);
                } else if (path.matches("/api/v1/logs/[^/]+/samples") && x.getRequestMethod().equals("GET")) {
                    String id = path.split("/")[4];
                    if (!complete.getOrDefault(id, false)) {
                        error(x, 404, "not-found", "samples not complete");
                        return;
                    }
                    byte[] b = samples.get(id).toByteArray();
                    x.getResponseHeaders().set("Content-Type", "text/csv");
                    x.sendResponseHeaders(200, b.length);
                    x.getResponseBody().write(b);
                } else {
                    error(x, 404, "not-found", "no such endpoint " + path);
                }
            }
        } catch (RuntimeException e) {
            violations.add("stub failed on " + x.getRequestURI() + ": " + e);
            x.sendResponseHeaders(500, -1);
        } finally {
            x.close();
        }
    }

    private void enrol(HttpExchange x, JsonObject in) throws IOException {
        String code = in.get("code").getAsString();
        if (!"open".equals(codes.get(code))) {
            error(x, 400, "bad-code", "code unknown, used or expired");
            return;
        }
        codes.put(code, "used");
        String device = "device-" + (++devices);
        String token = "token-" + device + "-" + Long.toHexString(Double.doubleToLongBits(Math.random()));
        tokens.put(token, device);
        JsonObject o = new JsonObject();
        o.addProperty("deviceId", device);
        o.addProperty("token", token);
        o.addProperty("company", COMPANY);
        o.addProperty("technician", "Ada Marsh");
        o.addProperty("role", "technician");
        send(x, 200, o);
    }

    private void push(HttpExchange x, JsonObject in, String device) throws IOException {
        JsonArray list = in.getAsJsonArray("records");
        pushSizes.add(list.size());
        if (list.size() > 500) {
            violations.add("a push of " + list.size() + " records (at most 500)");
            error(x, 400, "too-many", "at most 500 records per push");
            return;
        }
        // the parents this push may point at: stored current records, then this push's, as they come
        Map<String, Site> sites = new HashMap<>();
        Map<String, HvacSystem> systems = new HashMap<>();
        Map<String, Visit> visits = new HashMap<>();
        for (List<Revision> h : revisions.values()) {
            WireRecord r = currentOf(h).record();
            if (!r.deleted()) {
                remember(r, sites, systems, visits);
            }
        }
        List<WireRecord> records = new ArrayList<>();
        for (JsonElement e : list) {
            records.add(WireCodec.fromJson(e));
        }
        JsonArray results = new JsonArray();
        for (int i = 0; i < records.size(); i++) {
            WireRecord r = records.get(i);
            if (!r.deleted() && !r.hash().equals(WireHash.of(r.body()))) {
                violations.add(r.kind().wire() + " " + r.id() + " sent with a hash that is not WireHash's");
            }
            List<Refusal> refused = r.deleted() ? List.of()
                    : WireValidation.check(r, WireValidation.Parents.of(sites, systems, visits));
            if (!refused.isEmpty() && parentLater(r, records.subList(i + 1, records.size()))) {
                violations.add(r.kind().wire() + " " + r.id() + " came before its parent in one push");
            }
            JsonObject result = new JsonObject();
            result.addProperty("kind", r.kind().wire());
            result.addProperty("id", r.id());
            if (!refused.isEmpty()) {
                result.addProperty("status", "refused");
                result.add("refused", refused.get(0).toJson());
            } else {
                String key = r.kind().wire() + "/" + r.id();
                List<Revision> h = revisions.computeIfAbsent(key, k -> new ArrayList<>());
                Revision cur = h.isEmpty() ? null : currentOf(h);
                if (cur != null && cur.record().hash().equals(r.hash()) && cur.record().deleted() == r.deleted()) {
                    result.addProperty("status", "unchanged");
                    result.addProperty("revision", cur.seq());
                } else {
                    Revision added = new Revision(++seq, r, device);
                    h.add(added);
                    boolean current = currentOf(h) == added;
                    result.addProperty("status", current ? "stored" : "kept-as-revision");
                    result.addProperty("revision", added.seq());
                    if (r.deleted() && current) {
                        deleteChildren(r, device);
                    }
                    if (!r.deleted()) {
                        remember(r, sites, systems, visits);
                    }
                    if (r.kind() == SyncKind.LOG && !r.deleted()) {
                        samples.put(r.id(), new ByteArrayOutputStream());
                        complete.put(r.id(), false);
                    }
                }
            }
            results.add(result);
        }
        JsonObject out = new JsonObject();
        out.add("results", results);
        send(x, 200, out);
    }

    /** The current revision: the latest editedAt, the later stored on a tie. */
    private static Revision currentOf(List<Revision> h) {
        return h.stream().max(Comparator.comparing((Revision v) -> v.record().editedAt())
                .thenComparingLong(Revision::seq)).orElseThrow();
    }

    private static boolean parentLater(WireRecord child, List<WireRecord> later) {
        String parent = parentId(child);
        return parent != null && later.stream().anyMatch(r -> r.id().equals(parent) && r.kind().ordinal() < child.kind().ordinal());
    }

    private static String parentId(WireRecord r) {
        String field = r.kind().parentField();
        return field == null || r.body() == null || !r.body().has(field) ? null : r.body().get(field).getAsString();
    }

    private static void remember(WireRecord r, Map<String, Site> sites, Map<String, HvacSystem> systems,
                                 Map<String, Visit> visits) {
        switch (r.kind()) {
            case SITE -> sites.put(r.id(), WireCodec.site(r.body()));
            case SYSTEM -> systems.put(r.id(), WireCodec.system(r.body()));
            case VISIT -> visits.put(r.id(), WireCodec.visit(r.body()));
            default -> {
            }
        }
    }

    /** A deletion takes the record's children with it into the bin, each as a deleted revision. */
    private void deleteChildren(WireRecord parent, String device) {
        for (Map.Entry<String, List<Revision>> e : new ArrayList<>(revisions.entrySet())) {
            WireRecord r = currentOf(e.getValue()).record();
            if (!r.deleted() && parent.id().equals(parentId(r))
                    && r.kind().ordinal() > parent.kind().ordinal()) {
                WireRecord gone = WireRecord.deletion(r.kind(), r.id(), r.hash(), parent.editedAt());
                e.getValue().add(new Revision(++seq, gone, device));
                deleteChildren(gone, device);
            }
        }
    }

    private void changes(HttpExchange x, long after, int limit) throws IOException {
        // a record changed after the cursor when any revision of it was stored after it; its
        // current revision is what is sent
        record Changed(long last, Revision current) {
        }
        List<Changed> changed = new ArrayList<>();
        for (List<Revision> h : revisions.values()) {
            long last = h.stream().mapToLong(Revision::seq).max().orElse(0);
            if (last > after) {
                changed.add(new Changed(last, currentOf(h)));
            }
        }
        changed.sort(Comparator.comparingLong(Changed::last));
        boolean more = changed.size() > limit;
        List<Changed> taken = changed.subList(0, Math.min(limit, changed.size()));
        long cursor = taken.isEmpty() ? after : taken.get(taken.size() - 1).last();
        List<Revision> page = new ArrayList<>();
        taken.forEach(c -> page.add(c.current()));
        page.sort(Comparator.comparingInt((Revision v) -> v.record().kind().ordinal()).thenComparingLong(Revision::seq));
        JsonArray records = new JsonArray();
        for (Revision v : page) {
            JsonObject o = WireCodec.toJson(v.record());
            o.remove("baseHash");
            o.addProperty("revision", v.seq());
            o.addProperty("device", v.device());
            o.addProperty("author", "Ada Marsh");
            records.add(o);
        }
        JsonObject out = new JsonObject();
        out.add("records", records);
        out.addProperty("cursor", Long.toString(cursor));
        out.addProperty("more", more);
        send(x, 200, out);
    }

    private JsonObject status(String id) {
        JsonObject o = new JsonObject();
        o.addProperty("receivedBytes", samples.containsKey(id) ? samples.get(id).size() : 0);
        o.addProperty("complete", complete.getOrDefault(id, false));
        return o;
    }

    private void chunk(HttpExchange x, String id, long offset, byte[] bytes) throws IOException {
        Optional<WireRecord> log = current(SyncKind.LOG, id);
        if (log.isEmpty()) {
            error(x, 404, "not-found", "no such log");
            return;
        }
        chunks.add(id + "@" + offset + "+" + bytes.length);
        if (bytes.length > (1 << 20)) {
            violations.add("a chunk of " + bytes.length + " bytes (at most 1 MiB)");
        }
        chunkPuts++;
        if (chunkPuts > failChunksAfter && failChunks > 0) {
            failChunks--;
            error(x, 503, "unavailable", "try again later");
            return;
        }
        ByteArrayOutputStream held = samples.get(id);
        if (offset != held.size()) {
            violations.add("a chunk of " + id + " at offset " + offset + " while " + held.size() + " were received");
            JsonObject o = status(id);
            send(x, 409, o);
            return;
        }
        held.write(bytes, 0, bytes.length);
        long total = WireCodec.samplesBytes(log.get().body());
        if (held.size() >= total) {
            List<Refusal> refused = WireValidation.checkSamples(log.get(), held.toByteArray());
            if (!refused.isEmpty()) {
                samples.put(id, new ByteArrayOutputStream());
                error(x, 422, "samples-refused", refused.get(0).message());
                return;
            }
            complete.put(id, true);
        }
        send(x, 200, status(id));
    }

    // ---- plumbing -----------------------------------------------------------------------------

    private static JsonObject json(byte[] in) {
        return WireCodec.parse(new String(in, StandardCharsets.UTF_8)).getAsJsonObject();
    }

    private static Map<String, String> query(String raw) {
        Map<String, String> out = new HashMap<>();
        if (raw != null) {
            for (String pair : raw.split("&")) {
                String[] kv = pair.split("=", 2);
                out.put(URLDecoder.decode(kv[0], StandardCharsets.UTF_8),
                        kv.length > 1 ? URLDecoder.decode(kv[1], StandardCharsets.UTF_8) : "");
            }
        }
        return out;
    }

    private static void error(HttpExchange x, int status, String error, String message) throws IOException {
        JsonObject o = new JsonObject();
        o.addProperty("error", error);
        o.addProperty("message", message);
        send(x, status, o);
    }

    private static void send(HttpExchange x, int status, JsonObject o) throws IOException {
        byte[] b = WireCodec.GSON.toJson(o).getBytes(StandardCharsets.UTF_8);
        x.getResponseHeaders().set("Content-Type", "application/json; charset=utf-8");
        x.sendResponseHeaders(status, b.length);
        try (OutputStream out = x.getResponseBody()) {
            out.write(b);
        }
    }
}
