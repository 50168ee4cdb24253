package app.latentledger.report;

import app.latentledger.chart.draw.TextStyle;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Site;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.report.pdf.Ink;
import app.latentledger.report.pdf.PageFlow;
import app.latentledger.report.pdf.Table;
import app.latentledger.report.pdf.Typeset;

import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;

/**
 * Page 1, for the homeowner: where, what, the answer in plain words, what changed and what was
 * found. The numbers behind it follow on the later pages.
 */
final class SummarySection {
    private static final double LABEL_WIDTH = 78;

    private final ReportData data;
    private final UnitSystem units;
    private final OffsetDateTime generated;

    SummarySection(ReportData data, OffsetDateTime generated) {
        this.data = data;
        this.units = data.units();
        this.generated = generated;
    }

    /** The report's title, also its PDF title. */
    static String title(ReportData data) {
        VisitEvidence v = data.latest();
        if (data.pair() != null) {
            return "Before and after: cooling and moisture at " + v.site().name();
        }
        return switch (v.visit().purpose()) {
            case COMMISSIONING -> "Commissioning record: cooling and moisture at " + v.site().name();
            default -> "Cooling and moisture check at " + v.site().name();
        };
    }

    /** What kind of report this is, for the line above the title. */
    static String kind(ReportData data) {
        if (data.pair() != null) {
            return "Before-and-after cooling and moisture report";
        }
        return switch (data.latest().visit().purpose()) {
            case COMMISSIONING -> "Commissioning record: cooling and moisture";
            default -> "Cooling and moisture report";
        };
    }

    void write(Typeset t) {
        PageFlow f = t.flow();
        f.painter().text(f.left(), f.y() + 8, kind(data).toUpperCase(java.util.Locale.ROOT), Ink.LABEL.emphasised());
        f.painter().text(f.left() + f.width(), f.y() + 8, "Prepared " + PlainWords.date(generated),
                Ink.LABEL.align(TextStyle.HAlign.RIGHT, TextStyle.VAlign.BASELINE));
        t.gap(16);
        t.paragraph(data.latest().site().name(), Ink.TITLE, 0, f.width());
        t.gap(2);
        t.rule(Ink.ACCENT, 1.2);
        t.gap(9);
        facts(t);
        t.gap(4);
        inShort(t);
        if (data.differentSystems()) {
            t.paragraph("Note: the two visits compared are of different systems (" + data.visits().get(0).system().label()
                    + " and " + data.visits().get(1).system().label() + "); the figures describe two systems, not one"
                    + " system before and after a change.", Ink.BODY_BOLD.coloured(Ink.WARN), 0);
        }
        if (data.pair() != null) {
            changes(t);
        }
        howToRead(t);
        found(t);
        notes(t);
    }

    private static void howToRead(Typeset t) {
        t.paragraph("How to read the numbers: ± gives the range the instruments allow (about 95 % confidence). A change"
                + " counts as measured only when it is larger than that range. The pages that follow give every reading,"
                + " the calculations and the chart.", Ink.SMALL, 0);
    }

    private void facts(Typeset t) {
        for (VisitEvidence v : data.visits()) {
            Site s = v.site();
            if (v == data.visits().get(0) || !s.id().equals(data.visits().get(0).site().id())) {
                fact(t, "Site", s.name() + ", " + s.address() + " (elevation "
                        + DisplayNumber.withUnit(Quantity.ELEVATION, units, s.elevationM()) + ")");
            }
        }
        for (VisitEvidence v : data.visits()) {
            if (data.differentSystems() || v == data.visits().get(0)) {
                HvacSystem s = v.system();
                fact(t, "System", s.label() + ": " + PlainWords.systemType(s.type()) + ", "
                        + DisplayNumber.withUnit(Quantity.POWER_LARGE, units, s.nominalCapacityW()) + " nominal"
                        + (s.refrigerant().isEmpty() ? "" : ", " + s.refrigerant())
                        + (s.blowerType().isEmpty() ? "" : "; blower " + s.blowerType()));
            }
        }
        for (VisitEvidence v : data.visits()) {
            fact(t, data.comparesVisits() ? (v == data.visits().get(0) ? "Earlier visit" : "Later visit") : "Visit",
                    PlainWords.dateTime(v.visit().startedAt()) + " · " + PlainWords.purpose(v.visit().purpose())
                            + " · technician " + v.visit().technician());
        }
    }

