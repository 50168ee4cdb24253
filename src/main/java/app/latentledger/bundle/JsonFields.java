package app.latentledger.bundle;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

import java.time.OffsetDateTime;
import java.time.format.DateTimeParseException;

/** Reading one field of a bundle's JSON object, naming the entry and field when it is wrong. */
final class JsonFields {
    private final JsonObject object;
    private final String where;

    JsonFields(JsonElement element, String where) throws BundleException {
        if (element == null || !element.isJsonObject()) {
            throw new BundleException(where + ": expected a JSON object");
        }
        this.object = element.getAsJsonObject();
        this.where = where;
    }

    String text(String name) throws BundleException {
        JsonElement e = object.get(name);
        if (e == null || e.isJsonNull()) {
            throw new BundleException(where + ": field \"" + name + "\" missing");
        }
        if (!e.isJsonPrimitive() || !e.getAsJsonPrimitive().isString()) {
            throw new BundleException(where + ": field \"" + name + "\" must be text");
        }
        return e.getAsString();
    }

    /** Text that may be absent (older writers) — "" then. */
    String optionalText(String name) throws BundleException {
        JsonElement e = object.get(name);
        return e == null || e.isJsonNull() ? "" : text(name);
    }

    double number(String name) throws BundleException {
        JsonElement e = object.get(name);
        if (e == null || e.isJsonNull() || !e.isJsonPrimitive() || !e.getAsJsonPrimitive().isNumber()) {
            throw new BundleException(where + ": field \"" + name + "\" must be a number");
        }
        return e.getAsDouble();
    }

    /** A number that may be absent or null — null then. */
    Double optionalNumber(String name) throws BundleException {
        JsonElement e = object.get(name);
        return e == null || e.isJsonNull() ? null : number(name);
    }

    /** A nested object that may be absent or null — null then. */
    JsonFields optionalObject(String name) throws BundleException {
        JsonElement e = object.get(name);
        return e == null || e.isJsonNull() ? null : new JsonFields(e, where + " " + name);
    }

    /** A list of texts. */
    java.util.List<String> texts(String name) throws BundleException {
        JsonElement e = element(name);
        if (!e.isJsonArray()) {
            throw new BundleException(where + ": field \"" + name + "\" must be a list");
        }
        java.util.List<String> out = new java.util.ArrayList<>();
        for (JsonElement item : e.getAsJsonArray()) {
            if (!item.isJsonPrimitive() || !item.getAsJsonPrimitive().isString()) {
                throw new BundleException(where + ": field \"" + name + "\" must hold only text");
            }
            out.add(item.getAsString());
        }
        return out;
    }

    int integer(String name) throws BundleException {
        double v = number(name);
        if (v != Math.rint(v) || v < 0 || v > Integer.MAX_VALUE) {
            throw new BundleException(where + ": field \"" + name + "\" must be a whole number ≥ 0");
        }
        return (int) v;
    }

    OffsetDateTime time(String name) throws BundleException {
        String t = text(name);
        try {
            return OffsetDateTime.parse(t);
        } catch (DateTimeParseException e) {
            throw new BundleException(where + ": field \"" + name + "\" '" + t + "' is not an ISO-8601 date-time with offset");
        }
    }

    JsonElement element(String name) throws BundleException {
        JsonElement e = object.get(name);
        if (e == null) {
            throw new BundleException(where + ": field \"" + name + "\" missing");
        }
        return e;
    }

    String where() {
        return where;
    }
}
