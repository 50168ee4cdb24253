package app.latentledger.report;

import app.latentledger.chart.draw.Theme;
import app.latentledger.chart.house.MoistureBudgetChart;
import app.latentledger.core.coil.Estimate;
import app.latentledger.core.house.HouseBudget;
import app.latentledger.core.house.InternalMoisture;
import app.latentledger.core.house.ScenarioResult;
import app.latentledger.core.text.BalanceWords;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.report.pdf.Ink;
import app.latentledger.report.pdf.PageFlow;
import app.latentledger.report.pdf.PdfPainter;
import app.latentledger.report.pdf.Table;
import app.latentledger.report.pdf.Typeset;

/**
 * "Where the water comes from": the house's moisture budget in plain words with its bar chart, the
 * return-leak result, the fixes compared side by side, the dehumidifier it would take, what is from
 * memory, and the cautions that go with the fixes.
 */
final class HouseSection {
    static final double CHART_WIDTH = 1000;
    static final double CHART_HEIGHT = 520;

    private final HouseBudget budget;
    private final UnitSystem units;

    HouseSection(HouseBudget budget, UnitSystem units) {
        this.budget = budget;
        this.units = units;
    }

    void write(Typeset t) {
        ScenarioResult s = budget.asFound();
        PageFlow f = t.flow();
        double scale = f.width() / CHART_WIDTH;
        t.heading("Where the water comes from", CHART_HEIGHT * scale + 60);
        t.paragraph(PlainHouseWords.summary(budget, units), Ink.BODY, 0);
        f.need(CHART_HEIGHT * scale + 8);
        PdfPainter p = f.painter();
        p.place(f.left(), f.y(), scale, CHART_WIDTH, CHART_HEIGHT);
        MoistureBudgetChart.of(s, units).paint(p, Theme.LIGHT, CHART_WIDTH, CHART_HEIGHT);
        p.restore();
        f.advance(CHART_HEIGHT * scale + 8);
        t.paragraph(PlainHouseWords.leak(s), Ink.BODY, 0);
        if (!budget.whatIfs().isEmpty()) {
            t.subheading("Fixes compared (the same budget re-solved for each)", 60);
            // the balance in words (the screen's and the house command's sentence), wide enough for one line
            Table tb = new Table(new String[] {"Change", "Water over a day like this one (± U)",
                    "Indoor dew point it settles at", "Coil SHR"}, new double[] {1.8, 2.6, 1.1, 0.5},
                    new boolean[] {false, false, true, true});
            tb.row("As found", balance(s.balance()), dewPoint(s), DisplayNumber.number(s.shr().valueSi(), 3));
            for (ScenarioResult w : budget.whatIfs()) {
                tb.row(w.scenario().change(), balance(w.balance()), dewPoint(w), DisplayNumber.number(w.shr().valueSi(), 3));
            }
            tb.draw(t);
            t.paragraph("The water over a day is gains minus removal at the house's present humidity, the system's"
                    + " runtime counted. \"About in balance\" means the readings cannot tell whether the house gains"
                    + " or dries: the range is what the uncertainty allows. Uncertainties are expanded (k = 2,"
                    + " about 95 %).", Ink.SMALL, 0);
        }
        t.paragraph(PlainHouseWords.dehumidifier(budget, units), Ink.BODY, 0);
        t.paragraph("* People and activities: " + InternalMoisture.MEMORY_ONLY + "; the figure is the midpoint of the"
                + " two presets and its uncertainty covers both.", Ink.SMALL, 0);
        for (String c : budget.cautions()) {
            t.bullet(c, Ink.SMALL, 0);
        }
    }

    private String balance(Estimate e) {
        return BalanceWords.sentence(units, e.valueSi(), e.expandedSi());
    }

    private String dewPoint(ScenarioResult s) {
        return s.hasEquilibrium() ? Numbers.estimate(Quantity.TEMPERATURE, units, s.equilibriumDewPointC())
                : "none (keeps rising)";
    }
}
