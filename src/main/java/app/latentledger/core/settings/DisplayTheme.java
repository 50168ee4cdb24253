package app.latentledger.core.settings;

import java.util.Locale;

/**
 * Light, dark or outdoor (high contrast for direct sunlight) screens and charts; the UI maps it onto
 * its own colour themes.
 */
public enum DisplayTheme {
    LIGHT, DARK, OUTDOOR;

    /** "light" | "dark" | "outdoor", as stored and typed. */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** Parses a key; null when not one. */
    public static DisplayTheme parseOrNull(String text) {
        for (DisplayTheme t : values()) {
            if (t.key().equalsIgnoreCase(text == null ? "" : text.trim())) {
                return t;
            }
        }
        return null;
    }
}
