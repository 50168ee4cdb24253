package app.latentledger.server;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.sync.wire.Refusal;
import app.latentledger.sync.wire.SyncKind;
import app.latentledger.sync.wire.WireCodec;
import app.latentledger.sync.wire.WireException;
import app.latentledger.sync.wire.WireRecord;
import app.latentledger.sync.wire.WireValidation;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.UUID;

/**
 * Push, changes and history: the company's records as revisions. Every pushed record passes the
 * same checks as every other way in ({@link WireValidation}); a record is stored as a new revision
 * unless the same content is already there (a retried push never duplicates); the revision with
 * the latest edit time is the current one, the others stay in the history.
 *
 * <p>Writes of one company are serialised by a row lock on the company, held only while the
 * checked records are written: the company's change counter then grows in commit order, so a
 * reader's cursor never passes a write still being committed.
 */
final class SyncService {
    static final int MAX_PUSH = 500;

    private final OfficeDatabase db;

    SyncService(OfficeDatabase db) {
        this.db = db;
    }

    // ---- push ---------------------------------------------------------------------------------

    /** One input record: read (or refused while reading) and, once decided, its result. */
    private static final class Item {
        WireRecord record;
        Refusal refusal;
        String kindWord;
        String id;
        JsonObject result;
    }

    JsonObject push(Caller who, byte[] body) {
        JsonElement root;
        try {
            root = WireCodec.parse(new String(body, java.nio.charset.StandardCharsets.UTF_8));
        } catch (WireException e) {
            throw ApiError.badInput("body", "", "a JSON object {\"records\": [...]}", "the push is not JSON: "
                    + e.getMessage());
        }
        if (!root.isJsonObject() || !root.getAsJsonObject().has("records")
                || !root.getAsJsonObject().get("records").isJsonArray()) {
            throw ApiError.badInput("records", "", "an array of 1 to " + MAX_PUSH + " records",
                    "the push must be {\"records\": [...]}");
        }
        JsonArray input = root.getAsJsonObject().getAsJsonArray("records");
        if (input.isEmpty() || input.size() > MAX_PUSH) {
            throw ApiError.badInput("records", String.valueOf(input.size()), "1 to " + MAX_PUSH + " records",
                    "a push carries 1 to " + MAX_PUSH + " records; this one has " + input.size() + " (split it)");
        }
        List<Item> items = new ArrayList<>();
        for (JsonElement e : input) {
            Item it = new Item();
            if (e.isJsonObject()) {
                JsonObject o = e.getAsJsonObject();
                it.kindWord = o.has("kind") && o.get("kind").isJsonPrimitive() ? o.get("kind").getAsString() : "";
                it.id = o.has("id") && o.get("id").isJsonPrimitive() ? o.get("id").getAsString() : "";
            } else {
                it.kindWord = "";
                it.id = "";
            }
            try {
                it.record = WireCodec.fromJson(e);
            } catch (WireException x) {
                it.refusal = x.refusal();
            }
            items.add(it);
        }
        Sql.inTransaction(db, c -> {
            long seq = lockCompany(c, who.companyId());
            PushParents parents = new PushParents(c, who.companyId());
            for (Item it : items) {
                if (it.refusal == null) {
                    List<Refusal> refused = WireValidation.check(it.record, it.record.deleted() ? null : parents);
                    if (!refused.isEmpty()) {
                        it.refusal = refused.get(0);
                    }
                }
                if (it.refusal != null) {
                    it.result = result(it.kindWord, it.id, "refused", null);
                    it.result.add("refused", it.refusal.toJson());
                    continue;
                }
                seq = store(c, who, it, seq);
                if (!it.record.deleted()) {
                    parents.accepted(it.record);
                }
            }
            try (PreparedStatement ps = c.prepareStatement("update company set change_seq = ? where id = ?")) {
                ps.setLong(1, seq);
                ps.setObject(2, who.companyId());
                ps.executeUpdate();
            }
            return null;
        });
        JsonArray results = new JsonArray();
        items.forEach(it -> results.add(it.result));
        JsonObject out = new JsonObject();
        out.add("results", results);
        return out;
    }

