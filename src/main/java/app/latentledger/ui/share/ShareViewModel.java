package app.latentledger.ui.share;

import app.latentledger.handoff.HandOff;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Set;
import java.util.concurrent.Executor;

/**
 * Open, print or share the file just written (a report, a bundle): the buttons show only what this
 * device offers, the action runs off the FX thread (a viewer can take seconds to start), and the
 * message says what happened or why not.
 */
public final class ShareViewModel {
    private final HandOff handOff;
    private final Executor work;
    private final Executor fx;
    private final Set<HandOff.Action> offered;
    private final ObjectProperty<Path> file = new SimpleObjectProperty<>();
    private final ObjectProperty<String> title = new SimpleObjectProperty<>("Report");
    private final ReadOnlyBooleanWrapper canOpen = new ReadOnlyBooleanWrapper(false);
    private final ReadOnlyBooleanWrapper canPrint = new ReadOnlyBooleanWrapper(false);
    private final ReadOnlyBooleanWrapper canShare = new ReadOnlyBooleanWrapper(false);
    private final ReadOnlyBooleanWrapper busy = new ReadOnlyBooleanWrapper(false);
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper("");

    public ShareViewModel(HandOff handOff, Executor work, Executor fx) {
        this.handOff = handOff;
        this.work = work;
        this.fx = fx;
        this.offered = handOff.available();
        file.addListener((o, was, now) -> update());
        busy.addListener((o, was, now) -> update());
    }

    private void update() {
        boolean ready = file.get() != null && !busy.get();
        canOpen.set(ready && offered.contains(HandOff.Action.OPEN));
        canPrint.set(ready && offered.contains(HandOff.Action.PRINT));
        canShare.set(ready && offered.contains(HandOff.Action.SHARE));
    }

    /** True when this device offers no way at all to hand a file on (the screen then names the folder). */
    public boolean offersNothing() {
        return offered.isEmpty();
    }

    public void open() {
        run(HandOff.Action.OPEN, "Opened ");
    }

    public void print() {
        run(HandOff.Action.PRINT, "Sent to the printer: ");
    }

    public void share() {
        run(HandOff.Action.SHARE, "Shared ");
    }

    private void run(HandOff.Action action, String done) {
        Path f = file.get();
        if (f == null || !offered.contains(action)) {
            return;
        }
        busy.set(true);
        String t = title.get();
        work.execute(() -> {
            String result;
            try {
                handOff.run(action, f, t);
                result = done + f.getFileName() + ".";
            } catch (IOException | RuntimeException e) {
                result = "Could not " + action.name().toLowerCase(java.util.Locale.ROOT) + " " + f.getFileName()
                        + ": " + e.getMessage();
            }
            String shown = result;
            fx.execute(() -> {
                message.set(shown);
                busy.set(false);
            });
        });
    }

    /** The file the buttons act on. */
    public ObjectProperty<Path> fileProperty() {
        return file;
    }

    /** What the file is, for a share sheet's subject. */
    public ObjectProperty<String> titleProperty() {
        return title;
    }

    public ReadOnlyBooleanProperty canOpenProperty() {
        return canOpen.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty canPrintProperty() {
        return canPrint.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty canShareProperty() {
        return canShare.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }
}
