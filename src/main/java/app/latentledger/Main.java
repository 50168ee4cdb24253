package app.latentledger;

import app.latentledger.cli.Cli;

import java.util.Arrays;
import java.util.List;

/**
 * Entry point of {@code java -jar latent-ledger.jar}: with a command it runs the command line and
 * needs no display; with none (or only global options) it opens the tablet app.
 */
public final class Main {
    private Main() {
    }

    public static void main(String[] argv) {
        List<String> words = Arrays.asList(argv);
        nativeLibraryOnce(argv);
        if (!hasCommand(words)) {
            app.latentledger.ui.LedgerApp.launchWith(argv);
            return;
        }
        int code = Cli.standard().run(words, System.out, System.err);
        System.out.flush();
        System.exit(code);
    }

    /**
     * SQLite's native library is unpacked once into the data folder's {@code native/} folder rather
     * than into the temporary folder on every start (a killed run would leave its copy there).
     */
    private static void nativeLibraryOnce(String[] argv) {
        try {
            java.nio.file.Path dataDir = app.latentledger.store.DataLocation.dataDirOption(argv);
            if (dataDir != null && dataDir.toString().isBlank()) {
                return; // refused with a message by the command line
            }
            app.latentledger.store.NativeLibrary.useAppFolder(
                    app.latentledger.store.DataLocation.resolve(dataDir).folder());
        } catch (RuntimeException e) {
            // the driver unpacks it itself as before
        }
    }

    /** True when a command word follows the global options. */
    static boolean hasCommand(List<String> words) {
        for (int i = 0; i < words.size(); i++) {
            String w = words.get(i);
            if (w.equals("--data-dir")) {
                i++;
            } else if (!w.startsWith("--data-dir=")) {
                return true;
            }
        }
        return false;
    }
}
