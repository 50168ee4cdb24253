package app.latentledger.sync;

import app.latentledger.sync.wire.WireCodec;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

import java.io.IOException;
import java.net.URI;
import java.net.URISyntaxException;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.Locale;

/**
 * The office server's HTTP API as the tablet calls it (JSON, UTF-8, base {@code /api/v1}), with
 * every failure turned into a {@link SyncException} a tech can act on.
 */
final class OfficeHttp {
    static final Duration CONNECT_TIMEOUT = Duration.ofSeconds(10);
    static final Duration REQUEST_TIMEOUT = Duration.ofSeconds(60);

    private final HttpClient client;
    private final String base;
    private final String token;

    /** An answer: its status and body. */
    record Answer(int status, byte[] body) {
        JsonObject json() {
            JsonElement e = WireCodec.parse(new String(body, StandardCharsets.UTF_8));
            if (!e.isJsonObject()) {
                throw new SyncException(SyncException.Kind.SERVER, "the office server answered with something that"
                        + " is not a JSON object");
            }
            return e.getAsJsonObject();
        }
    }

    /** @param token the device token, or null for enrolment */
    OfficeHttp(HttpClient client, String serverUrl, String token) {
        this.client = client;
        this.base = normalise(serverUrl) + "/api/v1";
        this.token = token;
    }

    static HttpClient newClient() {
        return HttpClient.newBuilder().connectTimeout(CONNECT_TIMEOUT).followRedirects(HttpClient.Redirect.NEVER).build();
    }

    /**
     * The server address as typed, checked: http or https, a host, no query; the trailing slash
     * dropped. Refused with {@link SyncException.Kind#BAD_INPUT} naming what is wrong.
     */
    static String normalise(String url) {
        String u = url == null ? "" : url.strip();
        while (u.endsWith("/")) {
            u = u.substring(0, u.length() - 1);
        }
        URI uri;
        try {
            uri = new URI(u);
        } catch (URISyntaxException e) {
            throw new SyncException(SyncException.Kind.BAD_INPUT, "server address '" + url + "' is not an address: "
                    + e.getReason() + "; give it as https://host[:port]");
        }
        String scheme = uri.getScheme() == null ? "" : uri.getScheme().toLowerCase(Locale.ROOT);
        if (!scheme.equals("https") && !scheme.equals("http") || uri.getHost() == null) {
            throw new SyncException(SyncException.Kind.BAD_INPUT, "server address '" + url
                    + "' refused: give it as https://host[:port] (http:// only on the office's own network)");
        }
        if (uri.getQuery() != null || uri.getFragment() != null || uri.getUserInfo() != null) {
            throw new SyncException(SyncException.Kind.BAD_INPUT, "server address '" + url
                    + "' refused: no user, query or # part; give it as https://host[:port]");
        }
        return u;
    }

    Answer postJson(String path, JsonElement body) {
        return send(request(path).header("Content-Type", "application/json; charset=utf-8")
                .POST(HttpRequest.BodyPublishers.ofString(WireCodec.GSON.toJson(body), StandardCharsets.UTF_8)).build());
    }

    Answer get(String path) {
        return send(request(path).GET().build());
    }

    Answer put(String path, byte[] bytes) {
        return send(request(path).header("Content-Type", "text/csv")
                .PUT(HttpRequest.BodyPublishers.ofByteArray(bytes)).build());
    }

    private HttpRequest.Builder request(String path) {
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create(base + path)).timeout(REQUEST_TIMEOUT)
                .header("Accept", "application/json");
        if (token != null) {
            b.header("Authorization", "Bearer " + token);
        }
        return b;
    }

    /** Sends; 401 and 429 are refused here, every other status goes back to the caller. */
    private Answer send(HttpRequest r) {
        HttpResponse<byte[]> response;
        try {
            response = client.send(r, HttpResponse.BodyHandlers.ofByteArray());
        } catch (IOException e) {
            throw new SyncException(SyncException.Kind.NO_NETWORK, "cannot reach the office server at "
                    + base.substring(0, base.length() - "/api/v1".length()) + " (no network, or the server is not"
                    + " answering); nothing was lost: everything stays on this tablet and goes at the next sync", e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new SyncException(SyncException.Kind.NO_NETWORK, "the sync was stopped; nothing was lost", e);
        }
        Answer a = new Answer(response.statusCode(), response.body());
        if (a.status() == 401) {
            throw new SyncException(SyncException.Kind.REVOKED, SyncException.REVOKED_MESSAGE);
        }
        if (a.status() == 429) {
            String wait = response.headers().firstValue("Retry-After").orElse("a few");
            throw new SyncException(SyncException.Kind.REFUSED, "the office server refused: too many tries from"
                    + " this address; wait " + wait + " seconds and try again");
        }
        return a;
    }

    /** A status the caller did not expect, as a sentence with the server's own message. */
    static SyncException unexpected(String what, Answer a) {
        String message = "";
        try {
            JsonObject o = a.json();
            message = o.has("message") && o.get("message").isJsonPrimitive() ? o.get("message").getAsString() : "";
        } catch (RuntimeException ignored) {
            // not JSON: the status alone says it
        }
        SyncException.Kind kind = a.status() >= 400 && a.status() < 500 ? SyncException.Kind.REFUSED
                : SyncException.Kind.SERVER;
        return new SyncException(kind, what + ": the office server answered " + a.status()
                + (message.isEmpty() ? "" : " (" + message + ")"));
    }
}
