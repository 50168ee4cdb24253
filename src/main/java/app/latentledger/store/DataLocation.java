package app.latentledger.store;

import com.gluonhq.attach.storage.StorageService;

import java.io.File;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import java.util.function.Supplier;

/**
 * Where the ledger lives. The one place the app and every command decide it, in this order:
 * <ol>
 * <li>{@code --data-dir DIR} given before the command name (or to the app);</li>
 * <li>the environment variable {@value #ENV};</li>
 * <li>the platform's private app storage from Gluon Attach {@code StorageService} (on a desktop
 *     {@code ~/.gluon}), in a {@value #SUBFOLDER} folder inside it;</li>
 * <li>{@code ${user.home}/.latent-ledger}.</li>
 * </ol>
 */
public final class DataLocation {
    public static final String ENV = "LATENT_LEDGER_DATA_DIR";
    static final String SUBFOLDER = "latent-ledger";

    private final Path folder;
    private final String source;

    private DataLocation(Path folder, String source) {
        this.folder = folder;
        this.source = source;
    }

    /** The folder for this run. {@code dataDir} is the {@code --data-dir} value or null. */
    public static DataLocation resolve(Path dataDir) {
        return resolve(dataDir, System.getenv(), DataLocation::attachPrivateStorage, System.getProperty("user.home"));
    }

    static DataLocation resolve(Path dataDir, Map<String, String> env, Supplier<Optional<File>> attach, String userHome) {
        if (dataDir != null) {
            return new DataLocation(dataDir.toAbsolutePath(), "--data-dir");
        }
        String fromEnv = env.get(ENV);
        if (fromEnv != null && !fromEnv.isBlank()) {
            return new DataLocation(Path.of(fromEnv).toAbsolutePath(), ENV);
        }
        Optional<File> privateStorage = attach.get();
        if (privateStorage.isPresent()) {
            return new DataLocation(privateStorage.get().toPath().resolve(SUBFOLDER).toAbsolutePath(),
                    "private app storage");
        }
        return new DataLocation(Path.of(userHome, ".latent-ledger").toAbsolutePath(), "home folder");
    }

    /**
     * The {@code --data-dir} value among the app's start-up words, or null; the same option the
     * command line reads, so the app and the commands agree.
     */
    public static Path dataDirOption(String[] words) {
        Path found = null;
        for (int i = 0; i < words.length; i++) {
            if (words[i].equals("--data-dir") && i + 1 < words.length) {
                found = Path.of(words[++i]);
            } else if (words[i].startsWith("--data-dir=")) {
                found = Path.of(words[i].substring("--data-dir=".length()));
            }
        }
        return found;
    }

    /** Held so the level set below is not lost when the logger is collected. */
    private static final java.util.logging.Logger ATTACH_PLATFORM_LOG =
            java.util.logging.Logger.getLogger("com.gluonhq.attach.util.Platform");

    private static Optional<File> attachPrivateStorage() {
        // Attach announces at INFO that it picked the desktop platform; on the command line that
        // line would land on standard error of every command
        ATTACH_PLATFORM_LOG.setLevel(java.util.logging.Level.WARNING);
        try {
            return StorageService.create().flatMap(StorageService::getPrivateStorage);
        } catch (RuntimeException | LinkageError e) {
            // no Attach implementation for this platform: fall back to the home folder
            return Optional.empty();
        }
    }

    public Path folder() {
        return folder;
    }

    /** The ledger database file in the folder. */
    public Path databaseFile() {
        return folder.resolve(Ledger.FILE_NAME);
    }

    /** Which rule chose the folder, for messages: "--data-dir", the variable name, … */
    public String source() {
        return source;
    }

    @Override
    public String toString() {
        return folder + " (" + source + ")";
    }
}
