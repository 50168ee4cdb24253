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
        if (!hasCommand(words)) {
            app.latentledger.ui.LedgerApp.launchWith(argv);
            return;
        }
        int code = Cli.standard().run(words, System.out, System.err);
        System.out.flush();
        System.exit(code);
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
