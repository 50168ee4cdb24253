package app.latentledger.report;

import app.latentledger.core.text.DailyWaterWords;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.CoilTemperatureSource;
import app.latentledger.core.coil.Estimate;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.coil.WithheldRatios;
import app.latentledger.core.measure.ProbeMatch;
import app.latentledger.core.measure.AirflowBasis;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.records.Airflow;
import app.latentledger.core.records.HumidityReading;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.text.MarginWords;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.Ratio;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.report.pdf.Ink;
import app.latentledger.report.pdf.Table;
import app.latentledger.report.pdf.Typeset;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;

/**
 * The readings as taken, each with the instrument tolerance it was entered with, and the coil
 * check's results with their expanded uncertainty (k = 2), reading sets side by side.
 */
final class ReadingsSection {
    /** Reading sets per table: more would squeeze the cells below a readable width. */
    private static final int PER_TABLE = 3;

    private final ReportData data;
    private final UnitSystem units;

    ReadingsSection(ReportData data) {
        this.data = data;
        this.units = data.units();
    }

    void write(Typeset t) {
        t.heading("Readings taken", 120);
        t.paragraph("Each reading with the tolerance (±) of the instrument it was taken with, as entered on site."
                + " Temperatures in " + Quantity.TEMPERATURE.symbol(units) + ".", Ink.SMALL, 0);
        for (VisitEvidence v : data.visits()) {
            if (data.comparesVisits()) {
                t.subheading("Visit of " + PlainWords.dateTime(v.visit().startedAt()), 60);
            }
            if (v.readings().isEmpty()) {
                t.paragraph("No readings were stored on this visit.", Ink.BODY, 0);
            }
            for (List<CheckedReadings> chunk : chunks(v.readings())) {
                readings(chunk).draw(t);
            }
        }
        t.heading("Computed results", 120);
        t.paragraph("Worked out from the readings by the mass-flow method of the ASHRAE Handbook—Fundamentals,"
                + " ch. 1. ± is the expanded uncertainty (k = 2, about 95 % coverage) carried from the instrument"
                + " tolerances (first-order GUM, JCGM 100:2008).", Ink.SMALL, 0);
        for (VisitEvidence v : data.visits()) {
            List<CheckedReadings> sets = v.readings();
            if (data.comparesVisits()) {
                t.subheading("Visit of " + PlainWords.dateTime(v.visit().startedAt()), 60);
            }
            for (List<CheckedReadings> chunk : chunks(sets)) {
                results(chunk).draw(t);
            }
        }
        BeforeAfter pair = data.pair();
        if (pair != null) {
            t.heading("Before and after, every figure", 100);
            t.paragraph("Before: " + pair.before().name() + " (" + PlainWords.dateTime(pair.before().set().takenAt())
                    + "). After: " + pair.after().name() + " (" + PlainWords.dateTime(pair.after().set().takenAt())
                    + "). U of the change = √(U_before² + U_after²), treating the two sets as independent (cautious when"
                    + " they share instruments). A change is measured when it is larger than its U.", Ink.SMALL, 0);
            SummarySection.changesTable(pair, units, true).draw(t);
        }
    }

    private static List<List<CheckedReadings>> chunks(List<CheckedReadings> sets) {
        List<List<CheckedReadings>> out = new ArrayList<>();
        for (int i = 0; i < sets.size(); i += PER_TABLE) {
            out.add(sets.subList(i, Math.min(sets.size(), i + PER_TABLE)));
        }
        return out;
    }

    private Table table(List<CheckedReadings> sets, String first) {
        String[] header = new String[sets.size() + 1];
        double[] weights = new double[header.length];
        boolean[] right = new boolean[header.length];
        header[0] = first;
        weights[0] = 1.25;
        for (int i = 0; i < sets.size(); i++) {
            header[i + 1] = sets.get(i).name() + " (" + PlainWords.time(sets.get(i).set().takenAt()) + ")";
            weights[i + 1] = sets.size() == 1 ? 2.2 : 1.5;
            right[i + 1] = false;
        }
        return new Table(header, weights, right);
    }

    private Table readings(List<CheckedReadings> sets) {
        Table tb = table(sets, "Reading");
        row(tb, sets, "Return air dry bulb", s -> temperature(s.returnDryBulb()));
        row(tb, sets, "Return air humidity", s -> humidity(s.returnHumidity()));
        row(tb, sets, "Supply air dry bulb", s -> temperature(s.supplyDryBulb()));
        row(tb, sets, "Supply air humidity", s -> humidity(s.supplyHumidity()));
        if (sets.stream().anyMatch(c -> c.set().outdoorDryBulb() != null)) {
            row(tb, sets, "Outdoor dry bulb", s -> temperature(s.outdoorDryBulb()));
            row(tb, sets, "Outdoor humidity", s -> humidity(s.outdoorHumidity()));
        }
        row(tb, sets, "Coil temperature", s -> s.coilTemperature() == null ? "not measured"
                : temperature(s.coilTemperature().value()) + " (" + s.coilTemperature().kind().key().replace('-', ' ') + ")");
        row(tb, sets, "Airflow", this::airflow);
        row(tb, sets, "Humidity probes", this::probes);
        rowChecked(tb, sets, "Pressure used", this::pressure);
        row(tb, sets, "Condensate caught", s -> s.condensate() == null ? "not caught"
                : DisplayNumber.withSpread(Quantity.WATER_VOLUME, units, s.condensate().volume().valueSi(),
                s.condensate().volume().toleranceSi()) + " in "
                + DisplayNumber.withSpread(Quantity.DURATION_MINUTES, units, s.condensate().seconds().valueSi(),
                s.condensate().seconds().toleranceSi()));
        row(tb, sets, "Instruments", this::instruments);
        row(tb, sets, "Notes", s -> s.notes().isEmpty() ? "—" : s.notes());
        return tb;
    }

