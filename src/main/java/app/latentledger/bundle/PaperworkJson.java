package app.latentledger.bundle;

import app.latentledger.core.records.BinEntry;
import app.latentledger.core.records.Ids;
import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.RecordKind;
import app.latentledger.core.records.SignOff;
import app.latentledger.core.records.StatedAccuracy;
import app.latentledger.core.records.Timestamps;
import app.latentledger.core.records.VisitPaperwork;
import com.google.gson.JsonArray;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;

import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.List;

/** Instruments, paperwork and deletions as the bundle's JSON objects (format version 2). */
final class PaperworkJson {
    private PaperworkJson() {
    }

    static JsonObject instrument(Instrument i, List<String> usedOn) {
        JsonObject o = new JsonObject();
        o.addProperty("id", i.id());
        o.addProperty("visitId", i.visitId());
        o.addProperty("name", i.name());
        o.addProperty("serial", i.serial());
        o.addProperty("calibratedOn", i.calibratedOn() == null ? null : i.calibratedOn().toString());
        StatedAccuracy a = i.accuracy();
        JsonObject acc = new JsonObject();
        acc.addProperty("dryBulbK", a.dryBulbK());
        acc.addProperty("relativeHumidityPct", a.relativeHumidityPct());
        acc.addProperty("wetBulbK", a.wetBulbK());
        acc.addProperty("dewPointK", a.dewPointK());
        acc.addProperty("coilK", a.coilK());
        acc.addProperty("airflowFraction", a.airflowFraction());
        o.add("accuracy", acc);
        JsonArray used = new JsonArray();
        usedOn.forEach(used::add);
        o.add("usedOn", used);
        return o;
    }

    static Instrument instrument(JsonFields f) throws BundleException {
        String date = f.optionalText("calibratedOn");
        LocalDate calibrated;
        try {
            calibrated = date.isEmpty() ? null : LocalDate.parse(date);
        } catch (DateTimeParseException e) {
            throw new BundleException(f.where() + ": field \"calibratedOn\" '" + date + "' is not a date (YYYY-MM-DD)");
        }
        JsonFields a = f.optionalObject("accuracy");
        StatedAccuracy accuracy = a == null ? StatedAccuracy.NONE : new StatedAccuracy(a.optionalNumber("dryBulbK"),
                a.optionalNumber("relativeHumidityPct"), a.optionalNumber("wetBulbK"), a.optionalNumber("dewPointK"),
                a.optionalNumber("coilK"), a.optionalNumber("airflowFraction"));
        return new Instrument(f.text("id"), f.text("visitId"), f.text("name"), f.optionalText("serial"), calibrated,
                accuracy);
    }

    static JsonObject paperwork(VisitPaperwork w) {
        JsonObject o = new JsonObject();
        o.addProperty("visitId", w.visitId());
        o.addProperty("customerWords", w.customerWords());
        o.addProperty("workDone", w.workDone());
        o.add("technicianSignOff", signOff(w.technician()));
        o.add("customerSignOff", signOff(w.customer()));
        return o;
    }

    static VisitPaperwork paperwork(JsonFields f) throws BundleException {
        return new VisitPaperwork(f.text("visitId"), f.optionalText("customerWords"), f.optionalText("workDone"),
                signOff(f.optionalObject("technicianSignOff")), signOff(f.optionalObject("customerSignOff")));
    }

    private static com.google.gson.JsonElement signOff(SignOff s) {
        if (s == null) {
            return JsonNull.INSTANCE;
        }
        JsonObject o = new JsonObject();
        o.addProperty("name", s.name());
        o.addProperty("signedAt", Timestamps.text(s.signedAt()));
        o.addProperty("remark", s.remark());
        return o;
    }

    private static SignOff signOff(JsonFields f) throws BundleException {
        return f == null ? null : new SignOff(f.text("name"), f.time("signedAt"), f.optionalText("remark"));
    }

    static JsonObject deletion(BinEntry e) {
        JsonObject o = new JsonObject();
        o.addProperty("kind", e.kind().key());
        o.addProperty("recordId", e.recordId());
        o.addProperty("summary", e.summary());
        o.addProperty("deletedAt", Timestamps.text(e.deletedAt()));
        o.addProperty("siteId", e.siteId());
        o.addProperty("visitId", e.visitId());
        return o;
    }

    static BinEntry deletion(JsonFields f) throws BundleException {
        return new BinEntry(Ids.newId(), RecordKind.parse("deletion kind", f.text("kind")), f.text("recordId"),
                f.optionalText("summary"), f.time("deletedAt"), f.text("siteId"), f.optionalText("visitId"));
    }
}
