package app.latentledger.store;

import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.SignOff;
import app.latentledger.core.records.VisitPaperwork;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.Optional;

/** A visit's written part: the customer's words, the work done and the sign-offs. */
public final class PaperworkRepository {
    private final Database db;

    PaperworkRepository(Database db) {
        this.db = db;
    }

    /** Saves the visit's paperwork, replacing what was there. */
    public void save(VisitPaperwork w) {
        db.write(c -> {
            if (VisitRepository.find(c, w.visitId()).isEmpty()) {
                throw new InvalidRecordException("paperwork visit", "no visit with id " + w.visitId() + " in this ledger");
            }
            try (PreparedStatement p = c.prepareStatement("INSERT INTO visit_paperwork (visit_id, customer_words,"
                    + " work_done, technician_name, technician_signed_at, technician_remark, customer_name,"
                    + " customer_signed_at, customer_remark) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)"
                    + " ON CONFLICT (visit_id) DO UPDATE SET customer_words = excluded.customer_words,"
                    + " work_done = excluded.work_done, technician_name = excluded.technician_name,"
                    + " technician_signed_at = excluded.technician_signed_at,"
                    + " technician_remark = excluded.technician_remark, customer_name = excluded.customer_name,"
                    + " customer_signed_at = excluded.customer_signed_at, customer_remark = excluded.customer_remark")) {
                p.setString(1, w.visitId());
                p.setString(2, w.customerWords());
                p.setString(3, w.workDone());
                signOff(p, 4, w.technician());
                signOff(p, 7, w.customer());
                p.executeUpdate();
            }
            return null;
        });
    }

    private static void signOff(PreparedStatement p, int i, SignOff s) throws SQLException {
        Sql.setNullableText(p, i, s == null ? null : s.name());
        Sql.setNullableText(p, i + 1, s == null ? null : Sql.time(s.signedAt()));
        Sql.setNullableText(p, i + 2, s == null ? null : s.remark());
    }

    /** The visit's paperwork, or empty when nothing was written yet. */
    public Optional<VisitPaperwork> find(String visitId) {
        return db.read(c -> find(c, visitId));
    }

    /** The visit's paperwork, blank when nothing was written yet. */
    public VisitPaperwork forVisit(String visitId) {
        return find(visitId).orElse(VisitPaperwork.blank(visitId));
    }

    static Optional<VisitPaperwork> find(Connection c, String visitId) throws SQLException {
        try (PreparedStatement p = c.prepareStatement("SELECT * FROM visit_paperwork WHERE visit_id = ?")) {
            p.setString(1, visitId);
            try (ResultSet r = p.executeQuery()) {
                if (!r.next()) {
                    return Optional.empty();
                }
                return Optional.of(new VisitPaperwork(r.getString("visit_id"), r.getString("customer_words"),
                        r.getString("work_done"), signOff(r, "technician"), signOff(r, "customer")));
            }
        }
    }

    private static SignOff signOff(ResultSet r, String who) throws SQLException {
        String name = r.getString(who + "_name");
        if (name == null) {
            return null;
        }
        String remark = r.getString(who + "_remark");
        return new SignOff(name, Sql.time(r, who + "_signed_at"), remark == null ? "" : remark);
    }
}
