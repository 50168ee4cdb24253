package app.latentledger.ui.chart;

import app.latentledger.chart.draw.TextMeasurer;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.Text;

import java.util.HashMap;
import java.util.Map;

/** Measures text with the canvas's own font so labels are placed where they will really be drawn. */
public final class FxTextMeasurer implements TextMeasurer {
    private final String family;
    private final Map<Long, Font> fonts = new HashMap<>();
    private final Text probe = new Text();

    public FxTextMeasurer(String family) {
        this.family = family;
    }

    /** The system's default sans-serif family. */
    public static FxTextMeasurer system() {
        return new FxTextMeasurer(Font.getDefault().getFamily());
    }

    Font font(double size, boolean bold) {
        long key = Double.doubleToLongBits(size) ^ (bold ? 1L : 0L);
        return fonts.computeIfAbsent(key, k -> Font.font(family, bold ? FontWeight.BOLD : FontWeight.NORMAL, size));
    }

    @Override
    public double width(String text, double size, boolean bold) {
        probe.setFont(font(size, bold));
        probe.setText(text);
        return probe.getLayoutBounds().getWidth();
    }
}
