package app.latentledger.chart.psychro;

import app.latentledger.chart.draw.Colour;
import app.latentledger.chart.draw.DashPattern;
import app.latentledger.chart.draw.Marker;
import app.latentledger.chart.draw.Theme;

/**
 * How one coil process is told apart from the other: colour, and also marker shape and line
 * pattern, so a before/after pair still reads in black and white. A single process is drawn like
 * the "after" of a pair: solid line, round markers.
 */
record OverlayStyle(Colour colour, Marker marker, DashPattern dash, String legendName) {

    static OverlayStyle of(Theme theme, CoilProcessOverlay overlay, int index, int count) {
        String name = overlay.name().isBlank() ? "Coil process" : overlay.name();
        if (count == 2 && index == 0) {
            return new OverlayStyle(theme.before(), Marker.SQUARE, DashPattern.DASHED, name);
        }
        return new OverlayStyle(theme.after(), Marker.CIRCLE, DashPattern.SOLID, name);
    }
}