    /** The instruments chosen for the set by name, else what was typed, else "not recorded". */
    private String instruments(ReadingSet s) {
        List<String> names = data.paperwork().usedOn(s.id()).stream().map(i -> i.name()).toList();
        return !names.isEmpty() ? String.join(", ", names) : s.instrument().isEmpty() ? "not recorded" : s.instrument();
    }

    private Table results(List<CheckedReadings> sets) {
        Table tb = table(sets, "Result (± U, k = 2)");
        if (sets.stream().noneMatch(CheckedReadings::checked)) {
            String[] cells = new String[sets.size() + 1];
            cells[0] = "Coil check";
            for (int i = 0; i < sets.size(); i++) {
                cells[i + 1] = "not worked out: lacks " + String.join(", ", sets.get(i).missing());
            }
            return tb.row(cells);
        }
        rowResult(tb, sets, "Coil check verdict", r -> PlainWords.verdictShort(r.verdict()) + " (" + r.verdict().key() + ")");
        est(tb, sets, Measurand.RETURN_DEW_POINT, "Indoor (return) dew point");
        est(tb, sets, Measurand.RETURN_RELATIVE_HUMIDITY, "Indoor (return) relative humidity");
        est(tb, sets, Measurand.LEAVING_DEW_POINT, "Supply dew point");
        est(tb, sets, Measurand.TEMPERATURE_DROP, "Dry-bulb drop across the coil");
        est(tb, sets, Measurand.HUMIDITY_RATIO_DROP, Measurand.HUMIDITY_RATIO_DROP.title(units) + " across the coil");
        est(tb, sets, Measurand.SENSIBLE, "Sensible capacity");
        est(tb, sets, Measurand.LATENT, "Latent capacity");
        rowResult(tb, sets, "Total capacity", r -> Numbers.estimate(Quantity.POWER, units, r.estimate(Measurand.TOTAL))
                + " (" + DisplayNumber.withUnit(Quantity.POWER_LARGE, units, r.process().totalW()) + ")");
        rowResult(tb, sets, "Sensible heat ratio", r -> ratio(r, Measurand.SHR, WithheldRatios.shr(r)));
        rowResult(tb, sets, Measurand.MOISTURE_REMOVAL.title(units), r -> Numbers.estimate(Quantity.WATER_RATE, units,
                r.estimate(Measurand.MOISTURE_REMOVAL)) + " ("
                + DailyWaterWords.phrase(r.process().moistureRemovalKgPerS(), units) + ")");
        est(tb, sets, Measurand.LATENT_PER_AIRFLOW, Measurand.LATENT_PER_AIRFLOW.title(units));
        est(tb, sets, Measurand.AIRFLOW_PER_CAPACITY, Measurand.AIRFLOW_PER_CAPACITY.title(units));
        rowResult(tb, sets, Measurand.AIRFLOW_PER_NOMINAL_CAPACITY.title(units), r -> r.readings().hasNominalCapacity()
                ? DisplayNumber.withUnit(Quantity.AIRFLOW_PER_CAPACITY, units, r.airflowPerNominalCapacity())
                : Ratio.notMeasurable(WithheldRatios.airflowPerNominalWhyNot(r)));
        rowResult(tb, sets, "Apparatus dew point", r -> r.adp().found()
                ? Numbers.estimate(Quantity.TEMPERATURE, units, r.estimate(Measurand.APPARATUS_DEW_POINT))
                : Ratio.notMeasurable(WithheldRatios.apparatusDewPointWhyNot(r)));
        rowResult(tb, sets, "Bypass factor", r -> ratio(r, Measurand.BYPASS_FACTOR, WithheldRatios.bypassFactor(r)));
        rowResult(tb, sets, "Coil temperature compared", r -> Double.isFinite(r.coilTemperatureC())
                ? Numbers.estimate(Quantity.TEMPERATURE, units, r.estimate(Measurand.COIL_TEMPERATURE)) + " ("
                + (r.coilTemperatureSource() == CoilTemperatureSource.MEASURED ? "measured" : "apparatus dew point")
                + ")" : "none");
        // which side of the dew point the coil is on, in the words the screen uses, never a bare minus sign
        rowResult(tb, sets, "Coil against the entering air's dew point", r -> {
            Estimate e = r.estimate(Measurand.DEW_POINT_MARGIN);
            return e.exists() ? MarginWords.amount(units, e.valueSi(), e.expandedSi()) + " ("
                    + MarginWords.consequence(e.valueSi(), e.expandedSi()) + ")" : "—";
        });
        if (sets.stream().anyMatch(c -> c.checked() && c.result().condensate() != null)) {
            est(tb, sets, Measurand.CONDENSATE_RATE, "Condensate caught per hour");
            est(tb, sets, Measurand.CONDENSATE_MINUS_AIRSIDE, "Condensate minus air-side removal");
        }
        if (sets.stream().anyMatch(c -> c.checked() && c.result().condensate() != null && c.result().condensate().usable())) {
            rowResult(tb, sets, "Latent from the water caught", r -> r.condensate() != null && r.condensate().usable()
                    ? Numbers.estimate(Quantity.POWER, units, r.estimate(Measurand.LATENT_FROM_CONDENSATE))
                    : Ratio.notMeasurable(WithheldRatios.shrFromCondensate(r).reason()));
            rowResult(tb, sets, "Sensible heat ratio from the water caught",
                    r -> ratio(r, Measurand.SHR_FROM_CONDENSATE, WithheldRatios.shrFromCondensate(r)));
        }
        return tb;
    }

