package app.latentledger.cli;

import app.latentledger.core.text.TerminalText;

import java.io.PrintStream;

/**
 * The command line's output stream: every text printed passes through
 * {@link TerminalText#escape(String, boolean)}, so a site name or note from a bundle cannot send
 * escape sequences or bidirectional overrides to the tech's terminal. Line breaks and tabs pass;
 * the escape is JSON's own spelling ({@code \\u001B}), so JSON output stays valid. It applies to
 * pipes and files too: the same bytes whatever the output is.
 */
final class TerminalSafe extends PrintStream {
    private final PrintStream target;

    private TerminalSafe(PrintStream target) {
        super(target, true);
        this.target = target;
    }

    static PrintStream wrap(PrintStream out) {
        return out instanceof TerminalSafe ? out : new TerminalSafe(out);
    }

    private static String safe(String s) {
        return TerminalText.escape(s, true);
    }

    @Override
    public void print(String s) {
        target.print(safe(String.valueOf(s)));
    }

    @Override
    public void print(Object o) {
        print(String.valueOf(o));
    }

    @Override
    public void print(char c) {
        print(String.valueOf(c));
    }

    @Override
    public void print(char[] s) {
        print(new String(s));
    }

    @Override
    public void println() {
        target.println();
    }

    @Override
    public void println(String s) {
        target.println(safe(String.valueOf(s)));
    }

    @Override
    public void println(Object o) {
        println(String.valueOf(o));
    }

    @Override
    public void println(char c) {
        println(String.valueOf(c));
    }

    @Override
    public void println(char[] s) {
        println(new String(s));
    }

    @Override
    public void flush() {
        target.flush();
    }

    @Override
    public void close() {
        target.flush();
    }
}
