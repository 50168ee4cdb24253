package app.latentledger.bundle;

import java.util.Locale;

/** What a bundle holds: one visit (with its site and system) or a whole site. */
public enum BundleScope {
    VISIT, SITE;

    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }
}
