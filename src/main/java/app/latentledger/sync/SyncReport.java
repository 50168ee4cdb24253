package app.latentledger.sync;

import app.latentledger.sync.wire.Refusal;
import app.latentledger.sync.wire.SyncKind;

import java.util.List;

/**
 * What one sync did.
 *
 * @param sent          records the server stored as new revisions (including deletions)
 * @param alreadyThere  records the server already held with the same content
 * @param keptAside     records stored as a revision while another, later one stays current
 * @param refused       records the server refused (kept here, shown, sent again once changed)
 * @param sampleBytes   log sample bytes uploaded
 * @param received      records put into this ledger from the office
 * @param keptLocal     records changed at the office and here; this tablet's edit was kept and goes next time
 * @param waiting       records still waiting to go after this sync
 */
public record SyncReport(int sent, int alreadyThere, int keptAside, List<Refused> refused, long sampleBytes,
                         int received, int keptLocal, int waiting) {
    /** A record the server refused, with why. */
    public record Refused(SyncKind kind, String id, Refusal refusal) {
        /** "readings 1f0c…: return rh 150 % refused: accepted range 0 to 100 %". */
        public String sentence() {
            return kind.wire() + " " + id + ": " + refusal.message();
        }
    }

    public SyncReport {
        refused = List.copyOf(refused);
    }

    /** One line for the tech: what went, what came, what was refused. */
    public String summary() {
        StringBuilder b = new StringBuilder("Sent " + sent + (sent == 1 ? " record" : " records"));
        if (alreadyThere > 0) {
            b.append(" (").append(alreadyThere).append(" already at the office)");
        }
        b.append(", received ").append(received).append('.');
        if (keptAside > 0) {
            b.append(' ').append(keptAside).append(keptAside == 1 ? " edit was" : " edits were")
                    .append(" kept at the office beside a later one (see the record's history).");
        }
        if (keptLocal > 0) {
            b.append(' ').append(keptLocal).append(keptLocal == 1 ? " record" : " records")
                    .append(" changed both here and at the office: this tablet's edit was kept and goes next time.");
        }
        if (!refused.isEmpty()) {
            b.append(' ').append(refused.size()).append(refused.size() == 1 ? " record was" : " records were")
                    .append(" refused and stay on this tablet: ");
            for (int i = 0; i < refused.size(); i++) {
                b.append(i == 0 ? "" : "; ").append(refused.get(i).sentence());
            }
            b.append('.');
        }
        return b.toString();
    }
}
