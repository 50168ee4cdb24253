package app.latentledger.server;

import app.latentledger.sync.wire.Refusal;
import app.latentledger.sync.wire.SyncKind;
import app.latentledger.sync.wire.WireCodec;
import app.latentledger.sync.wire.WireHash;
import app.latentledger.sync.wire.WireRecord;
import app.latentledger.sync.wire.WireValidation;
import com.google.gson.JsonObject;

import java.io.ByteArrayOutputStream;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.List;

/**
 * A log's samples, uploaded in chunks that can resume after a broken connection. The upload belongs
 * to the current revision of the log record ({@code samplesBytes}, {@code samplesSha256}); a new edit
 * of the log with other samples starts a new upload. When the last byte is in, the whole is checked
 * against the declared SHA-256 and by the same log checks as a bundle's samples; a failure drops the
 * chunks (422) so the tablet sends them again from the start.
 */
final class LogSamples {
    /** The largest chunk accepted in one request. */
    static final int MAX_CHUNK = 1 << 20;

    private final OfficeDatabase db;

    LogSamples(OfficeDatabase db) {
        this.db = db;
    }

    /** What the current log revision declares; 404 when the company has no such live log. */
    private record Declared(String sha256, long bytes, SyncService.Current log) {
    }

    private static Declared declared(Connection c, Caller who, String logId) throws SQLException {
        SyncService.Current log = SyncService.currentOf(c, who.companyId(), SyncKind.LOG, logId)
                .filter(l -> !l.deleted())
                .orElseThrow(() -> ApiError.notFound("no log " + logId + " on the server; push the log record first"));
        return new Declared(WireCodec.samplesSha256(log.body()), WireCodec.samplesBytes(log.body()), log);
    }

    JsonObject status(Caller who, String logId) {
        return Sql.inTransaction(db, c -> {
            Declared d = declared(c, who, logId);
            long received = 0;
            boolean complete = false;
            try (PreparedStatement ps = c.prepareStatement("select received_bytes, complete from log_samples where"
                    + " company_id = ? and log_id = ? and samples_sha256 = ?")) {
                ps.setObject(1, who.companyId());
                ps.setString(2, logId);
                ps.setString(3, d.sha256());
                ResultSet rs = ps.executeQuery();
                if (rs.next()) {
                    received = rs.getLong(1);
                    complete = rs.getBoolean(2);
                }
            }
            return status(received, complete || d.bytes() == 0, d.bytes());
        });
    }

    private static JsonObject status(long received, boolean complete, long total) {
        JsonObject o = new JsonObject();
        o.addProperty("receivedBytes", received);
        o.addProperty("complete", complete);
        o.addProperty("samplesBytes", total);
        return o;
    }

    /** What one chunk did: the new status, or the 422 refusal after the chunks were dropped. */
    private record Outcome(JsonObject status, Refusal refused) {
    }

