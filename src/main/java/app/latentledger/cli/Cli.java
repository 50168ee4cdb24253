package app.latentledger.cli;

import app.latentledger.core.InvalidInputException;
import app.latentledger.store.StoreException;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The command line: {@code latent-ledger [--data-dir DIR] COMMAND [options]}. Exit codes:
 * 0 done, 2 input refused (message on standard error), 1 unexpected failure.
 */
public final class Cli {
    private static final System.Logger LOG = System.getLogger(Cli.class.getName());

    public static final int OK = 0;
    public static final int FAILED = 1;
    public static final int REFUSED = 2;

    private final Map<String, Command> commands = new LinkedHashMap<>();

    public Cli(List<Command> available) {
        for (Command c : available) {
            commands.put(c.name(), c);
        }
    }

    /** The commands that need no display; {@code Main} adds the ones that draw the app. */
    public static List<Command> standardCommands() {
        return List.of(new StateCommand(), new CoilCommand(), new LogCommand(), new VisitsCommand(),
                new ReportCommand(), new DataCommand(), new SettingsCommand(),
                // recording from the command line
                new SitesCommand(), new SystemsCommand(), new ReadingsCommand(), DeleteCommand.delete(),
                DeleteCommand.restore(), new RecycleBinCommand(),
                // the house around the system
                new HouseCommand(),
                new BatchCommand(),
                // syncing with the office server
                new OfficeCommand());
    }

    /** The display-free commands alone (tests and tools that never draw). */
    public static Cli standard() {
        return new Cli(standardCommands());
    }

    public int run(List<String> words, PrintStream rawOut, PrintStream rawErr) {
        // text from records (a bundle's site name, notes) never reaches the terminal as control codes
        PrintStream out = TerminalSafe.wrap(rawOut);
        PrintStream err = TerminalSafe.wrap(rawErr);
        List<String> rest = new ArrayList<>(words);
        Path dataDir = null;
        try {
            while (!rest.isEmpty() && rest.get(0).startsWith("--")) {
                String opt = rest.remove(0);
                if (opt.equals("--data-dir") || opt.startsWith("--data-dir=")) {
                    String v = opt.contains("=") ? opt.substring(opt.indexOf('=') + 1) : next(rest, opt);
                    dataDir = dataDir(v);
                } else if (opt.equals("--help")) {
                    out.print(overview());
                    return OK;
                } else {
                    throw new UsageException("unknown option " + opt + " before the command name\n" + overview());
                }
            }
            if (rest.isEmpty()) {
                throw new UsageException("no command given\n" + overview());
            }
            String name = rest.remove(0);
            Command command = commands.get(name);
            if (command == null) {
                throw new UsageException("unknown command '" + name + "'\n" + overview());
            }
            if (rest.contains("--help")) {
                out.print(command.usage());
                return OK;
            }
            Args args = Args.parse(rest, Set.of("json", "help", "repair", "remove", Args.DECIMAL_COMMA, "yes", "with-deletions",
                    "dry-run", "same-probe", "store", "template"));
            return command.run(args, new CliContext(out, err, dataDir));
        } catch (UsageException e) {
            err.println("latent-ledger: " + e.getMessage());
            return REFUSED;
        } catch (InvalidInputException e) {
            err.println("latent-ledger: " + e.getMessage());
            return REFUSED;
        } catch (StoreException e) {
            if (e.kind() == StoreException.Kind.FAILED) {
                err.println("latent-ledger: the ledger could not do it: " + e.getMessage());
                return FAILED;
            }
            // busy (try again) or a data folder that cannot hold a ledger: the tech can act on both
            err.println("latent-ledger: " + e.getMessage());
            return REFUSED;
        } catch (OutOfMemoryError e) {
            err.println("latent-ledger: refused: this needs more memory than the app has ("
                    + (Runtime.getRuntime().maxMemory() >> 20) + " MiB); nothing was changed");
            return REFUSED;
        } catch (Exception e) {
            // the tech reads a sentence; the class name and stack go to the log (java.util.logging, level FINE)
            LOG.log(System.Logger.Level.DEBUG, "command failed", e);
            err.println("latent-ledger: unexpected failure: " + (e.getMessage() == null || e.getMessage().isBlank()
                    ? "the command stopped before it finished; nothing saved was changed" : e.getMessage()));
            return FAILED;
        }
    }

    /** The {@code --data-dir} value: refused when empty or an existing file (a folder is needed). */
    private static Path dataDir(String value) {
        if (value.isBlank()) {
            throw new UsageException("--data-dir is empty: give the folder that holds (or will hold) the ledger");
        }
        Path p;
        try {
            p = Path.of(value);
        } catch (java.nio.file.InvalidPathException e) {
            throw new UsageException("--data-dir '" + value + "' is not a usable folder name: " + e.getReason());
        }
        if (java.nio.file.Files.exists(p) && !java.nio.file.Files.isDirectory(p)) {
            throw new UsageException("--data-dir " + value + " is a file, not a folder; give a folder");
        }
        return p;
    }

    private static String next(List<String> rest, String opt) {
        if (rest.isEmpty()) {
            throw new UsageException(opt + " needs a value");
        }
        return rest.remove(0);
    }

    public String overview() {
        StringBuilder b = new StringBuilder("usage: latent-ledger [--data-dir DIR] COMMAND [options]\n"
                + "       latent-ledger            (no command: opens the tablet app)\ncommands:\n");
        for (Command c : commands.values()) {
            b.append(String.format("  %-11s %s%n", c.name(), c.summary()));
        }
        return b.append("Each command takes --help.\n").toString();
    }
}