    private void fact(Typeset t, String label, String text) {
        PageFlow f = t.flow();
        f.need(Typeset.leading(Ink.BODY));
        f.painter().text(f.left(), f.y() + Ink.BODY_SIZE, label, Ink.LABEL.emphasised());
        t.paragraph(text, Ink.BODY, LABEL_WIDTH, f.width() - LABEL_WIDTH);
        t.gap(1.5);
    }

    private void inShort(Typeset t) {
        List<String[]> lines = new ArrayList<>();
        BeforeAfter pair = data.pair();
        if (pair != null) {
            lines.add(new String[] {pair.beforeTitle() + " (" + pair.before().name() + ", " + PlainWords.time(pair.before().set().takenAt())
                    + "): ", PlainWords.verdict(pair.before().result().verdict())});
            lines.add(new String[] {pair.afterTitle() + " (" + pair.after().name() + ", "
                    + PlainWords.time(pair.after().set().takenAt()) + "): ",
                    PlainWords.verdict(pair.after().result().verdict())});
            CoilResult b = pair.before().result();
            CoilResult a = pair.after().result();
            lines.add(new String[] {"Water taken out of the air while running: ",
                    Numbers.estimate(Quantity.WATER_RATE, units, b.estimate(Measurand.MOISTURE_REMOVAL)) + " before, "
                            + Numbers.estimate(Quantity.WATER_RATE, units, a.estimate(Measurand.MOISTURE_REMOVAL))
                            + " after (" + daily(a) + ")."});
        } else {
            List<CheckedReadings> sets = data.latest().checkedReadings();
            if (sets.isEmpty()) {
                lines.add(new String[] {"", "This visit has no complete set of coil readings, so no coil check could be"
                        + " worked out; the readings that were taken are listed on the next pages."});
            } else {
                CheckedReadings c = sets.get(sets.size() - 1);
                CoilResult r = c.result();
                lines.add(new String[] {"Coil check (" + c.name() + ", " + PlainWords.time(c.set().takenAt()) + "): ",
                        PlainWords.verdict(r.verdict())});
                lines.add(new String[] {"Water taken out of the air while running: ",
                        Numbers.estimate(Quantity.WATER_RATE, units, r.estimate(Measurand.MOISTURE_REMOVAL)) + " ("
                                + daily(r) + ")."});
                lines.add(new String[] {"Indoor air: ",
                        "dew point " + Numbers.estimate(Quantity.TEMPERATURE, units, r.estimate(Measurand.RETURN_DEW_POINT))
                                + ", relative humidity " + Numbers.estimate(Quantity.RELATIVE_HUMIDITY, units,
                                r.estimate(Measurand.RETURN_RELATIVE_HUMIDITY)) + "."});
            }
        }
        PageFlow f = t.flow();
        double pad = 9;
        double width = f.width() - 2 * pad;
        TextStyle lead = Ink.LEAD.sized(10.5);
        double h = 2 * pad + Typeset.leading(Ink.SUBHEADING) + 2;
        for (String[] l : lines) {
            h += t.leadInHeight(l[0], l[1], lead, width) + 3;
        }
        f.need(h);
        f.painter().rect(f.left(), f.y(), f.width(), h, Ink.PANEL, null);
        f.painter().rect(f.left(), f.y(), 3, h, Ink.ACCENT, null);
        t.gap(pad);
        t.paragraph("In short", Ink.SUBHEADING.coloured(Ink.ACCENT), pad, width);
        t.gap(2);
        for (String[] l : lines) {
            t.leadIn(l[0], l[1], lead, pad, width);
            t.gap(3);
        }
        t.gap(pad);
        t.gap(2);
    }

