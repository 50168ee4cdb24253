package app.latentledger.chart.draw;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class RecordingPainterTest {

    @Test
    void recordsCallsWithTheirGroupAndCopiesPoints() {
        RecordingPainter p = new RecordingPainter();
        double[] xs = {1, 2, 3};
        double[] ys = {4, 5, 6};
        p.beginGroup("curve");
        p.polyline(xs, ys, 2, Stroke.solid(Colour.rgb(0x102030), 1));
        p.endGroup();
        xs[0] = 99;
        RecordingPainter.Polyline line = p.ops(RecordingPainter.Polyline.class, "curve").get(0);
        assertArrayEquals(new double[] {1, 2}, line.xs());
        assertEquals(0, p.ops(RecordingPainter.Polyline.class, "").size());
        assertTrue(p.balanced());
    }

    @Test
    void unbalancedRestoreIsRefused() {
        RecordingPainter p = new RecordingPainter();
        assertThrows(IllegalStateException.class, p::restore);
        p.save();
        assertFalse(p.balanced());
    }

    @Test
    void colourAndStrokeRefuseNonsense() {
        assertThrows(IllegalArgumentException.class, () -> new Colour(256, 0, 0, 1));
        assertThrows(IllegalArgumentException.class, () -> Stroke.solid(Colour.rgb(0), 0));
        assertEquals("#0b3c78", Colour.rgb(0x0B3C78).hex());
    }

    @Test
    void dashLengthsScaleWithWidth() {
        assertEquals(0, DashPattern.SOLID.lengths(3).length);
        assertArrayEquals(new double[] {12, 8}, DashPattern.DASHED.lengths(2));
    }

    @Test
    void estimatedTextWidthGrowsWithLengthAndSize() {
        double a = TextMeasurer.ESTIMATE.width("70", 18, false);
        assertEquals(2 * 0.56 * 18, a, 1e-9);
        assertTrue(TextMeasurer.ESTIMATE.width("70 °F", 18, true) > a);
    }
}
