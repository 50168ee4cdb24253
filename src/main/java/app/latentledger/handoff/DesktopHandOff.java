package app.latentledger.handoff;

import java.awt.Desktop;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.Set;

/**
 * Open and print through the desktop's own file associations ({@link java.awt.Desktop}): the PDF
 * viewer the tablet already has, and its print dialog. A headless machine offers neither.
 */
public final class DesktopHandOff implements HandOff {
    /** The part of {@link Desktop} used here, so tests can stand in for it. */
    public interface Actions {
        boolean supports(Action action);

        void open(Path file) throws IOException;

        void print(Path file) throws IOException;
    }

    private final Actions actions;

    public DesktopHandOff(Actions actions) {
        this.actions = actions;
    }

    /** The real desktop, or one that offers nothing when there is none (headless, no session). */
    public static DesktopHandOff system() {
        return new DesktopHandOff(new Actions() {
            @Override
            public boolean supports(Action action) {
                if (java.awt.GraphicsEnvironment.isHeadless() || !Desktop.isDesktopSupported()) {
                    return false;
                }
                return switch (action) {
                    case OPEN -> Desktop.getDesktop().isSupported(Desktop.Action.OPEN);
                    case PRINT -> Desktop.getDesktop().isSupported(Desktop.Action.PRINT);
                    case SHARE -> false;
                };
            }

            @Override
            public void open(Path file) throws IOException {
                Desktop.getDesktop().open(file.toFile());
            }

            @Override
            public void print(Path file) throws IOException {
                Desktop.getDesktop().print(file.toFile());
            }
        });
    }

    @Override
    public Set<Action> available() {
        Set<Action> out = EnumSet.noneOf(Action.class);
        for (Action a : new Action[] {Action.OPEN, Action.PRINT}) {
            if (actions.supports(a)) {
                out.add(a);
            }
        }
        return out;
    }

    @Override
    public void run(Action action, Path file, String title) throws IOException {
        if (!Files.isRegularFile(file)) {
            throw new IOException("no file " + file + " to " + action.name().toLowerCase(java.util.Locale.ROOT));
        }
        if (!available().contains(action)) {
            throw new IOException("this device cannot " + action.name().toLowerCase(java.util.Locale.ROOT)
                    + " files from the app; the file is " + file);
        }
        switch (action) {
            case OPEN -> actions.open(file);
            case PRINT -> actions.print(file);
            case SHARE -> throw new IOException("sharing is not offered by the desktop");
        }
    }
}
