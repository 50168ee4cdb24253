package app.latentledger.handoff;

import java.io.IOException;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/** Every way this device can hand a file on: the share service where present, the desktop otherwise. */
public final class HandOffs implements HandOff {
    private final List<HandOff> ways;

    public HandOffs(List<HandOff> ways) {
        this.ways = List.copyOf(ways);
    }

    /** This device's: Attach share first (a tablet's share sheet), then the desktop's open and print. */
    public static HandOffs forThisDevice() {
        Optional<AttachShare> share = AttachShare.find();
        return share.<HandOffs>map(s -> new HandOffs(List.of(s, DesktopHandOff.system())))
                .orElseGet(() -> new HandOffs(List.of(DesktopHandOff.system())));
    }

    @Override
    public Set<Action> available() {
        Set<Action> out = EnumSet.noneOf(Action.class);
        ways.forEach(w -> out.addAll(w.available()));
        return out;
    }

    @Override
    public void run(Action action, Path file, String title) throws IOException {
        for (HandOff w : ways) {
            if (w.available().contains(action)) {
                w.run(action, file, title);
                return;
            }
        }
        throw new IOException("this device cannot " + action.name().toLowerCase(java.util.Locale.ROOT)
                + " files from the app; the file is " + file);
    }
}