    /** A ratio with its U, or "not measurable (why)": never NaN, a bare dash or a misleading 0. */
    private String ratio(CoilResult r, Measurand m, Ratio ratio) {
        return ratio.measurable() ? Numbers.estimate(m.quantity(), units, r.estimate(m))
                : Ratio.notMeasurable(ratio.reason());
    }

    private void est(Table tb, List<CheckedReadings> sets, Measurand m, String label) {
        rowResult(tb, sets, label, r -> {
            Estimate e = r.estimate(m);
            return e.exists() ? Numbers.estimate(m.quantity(), units, e) : "—";
        });
    }

    private static void row(Table tb, List<CheckedReadings> sets, String label, Function<ReadingSet, String> f) {
        String[] cells = new String[sets.size() + 1];
        cells[0] = label;
        for (int i = 0; i < sets.size(); i++) {
            cells[i + 1] = f.apply(sets.get(i).set());
        }
        tb.row(cells);
    }

    private static void rowChecked(Table tb, List<CheckedReadings> sets, String label,
                                   Function<CheckedReadings, String> f) {
        String[] cells = new String[sets.size() + 1];
        cells[0] = label;
        for (int i = 0; i < sets.size(); i++) {
            cells[i + 1] = f.apply(sets.get(i));
        }
        tb.row(cells);
    }

    private static void rowResult(Table tb, List<CheckedReadings> sets, String label, Function<CoilResult, String> f) {
        rowChecked(tb, sets, label, c -> c.checked() ? f.apply(c.result()) : "not worked out");
    }

    private String temperature(Measurement m) {
        return m == null ? "not measured" : DisplayNumber.withSpread(Quantity.TEMPERATURE, units, m.valueSi(), m.toleranceSi());
    }

    private String humidity(HumidityReading h) {
        if (h == null) {
            return "not measured";
        }
        if (h.kind() == HumidityKind.RELATIVE_HUMIDITY) {
            return DisplayNumber.withSpread(Quantity.RELATIVE_HUMIDITY, units, h.value().valueSi(), h.value().toleranceSi())
                    + " RH";
        }
        return temperature(h.value()) + (h.kind() == HumidityKind.WET_BULB ? " wet bulb" : " dew point");
    }

    private String airflow(ReadingSet s) {
        Airflow a = s.airflow();
        if (a == null) {
            return "not measured";
        }
        return DisplayNumber.withSpread(Quantity.AIRFLOW, units, a.volume().valueSi(), a.volume().toleranceSi())
                + (a.basis() == AirflowBasis.STANDARD ? " (standard air)" : "") + " at the "
                + (a.point().key().equals("entering") ? "return (entering)" : "supply (leaving)") + " side"
                + (a.method().isEmpty() ? "" : "; " + a.method());
    }

    /** Whether one instrument read return and supply, and the supply probe's offset taken off. */
    private String probes(ReadingSet s) {
        ProbeMatch p = s.probes();
        String how = p.sameInstrument() ? "one instrument (or compared side by side) for return and supply"
                : "separate probes for return and supply";
        return p.hasOffset() ? how + "; supply dew point corrected by "
                + DisplayNumber.withUnit(Quantity.TEMPERATURE_DIFFERENCE, units, -p.supplyDewPointOffsetK()) : how;
    }

    private String pressure(CheckedReadings c) {
        ReadingSet s = c.set();
        if (s.stationPressurePa() != null) {
            return DisplayNumber.withSpread(Quantity.PRESSURE, units, s.stationPressurePa().valueSi(),
                    s.stationPressurePa().toleranceSi()) + " measured";
        }
        if (!c.checked()) {
            return "standard atmosphere at the site elevation";
        }
        return DisplayNumber.withUnit(Quantity.PRESSURE, units, c.result().readings().pressurePa())
                + " (standard atmosphere at the site elevation)";
    }
}
