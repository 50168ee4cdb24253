package app.latentledger.sync;

import app.latentledger.core.records.BinEntry;
import app.latentledger.store.Ledger;
import app.latentledger.sync.wire.Refusal;
import app.latentledger.sync.wire.SyncKind;
import app.latentledger.sync.wire.WireCodec;
import app.latentledger.sync.wire.WireHash;
import app.latentledger.sync.wire.WireRecord;
import app.latentledger.sync.wire.WireValidation;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The tablet's end of the office sync (docs/office-server.md). One sync: push every record whose
 * hash differs from the one last agreed with the server (parents first, at most {@link #MAX_PUSH}
 * per request, deletions from the recycle bin included), upload each pushed log's samples in
 * chunks of at most {@link #CHUNK_BYTES} resuming where the server stopped, then pull the company's
 * changes since the stored cursor, one transaction per page with the cursor stored in it.
 *
 * <p>Nothing here blocks a screen: the app calls it on a background thread. Without a network the
 * sync stops with a plain message and nothing local changes; the next sync starts over from the
 * stored state, and the server's answers make a repeated push harmless (same hash: unchanged).
 */
public final class OfficeSync {
    /** Records per push request (the server takes at most 500). */
    public static final int MAX_PUSH = 500;
    /** Bytes per log-samples chunk (the server takes at most 1 MiB). */
    public static final int CHUNK_BYTES = 1 << 20;
    /** Records per page of changes asked for. */
    static final int PAGE = 500;

    private final Ledger ledger;
    private final SyncState state;
    private final LocalRecords local;
    private final TokenFile tokens;
    private final HttpClient client;
    private final int pushBatch;
    private final int chunkBytes;
    private final java.time.Clock clock;

    public OfficeSync(Ledger ledger) {
        this(ledger, OfficeHttp.newClient(), MAX_PUSH, CHUNK_BYTES, java.time.Clock.systemUTC());
    }

    /**
     * For tests: a given HTTP client, smaller batches, and the clock that stamps each sent edit's
     * {@code editedAt} (a tablet's clock may run behind another's).
     */
    OfficeSync(Ledger ledger, HttpClient client, int pushBatch, int chunkBytes, java.time.Clock clock) {
        this.clock = clock;
        this.ledger = ledger;
        this.state = new SyncState(ledger.database());
        this.local = new LocalRecords(ledger);
        Path dataDir = ledger.database().file().toAbsolutePath().getParent();
        this.tokens = new TokenFile(dataDir);
        this.client = client;
        this.pushBatch = Math.min(pushBatch, MAX_PUSH);
        this.chunkBytes = Math.min(chunkBytes, CHUNK_BYTES);
    }

    public SyncState state() {
        return state;
    }

    // ---- enrol --------------------------------------------------------------------------------

    /**
     * Enrols this tablet with a one-time code from the office. The token is kept in a private
     * file; the account in the ledger. Enrolling again (another code, another server) starts the
     * sync afresh: every record is offered once more and the server skips what it holds.
     */
    public OfficeAccount enrol(String serverUrl, String code, String deviceName) {
        String url = OfficeHttp.normalise(serverUrl);
        String c = code == null ? "" : code.strip();
        if (c.isEmpty() || c.length() > 64) {
            throw new SyncException(SyncException.Kind.BAD_INPUT, "enrolment code '" + c + "' refused: give the code"
                    + " the office gave you (like ABCD-EFGH-JKLM)");
        }
        String name = deviceName == null || deviceName.isBlank() ? "Tablet" : deviceName.strip();
        if (name.length() > 100) {
            throw new SyncException(SyncException.Kind.BAD_INPUT, "device name refused: " + name.length()
                    + " characters; at most 100");
        }
        JsonObject request = new JsonObject();
        request.addProperty("code", c);
        request.addProperty("deviceName", name);
        OfficeHttp.Answer a = new OfficeHttp(client, url, null).postJson("/enrol", request);
        if (a.status() != 200) {
            throw OfficeHttp.unexpected("enrolment refused (the code may be used, mistyped or older than 24 h; ask"
                    + " the office for a new one)", a);
        }
        JsonObject o = a.json();
        String token = text(o, "token");
        OfficeAccount account = new OfficeAccount(url, text(o, "deviceId"), name, optional(o, "company"),
                optional(o, "technician"), o.has("role") ? optional(o, "role") : "technician",
                OffsetDateTime.now().truncatedTo(java.time.temporal.ChronoUnit.SECONDS));
        tokens.write(token);
        state.enrol(account);
        return account;
    }

    // ---- status -------------------------------------------------------------------------------

    /** Where the tablet stands: account, last sync, what is waiting and what was refused. */
    public SyncStatus status() {
        Optional<OfficeAccount> account = state.account();
        Plan plan = plan();
        List<SyncReport.Refused> refusals = new ArrayList<>();
        for (WireRecord r : plan.push) {
            SyncState.Row row = plan.rows.get(SyncState.key(r.kind(), r.id()));
            if (row != null && row.refusal() != null && r.hash().equals(row.refusedHash())) {
                refusals.add(new SyncReport.Refused(r.kind(), r.id(), row.refusal()));
            }
        }
        return new SyncStatus(account, state.lastSync(), plan.push.size() + plan.samples.size(), refusals);
    }

    // ---- sync ---------------------------------------------------------------------------------

    /** What is to go: changed records in push order, and logs whose samples are still to upload. */
    private record Plan(List<WireRecord> push, Map<String, LocalRecords.Local> locals, List<LocalRecords.Local> samples,
                        Map<String, SyncState.Row> rows) {
    }

    private Plan plan() {
        Map<String, SyncState.Row> rows = state.rows();
        List<WireRecord> push = new ArrayList<>();
        Map<String, LocalRecords.Local> locals = new HashMap<>();
        List<LocalRecords.Local> samples = new ArrayList<>();
        // a change is stamped when it is first sent: the ledger keeps no edit time per record
        Instant now = clock.instant();
        for (LocalRecords.Local l : local.all()) {
            SyncState.Row row = rows.get(SyncState.key(l.kind(), l.id()));
            String synced = row == null ? null : row.syncedHash();
            locals.put(SyncState.key(l.kind(), l.id()), l);
            if (!l.hash().equals(synced)) {
                push.add(new WireRecord(l.kind(), l.id(), l.hash(), synced, now, false, l.body()));
            } else if (l.kind() == SyncKind.LOG && !row.samplesDone()) {
                samples.add(l);
            }
        }
        // deletions: what the office holds live and this tablet moved to its recycle bin
        for (BinEntry e : ledger.recycleBin().list()) {
            SyncKind kind = LocalRecords.syncKind(e.kind());
            SyncState.Row row = rows.get(SyncState.key(kind, e.recordId()));
            if (row != null && row.syncedHash() != null && !row.syncedHash().equals(WireHash.DELETED)
                    && !locals.containsKey(SyncState.key(kind, e.recordId()))) {
                push.add(WireRecord.deletion(kind, e.recordId(), row.syncedHash(), e.deletedAt().toInstant()));
            }
        }
        return new Plan(push, locals, samples, rows);
    }

    /**
     * Pushes what changed here, uploads log samples, pulls what changed at the office.
     *
     * @throws SyncException when the tablet is not enrolled, the server cannot be reached, the
     *                       token was revoked, or the server answers something unusable; what was
     *                       done before stays done and the rest goes next time
     */
    public SyncReport syncNow() {
        OfficeAccount account = state.account().orElseThrow(() -> new SyncException(SyncException.Kind.NOT_ENROLLED,
                "this tablet is not enrolled with an office yet: enrol it with the server address and a code from"
                        + " the office"));
        String token = tokens.read().orElseThrow(() -> new SyncException(SyncException.Kind.NOT_ENROLLED,
                "this tablet's office token is missing (" + tokens.path() + "); enrol again"));
        OfficeHttp http = new OfficeHttp(client, account.serverUrl(), token);
        OffsetDateTime started = OffsetDateTime.now().truncatedTo(java.time.temporal.ChronoUnit.SECONDS);
        try {
            Counts n = new Counts();
            Plan plan = plan();
            push(http, plan, n);
            for (LocalRecords.Local l : plan.samples) {
                upload(http, l, n);
            }
            pull(http, n);
            retryWaitingLogs(http, n);
            SyncReport report = new SyncReport(n.sent, n.unchanged, n.kept, n.refused, n.bytes, n.received,
                    n.keptLocal, status().waiting());
            state.recordOutcome(started, n.refused.isEmpty() ? "done" : "refusals", report.summary());
            return report;
        } catch (SyncException e) {
            state.recordOutcome(started, "failed", e.getMessage());
            throw e;
        }
    }

    private static final class Counts {
        int sent;
        int unchanged;
        int kept;
        int received;
        int keptLocal;
        long bytes;
        final List<SyncReport.Refused> refused = new ArrayList<>();
    }

    private void push(OfficeHttp http, Plan plan, Counts n) {
        List<WireRecord> all = plan.push;
        for (int from = 0; from < all.size(); from += pushBatch) {
            List<WireRecord> batch = all.subList(from, Math.min(all.size(), from + pushBatch));
            JsonArray records = new JsonArray();
            batch.forEach(r -> records.add(WireCodec.toJson(r)));
            JsonObject request = new JsonObject();
            request.add("records", records);
            OfficeHttp.Answer a = http.postJson("/sync/push", request);
            if (a.status() != 200) {
                throw OfficeHttp.unexpected("the push was not taken", a);
            }
            JsonElement results = a.json().get("results");
            if (results == null || !results.isJsonArray() || results.getAsJsonArray().size() != batch.size()) {
                throw new SyncException(SyncException.Kind.SERVER, "the office server's answer to a push does not list"
                        + " one result per record sent; nothing is lost, the next sync sends them again");
            }
            // every answer is recorded before any samples go, so a failed upload leaves only the log waiting
            List<WireRecord> logs = new ArrayList<>();
            for (int i = 0; i < batch.size(); i++) {
                if (result(batch.get(i), results.getAsJsonArray().get(i).getAsJsonObject(), n)) {
                    logs.add(batch.get(i));
                }
            }
            for (WireRecord log : logs) {
                upload(http, plan.locals.get(SyncState.key(log.kind(), log.id())), n);
            }
        }
    }

    /** Records the server's answer for one pushed record. @return true when its log samples are to go */
    private boolean result(WireRecord r, JsonObject result, Counts n) {
        String status = optional(result, "status");
        String revision = optional(result, "revision");
        switch (status) {
            case "stored", "unchanged", "kept-as-revision" -> {
                boolean log = r.kind() == SyncKind.LOG && !r.deleted();
                state.synced(r.kind(), r.id(), r.hash(), revision.isEmpty() ? null : revision, !log);
                if (status.equals("stored")) {
                    n.sent++;
                } else if (status.equals("unchanged")) {
                    n.unchanged++;
                } else {
                    n.kept++;
                }
                if (status.equals("kept-as-revision") || status.equals("stored") && r.baseHash() != null) {
                    // an edit of a record the office already had: keep this tablet's revision visible here,
                    // beside the one the pull may bring (the first sending of a record is not copied)
                    state.addRevision(new SyncState.Revision(r.kind(), r.id(), revision.isEmpty() ? r.hash() : revision,
                            r.hash(), r.editedAt().toString(), "this tablet", "", r.deleted(),
                            r.body() == null ? null : WireCodec.GSON.toJson(r.body()), status.equals("stored"),
                            status.equals("stored") ? "sent from this tablet"
                                    : "this tablet's edit; a later revision is current at the office"));
                }
                return log;
            }
            case "refused" -> {
                JsonElement why = result.get("refused");
                Refusal refusal = why != null && why.isJsonObject() ? Refusal.fromJson(why.getAsJsonObject())
                        : new Refusal("", "", "", "refused by the office server");
                state.refused(r.kind(), r.id(), r.hash(), refusal);
                n.refused.add(new SyncReport.Refused(r.kind(), r.id(), refusal));
                return false;
            }
            default -> throw new SyncException(SyncException.Kind.SERVER, "the office server answered status '"
                    + status + "' for " + r.kind().wire() + " " + r.id() + "; expected stored, unchanged,"
                    + " kept-as-revision or refused");
        }
    }

    /** Uploads a log's samples from where the server stopped, in chunks; resumable at any point. */
    private void upload(OfficeHttp http, LocalRecords.Local l, Counts n) {
        String path = "/logs/" + enc(l.id()) + "/samples";
        OfficeHttp.Answer s = http.get(path + "/status");
        if (s.status() != 200) {
            throw OfficeHttp.unexpected("the log samples' upload status could not be read", s);
        }
        JsonObject st = s.json();
        if (st.has("complete") && st.get("complete").getAsBoolean()) {
            state.samplesDone(SyncKind.LOG, l.id());
            return;
        }
        byte[] bytes = WireCodec.samples(l.log());
        long offset = st.has("receivedBytes") ? st.get("receivedBytes").getAsLong() : 0;
        while (true) {
            if (offset < 0 || offset > bytes.length) {
                throw new SyncException(SyncException.Kind.SERVER, "the office server says it holds " + offset
                        + " bytes of log " + l.id() + "'s " + bytes.length + "; the next sync tries again");
            }
            int size = (int) Math.min(chunkBytes, bytes.length - offset);
            byte[] chunk = java.util.Arrays.copyOfRange(bytes, (int) offset, (int) offset + size);
            OfficeHttp.Answer a = http.put(path + "?offset=" + offset, chunk);
            if (a.status() == 409) {
                offset = a.json().get("receivedBytes").getAsLong();
                continue;
            }
            if (a.status() == 422) {
                JsonObject o = a.json();
                Refusal refusal = new Refusal(optional(o, "field").isEmpty() ? "samplesSha256" : optional(o, "field"),
                        "", "", "log samples refused: " + optional(o, "message"));
                state.refused(SyncKind.LOG, l.id(), l.hash(), refusal);
                n.refused.add(new SyncReport.Refused(SyncKind.LOG, l.id(), refusal));
                return;
            }
            if (a.status() != 200) {
                throw OfficeHttp.unexpected("a chunk of log " + l.id() + "'s samples was not taken", a);
            }
            n.bytes += size;
            JsonObject o = a.json();
            offset = o.has("receivedBytes") ? o.get("receivedBytes").getAsLong() : offset + size;
            if (o.has("complete") && o.get("complete").getAsBoolean()) {
                state.samplesDone(SyncKind.LOG, l.id());
                return;
            }
            if (offset >= bytes.length) {
                throw new SyncException(SyncException.Kind.SERVER, "the office server holds all of log " + l.id()
                        + "'s samples but does not call them complete; the next sync asks again");
            }
        }
    }

    private void pull(OfficeHttp http, Counts n) {
        while (true) {
            String cursor = state.cursor();
            OfficeHttp.Answer a = http.get("/sync/changes?after=" + enc(cursor) + "&limit=" + PAGE);
            if (a.status() != 200) {
                throw OfficeHttp.unexpected("the office's changes could not be read", a);
            }
            JsonObject page = a.json();
            JsonElement list = page.get("records");
            if (list == null || !list.isJsonArray() || !page.has("cursor")) {
                throw new SyncException(SyncException.Kind.SERVER, "the office server's page of changes has no"
                        + " records list or no cursor");
            }
            List<WireCodec.Change> changes = new ArrayList<>();
            for (JsonElement e : list.getAsJsonArray()) {
                changes.add(WireCodec.change(e));
            }
            // samples are fetched before the page's transaction: no network wait holds the ledger
            Map<String, byte[]> samples = new HashMap<>();
            for (WireCodec.Change c : changes) {
                WireRecord r = c.record();
                if (r.kind() == SyncKind.LOG && !r.deleted() && needs(r)) {
                    fetchSamples(http, r).ifPresent(b -> samples.put(r.id(), b));
                }
            }
            String next = page.get("cursor").getAsString();
            ledger.database().write(conn -> {
                for (WireCodec.Change c : changes) {
                    apply(conn, c, samples.get(c.record().id()), n);
                }
                state.setCursor(conn, next);
                return null;
            });
            boolean more = page.has("more") && page.get("more").getAsBoolean();
            if (!more || changes.isEmpty()) {
                return;
            }
        }
    }

    /** Whether a pulled record differs from what is here (a log's samples are then fetched). */
    private boolean needs(WireRecord r) {
        return local.find(r.kind(), r.id()).map(l -> !l.hash().equals(r.hash())).orElse(true);
    }

    private Optional<byte[]> fetchSamples(OfficeHttp http, WireRecord r) {
        OfficeHttp.Answer a = http.get("/logs/" + enc(r.id()) + "/samples");
        if (a.status() == 404 || a.status() == 409) {
            return Optional.empty();
        }
        if (a.status() != 200) {
            throw OfficeHttp.unexpected("log " + r.id() + "'s samples could not be fetched", a);
        }
        return WireValidation.checkSamples(r, a.body()).isEmpty() ? Optional.of(a.body()) : Optional.empty();
    }

    /**
     * Applies one pulled record inside the page's transaction, in its own savepoint so a record
     * this ledger cannot take is kept in the history, not allowed to stop the page.
     */
    private void apply(Connection conn, WireCodec.Change c, byte[] samples, Counts n) throws SQLException {
        WireRecord r = c.record();
        Optional<SyncState.Row> row = state.row(conn, r.kind(), r.id());
        Optional<LocalRecords.Local> here = local.find(r.kind(), r.id());
        String body = r.body() == null ? null : WireCodec.GSON.toJson(r.body());
        if (here.isPresent() && here.get().hash().equals(r.hash())) {
            // already the same here (this tablet's own push, or an earlier pull)
            state.synced(conn, r.kind(), r.id(), r.hash(), c.revision(), row.map(SyncState.Row::samplesDone).orElse(true));
            return;
        }
        String synced = row.map(SyncState.Row::syncedHash).orElse(null);
        boolean unchangedHere = here.isEmpty() ? !local.inBin(r.kind(), r.id()) || r.deleted()
                : here.get().hash().equals(synced);
        String note = "";
        boolean applied = false;
        if (!unchangedHere) {
            note = here.isPresent() ? "changed on this tablet too: this tablet's edit was kept and goes to the office"
                    : "deleted on this tablet; the office still has it";
            n.keptLocal++;
        } else if (!r.deleted() && !WireValidation.check(r).isEmpty()) {
            // the same checks as every way in: a record this ledger would refuse stays in the history only
            note = "not taken here: " + WireValidation.check(r).get(0).message();
        } else {
            exec(conn, "SAVEPOINT pulled");
            try {
                if (r.deleted()) {
                    if (here.isPresent() && !local.delete(r.kind(), r.id(), r.editedAt().atOffset(ZoneOffset.UTC))) {
                        note = "deleted at the office; this part goes with its visit here";
                    }
                } else if (r.kind() == SyncKind.LOG && samples == null) {
                    note = SyncState.NOTE_SAMPLES;
                } else {
                    local.save(r, samples);
                }
                exec(conn, "RELEASE pulled");
                applied = note.isEmpty();
            } catch (IllegalArgumentException | app.latentledger.store.StoreException e) {
                exec(conn, "ROLLBACK TO pulled");
                exec(conn, "RELEASE pulled");
                note = "not taken here: " + e.getMessage();
            }
            if (applied) {
                state.synced(conn, r.kind(), r.id(), r.hash(), c.revision(), true);
                state.supersede(conn, r.kind(), r.id());
                n.received++;
            }
        }
        state.addRevision(conn, new SyncState.Revision(r.kind(), r.id(), c.revision().isEmpty() ? r.hash()
                : c.revision(), r.hash(), r.editedAt().toString(), c.device(), c.author(), r.deleted(), body, applied,
                note));
    }

    /** Logs pulled earlier whose samples were not complete at the office then. */
    private void retryWaitingLogs(OfficeHttp http, Counts n) {
        for (SyncState.Revision v : state.waitingForSamples()) {
            if (v.body() == null) {
                continue;
            }
            WireRecord r = new WireRecord(v.kind(), v.id(), v.hash(), null, OffsetDateTime.parse(v.editedAt()).toInstant(),
                    false, WireCodec.parse(v.body()).getAsJsonObject());
            Optional<byte[]> samples = fetchSamples(http, r);
            if (samples.isEmpty()) {
                continue;
            }
            ledger.database().write(conn -> {
                apply(conn, new WireCodec.Change(r, v.revision(), v.device(), v.author()), samples.get(), n);
                return null;
            });
        }
    }

    private static void exec(Connection c, String sql) throws SQLException {
        try (Statement s = c.createStatement()) {
            s.execute(sql);
        }
    }

    private static String enc(String s) {
        return URLEncoder.encode(s, StandardCharsets.UTF_8);
    }

    private static String text(JsonObject o, String name) {
        String v = optional(o, name);
        if (v.isEmpty()) {
            throw new SyncException(SyncException.Kind.SERVER, "the office server's answer has no " + name);
        }
        return v;
    }

    private static String optional(JsonObject o, String name) {
        JsonElement e = o.get(name);
        return e == null || e.isJsonNull() || !e.isJsonPrimitive() ? "" : e.getAsString();
    }

}
