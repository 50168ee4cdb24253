package app.latentledger.server;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonElement;

import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Map;

/** What the server answers: status, headers and body bytes. */
public record Reply(int status, Map<String, String> headers, byte[] body) {
    static final Gson GSON = new GsonBuilder().disableHtmlEscaping().serializeNulls().create();

    public static Reply json(int status, JsonElement body) {
        Map<String, String> h = new LinkedHashMap<>();
        h.put("Content-Type", "application/json; charset=utf-8");
        h.put("Cache-Control", "no-store");
        return new Reply(status, h, GSON.toJson(body).getBytes(StandardCharsets.UTF_8));
    }

    public static Reply bytes(int status, String contentType, byte[] body) {
        Map<String, String> h = new LinkedHashMap<>();
        h.put("Content-Type", contentType);
        h.put("Cache-Control", "no-store");
        return new Reply(status, h, body);
    }

    public Reply withHeader(String name, String value) {
        Map<String, String> h = new LinkedHashMap<>(headers);
        h.put(name, value);
        return new Reply(status, h, body);
    }
}
