package app.latentledger.chart.house;

import app.latentledger.chart.draw.RecordingPainter;
import app.latentledger.chart.draw.Theme;
import app.latentledger.core.coil.Estimate;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The budget bar chart: bar lengths in proportion to the values, each labelled, whiskers for ± U. */
class MoistureBudgetChartTest {
    private static final double PINT_PER_DAY = 0.473176473 / 86_400; // kg/s of one US pint a day (water at 1 kg/L)

    @Test
    void barsAreProportionalAndLabelled() {
        List<MoistureBudgetChart.Bar> bars = List.of(
                new MoistureBudgetChart.Bar("A", new Estimate(20 * PINT_PER_DAY, 4 * PINT_PER_DAY), false, false),
                new MoistureBudgetChart.Bar("B", new Estimate(40 * PINT_PER_DAY, 0), false, false),
                new MoistureBudgetChart.Bar("Total gains", new Estimate(60 * PINT_PER_DAY, 5 * PINT_PER_DAY), false, true),
                new MoistureBudgetChart.Bar("Removed", new Estimate(30 * PINT_PER_DAY, 6 * PINT_PER_DAY), true, true));
        RecordingPainter p = new RecordingPainter();
        new MoistureBudgetChart(bars, UnitSystem.IP, "footer").paint(p, Theme.LIGHT, 1000, 500);
        List<RecordingPainter.Rect> rects = p.ops().stream().filter(o -> o instanceof RecordingPainter.Rect)
                .map(o -> (RecordingPainter.Rect) o).toList();
        assertEquals(5, rects.size(), "background and four bars");
        double a = rects.get(1).width();
        assertEquals(2.0, rects.get(2).width() / a, 1e-9);
        assertEquals(3.0, rects.get(3).width() / a, 1e-9);
        assertEquals(1.5, rects.get(4).width() / a, 1e-9);
        List<String> texts = p.ops().stream().filter(o -> o instanceof RecordingPainter.Text)
                .map(o -> ((RecordingPainter.Text) o).text()).toList();
        assertTrue(texts.containsAll(List.of("A", "B", "Total gains", "Removed", "20.0", "60.0", "footer")), texts.toString());
        assertTrue(texts.get(0).contains("pints/day"));
    }
}
