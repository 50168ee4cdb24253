package app.latentledger.bundle;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;

import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/** The bundle's name, version and fixed entry names (docs/bundle-format.md). */
final class BundleFormat {
    static final String NAME = "latent-ledger-bundle";
    /** Bumped when a reader of the previous version could misread a new bundle. */
    static final int VERSION = 3;
    /**
     * The oldest version this build still imports (version 1 had no paperwork or deletions, versions
     * 1 and 2 no house data or stored log conditions).
     */
    static final int OLDEST_READ = 1;

    static final String MANIFEST = "manifest.json";
    static final String SITE = "site.json";
    static final String SYSTEMS = "systems.json";
    static final String VISITS = "visits.json";
    static final String LOGS = "logs.json";
    static final String SNAPSHOTS = "snapshots.json";
    /** Since version 2. */
    static final String INSTRUMENTS = "instruments.json";
    static final String PAPERWORK = "paperwork.json";
    static final String DELETIONS = "deletions.json";
    /** Since version 3: the site's house facts and the visits' house readings. */
    static final String HOUSE = "house.json";

    /*
     * Import limits (docs/bundle-format.md, "Limits"). The manifest is read first and every size it
     * declares is checked against these before any other entry is inflated; an entry is then read
     * only up to its declared size, so a bundle cannot make the reader hold more than it declared.
     */
    /** Entries in one zip: a site bundle holds 11 fixed entries and one per log. */
    static final int MAX_ENTRIES = 2_000;
    /** The manifest itself: a list of up to 2 000 names and checksums. */
    static final long MAX_MANIFEST_BYTES = 1L << 20;
    /** A record entry (site, systems, visits, logs, snapshots JSON; readings CSV). */
    static final long MAX_RECORD_ENTRY_BYTES = 32L << 20;
    /** One log's samples CSV: 256 MiB is far above a month of 1 Hz logging (about 140 MB). */
    static final long MAX_ENTRY_BYTES = 256L << 20;
    /** All entries together, inflated. */
    static final long MAX_TOTAL_BYTES = 2L << 30;
    /** Longest line of a log CSV: a time and 64 channels of 25 characters each fit in 2 KiB. */
    static final int MAX_LOG_LINE_CHARS = 16 * 1024;

    static final Gson GSON = new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().serializeNulls().create();

    private BundleFormat() {
    }

    static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }
}
