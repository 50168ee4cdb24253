package app.latentledger.sync.wire;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.RecordRules;
import com.google.gson.JsonElement;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * The checks a synced record passes, the same every other way in passes: the record's own
 * constructor (every range in {@code FieldLimits} and {@code RecordLimits}), {@link RecordRules}
 * for what needs more than one field (an air stream that exists, the coil band, coil-check inputs
 * on the set's system and site), finite numbers only, and for a log's samples the bundle's reader
 * and {@link RecordRules#log} (a non-decreasing time axis within its span and interval bounds,
 * finite samples in range). A refusal names the field, the value and the accepted range.
 *
 * <p>A log's conditions (airflow and pressure it is analysed at) do not travel on the wire, as
 * they do not in a bundle; the receiving side derives them with {@code LogConditions} from the
 * visit's readings, so there is nothing of them to check here.
 */
public final class WireValidation {
    private static final Pattern ID = Pattern.compile("[A-Za-z0-9_-]{1,64}");

    private WireValidation() {
    }

    /**
     * The records a pushed record points at, as the receiving side knows them (in the same push or
     * already stored). {@link #NONE} skips the checks that need them.
     */
    public interface Parents {
        Optional<Site> site(String id);

        Optional<HvacSystem> system(String id);

        Optional<Visit> visit(String id);

        /** Knows no parent: only the record itself is checked. */
        Parents NONE = new Parents() {
            @Override
            public Optional<Site> site(String id) {
                return Optional.empty();
            }

            @Override
            public Optional<HvacSystem> system(String id) {
                return Optional.empty();
            }

            @Override
            public Optional<Visit> visit(String id) {
                return Optional.empty();
            }
        };

        /** Parents from plain maps by id (tests, or a push's own records). */
        static Parents of(Map<String, Site> sites, Map<String, HvacSystem> systems, Map<String, Visit> visits) {
            return new Parents() {
                @Override
                public Optional<Site> site(String id) {
                    return Optional.ofNullable(sites.get(id));
                }

                @Override
                public Optional<HvacSystem> system(String id) {
                    return Optional.ofNullable(systems.get(id));
                }

                @Override
                public Optional<Visit> visit(String id) {
                    return Optional.ofNullable(visits.get(id));
                }
            };
        }
    }

    /** The record on its own: empty when it passes. */
    public static List<Refusal> check(WireRecord r) {
        return check(r, null);
    }

    /**
     * The record, and with {@code parents} (not null) also that its parents exist and, for a
     * reading set, that it passes {@link RecordRules#readingSet} on its system at its site.
     */
    public static List<Refusal> check(WireRecord r, Parents parents) {
        List<Refusal> out = new ArrayList<>();
        if (!ID.matcher(r.id()).matches()) {
            out.add(new Refusal("id", r.id(), "1 to 64 letters, digits, '-' or '_'",
                    "record id '" + r.id() + "' is not an id (1 to 64 letters, digits, '-' or '_')"));
            return out;
        }
        if (r.deleted()) {
            if (!WireHash.DELETED.equals(r.hash())) {
                out.add(hashRefusal(r.hash(), WireHash.DELETED));
            }
            return out;
        }
        if (r.body() == null) {
            out.add(new Refusal("body", "", "", r.kind().wire() + " " + r.id() + ": body missing (only a deletion has none)"));
            return out;
        }
        String nonFinite = nonFinite(r.body(), "");
        if (nonFinite != null) {
            out.add(new Refusal(nonFinite, "", "a finite number", nonFinite + " is not a finite number"));
            return out;
        }
        String hash = WireHash.of(r.body());
        if (!hash.equals(r.hash())) {
            out.add(hashRefusal(r.hash(), hash));
        }
        JsonElement ownId = r.body().get(r.kind().idField());
        if (ownId == null || !ownId.isJsonPrimitive() || !r.id().equals(ownId.getAsString())) {
            out.add(new Refusal(r.kind().idField(), ownId == null ? "" : ownId.toString(), r.id(),
                    r.kind().wire() + " body's " + r.kind().idField() + " is not the record's id " + r.id()));
        }
        Object record;
        try {
            record = WireCodec.decode(r.kind(), r.body());
        } catch (IllegalArgumentException e) {
            out.add(refusal(e));
            return out;
        }
        if (parents != null) {
            parentCheck(r, record, parents, out);
        }
        return out;
    }

    /**
     * A log's samples once all their bytes are in: the declared size and SHA-256, then the bundle
     * reader's checks and {@link RecordRules#log}. Empty when they pass.
     */
    public static List<Refusal> checkSamples(WireRecord log, byte[] samples) {
        try {
            WireCodec.log(log.body(), samples);
            return List.of();
        } catch (IllegalArgumentException e) {
            return List.of(refusal(e));
        }
    }

    /** Any refusal the core or the codec throws, as field, value, range and message. */
    public static Refusal refusal(IllegalArgumentException e) {
        if (e instanceof WireException w) {
            return w.refusal();
        }
        if (e instanceof InvalidInputException i) {
            String unit = i.quantity().symbol(UnitSystem.SI);
            return new Refusal(i.field(), Double.isNaN(i.valueSi()) ? "not a number" : DisplayNumber.exact(i.valueSi())
                    + " " + unit, DisplayNumber.exact(i.minSi()) + " to " + DisplayNumber.exact(i.maxSi()) + " " + unit,
                    i.getMessage());
        }
        if (e instanceof InvalidRecordException i) {
            return new Refusal(i.field(), "", "", i.getMessage());
        }
        return new Refusal("body", "", "", String.valueOf(e.getMessage()));
    }

    private static Refusal hashRefusal(String sent, String computed) {
        return new Refusal("hash", sent, computed, "hash " + sent + " is not the SHA-256 of the body's canonical JSON ("
                + computed + ")");
    }

    private static void parentCheck(WireRecord r, Object record, Parents parents, List<Refusal> out) {
        switch (r.kind()) {
            case SITE -> {
            }
            case SYSTEM -> site(((HvacSystem) record).siteId(), parents, out);
            case VISIT -> {
                Visit v = (Visit) record;
                if (site(v.siteId(), parents, out)) {
                    Optional<HvacSystem> s = parents.system(v.systemId());
                    if (s.isEmpty()) {
                        out.add(missing("systemId", v.systemId(), "system"));
                    } else if (!s.get().siteId().equals(v.siteId())) {
                        out.add(new Refusal("systemId", v.systemId(), "a system of site " + v.siteId(),
                                "visit's system " + v.systemId() + " is at another site, not " + v.siteId()));
                    }
                }
            }
            case READINGS -> {
                ReadingSet rs = (ReadingSet) record;
                Optional<Visit> v = parents.visit(rs.visitId());
                if (v.isEmpty()) {
                    out.add(missing("visitId", rs.visitId(), "visit"));
                    return;
                }
                Optional<Site> site = parents.site(v.get().siteId());
                Optional<HvacSystem> system = parents.system(v.get().systemId());
                if (site.isPresent() && system.isPresent()) {
                    try {
                        RecordRules.readingSet(rs, system.get(), site.get());
                    } catch (IllegalArgumentException e) {
                        out.add(refusal(e));
                    }
                }
            }
            case LOG, INSTRUMENT, PAPERWORK, HOUSE -> {
                String visitId = r.body().get("visitId").getAsString();
                if (parents.visit(visitId).isEmpty()) {
                    out.add(missing("visitId", visitId, "visit"));
                }
            }
        }
    }

    private static boolean site(String siteId, Parents parents, List<Refusal> out) {
        if (parents.site(siteId).isEmpty()) {
            out.add(missing("siteId", siteId, "site"));
            return false;
        }
        return true;
    }

    private static Refusal missing(String field, String id, String what) {
        return new Refusal(field, id, "a " + what + " in this push or already on the server",
                "no " + what + " " + id + " in this push or on the server; send the " + what + " first");
    }

    /** The path of the first non-finite number in {@code e}, or null (Gson can read NaN leniently). */
    private static String nonFinite(JsonElement e, String path) {
        if (e.isJsonObject()) {
            for (Map.Entry<String, JsonElement> m : e.getAsJsonObject().entrySet()) {
                String found = nonFinite(m.getValue(), path.isEmpty() ? m.getKey() : path + "." + m.getKey());
                if (found != null) {
                    return found;
                }
            }
        } else if (e.isJsonArray()) {
            int i = 0;
            for (JsonElement item : e.getAsJsonArray()) {
                String found = nonFinite(item, path + "[" + i++ + "]");
                if (found != null) {
                    return found;
                }
            }
        } else if (e.isJsonPrimitive() && e.getAsJsonPrimitive().isNumber()
                && !Double.isFinite(e.getAsDouble())) {
            return path.isEmpty() ? "body" : path;
        }
        return null;
    }
}
