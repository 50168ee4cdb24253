package app.latentledger.sync.wire;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;

import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;

/**
 * The content hash both ends compute, and the only place it is computed: SHA-256 (FIPS 180-4) of
 * the body's canonical JSON as lower-case hex. Canonical means keys sorted (by Java's
 * {@code String.compareTo}, i.e. UTF-16 code units) at every depth, no whitespace, strings escaped
 * as Gson escapes them with HTML escaping off, {@code null}, {@code true}, {@code false} as such, and
 * numbers by their double value: plain digits when the value is whole ({@code 2.0} → {@code 2},
 * {@code -0.0} → {@code 0}), else {@code Double.toString} ({@code 1.0E-5}, {@code 24.5}). So the same
 * record hashes the same however its JSON was spaced or ordered, and whichever side made it.
 */
public final class WireHash {
    private static final Gson STRINGS = new GsonBuilder().disableHtmlEscaping().create();
    private static final HexFormat HEX = HexFormat.of();

    /** The hash a deletion carries: that of the empty object {@code {}}. */
    public static final String DELETED = sha256("{}");

    private WireHash() {
    }

    /** SHA-256 hex of {@code body}'s canonical JSON. */
    public static String of(JsonObject body) {
        return sha256(canonical(body));
    }

    /** The canonical text of any JSON value. */
    public static String canonical(JsonElement e) {
        StringBuilder b = new StringBuilder();
        write(e, b);
        return b.toString();
    }

    /** SHA-256 hex of raw bytes (log samples). */
    public static String sha256(byte[] bytes) {
        try {
            return HEX.formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }

    private static String sha256(String text) {
        return sha256(text.getBytes(StandardCharsets.UTF_8));
    }

    private static void write(JsonElement e, StringBuilder b) {
        if (e == null || e.isJsonNull()) {
            b.append("null");
        } else if (e.isJsonObject()) {
            JsonObject o = e.getAsJsonObject();
            List<String> keys = new ArrayList<>(o.keySet());
            keys.sort(null);
            b.append('{');
            for (int i = 0; i < keys.size(); i++) {
                if (i > 0) {
                    b.append(',');
                }
                b.append(STRINGS.toJson(new JsonPrimitive(keys.get(i)))).append(':');
                write(o.get(keys.get(i)), b);
            }
            b.append('}');
        } else if (e.isJsonArray()) {
            JsonArray a = e.getAsJsonArray();
            b.append('[');
            for (int i = 0; i < a.size(); i++) {
                if (i > 0) {
                    b.append(',');
                }
                write(a.get(i), b);
            }
            b.append(']');
        } else {
            JsonPrimitive p = e.getAsJsonPrimitive();
            if (p.isBoolean()) {
                b.append(p.getAsBoolean());
            } else if (p.isNumber()) {
                b.append(number(p.getAsDouble()));
            } else {
                b.append(STRINGS.toJson(p));
            }
        }
    }

    /** A number's canonical text; a value JSON cannot hold (NaN, ±∞) is refused. */
    static String number(double v) {
        if (!Double.isFinite(v)) {
            throw new WireException("body", v + " is not a finite number; JSON holds only finite numbers");
        }
        if (v == Math.rint(v)) {
            return v == 0 ? "0" : new BigDecimal(v).toPlainString();
        }
        return Double.toString(v);
    }
}
