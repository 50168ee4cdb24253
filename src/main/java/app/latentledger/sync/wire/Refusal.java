package app.latentledger.sync.wire;

import com.google.gson.JsonObject;

/**
 * Why a record was not accepted: the field as named on the wire or by the tech, the refused value,
 * the accepted range (both "" when they do not apply) and the whole sentence.
 */
public record Refusal(String field, String value, String range, String message) {
    public Refusal {
        field = field == null ? "" : field;
        value = value == null ? "" : value;
        range = range == null ? "" : range;
        message = message == null ? "" : message;
    }

    public JsonObject toJson() {
        JsonObject o = new JsonObject();
        o.addProperty("field", field);
        o.addProperty("value", value);
        o.addProperty("range", range);
        o.addProperty("message", message);
        return o;
    }

    /** Reads a refusal object; missing members read as "". */
    public static Refusal fromJson(JsonObject o) {
        return new Refusal(text(o, "field"), text(o, "value"), text(o, "range"), text(o, "message"));
    }

    private static String text(JsonObject o, String name) {
        return o != null && o.has(name) && o.get(name).isJsonPrimitive() ? o.get(name).getAsString() : "";
    }
}
