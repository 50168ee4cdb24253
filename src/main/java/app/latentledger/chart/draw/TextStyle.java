package app.latentledger.chart.draw;

import java.util.Objects;

/**
 * How a string is set: size in device units, weight, colour, which point of the text box sits at
 * the given (x, y), and a rotation about that point (degrees, clockwise because y grows downwards).
 */
public record TextStyle(double size, boolean bold, Colour colour, HAlign hAlign, VAlign vAlign, double rotationDeg) {

    /** Horizontal anchor. */
    public enum HAlign { LEFT, CENTER, RIGHT }

    /** Vertical anchor; BASELINE is the font's baseline. */
    public enum VAlign { TOP, MIDDLE, BASELINE, BOTTOM }

    public TextStyle {
        Objects.requireNonNull(colour, "colour");
        Objects.requireNonNull(hAlign, "hAlign");
        Objects.requireNonNull(vAlign, "vAlign");
        if (!(size > 0)) {
            throw new IllegalArgumentException("text size " + size + " must be above 0");
        }
    }

    public static TextStyle of(double size, Colour colour) {
        return new TextStyle(size, false, colour, HAlign.LEFT, VAlign.BASELINE, 0);
    }

    public TextStyle align(HAlign h, VAlign v) {
        return new TextStyle(size, bold, colour, h, v, rotationDeg);
    }

    public TextStyle rotated(double degrees) {
        return new TextStyle(size, bold, colour, hAlign, vAlign, degrees);
    }

    public TextStyle emphasised() {
        return new TextStyle(size, true, colour, hAlign, vAlign, rotationDeg);
    }

    public TextStyle sized(double newSize) {
        return new TextStyle(newSize, bold, colour, hAlign, vAlign, rotationDeg);
    }

    public TextStyle coloured(Colour newColour) {
        return new TextStyle(size, bold, newColour, hAlign, vAlign, rotationDeg);
    }
}
