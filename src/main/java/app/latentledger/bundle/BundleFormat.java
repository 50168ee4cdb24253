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
    static final int VERSION = 2;
    /** The oldest version this build still imports (version 1 had no paperwork or deletions). */
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

    /** Refuse entries larger than this: 256 MiB is far above a month of 1 Hz logging. */
    static final long MAX_ENTRY_BYTES = 256L << 20;

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
