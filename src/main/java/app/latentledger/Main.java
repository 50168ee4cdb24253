package app.latentledger;

import app.latentledger.cli.Cli;
import app.latentledger.cli.Command;
import app.latentledger.ui.LedgerApp;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Entry point of {@code java -jar latent-ledger.jar}: with a command it runs the command line and
 * needs no display; with none (or only global options) it opens the tablet app. This is the
 * composition root: the only class that knows both faces, so it registers the commands that draw
 * the app ({@link ScreensCommand}).
 */
public final class Main {
    private Main() {
    }

    public static void main(String[] argv) {
        List<String> words = Arrays.asList(argv);
        if (!hasCommand(words)) {
            LedgerApp.launchWith(argv);
            return;
        }
        int code = commandLine().run(words, System.out, System.err);
        System.out.flush();
        System.exit(code);
    }

    /** Every command of this build: the display-free ones and {@code screens}. */
    public static Cli commandLine() {
        List<Command> all = new ArrayList<>(Cli.standardCommands());
        all.add(new ScreensCommand());
        return new Cli(all);
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
