package app.latentledger.bundle;

import app.latentledger.core.records.Timestamps;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ResultsSnapshot;
import app.latentledger.core.records.SnapshotSubject;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.SystemType;
import app.latentledger.core.records.Visit;
import app.latentledger.core.records.VisitPurpose;
import com.google.gson.JsonObject;

/** Sites, systems, visits and snapshots as the bundle's JSON objects (docs/bundle-format.md). */
final class RecordsJson {
    private RecordsJson() {
    }

    static JsonObject site(Site s) {
        JsonObject o = new JsonObject();
        o.addProperty("id", s.id());
        o.addProperty("name", s.name());
        o.addProperty("address", s.address());
        o.addProperty("elevationM", s.elevationM());
        o.addProperty("notes", s.notes());
        // only when given: a site without a zone writes the same object (and wire hash) as before
        if (!s.timeZone().isEmpty()) {
            o.addProperty("timeZone", s.timeZone());
        }
        return o;
    }

    static Site site(JsonFields f) throws BundleException {
        return new Site(f.text("id"), f.text("name"), f.optionalText("address"), f.number("elevationM"),
                f.optionalText("notes"), f.optionalText("timeZone"));
    }

    static JsonObject system(HvacSystem s) {
        JsonObject o = new JsonObject();
        o.addProperty("id", s.id());
        o.addProperty("siteId", s.siteId());
        o.addProperty("label", s.label());
        o.addProperty("type", s.type().key());
        o.addProperty("nominalCapacityW", s.nominalCapacityW());
        o.addProperty("refrigerant", s.refrigerant());
        o.addProperty("blowerType", s.blowerType());
        o.addProperty("fanSetting", s.fanSetting());
        o.addProperty("thermostatNotes", s.thermostatNotes());
        o.addProperty("meteringDevice", s.meteringDevice());
        o.addProperty("filter", s.filter());
        return o;
    }

    static HvacSystem system(JsonFields f) throws BundleException {
        return new HvacSystem(f.text("id"), f.text("siteId"), f.text("label"),
                SystemType.parse("system type", f.text("type")), f.number("nominalCapacityW"),
                f.optionalText("refrigerant"), f.optionalText("blowerType"), f.optionalText("fanSetting"),
                f.optionalText("thermostatNotes"), f.optionalText("meteringDevice"), f.optionalText("filter"));
    }

    static JsonObject visit(Visit v) {
        JsonObject o = new JsonObject();
        o.addProperty("id", v.id());
        o.addProperty("siteId", v.siteId());
        o.addProperty("systemId", v.systemId());
        o.addProperty("startedAt", Timestamps.text(v.startedAt()));
        o.addProperty("technician", v.technician());
        o.addProperty("purpose", v.purpose().key());
        o.addProperty("notes", v.notes());
        return o;
    }

    static Visit visit(JsonFields f) throws BundleException {
        return new Visit(f.text("id"), f.text("siteId"), f.text("systemId"), f.time("startedAt"),
                f.text("technician"), VisitPurpose.parse("visit purpose", f.text("purpose")), f.optionalText("notes"));
    }

    static JsonObject snapshot(ResultsSnapshot s) {
        JsonObject o = new JsonObject();
        o.addProperty("id", s.id());
        o.addProperty("subject", s.subject().key());
        o.addProperty("subjectId", s.subjectId());
        o.addProperty("appVersion", s.appVersion());
        o.addProperty("computedAt", Timestamps.text(s.computedAt()));
        // kept as the exact text the app stored, so a re-import is byte-for-byte the same result
        o.addProperty("resultsJson", s.json());
        return o;
    }

    static ResultsSnapshot snapshot(JsonFields f) throws BundleException {
        return new ResultsSnapshot(f.text("id"), SnapshotSubject.parse("snapshot subject", f.text("subject")),
                f.text("subjectId"), f.text("appVersion"), f.time("computedAt"), f.text("resultsJson"));
    }
}
