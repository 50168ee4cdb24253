package app.latentledger.report;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.StatedAccuracy;
import app.latentledger.core.records.VisitPaperwork;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.report.pdf.Ink;
import app.latentledger.report.pdf.Typeset;

import java.util.ArrayList;
import java.util.List;

/**
 * The visit's paperwork in the report: what the customer said, what was done, the system as found
 * (stages, refrigerant, metering device, blower, filter) and the instruments used, each with its
 * serial, calibration date, stated accuracy and the reading sets it took.
 */
final class PaperworkSection {
    private final ReportData data;

    PaperworkSection(ReportData data) {
        this.data = data;
    }

    void write(Typeset t) {
        t.heading("The visit's record", 80);
        for (VisitEvidence v : data.visits()) {
            String of = data.comparesVisits() ? " (" + PlainWords.date(v.visit().startedAt()) + ")" : "";
            VisitPaperwork w = data.paperwork().of(v.visit().id());
            t.subheading("What the customer said and what was done" + of, 40);
            t.leadIn("Customer's words: ", orNone(w.customerWords(), "not written down"), Ink.BODY, 0, t.flow().width());
            t.leadIn("Work done: ", orNone(w.workDone(), "not written down"), Ink.BODY, 0, t.flow().width());
            t.subheading("The system as found" + of, 40);
            for (String line : systemLines(v.system(), data.units())) {
                t.bullet(line, Ink.BODY, 0);
            }
            t.subheading("Instruments used" + of, 40);
            List<Instrument> instruments = data.paperwork().instruments(v.visit().id());
            if (instruments.isEmpty()) {
                t.paragraph("No instruments were recorded on this visit; the readings carry the tolerances typed or"
                        + " set as defaults.", Ink.BODY, 0);
            }
            for (Instrument i : instruments) {
                t.bullet(i.describe() + accuracy(i.accuracy(), data.units()) + takes(i, v), Ink.BODY, 0);
            }
        }
    }

    /** Stages, refrigerant, metering device, blower type and setting, filter, thermostat: what was recorded. */
    static List<String> systemLines(HvacSystem s, UnitSystem units) {
        List<String> lines = new ArrayList<>();
        lines.add(s.label() + ": " + PlainWords.systemType(s.type()) + ", "
                + DisplayNumber.withUnit(Quantity.POWER_LARGE, units, s.nominalCapacityW()) + " nominal");
        lines.add("Refrigerant: " + orNone(s.refrigerant(), "not recorded"));
        lines.add("Metering device: " + orNone(s.meteringDevice(), "not recorded"));
        lines.add("Blower: " + orNone(s.blowerType(), "type not recorded") + "; setting "
                + orNone(s.fanSetting(), "not recorded"));
        lines.add("Filter: " + orNone(s.filter(), "not recorded"));
        if (!s.thermostatNotes().isEmpty()) {
            lines.add("Thermostat: " + s.thermostatNotes());
        }
        return lines;
    }

    private String takes(Instrument i, VisitEvidence v) {
        List<String> sets = new ArrayList<>();
        for (CheckedReadings c : v.readings()) {
            if (data.paperwork().usedOn(c.set().id()).contains(i)) {
                sets.add(c.name());
            }
        }
        return sets.isEmpty() ? "" : "; used for: " + String.join(", ", sets);
    }

    static String accuracy(StatedAccuracy a, UnitSystem units) {
        List<String> parts = new ArrayList<>();
        temperature(parts, "dry bulb", a.dryBulbK(), units);
        if (a.relativeHumidityPct() != null) {
            parts.add("RH ±" + DisplayNumber.number(a.relativeHumidityPct(), 1) + " %");
        }
        temperature(parts, "wet bulb", a.wetBulbK(), units);
        temperature(parts, "dew point", a.dewPointK(), units);
        temperature(parts, "coil probe", a.coilK(), units);
        if (a.airflowFraction() != null) {
            parts.add("airflow ±" + DisplayNumber.number(a.airflowFraction() * 100, 0) + " % of reading");
        }
        return parts.isEmpty() ? "; accuracy not stated" : "; stated accuracy " + String.join(", ", parts);
    }

    private static void temperature(List<String> parts, String what, Double k, UnitSystem units) {
        if (k != null) {
            parts.add(what + " ±" + DisplayNumber.withUnit(Quantity.TEMPERATURE_DIFFERENCE, units, k));
        }
    }

    private static String orNone(String s, String none) {
        return s.isEmpty() ? none : s;
    }
}