    /** "about 235 pints if it ran all day": the rate a homeowner can picture. */
    private String daily(CoilResult r) {
        double perDay = Quantity.WATER_RATE_DAILY.toDisplay(units, r.process().moistureRemovalKgPerS());
        String unit = Quantity.WATER_RATE_DAILY.symbol(units).replace("/day", "");
        if (perDay < 0 && !DisplayNumber.number(-perDay, 0).equals(DisplayNumber.number(0, 0))) {
            // never "about -96 pints": the air left wetter than it came, so say that
            return "none: the air left wetter, about " + DisplayNumber.number(-perDay, 0) + " " + unit
                    + " put back if it ran all day";
        }
        return "about " + DisplayNumber.number(Math.abs(perDay), 0) + " " + unit + " if it ran all day";
    }

    private void changes(Typeset t) {
        t.heading("What changed", 80);
        changesTable(data.pair(), units, false).draw(t);
    }

    /** Before, after and the change with its uncertainty; {@code all} adds the rows page 1 leaves out. */
    static Table changesTable(BeforeAfter pair, UnitSystem units, boolean all) {
        Table tb = new Table(new String[] {"Figure", "Before", "After", "Change (± U, k = 2)", "Result"},
                new double[] {2.3, 1.35, 1.35, 1.55, 0.95}, new boolean[] {false, true, true, true, false});
        for (Improvement i : Improvement.of(pair, units)) {
            if (!all && !i.onSummary()) {
                continue;
            }
            tb.row(i.label(), figure(i, i.before(), pair.before().result(), units),
                    figure(i, i.after(), pair.after().result(), units),
                    DisplayNumber.change(i.quantity(), units, i.changeSi(), i.changeUncertaintySi(), i.decimals()),
                    i.verdict());
        }
        return tb;
    }

    /** One side of a change: the figure with its U, or for a withheld SHR "not measurable (why)". */
    private static String figure(Improvement i, app.latentledger.core.coil.Estimate e,
                                 app.latentledger.core.coil.CoilResult r, UnitSystem units) {
        if (!e.exists() && i.key().equals("shr")) {
            return app.latentledger.core.units.Ratio.notMeasurable(
                    app.latentledger.core.coil.WithheldRatios.shr(r).reason());
        }
        return DisplayNumber.withSpread(i.quantity(), units, e.valueSi(), e.expandedSi(), i.decimals());
    }

    private void found(Typeset t) {
        BeforeAfter pair = data.pair();
        t.heading("What we found", 60);
        if (pair != null) {
            findings(t, pair.beforeTitle(), pair.before().result().findings());
            findings(t, pair.afterTitle(), pair.after().result().findings());
        } else {
            for (CheckedReadings c : data.latest().checkedReadings()) {
                findings(t, data.latest().checkedReadings().size() > 1 ? c.name() : null, c.result().findings());
            }
        }
        for (VisitEvidence v : data.visits()) {
            for (AnalysedLog l : v.logs()) {
                if (l.analysed()) {
                    findings(t, "From the logged run (" + l.log().sourceFileName() + ")", l.report().findings());
                }
            }
        }
    }

    private void findings(Typeset t, String title, List<Finding> findings) {
        if (title != null) {
            t.subheading(title, 30);
        }
        if (findings.isEmpty()) {
            t.bullet("Nothing out of the ordinary in these readings.", Ink.BODY, 0);
        }
        for (Finding f : findings) {
            t.bullet(PlainWords.severity(f.severity()) + ": " + f.message(), Ink.BODY, 0);
        }
    }

    private void notes(Typeset t) {
        for (VisitEvidence v : data.visits()) {
            if (!v.visit().notes().isEmpty()) {
                t.subheading("Notes from the visit" + (data.comparesVisits() ? " of " + PlainWords.date(v.visit().startedAt()) : ""), 24);
                t.paragraph(v.visit().notes(), Ink.BODY, 0);
            }
        }
    }
}