    JsonObject put(Caller who, String logId, String offsetText, byte[] chunk) {
        long offset;
        try {
            offset = Long.parseLong(offsetText == null ? "" : offsetText);
        } catch (NumberFormatException e) {
            offset = -1;
        }
        if (offset < 0) {
            throw ApiError.badInput("offset", offsetText, "0 or more (the receivedBytes from the status)",
                    "offset '" + offsetText + "' must be a whole number of bytes, 0 or more");
        }
        if (chunk.length == 0 || chunk.length > MAX_CHUNK) {
            throw ApiError.badInput("body", chunk.length + " bytes", "1 to " + MAX_CHUNK + " bytes",
                    "a chunk must have 1 to " + MAX_CHUNK + " bytes; this one has " + chunk.length);
        }
        long at = offset;
        Outcome outcome = Sql.inTransaction(db, c -> {
            Declared d = declared(c, who, logId);
            try (PreparedStatement ps = c.prepareStatement("insert into log_samples (company_id, log_id, samples_sha256,"
                    + " samples_bytes) values (?, ?, ?, ?) on conflict do nothing")) {
                ps.setObject(1, who.companyId());
                ps.setString(2, logId);
                ps.setString(3, d.sha256());
                ps.setLong(4, d.bytes());
                ps.executeUpdate();
            }
            long received;
            boolean complete;
            try (PreparedStatement ps = c.prepareStatement("select received_bytes, complete from log_samples where"
                    + " company_id = ? and log_id = ? and samples_sha256 = ? for update")) {
                ps.setObject(1, who.companyId());
                ps.setString(2, logId);
                ps.setString(3, d.sha256());
                ResultSet rs = ps.executeQuery();
                rs.next();
                received = rs.getLong(1);
                complete = rs.getBoolean(2);
            }
            if (complete || at != received) {
                throw new ApiError(409, "wrong-offset", complete ? "these samples are already complete"
                        : "offset " + at + " is not where the upload stands: send from byte " + received)
                        .with("receivedBytes", received);
            }
            if (at + chunk.length > d.bytes()) {
                throw ApiError.badInput("body", (at + chunk.length) + " bytes", "up to samplesBytes = " + d.bytes(),
                        "this chunk ends at byte " + (at + chunk.length) + ", past the " + d.bytes()
                                + " bytes the log record declares");
            }
            try (PreparedStatement ps = c.prepareStatement("insert into log_sample_chunk (company_id, log_id,"
                    + " samples_sha256, byte_offset, bytes) values (?, ?, ?, ?, ?)")) {
                ps.setObject(1, who.companyId());
                ps.setString(2, logId);
                ps.setString(3, d.sha256());
                ps.setLong(4, at);
                ps.setBytes(5, chunk);
                ps.executeUpdate();
            }
            long now = at + chunk.length;
            Refusal refused = null;
            boolean done = false;
            if (now == d.bytes()) {
                byte[] all = assemble(c, who, logId, d.sha256());
                if (!WireHash.sha256(all).equals(d.sha256())) {
                    refused = new Refusal("samplesSha256", WireHash.sha256(all), d.sha256(),
                            "the samples received do not match the SHA-256 the log record declares; send them again");
                } else {
                    WireRecord log = new WireRecord(SyncKind.LOG, logId, d.log().hash(), null, d.log().editedAt(),
                            false, d.log().body());
                    List<Refusal> r = WireValidation.checkSamples(log, all);
                    refused = r.isEmpty() ? null : r.get(0);
                }
                done = refused == null;
            }
            if (refused != null) {
                try (PreparedStatement ps = c.prepareStatement("delete from log_sample_chunk where company_id = ? and"
                        + " log_id = ? and samples_sha256 = ?")) {
                    ps.setObject(1, who.companyId());
                    ps.setString(2, logId);
                    ps.setString(3, d.sha256());
                    ps.executeUpdate();
                }
                now = 0;
            }
            try (PreparedStatement ps = c.prepareStatement("update log_samples set received_bytes = ?, complete = ?,"
                    + " completed_at = case when ? then now() end where company_id = ? and log_id = ? and samples_sha256 = ?")) {
                ps.setLong(1, now);
                ps.setBoolean(2, done);
                ps.setBoolean(3, done);
                ps.setObject(4, who.companyId());
                ps.setString(5, logId);
                ps.setString(6, d.sha256());
                ps.executeUpdate();
            }
            Audit.write(c, who, refused != null ? "samples-refused" : done ? "samples-complete" : "samples-chunk", "log",
                    logId, d.log().revision(), "offset " + at + ", " + chunk.length + " bytes");
            return new Outcome(status(now, done, d.bytes()), refused);
        });
        if (outcome.refused() != null) {
            ApiError e = new ApiError(422, "samples-refused", outcome.refused().message());
            e.with("receivedBytes", 0);
            throw e.field(outcome.refused().field(), outcome.refused().value(), outcome.refused().range());
        }
        return outcome.status();
    }

    private static byte[] assemble(Connection c, Caller who, String logId, String sha) throws SQLException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (PreparedStatement ps = c.prepareStatement("select bytes from log_sample_chunk where company_id = ? and"
                + " log_id = ? and samples_sha256 = ? order by byte_offset")) {
            ps.setObject(1, who.companyId());
            ps.setString(2, logId);
            ps.setString(3, sha);
            ResultSet rs = ps.executeQuery();
            while (rs.next()) {
                out.writeBytes(rs.getBytes(1));
            }
        }
        return out.toByteArray();
    }

    /** The complete samples of the log's current revision, or null when they are not all in. */
    static byte[] complete(Connection c, Caller who, String logId) throws SQLException {
        Declared d = declared(c, who, logId);
        if (d.bytes() == 0) {
            return new byte[0];
        }
        try (PreparedStatement ps = c.prepareStatement("select complete from log_samples where company_id = ? and"
                + " log_id = ? and samples_sha256 = ?")) {
            ps.setObject(1, who.companyId());
            ps.setString(2, logId);
            ps.setString(3, d.sha256());
            ResultSet rs = ps.executeQuery();
            if (!rs.next() || !rs.getBoolean(1)) {
                return null;
            }
        }
        return assemble(c, who, logId, d.sha256());
    }

    /** The samples as CSV bytes; {@code Range: bytes=n-} resumes a download (206). */
    Reply get(Caller who, String logId, String range) {
        byte[] all = Sql.inTransaction(db, c -> complete(c, who, logId));
        if (all == null) {
            throw new ApiError(409, "samples-incomplete", "the samples of log " + logId + " are not all on the server yet");
        }
        if (range == null) {
            return Reply.bytes(200, "text/csv; charset=utf-8", all).withHeader("Accept-Ranges", "bytes");
        }
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("bytes=(\\d{1,18})-").matcher(range.strip());
        long from = m.matches() ? Long.parseLong(m.group(1)) : -1;
        if (from < 0 || from > all.length) {
            throw new ApiError(416, "bad-range", "range '" + range + "' is not bytes=N- with N from 0 to " + all.length)
                    .header("Content-Range", "bytes */" + all.length);
        }
        byte[] part = java.util.Arrays.copyOfRange(all, (int) from, all.length);
        return Reply.bytes(206, "text/csv; charset=utf-8", part)
                .withHeader("Content-Range", "bytes " + from + "-" + (all.length - 1) + "/" + all.length);
    }
}
