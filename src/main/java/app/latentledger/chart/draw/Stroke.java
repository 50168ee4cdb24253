package app.latentledger.chart.draw;

import java.util.Objects;

/** How a line is drawn: colour, width in device units, pattern. */
public record Stroke(Colour colour, double width, DashPattern dash) {

    public Stroke {
        Objects.requireNonNull(colour, "colour");
        Objects.requireNonNull(dash, "dash");
        if (!(width > 0)) {
            throw new IllegalArgumentException("stroke width " + width + " must be above 0");
        }
    }

    public static Stroke solid(Colour colour, double width) {
        return new Stroke(colour, width, DashPattern.SOLID);
    }

    public Stroke withDash(DashPattern newDash) {
        return new Stroke(colour, width, newDash);
    }

    public Stroke withWidth(double newWidth) {
        return new Stroke(colour, newWidth, dash);
    }
}
