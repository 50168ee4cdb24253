package app.latentledger.core.settings;

import java.util.Locale;

/** Light or dark screens and charts; the UI maps it onto its own colour themes. */
public enum DisplayTheme {
    LIGHT, DARK;

    /** "light" | "dark", as stored and typed. */
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
