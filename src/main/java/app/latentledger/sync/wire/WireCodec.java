package app.latentledger.sync.wire;

import app.latentledger.bundle.BundleException;
import app.latentledger.bundle.BundleObjects;
import app.latentledger.core.house.HouseVisitReadings;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.records.VisitPaperwork;
import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonElement;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import com.google.gson.JsonParseException;
import com.google.gson.JsonParser;

import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.format.DateTimeParseException;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Records ⇄ wire bodies, with the bundle's own field names and shapes (docs/bundle-format.md) by
 * way of {@link BundleObjects}: a site, system, visit, instrument or paperwork body is the bundle's
 * object; a reading set's body is its {@code readings.csv} row keyed by column; a log's body is the
 * bundle's log object plus {@code samplesBytes} and {@code samplesSha256} of the exact
 * {@code logs/<id>.csv} bytes; house facts are one object per visit ({@link HouseRecord}).
 * Reading a body refuses with {@link WireException} (field and reason) or with the record's own
 * {@link IllegalArgumentException} (field, value and range).
 */
public final class WireCodec {
    /** How wire JSON is written: compact, nulls kept (an empty cell is a null), no HTML escaping. */
    public static final Gson GSON = new GsonBuilder().disableHtmlEscaping().serializeNulls().create();
    private static final Pattern FIELD = Pattern.compile("field \"([^\"]+)\"");

    private WireCodec() {
    }

    // ---- bodies -------------------------------------------------------------------------------

    public static JsonObject body(Site s) {
        return BundleObjects.site(s);
    }

    public static JsonObject body(HvacSystem s) {
        return BundleObjects.system(s);
    }

    public static JsonObject body(Visit v) {
        return BundleObjects.visit(v);
    }

    public static JsonObject body(ReadingSet r) {
        return BundleObjects.readingRow(r);
    }

    public static JsonObject body(Instrument i, List<String> usedOn) {
        return BundleObjects.instrument(i, usedOn);
    }

    public static JsonObject body(VisitPaperwork w) {
        return BundleObjects.paperwork(w);
    }

    /** The log object plus the size and SHA-256 of {@link #samples}. */
    public static JsonObject body(ImportedLog l) {
        JsonObject o = BundleObjects.log(l);
        byte[] samples = samples(l);
        o.addProperty("samplesBytes", samples.length);
        o.addProperty("samplesSha256", WireHash.sha256(samples));
        return o;
    }

    /** The exact bytes of {@code logs/<id>.csv} the bundle would write: what is uploaded in chunks. */
    public static byte[] samples(ImportedLog l) {
        return BundleObjects.logSamples(l.samples());
    }

    /** The site's facts and the visit's readings in the shapes {@code house.json} gives them. */
    public static JsonObject body(HouseRecord h) {
        JsonObject o = new JsonObject();
        o.addProperty("visitId", h.visitId());
        o.addProperty("siteId", h.siteId());
        o.add("facts", h.facts() == null ? JsonNull.INSTANCE : BundleObjects.houseFacts(h.facts(), h.siteId()));
        o.add("readings", BundleObjects.houseReadings(h.visitId(), h.readings()));
        return o;
    }

    // ---- reading bodies back ------------------------------------------------------------------

    public static Site site(JsonObject body) {
        return bundle(() -> BundleObjects.site(body));
    }

    public static HvacSystem system(JsonObject body) {
        return bundle(() -> BundleObjects.system(body));
    }

    public static Visit visit(JsonObject body) {
        return bundle(() -> BundleObjects.visit(body));
    }

    public static ReadingSet readingSet(JsonObject body) {
        return bundle(() -> BundleObjects.readingSet(body));
    }

    public static BundleObjects.InstrumentObject instrument(JsonObject body) {
        return bundle(() -> BundleObjects.instrument(body));
    }

    public static VisitPaperwork paperwork(JsonObject body) {
        return bundle(() -> BundleObjects.paperwork(body));
    }

    /** What a log body declares about its samples, checked without them. */
    public static BundleObjects.LogShape logShape(JsonObject body) {
        try {
            BundleObjects.LogShape shape = BundleObjects.logShape(body);
            samplesBytes(body);
            samplesSha256(body);
            return shape;
        } catch (BundleException e) {
            throw refused(e);
        }
    }

