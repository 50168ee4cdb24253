package app.latentledger.server;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParseException;
import com.google.gson.JsonParser;

import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.function.Consumer;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Every route of the server in one place (the office web page will add its own here): health,
 * readiness, enrolment and the sync API of docs/office-server.md. Each {@code /api/v1} route but
 * enrol needs a device token and sees only the caller's company.
 */
final class Routes {
    private static final System.Logger LOG = System.getLogger(Routes.class.getName());
    private static final String API = "/api/v1";
    private static final Pattern HISTORY = Pattern.compile(API + "/records/([^/]+)/([^/]+)/history");
    private static final Pattern SAMPLES = Pattern.compile(API + "/logs/([^/]+)/samples(/status)?");
    private static final Pattern BUNDLE = Pattern.compile(API + "/visits/([^/]+)/bundle");

    private final OfficeDatabase db;
    private final Accounts accounts;
    private final RateLimit enrolLimit;
    private final SyncService sync;
    private final LogSamples samples;
    private final VisitBundles bundles;
    private final OfficePages office;

    Routes(OfficeDatabase db, ServerConfig config) {
        this.db = db;
        this.accounts = new Accounts(db, Duration.ofDays(config.tokenDays()));
        this.enrolLimit = new RateLimit(config.enrolPerMinute(), System::nanoTime);
        this.sync = new SyncService(db);
        this.samples = new LogSamples(db);
        this.bundles = new VisitBundles(db);
        this.office = new OfficePages(db, config, accounts, bundles);
    }

    /**
     * Answers one request.
     *
     * @param deviceSeen told the caller's device id once its token is accepted (for the access log)
     */
    Reply handle(HttpCall call, Consumer<String> deviceSeen) {
        try {
            return route(call, deviceSeen);
        } catch (ApiError e) {
            return e.reply();
        } catch (RuntimeException e) {
            if (busy(e)) {
                // every connection of this instance is taken: the tablet tries again shortly (nothing was kept)
                return new ApiError(503, "busy", "the server is busy; try again in a few seconds")
                        .header("Retry-After", "2").reply();
            }
            LOG.log(System.Logger.Level.ERROR, "request failed: " + call.method() + " " + call.path(), e);
            return new ApiError(500, "server-error", "the server could not answer; nothing partial was kept").reply();
        }
    }

    private static boolean busy(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof java.sql.SQLTransientConnectionException) {
                return true;
            }
        }
        return false;
    }

    private Reply route(HttpCall call, Consumer<String> deviceSeen) {
        String path = call.path();
        String method = call.method();
        if (path.equals("/health")) {
            only(method, "GET");
            JsonObject o = new JsonObject();
            o.addProperty("status", "up");
            return Reply.json(200, o);
        }
        if (path.equals("/ready")) {
            only(method, "GET");
            boolean ready = db.ready();
            JsonObject o = new JsonObject();
            o.addProperty("status", ready ? "ready" : "not-ready");
            return Reply.json(ready ? 200 : 503, o);
        }
        if (path.equals(API + "/enrol")) {
            only(method, "POST");
            return enrol(call);
        }
        if (OfficePages.isOfficePath(path)) {
            return office.handle(call);
        }
        if (!path.startsWith(API + "/")) {
            throw ApiError.notFound("no such page: " + path);
        }
        Caller who = accounts.authenticate(call.header("Authorization"));
        deviceSeen.accept(who.deviceId().toString());
        if (path.equals(API + "/sync/push")) {
            only(method, "POST");
            return Reply.json(200, sync.push(who, call.body()));
        }
        if (path.equals(API + "/sync/changes")) {
            only(method, "GET");
            return Reply.json(200, sync.changes(who, call.query().get("after"), call.query().get("limit")));
        }
        Matcher m = HISTORY.matcher(path);
        if (m.matches()) {
            only(method, "GET");
            return Reply.json(200, sync.history(who, m.group(1), m.group(2)));
        }
        m = SAMPLES.matcher(path);
        if (m.matches()) {
            String log = m.group(1);
            if (m.group(2) != null) {
                only(method, "GET");
                return Reply.json(200, samples.status(who, log));
            }
            if (method.equals("PUT")) {
                return Reply.json(200, samples.put(who, log, call.query().get("offset"), call.body()));
            }
            only(method, "GET");
            return samples.get(who, log, call.header("Range"));
        }
        m = BUNDLE.matcher(path);
        if (m.matches()) {
            only(method, "GET");
            return bundles.bundle(who, m.group(1));
        }
        throw ApiError.notFound("no such API path: " + path);
    }

    private Reply enrol(HttpCall call) {
        long wait = enrolLimit.acquire(call.clientAddr());
        if (wait > 0) {
            throw new ApiError(429, "too-many-attempts", "too many enrol attempts from this address; try again in "
                    + wait + " s").header("Retry-After", String.valueOf(wait));
        }
        JsonObject in = jsonObject(call.body());
        Accounts.Enrolment e = accounts.enrol(text(in, "code"), text(in, "deviceName"));
        JsonObject o = new JsonObject();
        o.addProperty("deviceId", e.deviceId().toString());
        o.addProperty("token", e.token());
        o.addProperty("company", e.company());
        o.addProperty("technician", e.technician());
        o.addProperty("role", e.role());
        return Reply.json(200, o);
    }

    private static JsonObject jsonObject(byte[] body) {
        try {
            JsonElement e = JsonParser.parseString(new String(body, StandardCharsets.UTF_8));
            if (e.isJsonObject()) {
                return e.getAsJsonObject();
            }
        } catch (JsonParseException | StackOverflowError e) {
            // refused below
        }
        throw ApiError.badInput("body", "", "a JSON object", "the request body must be a JSON object");
    }

    private static String text(JsonObject o, String name) {
        JsonElement e = o.get(name);
        if (e == null || e.isJsonNull()) {
            return null;
        }
        if (!e.isJsonPrimitive() || !e.getAsJsonPrimitive().isString()) {
            throw ApiError.badInput(name, e.toString(), "text", "\"" + name + "\" must be text");
        }
        return e.getAsString();
    }

    private static void only(String method, String allowed) {
        if (!method.equals(allowed)) {
            throw new ApiError(405, "method-not-allowed", method + " is not answered here; use " + allowed)
                    .header("Allow", allowed);
        }
    }
}
