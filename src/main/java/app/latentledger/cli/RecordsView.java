package app.latentledger.cli;

import app.latentledger.core.coil.Measurand;

import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.records.Airflow;
import app.latentledger.core.records.CoilTemperature;
import app.latentledger.core.records.Condensate;
import app.latentledger.core.records.HumidityReading;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Timestamps;
import app.latentledger.core.records.Visit;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.LinkedHashMap;
import java.util.Map;

/** Stored records as the tech reads them: JSON objects and table lines in the tech's units. */
final class RecordsView {
    private RecordsView() {
    }

    static Map<String, Object> site(Site s, UnitSystem units) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("id", s.id());
        m.put("name", s.name());
        m.put("address", s.address());
        m.put("elevation", Quantity.ELEVATION.toDisplay(units, s.elevationM()));
        m.put("notes", s.notes());
        m.put("timeZone", s.timeZone().isEmpty() ? null : s.timeZone());
        return m;
    }

    static Map<String, Object> system(HvacSystem s, UnitSystem units) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("id", s.id());
        m.put("label", s.label());
        m.put("type", s.type().key());
        m.put("nominalCapacity", Quantity.POWER_LARGE.toDisplay(units, s.nominalCapacityW()));
        m.put("refrigerant", s.refrigerant());
        m.put("blowerType", s.blowerType());
        m.put("fanSetting", s.fanSetting());
        m.put("thermostatNotes", s.thermostatNotes());
        m.put("meteringDevice", s.meteringDevice());
        m.put("filter", s.filter());
        return m;
    }

    static Map<String, Object> readingSet(ReadingSet r, UnitSystem units) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("id", r.id());
        m.put("label", r.label());
        m.put("takenAt", Timestamps.text(r.takenAt()));
        m.put("instrument", r.instrument());
        m.put("returnDryBulb", temperature(r.returnDryBulb(), units));
        m.put("returnHumidity", humidity(r.returnHumidity(), units));
        m.put("supplyDryBulb", temperature(r.supplyDryBulb(), units));
        m.put("supplyHumidity", humidity(r.supplyHumidity(), units));
        m.put("outdoorDryBulb", temperature(r.outdoorDryBulb(), units));
        m.put("outdoorHumidity", humidity(r.outdoorHumidity(), units));
        CoilTemperature coil = r.coilTemperature();
        if (coil == null) {
            m.put("coilTemperature", null);
        } else {
            Map<String, Object> c = temperature(coil.value(), units);
            c.put("kind", coil.kind().key());
            m.put("coilTemperature", c);
        }
        Airflow a = r.airflow();
        if (a == null) {
            m.put("airflow", null);
        } else {
            Map<String, Object> f = value(a.volume(), Quantity.AIRFLOW, Quantity.AIRFLOW, units);
            f.put("point", a.point().key());
            f.put("basis", a.basis().key());
            f.put("method", a.method());
            m.put("airflow", f);
        }
        m.put("stationPressure", r.stationPressurePa() == null ? null
                : value(r.stationPressurePa(), Quantity.PRESSURE, Quantity.PRESSURE, units));
        Condensate k = r.condensate();
        if (k == null) {
            m.put("condensate", null);
        } else {
            Map<String, Object> c = new LinkedHashMap<>();
            c.put("volume", value(k.volume(), Quantity.WATER_VOLUME, Quantity.WATER_VOLUME, units));
            c.put("minutes", value(k.seconds(), Quantity.DURATION_MINUTES, Quantity.DURATION_MINUTES, units));
            m.put("condensate", c);
        }
        m.put("notes", r.notes());
        return m;
    }

    private static Map<String, Object> temperature(Measurement t, UnitSystem units) {
        return t == null ? null : value(t, Quantity.TEMPERATURE, Quantity.TEMPERATURE_DIFFERENCE, units);
    }

    private static Map<String, Object> humidity(HumidityReading h, UnitSystem units) {
        if (h == null) {
            return null;
        }
        Map<String, Object> m = h.kind() == HumidityKind.RELATIVE_HUMIDITY
                ? value(h.value(), Quantity.RELATIVE_HUMIDITY, Quantity.RELATIVE_HUMIDITY, units)
                : value(h.value(), Quantity.TEMPERATURE, Quantity.TEMPERATURE_DIFFERENCE, units);
        m.put("kind", h.kind().key());
        return m;
    }

    private static Map<String, Object> value(Measurement v, Quantity q, Quantity tolerance, UnitSystem units) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("value", q.toDisplay(units, v.valueSi()));
        m.put("tolerance", tolerance.toDisplay(units, v.toleranceSi()));
        m.put("unit", q.symbol(units));
        return m;
    }

    /** The readable block of one reading set. */
    static String readingSetTable(ReadingSet r, HvacSystem system, UnitSystem units) {
        StringBuilder b = new StringBuilder();
        b.append(String.format("  reading set %s  %s%s%n", Visits.shortId(r.id()), Visits.when(r.takenAt()),
                r.label().isEmpty() ? "" : "  [" + r.label() + "]"));
        b.append(air("return", r.returnDryBulb(), r.returnHumidity(), units));
        b.append(air("supply", r.supplyDryBulb(), r.supplyHumidity(), units));
        if (r.outdoorDryBulb() != null) {
            b.append(air("outdoor", r.outdoorDryBulb(), r.outdoorHumidity(), units));
        }
        if (r.coilTemperature() != null) {
            b.append(line("coil", temperatureText(r.coilTemperature().value(), units) + " "
                    + r.coilTemperature().kind().key().replace('-', ' ')));
        }
        Airflow a = r.airflow();
        if (a != null) {
            double perCapacity = a.volume().valueSi() / system.nominalCapacityW();
            b.append(line("airflow", Format.fixed(Quantity.AIRFLOW.toDisplay(units, a.volume().valueSi()), 0) + " ± "
                    + Format.fixed(Quantity.AIRFLOW.toDisplay(units, a.volume().toleranceSi()), 0) + " "
                    + a.basis().label() + " " + Quantity.AIRFLOW.symbol(units) + " " + a.point().key()
                    // per the nameplate size, named as the coil command, the app and the report name it
                    + (perCapacity > 0 && Double.isFinite(perCapacity) ? "; "
                    + Measurand.AIRFLOW_PER_NOMINAL_CAPACITY.label(units) + " "
                    + Format.fixed(Quantity.AIRFLOW_PER_CAPACITY.toDisplay(units, perCapacity), 0) + " "
                    + Quantity.AIRFLOW_PER_CAPACITY.symbol(units) : "")
                    + (a.method().isEmpty() ? "" : "; " + a.method())));
        }
        if (r.stationPressurePa() != null) {
            b.append(line("pressure", Format.fixed(Quantity.PRESSURE.toDisplay(units, r.stationPressurePa().valueSi()), 3)
                    + " " + Quantity.PRESSURE.symbol(units) + " measured"));
        }
        Condensate k = r.condensate();
        if (k != null) {
            b.append(line("condensate", Format.fixed(Quantity.WATER_VOLUME.toDisplay(units, k.volume().valueSi()), 1)
                    + " " + Quantity.WATER_VOLUME.symbol(units) + " in "
                    + Format.fixed(Quantity.DURATION_MINUTES.toDisplay(units, k.seconds().valueSi()), 1) + " min"));
        }
        if (!r.instrument().isEmpty()) {
            b.append(line("instruments", r.instrument()));
        }
        if (!r.notes().isEmpty()) {
            b.append(line("notes", r.notes()));
        }
        return b.toString();
    }

    private static String air(String label, Measurement db, HumidityReading h, UnitSystem units) {
        String text = temperatureText(db, units) + " db";
        if (h != null) {
            text += ", " + (h.kind() == HumidityKind.RELATIVE_HUMIDITY
                    ? Format.fixed(h.value().valueSi(), 1) + " ± " + Format.fixed(h.value().toleranceSi(), 1) + " %RH"
                    : temperatureText(h.value(), units) + (h.kind() == HumidityKind.WET_BULB ? " wb" : " dew point"));
        }
        return line(label, text);
    }

    private static String temperatureText(Measurement t, UnitSystem units) {
        return Format.fixed(Quantity.TEMPERATURE.toDisplay(units, t.valueSi()), 1) + " ± "
                + Format.fixed(Quantity.TEMPERATURE_DIFFERENCE.toDisplay(units, t.toleranceSi()), 1) + " "
                + Quantity.TEMPERATURE.symbol(units);
    }

    private static String line(String label, String text) {
        return String.format("    %-12s %s%n", label, text);
    }

    static String visitHeader(Visit v, Site site, HvacSystem system, UnitSystem units) {
        StringBuilder b = new StringBuilder();
        b.append("Visit ").append(v.id()).append('\n');
        b.append(line("date", Visits.when(v.startedAt())));
        b.append(line("purpose", v.purpose().key()));
        b.append(line("technician", v.technician()));
        b.append(line("site", site.name() + ", " + site.address() + " (elevation "
                + Format.fixed(Quantity.ELEVATION.toDisplay(units, site.elevationM()), 0) + " "
                + Quantity.ELEVATION.symbol(units) + ")"));
        if (!site.timeZone().isEmpty()) {
            b.append(line("time zone", site.timeZone()));
        }
        b.append(line("system", system.label() + ": " + system.type().key() + ", "
                + Format.fixed(Quantity.POWER_LARGE.toDisplay(units, system.nominalCapacityW()), 1) + " "
                + Quantity.POWER_LARGE.symbol(units) + " nominal"
                + (system.refrigerant().isEmpty() ? "" : ", " + system.refrigerant())));
        if (!system.blowerType().isEmpty() || !system.fanSetting().isEmpty()) {
            b.append(line("blower", String.join("; ", nonEmpty(system.blowerType(), system.fanSetting()))));
        }
        if (!system.thermostatNotes().isEmpty()) {
            b.append(line("thermostat", system.thermostatNotes()));
        }
        if (!system.meteringDevice().isEmpty()) {
            b.append(line("metering", system.meteringDevice()));
        }
        if (!system.filter().isEmpty()) {
            b.append(line("filter", system.filter()));
        }
        if (!v.notes().isEmpty()) {
            b.append(line("notes", v.notes()));
        }
        return b.toString();
    }

    private static java.util.List<String> nonEmpty(String... parts) {
        java.util.List<String> out = new java.util.ArrayList<>();
        for (String p : parts) {
            if (!p.isEmpty()) {
                out.add(p);
            }
        }
        return out;
    }
}