    /** The size the log body declares for its samples. */
    public static long samplesBytes(JsonObject body) {
        JsonElement e = body.get("samplesBytes");
        if (e == null || !e.isJsonPrimitive() || !e.getAsJsonPrimitive().isNumber()) {
            throw new WireException("samplesBytes", "log: field \"samplesBytes\" must be a whole number of bytes");
        }
        double v = e.getAsDouble();
        if (v != Math.rint(v) || v < 0 || v > Long.MAX_VALUE) {
            throw new WireException(new Refusal("samplesBytes", e.getAsString(), "0 or more, whole",
                    "log: samplesBytes " + e.getAsString() + " is not a whole number of bytes ≥ 0"));
        }
        return (long) v;
    }

    /** The SHA-256 the log body declares for its samples (64 lower-case hex digits). */
    public static String samplesSha256(JsonObject body) {
        JsonElement e = body.get("samplesSha256");
        if (e == null || !e.isJsonPrimitive() || !e.getAsJsonPrimitive().isString()
                || !e.getAsString().matches("[0-9a-f]{64}")) {
            throw new WireException("samplesSha256", "log: field \"samplesSha256\" must be 64 lower-case hex digits");
        }
        return e.getAsString();
    }

    /**
     * A log from its body and its samples' bytes. The bytes must have the declared size and SHA-256;
     * then they are read and checked as a bundle's log samples are (time axis, ranges).
     */
    public static ImportedLog log(JsonObject body, byte[] samples) {
        long declared = samplesBytes(body);
        if (samples.length != declared) {
            throw new WireException(new Refusal("samplesBytes", String.valueOf(samples.length), String.valueOf(declared),
                    "log samples are " + samples.length + " bytes; the log record declares " + declared));
        }
        String sha = WireHash.sha256(samples);
        if (!sha.equals(samplesSha256(body))) {
            throw new WireException(new Refusal("samplesSha256", sha, samplesSha256(body),
                    "log samples do not match the SHA-256 the log record declares"));
        }
        try {
            return BundleObjects.log(body, samples);
        } catch (BundleException e) {
            throw refused(e);
        }
    }

    public static HouseRecord house(JsonObject body) {
        String visitId = text(body, "visitId", "house");
        String siteId = text(body, "siteId", "house");
        JsonObject r = object(body, "readings", "house");
        try {
            return new HouseRecord(visitId, siteId, BundleObjects.houseFacts(body),
                    r == null ? HouseVisitReadings.EMPTY : BundleObjects.houseReadings(r));
        } catch (BundleException e) {
            throw refused(e);
        }
    }

    /**
     * Any body read into its record, for checking: a {@link Site}, {@link HvacSystem}, {@link Visit},
     * {@link ReadingSet}, {@link BundleObjects.InstrumentObject}, {@link VisitPaperwork},
     * {@link BundleObjects.LogShape} (a log's samples travel apart) or {@link HouseRecord}.
     */
    public static Object decode(SyncKind kind, JsonObject body) {
        return switch (kind) {
            case SITE -> site(body);
            case SYSTEM -> system(body);
            case VISIT -> visit(body);
            case READINGS -> readingSet(body);
            case LOG -> logShape(body);
            case INSTRUMENT -> instrument(body);
            case PAPERWORK -> paperwork(body);
            case HOUSE -> house(body);
        };
    }

    // ---- records ------------------------------------------------------------------------------

    /** A record as the push and changes lists carry it: kind, id, hash, baseHash, editedAt, deleted, body. */
    public static JsonObject toJson(WireRecord r) {
        JsonObject o = new JsonObject();
        o.addProperty("kind", r.kind().wire());
        o.addProperty("id", r.id());
        o.addProperty("hash", r.hash());
        o.addProperty("baseHash", r.baseHash());
        o.addProperty("editedAt", r.editedAt().toString());
        o.addProperty("deleted", r.deleted());
        o.add("body", r.body() == null ? JsonNull.INSTANCE : r.body());
        return o;
    }

