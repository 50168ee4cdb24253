package app.latentledger.chart.house;

import app.latentledger.chart.draw.Painter;
import app.latentledger.chart.draw.Stroke;
import app.latentledger.chart.draw.TextStyle;
import app.latentledger.chart.draw.Theme;
import app.latentledger.core.coil.Estimate;
import app.latentledger.core.house.ScenarioResult;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The house's water budget as one horizontal bar chart: each gain, their total, and the system's net
 * removal, in pints/day (L/day), each bar with its k = 2 uncertainty as a whisker and its value
 * written beside it; the equilibrium indoor dew point below. Gains and removal differ by label and by
 * the side their group sits on, not by colour alone. Drawn through {@link Painter}, so the screen
 * and the PDF report paint the same picture.
 */
public final class MoistureBudgetChart {
    /** One bar. */
    public record Bar(String label, Estimate kgPerS, boolean removal, boolean total) {
    }

    private final List<Bar> bars;
    private final UnitSystem units;
    private final String footer;

    public MoistureBudgetChart(List<Bar> bars, UnitSystem units, String footer) {
        this.bars = List.copyOf(bars);
        this.units = units;
        this.footer = footer;
    }

    /** The chart of a budget as found (or of one fix). */
    public static MoistureBudgetChart of(ScenarioResult s, UnitSystem units) {
        List<Bar> bars = new ArrayList<>();
        bars.add(new Bar("Air leakage", s.infiltration(), false, false));
        bars.add(new Bar("Ventilation", s.ventilation(), false, false));
        bars.add(new Bar("People and activities*", s.internal(), false, false));
        bars.add(new Bar("Return-duct leak", s.returnLeak(), false, false));
        bars.add(new Bar("Total gains", s.gains(), false, true));
        bars.add(new Bar("Removed by the system", s.removal(), true, true));
        String eq = s.hasEquilibrium()
                ? String.format(Locale.ROOT, "Equilibrium indoor dew point %.1f ± %.1f %s (%.0f %% RH)",
                Quantity.TEMPERATURE.toDisplay(units, s.equilibriumDewPointC().valueSi()),
                Quantity.TEMPERATURE_DIFFERENCE.toDisplay(units, s.equilibriumDewPointC().expandedSi()),
                Quantity.TEMPERATURE.symbol(units), s.equilibriumRhPct().valueSi())
                : "No equilibrium: the system cannot hold this house at any indoor humidity";
        return new MoistureBudgetChart(bars, units, eq + "\n* from memory (published presets not yet checked)");
    }

    public List<Bar> bars() {
        return bars;
    }

    /** Paints the whole chart into a {@code width} × {@code height} area at the origin. */
    public void paint(Painter p, Theme theme, double width, double height) {
        Quantity q = Quantity.WATER_RATE_DAILY;
        double text = theme.baseText();
        double left = Math.min(width * 0.34, 12 * text);
        double right = width - 7 * text;
        double top = text * 2.2;
        String[] foot = footer.split("\n");
        double bottom = height - text * (1.4 + 1.2 * foot.length);
        p.rect(0, 0, width, height, theme.background(), null);
        p.text(left, text * 1.3, "Water per day (" + q.symbol(units) + "; whiskers ± U, k = 2)",
                TextStyle.of(theme.smallText(), theme.mutedText()));
        double max = 1e-12;
        double min = 0;
        for (Bar b : bars) {
            double v = q.toDisplay(units, b.kgPerS().valueSi());
            double u = Double.isFinite(b.kgPerS().expandedSi()) ? q.toDisplay(units, b.kgPerS().expandedSi()) : 0;
            max = Math.max(max, v + u);
            min = Math.min(min, v - u);
        }
        double span = max - min;
        double x0 = left + (right - left) * (-min / span);
        double rowH = (bottom - top) / bars.size();
        p.line(x0, top, x0, bottom, Stroke.solid(theme.frame(), 1.5));
        for (int i = 0; i < bars.size(); i++) {
            Bar b = bars.get(i);
            double v = q.toDisplay(units, b.kgPerS().valueSi());
            double u = Double.isFinite(b.kgPerS().expandedSi()) ? q.toDisplay(units, b.kgPerS().expandedSi()) : 0;
            double yMid = top + rowH * (i + 0.5);
            double h = rowH * (b.total() ? 0.62 : 0.5);
            double x1 = x0 + (right - left) * (v / span);
            var fill = b.removal() ? theme.removed() : theme.returned();
            if (!b.total()) {
                fill = fill.withAlpha(0.55);
            }
            p.rect(Math.min(x0, x1), yMid - h / 2, Math.abs(x1 - x0), h, fill, Stroke.solid(theme.frame(), 1));
            if (u > 0) {
                double a = x0 + (right - left) * ((v - u) / span);
                double c = x0 + (right - left) * ((v + u) / span);
                Stroke whisker = Stroke.solid(theme.text(), 1.5);
                p.line(a, yMid, c, yMid, whisker);
                p.line(a, yMid - h / 4, a, yMid + h / 4, whisker);
                p.line(c, yMid - h / 4, c, yMid + h / 4, whisker);
            }
            TextStyle label = TextStyle.of(theme.smallText(), theme.text()).align(TextStyle.HAlign.RIGHT,
                    TextStyle.VAlign.MIDDLE);
            p.text(left - text * 0.5, yMid, b.label(), b.total() ? label.emphasised() : label);
            p.text(Math.max(x1, x0 + (right - left) * ((v + u) / span)) + text * 0.4, yMid,
                    String.format(Locale.ROOT, "%.1f", v), TextStyle.of(theme.smallText(), theme.text())
                            .align(TextStyle.HAlign.LEFT, TextStyle.VAlign.MIDDLE));
            if (b.total() && !b.removal()) {
                p.line(left * 0.2, yMid + rowH / 2, right, yMid + rowH / 2, Stroke.solid(theme.gridMajor(), 1));
            }
        }
        for (int i = 0; i < foot.length; i++) {
            p.text(left * 0.2, height - text * (0.8 + 1.2 * (foot.length - 1 - i)), foot[i],
                    TextStyle.of(theme.smallText(), i == 0 ? theme.text() : theme.mutedText()));
        }
    }
}
