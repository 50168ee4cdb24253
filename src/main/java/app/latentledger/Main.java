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
            requireDisplay("the app");
            try {
                LedgerApp.launchWith(argv);
            } catch (RuntimeException e) {
                if (!DisplayCheck.isNoDisplayFailure(e)) {
                    throw e;
                }
                System.err.println(DisplayCheck.message("the app", e.getMessage()));
                System.exit(DisplayCheck.NO_DISPLAY);
            }
            return;
        }
        if ("screens".equals(commandWord(words)) && !words.contains("--help")) {
            requireDisplay("screens");
        }
        int code = commandLine().run(words, System.out, System.err);
        System.out.flush();
        System.exit(code);
    }

    /** Every command of this build: the display-free ones, {@code screens} and {@code serve}. */
    public static Cli commandLine() {
        List<Command> all = new ArrayList<>(Cli.standardCommands());
        all.add(new ScreensCommand());
        // the office server: a face of its own, so it is registered here, not in the command line
        all.add(new ServeCommand());
        return new Cli(all);
    }

    /** Ends the process with one plain line when nothing can be shown here (see {@link DisplayCheck}). */
    private static void requireDisplay(String what) {
        DisplayCheck.missing(what, System.getProperty("os.name"), System.getenv(), System.getProperty("glass.platform"))
                .ifPresent(line -> {
                    System.err.println(line);
                    System.exit(DisplayCheck.NO_DISPLAY);
                });
    }

    /** True when a command word follows the global options. */
    static boolean hasCommand(List<String> words) {
        return commandWord(words) != null;
    }

    /** The first word after the global options (the command's name), or null. */
    static String commandWord(List<String> words) {
        for (int i = 0; i < words.size(); i++) {
            String w = words.get(i);
            if (w.equals("--data-dir")) {
                i++;
            } else if (!w.startsWith("--data-dir=")) {
                return w;
            }
        }
        return null;
    }
}