    /** Reads a record object (other members, such as a change's revision, are ignored here). */
    public static WireRecord fromJson(JsonElement e) {
        if (e == null || !e.isJsonObject()) {
            throw new WireException("record", "each record must be a JSON object");
        }
        JsonObject o = e.getAsJsonObject();
        String word = text(o, "kind", "record");
        SyncKind kind = SyncKind.fromWire(word);
        if (kind == null) {
            throw new WireException(new Refusal("kind", word, SyncKind.words(),
                    "record kind '" + word + "' is not one of " + SyncKind.words()));
        }
        String id = text(o, "id", "record");
        String hash = text(o, "hash", "record");
        JsonElement base = o.get("baseHash");
        String baseHash = base == null || base.isJsonNull() ? null : text(o, "baseHash", "record");
        String edited = text(o, "editedAt", "record");
        Instant editedAt;
        try {
            editedAt = OffsetDateTime.parse(edited).toInstant();
        } catch (DateTimeParseException x) {
            throw new WireException(new Refusal("editedAt", edited, "ISO-8601 date-time with offset",
                    "record editedAt '" + edited + "' is not an ISO-8601 date-time with offset"));
        }
        JsonElement d = o.get("deleted");
        boolean deleted = false;
        if (d != null && !d.isJsonNull()) {
            if (!d.isJsonPrimitive() || !d.getAsJsonPrimitive().isBoolean()) {
                throw new WireException("deleted", "record: field \"deleted\" must be true or false");
            }
            deleted = d.getAsBoolean();
        }
        JsonObject body = object(o, "body", "record");
        return new WireRecord(kind, id, hash, baseHash, editedAt, deleted, body);
    }

    /** Parses wire JSON text, refusing text that is not JSON. */
    public static JsonElement parse(String text) {
        try {
            return JsonParser.parseString(text);
        } catch (JsonParseException | StackOverflowError e) {
            throw new WireException("body", "not valid JSON: " + e.getMessage());
        }
    }

    /** One record of a page of changes, with what the server adds: its revision, device and author. */
    public record Change(WireRecord record, String revision, String device, String author) {
    }

    public static Change change(JsonElement e) {
        WireRecord r = fromJson(e);
        JsonObject o = e.getAsJsonObject();
        return new Change(r, optionalText(o, "revision"), optionalText(o, "device"), optionalText(o, "author"));
    }

    // ---- small readers ------------------------------------------------------------------------

    /** Reading a bundle object, which may refuse with a {@link BundleException}. */
    @FunctionalInterface
    private interface BundleRead<T> {
        T read() throws BundleException;
    }

    private static <T> T bundle(BundleRead<T> read) {
        try {
            return read.read();
        } catch (BundleException e) {
            throw refused(e);
        }
    }

    private static WireException refused(BundleException e) {
        if (e.getCause() instanceof IllegalArgumentException core && !(core instanceof WireException)) {
            // the record's own refusal, with its value and range
            return new WireException(WireValidation.refusal(core));
        }
        Matcher m = FIELD.matcher(e.getMessage());
        return new WireException(new Refusal(m.find() ? m.group(1) : "body", "", "", e.getMessage()));
    }

    private static String optionalText(JsonObject o, String name) {
        JsonElement e = o.get(name);
        return e == null || e.isJsonNull() || !e.isJsonPrimitive() ? "" : e.getAsString();
    }

    private static String text(JsonObject o, String name, String where) {
        JsonElement e = o.get(name);
        if (e == null || e.isJsonNull()) {
            throw new WireException(name, where + ": field \"" + name + "\" missing");
        }
        if (!e.isJsonPrimitive() || !e.getAsJsonPrimitive().isString()) {
            throw new WireException(name, where + ": field \"" + name + "\" must be text");
        }
        return e.getAsString();
    }

    private static JsonObject object(JsonObject o, String name, String where) {
        JsonElement e = o.get(name);
        if (e == null || e.isJsonNull()) {
            return null;
        }
        if (!e.isJsonObject()) {
            throw new WireException(name, where + ": field \"" + name + "\" must be an object or null");
        }
        return e.getAsJsonObject();
    }
}
