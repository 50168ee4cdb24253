package app.latentledger.server;

import com.google.gson.JsonObject;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * A request the server refuses: the HTTP status, a short error word, a sentence, and for bad input
 * the field, value and accepted range. Sent as {@code {"error": ..., "message": ..., ...}}.
 */
public final class ApiError extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final int status;
    private final String error;
    private final transient JsonObject extra = new JsonObject();
    private final Map<String, String> headers = new LinkedHashMap<>();

    ApiError(int status, String error, String message) {
        super(message);
        this.status = status;
        this.error = error;
    }

    /** 400: the field, the value given and the accepted range, all named. */
    static ApiError badInput(String field, String value, String range, String message) {
        ApiError e = new ApiError(400, "bad-input", message);
        e.extra.addProperty("field", field);
        e.extra.addProperty("value", value == null ? "" : value);
        e.extra.addProperty("range", range);
        return e;
    }

    static ApiError unauthorised(String message) {
        return new ApiError(401, "unauthorised", message).header("WWW-Authenticate", "Bearer");
    }

    /** 404 also for another company's record: never reveal that it exists. */
    static ApiError notFound(String message) {
        return new ApiError(404, "not-found", message);
    }

    ApiError header(String name, String value) {
        headers.put(name, value);
        return this;
    }

    ApiError with(String name, long value) {
        extra.addProperty(name, value);
        return this;
    }

    /** Names the refused field, value and range beside the message. */
    ApiError field(String field, String value, String range) {
        extra.addProperty("field", field);
        extra.addProperty("value", value);
        extra.addProperty("range", range);
        return this;
    }

    Reply reply() {
        JsonObject o = new JsonObject();
        o.addProperty("error", error);
        o.addProperty("message", getMessage());
        extra.entrySet().forEach(e -> o.add(e.getKey(), e.getValue()));
        Reply r = Reply.json(status, o);
        for (Map.Entry<String, String> h : headers.entrySet()) {
            r = r.withHeader(h.getKey(), h.getValue());
        }
        return r;
    }

    int status() {
        return status;
    }
}