    private static long lockCompany(Connection c, UUID company) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("select change_seq from company where id = ? for update")) {
            ps.setObject(1, company);
            ResultSet rs = ps.executeQuery();
            rs.next();
            return rs.getLong(1);
        }
    }

    private record Stored(int revision, String hash, boolean deleted, Instant editedAt, boolean current) {
    }

    /** Stores one checked record; returns the company's change counter after it. */
    private static long store(Connection c, Caller who, Item it, long seq) throws SQLException {
        WireRecord r = it.record;
        String kind = r.kind().wire();
        List<Stored> existing = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement("select revision, hash, deleted, edited_at, current from"
                + " record_revision where company_id = ? and kind = ? and id = ?")) {
            ps.setObject(1, who.companyId());
            ps.setString(2, kind);
            ps.setString(3, r.id());
            ResultSet rs = ps.executeQuery();
            while (rs.next()) {
                existing.add(new Stored(rs.getInt(1), rs.getString(2), rs.getBoolean(3),
                        rs.getTimestamp(4).toInstant(), rs.getBoolean(5)));
            }
        }
        Stored current = null;
        int max = 0;
        for (Stored s : existing) {
            max = Math.max(max, s.revision());
            if (s.current()) {
                current = s;
            }
            if (s.hash().equals(r.hash()) && s.deleted() == r.deleted() && s.editedAt().equals(r.editedAt())) {
                it.result = result(kind, r.id(), "unchanged", s.revision());
                return seq;
            }
        }
        if (current != null && current.hash().equals(r.hash()) && current.deleted() == r.deleted()) {
            // the same content is already current (another tablet sent it, or a retry with a new time)
            it.result = result(kind, r.id(), "unchanged", current.revision());
            return seq;
        }
        boolean becomesCurrent = current == null || later(r.editedAt(), r.hash(), current.editedAt(), current.hash());
        int revision = max + 1;
        long newSeq = seq;
        if (becomesCurrent) {
            newSeq = seq + 1;
            if (current != null) {
                try (PreparedStatement ps = c.prepareStatement("update record_revision set current = false where"
                        + " company_id = ? and kind = ? and id = ? and current")) {
                    ps.setObject(1, who.companyId());
                    ps.setString(2, kind);
                    ps.setString(3, r.id());
                    ps.executeUpdate();
                }
            }
        }
        try (PreparedStatement ps = c.prepareStatement("insert into record_revision (company_id, kind, id, revision,"
                + " hash, base_hash, edited_at, deleted, body, device_id, person_id, current, change_seq)"
                + " values (?, ?, ?, ?, ?, ?, ?, ?, cast(? as jsonb), ?, ?, ?, ?)")) {
            ps.setObject(1, who.companyId());
            ps.setString(2, kind);
            ps.setString(3, r.id());
            ps.setInt(4, revision);
            ps.setString(5, r.hash());
            ps.setString(6, r.baseHash());
            ps.setTimestamp(7, Timestamp.from(r.editedAt()));
            ps.setBoolean(8, r.deleted());
            ps.setString(9, r.body() == null ? null : Reply.GSON.toJson(r.body()));
            ps.setObject(10, who.deviceId());
            ps.setObject(11, who.personId());
            ps.setBoolean(12, becomesCurrent);
            if (becomesCurrent) {
                ps.setLong(13, newSeq);
            } else {
                ps.setNull(13, java.sql.Types.BIGINT);
            }
            ps.executeUpdate();
        }
        String status = becomesCurrent ? "stored" : "kept-as-revision";
        Audit.write(c, who, r.deleted() ? "push-delete" : "push", kind, r.id(), revision, status);
        it.result = result(kind, r.id(), status, revision);
        return newSeq;
    }

    /** The later edit wins; on the same instant the larger hash, so every instance and order agrees. */
    private static boolean later(Instant a, String hashA, Instant b, String hashB) {
        int t = a.compareTo(b);
        return t > 0 || (t == 0 && hashA.compareTo(hashB) > 0);
    }

    private static JsonObject result(String kind, String id, String status, Integer revision) {
        JsonObject o = new JsonObject();
        o.addProperty("kind", kind);
        o.addProperty("id", id);
        o.addProperty("status", status);
        o.addProperty("revision", revision);
        o.add("refused", JsonNull.INSTANCE);
        return o;
    }

    /**
     * Parents as the server knows them: accepted earlier in this push, else the latest live revision
     * on the server for this company (a parent in the recycle bin still counts: the child joins it there).
     */
    private static final class PushParents implements WireValidation.Parents {
        private final Connection c;
        private final UUID company;
        private final Map<String, Site> sites = new HashMap<>();
        private final Map<String, HvacSystem> systems = new HashMap<>();
        private final Map<String, Visit> visits = new HashMap<>();

        PushParents(Connection c, UUID company) {
            this.c = c;
            this.company = company;
        }

        void accepted(WireRecord r) {
            switch (r.kind()) {
                case SITE -> sites.put(r.id(), WireCodec.site(r.body()));
                case SYSTEM -> systems.put(r.id(), WireCodec.system(r.body()));
                case VISIT -> visits.put(r.id(), WireCodec.visit(r.body()));
                default -> {
                }
            }
        }

        @Override
        public Optional<Site> site(String id) {
            return Optional.ofNullable(sites.computeIfAbsent(id, k -> load(SyncKind.SITE, k, WireCodec::site)));
        }

        @Override
        public Optional<HvacSystem> system(String id) {
            return Optional.ofNullable(systems.computeIfAbsent(id, k -> load(SyncKind.SYSTEM, k, WireCodec::system)));
        }

        @Override
        public Optional<Visit> visit(String id) {
            return Optional.ofNullable(visits.computeIfAbsent(id, k -> load(SyncKind.VISIT, k, WireCodec::visit)));
        }

        private <T> T load(SyncKind kind, String id, java.util.function.Function<JsonObject, T> decode) {
            try (PreparedStatement ps = c.prepareStatement("select body::text from record_revision where company_id = ?"
                    + " and kind = ? and id = ? and not deleted order by current desc, edited_at desc limit 1")) {
                ps.setObject(1, company);
                ps.setString(2, kind.wire());
                ps.setString(3, id);
                ResultSet rs = ps.executeQuery();
                if (!rs.next()) {
                    return null;
                }
                return decode.apply(JsonParser.parseString(rs.getString(1)).getAsJsonObject());
            } catch (SQLException e) {
                throw new IllegalStateException("database: " + e.getMessage(), e);
            } catch (IllegalArgumentException e) {
                // stored under older rules and no longer readable: as good as absent for a new child
                return null;
            }
        }
    }

    // ---- changes ------------------------------------------------------------------------------

    static final int DEFAULT_LIMIT = 500;
    static final int MAX_LIMIT = 1000;

    /** A current revision as the changes list and the bundle read it. */
    record Current(String kind, String id, int revision, String hash, Instant editedAt, boolean deleted,
                   JsonObject body, String device, String author, long changeSeq) {
        JsonObject toJson() {
            JsonObject o = new JsonObject();
            o.addProperty("kind", kind);
            o.addProperty("id", id);
            o.addProperty("revision", revision);
            o.addProperty("hash", hash);
            o.addProperty("editedAt", editedAt.atOffset(ZoneOffset.UTC).toString());
            o.addProperty("deleted", deleted);
            o.add("body", body == null ? JsonNull.INSTANCE : body);
            o.addProperty("device", device);
            o.addProperty("author", author);
            return o;
        }
    }

    private static final String CURRENT_COLUMNS = "r.kind, r.id, r.revision, r.hash, r.edited_at, r.deleted,"
            + " r.body::text, r.device_id, p.name, r.change_seq from record_revision r left join person p"
            + " on p.id = r.person_id";

    private static Current current(ResultSet rs) throws SQLException {
        String body = rs.getString(7);
        Object device = rs.getObject(8);
        return new Current(rs.getString(1), rs.getString(2), rs.getInt(3), rs.getString(4),
                rs.getTimestamp(5).toInstant(), rs.getBoolean(6),
                body == null ? null : JsonParser.parseString(body).getAsJsonObject(),
                device == null ? null : device.toString(), rs.getString(9), rs.getLong(10));
    }

    JsonObject changes(Caller who, String afterText, String limitText) {
        long after = 0;
        if (afterText != null && !afterText.isEmpty()) {
            try {
                after = Long.parseLong(afterText);
            } catch (NumberFormatException e) {
                after = -1;
            }
            if (after < 0) {
                throw ApiError.badInput("after", afterText, "a cursor from an earlier reply, or 0",
                        "cursor '" + afterText + "' is not one this server gave; use 0 to start from the beginning");
            }
        }
        int limit = DEFAULT_LIMIT;
        if (limitText != null) {
            try {
                limit = Integer.parseInt(limitText);
            } catch (NumberFormatException e) {
                limit = -1;
            }
            if (limit < 1 || limit > MAX_LIMIT) {
                throw ApiError.badInput("limit", limitText, "1 to " + MAX_LIMIT, "limit '" + limitText
                        + "' must be a whole number from 1 to " + MAX_LIMIT);
            }
        }
        long from = after;
        int max = limit;
        return Sql.inTransaction(db, c -> {
            List<Current> page = new ArrayList<>();
            boolean more;
            try (PreparedStatement ps = c.prepareStatement("select " + CURRENT_COLUMNS + " where r.company_id = ?"
                    + " and r.current and r.change_seq > ? order by r.change_seq limit ?")) {
                ps.setObject(1, who.companyId());
                ps.setLong(2, from);
                ps.setInt(3, max + 1);
                ResultSet rs = ps.executeQuery();
                while (rs.next()) {
                    page.add(current(rs));
                }
            }
            more = page.size() > max;
            if (more) {
                page.remove(page.size() - 1);
            }
            long cursor = page.isEmpty() ? from : page.get(page.size() - 1).changeSeq();
            withParents(c, who.companyId(), page, cursor);
            JsonArray records = new JsonArray();
            page.forEach(r -> records.add(r.toJson()));
            JsonObject out = new JsonObject();
            out.add("records", records);
            out.addProperty("cursor", String.valueOf(cursor));
            out.addProperty("more", more);
            return out;
        });
    }

    /**
     * Parents before children: a record's parent changed after this page's cursor (an edit after the
     * child was made) would come on a later page, after its child; it is added to this page too (the
     * tablet recognises the repeat by its hash). Then the page is ordered by kind, parents first.
     */
    private static void withParents(Connection c, UUID company, List<Current> page, long cursor) throws SQLException {
        Set<String> present = new HashSet<>();
        page.forEach(r -> present.add(r.kind() + "/" + r.id()));
        List<Current> todo = new ArrayList<>(page);
        while (!todo.isEmpty()) {
            List<Current> added = new ArrayList<>();
            for (Current r : todo) {
                for (Map.Entry<String, String> parent : parentsOf(r).entrySet()) {
                    String key = parent.getKey() + "/" + parent.getValue();
                    if (present.add(key)) {
                        try (PreparedStatement ps = c.prepareStatement("select " + CURRENT_COLUMNS
                                + " where r.company_id = ? and r.kind = ? and r.id = ? and r.current and r.change_seq > ?")) {
                            ps.setObject(1, company);
                            ps.setString(2, parent.getKey());
                            ps.setString(3, parent.getValue());
                            ps.setLong(4, cursor);
                            ResultSet rs = ps.executeQuery();
                            if (rs.next()) {
                                added.add(current(rs));
                            }
                        }
                    }
                }
            }
            page.addAll(added);
            todo = added;
        }
        page.sort(Comparator.comparingInt((Current r) -> SyncKind.fromWire(r.kind()).ordinal())
                .thenComparingLong(Current::changeSeq));
    }

    /** The parents a body names: kind → id. */
    static Map<String, String> parentsOf(Current r) {
        Map<String, String> out = new LinkedHashMap<>();
        if (r.body() == null) {
            return out;
        }
        put(out, "site", r.body(), "siteId");
        put(out, "system", r.body(), "systemId");
        put(out, "visit", r.body(), "visitId");
        put(out, "visit", r.body(), "visit_id");
        if (r.kind().equals("site")) {
            out.clear();
        } else if (r.kind().equals("system")) {
            out.keySet().retainAll(Set.of("site"));
        } else if (r.kind().equals("visit")) {
            out.keySet().retainAll(Set.of("site", "system"));
        } else if (!r.kind().equals("house")) {
            out.keySet().retainAll(Set.of("visit"));
        }
        return out;
    }

    private static void put(Map<String, String> out, String kind, JsonObject body, String field) {
        JsonElement e = body.get(field);
        if (e != null && e.isJsonPrimitive() && !out.containsKey(kind)) {
            out.put(kind, e.getAsString());
        }
    }

    // ---- history ------------------------------------------------------------------------------

    JsonObject history(Caller who, String kindWord, String id) {
        SyncKind kind = kind(kindWord);
        return Sql.inTransaction(db, c -> {
            JsonArray revisions = new JsonArray();
            try (PreparedStatement ps = c.prepareStatement("select r.revision, r.hash, r.edited_at, r.device_id, p.name,"
                    + " r.deleted, r.current, r.received_at from record_revision r left join person p on p.id = r.person_id"
                    + " where r.company_id = ? and r.kind = ? and r.id = ? order by r.revision")) {
                ps.setObject(1, who.companyId());
                ps.setString(2, kind.wire());
                ps.setString(3, id);
                ResultSet rs = ps.executeQuery();
                while (rs.next()) {
                    JsonObject o = new JsonObject();
                    o.addProperty("revision", rs.getInt(1));
                    o.addProperty("hash", rs.getString(2));
                    o.addProperty("editedAt", rs.getTimestamp(3).toInstant().atOffset(ZoneOffset.UTC).toString());
                    Object device = rs.getObject(4);
                    o.addProperty("device", device == null ? null : device.toString());
                    o.addProperty("author", rs.getString(5));
                    o.addProperty("deleted", rs.getBoolean(6));
                    o.addProperty("current", rs.getBoolean(7));
                    o.addProperty("receivedAt", rs.getTimestamp(8).toInstant().atOffset(ZoneOffset.UTC).toString());
                    revisions.add(o);
                }
            }
            if (revisions.isEmpty()) {
                throw ApiError.notFound("no " + kind.wire() + " " + id);
            }
            JsonObject out = new JsonObject();
            out.add("revisions", revisions);
            return out;
        });
    }

    static SyncKind kind(String word) {
        SyncKind kind = SyncKind.fromWire(word);
        if (kind == null) {
            throw ApiError.badInput("kind", word, SyncKind.words(), "record kind '" + word + "' is not one of "
                    + SyncKind.words());
        }
        return kind;
    }

    /** The current revision of one record of the company, or empty. */
    static Optional<Current> currentOf(Connection c, UUID company, SyncKind kind, String id) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("select " + CURRENT_COLUMNS + " where r.company_id = ?"
                + " and r.kind = ? and r.id = ? and r.current")) {
            ps.setObject(1, company);
            ps.setString(2, kind.wire());
            ps.setString(3, id);
            ResultSet rs = ps.executeQuery();
            return rs.next() ? Optional.of(current(rs)) : Optional.empty();
        }
    }

    /** Every current revision of the company of one kind that belongs to the visit (its body's visit id). */
    static List<Current> currentOfVisit(Connection c, UUID company, SyncKind kind, String visitId) throws SQLException {
        List<Current> out = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement("select " + CURRENT_COLUMNS + " where r.company_id = ?"
                + " and r.kind = ? and r.current and coalesce(r.body ->> 'visitId', r.body ->> 'visit_id') = ?"
                + " order by r.id")) {
            ps.setObject(1, company);
            ps.setString(2, kind.wire());
            ps.setString(3, visitId);
            ResultSet rs = ps.executeQuery();
            while (rs.next()) {
                out.add(current(rs));
            }
        }
        return out;
    }
}
