package app.latentledger.cli;

import java.io.PrintStream;
import java.nio.file.Path;

/**
 * What every command gets: its output streams and the global options given before the command
 * name (such as {@code --data-dir}).
 *
 * @param out     results (tables or JSON)
 * @param err     messages and progress
 * @param dataDir data folder from {@code --data-dir}, or null to use the default location logic
 */
public record CliContext(PrintStream out, PrintStream err, Path dataDir) {
}
