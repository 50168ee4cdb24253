package app.latentledger.cli;

import java.io.PrintStream;

/**
 * "checked 1,250 of 10,000 rows" on one terminal line, redrawn at most four times a second, for a
 * long batch. Only on a console and never with {@code --json}: a pipe, a file or a program reading
 * the output gets none of it.
 */
final class BatchProgress {
    private static final long EVERY_NS = 250_000_000L;

    private final PrintStream out;
    private final String what;
    private final int total;
    private long last;
    private boolean shown;

    private BatchProgress(PrintStream out, String what, int total) {
        this.out = out;
        this.what = what;
        this.total = total;
        this.last = System.nanoTime();
    }

    /** A progress line on standard error when it is a terminal and {@code wanted}; else one that prints nothing. */
    static BatchProgress onTerminal(boolean wanted, String what, int total) {
        boolean console = wanted && System.console() != null;
        return new BatchProgress(console ? System.err : null, what, total);
    }

    /** For tests: progress to {@code out}, or none when null. */
    static BatchProgress to(PrintStream out, String what, int total) {
        return new BatchProgress(out, what, total);
    }

    synchronized void done(int count) {
        if (out == null) {
            return;
        }
        long now = System.nanoTime();
        if (now - last < EVERY_NS && count < total) {
            return;
        }
        last = now;
        shown = true;
        out.print("\r" + what + " " + String.format("%,d", count) + " of " + String.format("%,d", total) + "   ");
        out.flush();
    }

    /** Clears the line so what follows starts clean. */
    synchronized void finish() {
        if (out != null && shown) {
            out.print("\r" + " ".repeat(what.length() + 40) + "\r");
            out.flush();
        }
    }
}
