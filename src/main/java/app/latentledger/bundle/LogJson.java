package app.latentledger.bundle;

import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.LogChannel;
import app.latentledger.core.records.TimeBase;
import app.latentledger.core.records.Timestamps;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

import java.util.ArrayList;
import java.util.List;

/** A log's metadata as the bundle's log object ({@code logs.json}); its samples are {@link LogCsv}'s. */
final class LogJson {
    private LogJson() {
    }

    /** What a log object says about its samples, read before they are. */
    record Meta(TimeBase timeBase, List<String> names, List<String> units, int sampleCount) {
    }

    static JsonObject write(ImportedLog l) {
        JsonObject o = new JsonObject();
        o.addProperty("id", l.id());
        o.addProperty("visitId", l.visitId());
        o.addProperty("sourceFileName", l.sourceFileName());
        o.addProperty("columnMapping", l.columnMapping());
        o.addProperty("importedAt", Timestamps.text(l.importedAt()));
        o.addProperty("timeBase", l.samples().timeBase().key());
        o.addProperty("sampleCount", l.samples().size());
        JsonArray channels = new JsonArray();
        for (LogChannel c : l.samples().channels()) {
            JsonObject ch = new JsonObject();
            ch.addProperty("name", c.name());
            ch.addProperty("unit", c.unit());
            channels.add(ch);
        }
        o.add("channels", channels);
        o.addProperty("samples", LogCsv.entry(l.id()));
        o.add("kept", HouseJson.kept(l.kept()));
        return o;
    }

    /** @param where how messages name the object's place ("logs.json") */
    static Meta meta(JsonFields f, String where) throws BundleException {
        String id = f.text("id");
        JsonElement channelList = f.element("channels");
        if (!channelList.isJsonArray()) {
            throw new BundleException(where + ": log " + id + " channels must be a list");
        }
        List<String> names = new ArrayList<>();
        List<String> units = new ArrayList<>();
        for (JsonElement c : channelList.getAsJsonArray()) {
            JsonFields ch = new JsonFields(c, where + " log " + id + " channel");
            names.add(ch.text("name"));
            units.add(ch.optionalText("unit"));
        }
        TimeBase base = TimeBase.parse("log time base", f.text("timeBase"));
        return new Meta(base, names, units, f.integer("sampleCount"));
    }
}
