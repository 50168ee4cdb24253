package app.latentledger.cli;

/** One word of the command line, e.g. {@code state} or {@code coil}. */
public interface Command {
    /** The word the tech types. */
    String name();

    /** One line for the command list. */
    String summary();

    /** Full usage text shown for {@code --help} or a usage error. */
    String usage();

    /**
     * Runs the command.
     *
     * @return exit code: 0 done, 2 refused input
     */
    int run(Args args, CliContext context) throws Exception;
}
