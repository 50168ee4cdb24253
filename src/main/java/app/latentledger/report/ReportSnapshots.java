package app.latentledger.report;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.Estimate;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.findings.Evidence;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.records.Ids;
import app.latentledger.core.records.ResultsSnapshot;
import app.latentledger.core.records.SnapshotSubject;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.AppVersion;
import app.latentledger.store.Ledger;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;

import java.time.OffsetDateTime;

/**
 * What a report showed, kept with the readings it came from: when a report file is written, each
 * reading set it worked out gets a {@link ResultsSnapshot} of its results and findings, as printed,
 * with the app version that computed them. A later version with other formulas or thresholds can
 * then still say what the customer was given on the day.
 */
final class ReportSnapshots {
    private ReportSnapshots() {
    }

    /** Saves one snapshot per worked-out reading set of the report, each in its own transaction. */
    static void keep(Ledger ledger, ReportData data, OffsetDateTime madeAt) {
        for (VisitEvidence v : data.visits()) {
            for (CheckedReadings c : v.checkedReadings()) {
                if (c.checked()) {
                    ledger.snapshots().save(new ResultsSnapshot(Ids.newId(), SnapshotSubject.READING_SET, c.set().id(),
                            AppVersion.current(), madeAt, json(c.result(), data.units()).toString()));
                }
            }
        }
    }

    /** The results (SI value, expanded uncertainty and the printed text) and the findings as worded. */
    static JsonObject json(CoilResult r, UnitSystem units) {
        JsonObject o = new JsonObject();
        o.addProperty("units", units.key());
        o.addProperty("verdict", r.verdict().name().toLowerCase(java.util.Locale.ROOT));
        JsonObject figures = new JsonObject();
        for (Measurand m : Measurand.values()) {
            Estimate e = r.estimate(m);
            if (e != null && e.exists()) {
                JsonObject f = new JsonObject();
                f.addProperty("valueSi", e.valueSi());
                if (Double.isFinite(e.expandedSi())) {
                    f.addProperty("expandedSi", e.expandedSi());
                }
                f.addProperty("shown", DisplayNumber.withSpread(m.quantity(), units, e.valueSi(), e.expandedSi()));
                figures.add(m.key(), f);
            }
        }
        o.add("figures", figures);
        JsonArray findings = new JsonArray();
        for (Finding f : r.findings()) {
            JsonObject j = new JsonObject();
            j.addProperty("code", f.code().key());
            j.addProperty("severity", f.severity().key());
            j.addProperty("message", f.message());
            j.addProperty("technical", f.technical());
            JsonArray evidence = new JsonArray();
            for (Evidence e : f.evidence()) {
                evidence.add(EvidenceText.of(e, units));
            }
            j.add("evidence", evidence);
            findings.add(j);
        }
        o.add("findings", findings);
        return o;
    }
}
