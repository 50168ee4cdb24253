package app.latentledger.chart.draw;

/**
 * An sRGB colour with opacity. Channels 0–255, alpha 0–1.
 */
public record Colour(int red, int green, int blue, double alpha) {

    public Colour {
        checkChannel("red", red);
        checkChannel("green", green);
        checkChannel("blue", blue);
        if (!(alpha >= 0 && alpha <= 1)) {
            throw new IllegalArgumentException("alpha " + alpha + " is outside 0…1");
        }
    }

    /** An opaque colour from 0xRRGGBB. */
    public static Colour rgb(int hex) {
        return new Colour((hex >> 16) & 0xFF, (hex >> 8) & 0xFF, hex & 0xFF, 1.0);
    }

    /** The same colour with another opacity. */
    public Colour withAlpha(double newAlpha) {
        return new Colour(red, green, blue, newAlpha);
    }

    /** "#rrggbb" (opacity not included), for CSS and logs. */
    public String hex() {
        return String.format("#%02x%02x%02x", red, green, blue);
    }

    private static void checkChannel(String name, int value) {
        if (value < 0 || value > 255) {
            throw new IllegalArgumentException(name + " " + value + " is outside 0…255");
        }
    }
}
