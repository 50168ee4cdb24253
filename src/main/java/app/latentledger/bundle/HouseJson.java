package app.latentledger.bundle;

import app.latentledger.core.coil.AirReading;
import app.latentledger.core.house.HouseFacts;
import app.latentledger.core.house.HouseVisitReadings;
import app.latentledger.core.house.VentilationType;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.records.ImportedLog;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;

import java.util.ArrayList;
import java.util.List;

/**
 * The house around the system (format version 3): the site's house facts and each visit's house
 * readings as {@code house.json}, and a log's stored analysis conditions as the {@code kept} field
 * of its {@code logs.json} object. Values SI; a missing number is {@code null}.
 */
final class HouseJson {
    /** The air readings of a visit's house readings, in the order they are written. */
    private static final String[] AIR = {"outdoor", "grille", "plenum", "space"};

    private HouseJson() {
    }

    static JsonObject house(HouseFacts facts, String siteId, List<BundleContent.VisitHouse> readings) {
        JsonObject o = new JsonObject();
        o.add("facts", facts == null ? JsonNull.INSTANCE : facts(facts, siteId));
        JsonArray list = new JsonArray();
        readings.forEach(r -> list.add(readings(r)));
        o.add("readings", list);
        return o;
    }

    static JsonObject facts(HouseFacts f, String siteId) {
        JsonObject o = new JsonObject();
        o.addProperty("siteId", siteId);
        o.addProperty("floorAreaM2", f.floorAreaM2());
        o.addProperty("ceilingHeightM", f.ceilingHeightM());
        o.addProperty("stories", f.stories());
        o.addProperty("bedrooms", f.bedrooms());
        o.addProperty("occupants", f.occupants());
        number(o, "cfm50M3PerS", f.cfm50M3PerS());
        number(o, "ach50", f.ach50());
        o.addProperty("shelterClass", f.shelterClass());
        number(o, "windMPerS", f.windMPerS());
        o.addProperty("ventilationType", f.ventilationType().key());
        o.addProperty("ventilationM3PerS", f.ventilationM3PerS());
        number(o, "ervLatentEffectiveness", f.ervLatentEffectiveness());
        return o;
    }

    static JsonObject readings(BundleContent.VisitHouse v) {
        HouseVisitReadings h = v.readings();
        JsonObject o = new JsonObject();
        o.addProperty("visitId", v.visitId());
        number(o, "runtimeFraction", h.runtimeFraction());
        AirReading[] air = {h.outdoor(), h.grille(), h.plenum(), h.space()};
        for (int i = 0; i < AIR.length; i++) {
            o.add(AIR[i], air(air[i]));
        }
        return o;
    }

    private static JsonElement air(AirReading a) {
        if (a == null) {
            return JsonNull.INSTANCE;
        }
        JsonObject o = new JsonObject();
        o.addProperty("dryBulbC", a.dryBulbC());
        o.addProperty("dryBulbTolK", a.dryBulbTolK());
        o.addProperty("humidityKind", a.humidityKind().key());
        o.addProperty("humidity", a.humiditySi());
        o.addProperty("humidityTol", a.humidityTolSi());
        return o;
    }

    /** The site's facts as written, or null; each field checked by the facts' own ranges. */
    static HouseFacts facts(JsonFields house) throws BundleException {
        JsonFields f = house.optionalObject("facts");
        if (f == null) {
            return null;
        }
        return new HouseFacts(f.number("floorAreaM2"), f.number("ceilingHeightM"), whole(f, "stories"),
                whole(f, "bedrooms"), whole(f, "occupants"), optional(f, "cfm50M3PerS"), optional(f, "ach50"),
                whole(f, "shelterClass"), optional(f, "windMPerS"), VentilationType.parse(f.text("ventilationType")),
                f.number("ventilationM3PerS"), optional(f, "ervLatentEffectiveness"));
    }

    /** The site id the facts name (must be the bundle's site), or null without facts. */
    static String factsSiteId(JsonFields house) throws BundleException {
        JsonFields f = house.optionalObject("facts");
        return f == null ? null : f.text("siteId");
    }

    static List<BundleContent.VisitHouse> readings(JsonFields house) throws BundleException {
        JsonElement list = house.element("readings");
        if (!list.isJsonArray()) {
            throw new BundleException(house.where() + ": field \"readings\" must be a list");
        }
        List<BundleContent.VisitHouse> out = new ArrayList<>();
        int n = 0;
        for (JsonElement e : list.getAsJsonArray()) {
            out.add(visitReadings(new JsonFields(e, house.where() + " readings item " + (++n))));
        }
        return out;
    }

    /** One visit's house readings object, as {@link #readings(BundleContent.VisitHouse)} writes it. */
    static BundleContent.VisitHouse visitReadings(JsonFields f) throws BundleException {
        AirReading[] air = new AirReading[AIR.length];
        for (int i = 0; i < AIR.length; i++) {
            air[i] = air(f.optionalObject(AIR[i]), AIR[i]);
        }
        return new BundleContent.VisitHouse(f.text("visitId"),
                new HouseVisitReadings(air[0], air[1], air[2], air[3], optional(f, "runtimeFraction")));
    }

    private static AirReading air(JsonFields a, String where) throws BundleException {
        if (a == null) {
            return null;
        }
        return new AirReading(where, a.number("dryBulbC"), a.number("dryBulbTolK"), kind(a, a.text("humidityKind")),
                a.number("humidity"), a.number("humidityTol"));
    }

    /** A log's stored conditions, or null when it was kept without them. */
    static JsonElement kept(ImportedLog.KeptConditions k) {
        if (k == null) {
            return JsonNull.INSTANCE;
        }
        JsonObject o = new JsonObject();
        number(o, "airflowM3PerS", k.airflowM3PerS());
        o.addProperty("airflowFrom", k.airflowFrom());
        number(o, "fanAirflowM3PerS", k.fanAirflowM3PerS());
        o.addProperty("timeZone", k.timeZone());
        return o;
    }

    static ImportedLog.KeptConditions kept(JsonFields log) throws BundleException {
        JsonFields k = log.optionalObject("kept");
        if (k == null) {
            return null;
        }
        return new ImportedLog.KeptConditions(optional(k, "airflowM3PerS"), k.optionalText("airflowFrom"),
                optional(k, "fanAirflowM3PerS"), k.optionalText("timeZone"));
    }

    private static void number(JsonObject o, String name, double v) {
        if (Double.isNaN(v)) {
            o.add(name, JsonNull.INSTANCE);
        } else {
            o.addProperty(name, v);
        }
    }

    private static double optional(JsonFields f, String name) throws BundleException {
        Double v = f.optionalNumber(name);
        return v == null ? Double.NaN : v;
    }

    /** A whole number; the facts' own check then says whether it is in range. */
    private static int whole(JsonFields f, String name) throws BundleException {
        double v = f.number(name);
        if (v != Math.rint(v) || Math.abs(v) > 1e6) {
            throw new BundleException(f.where() + ": field \"" + name + "\" " + v + " is not a whole number");
        }
        return (int) v;
    }

    private static HumidityKind kind(JsonFields f, String key) throws BundleException {
        for (HumidityKind k : HumidityKind.values()) {
            if (k.key().equals(key)) {
                return k;
            }
        }
        throw new BundleException(f.where() + ": field \"humidityKind\" '" + key + "' is not wet-bulb, rh or dew-point");
    }
}
