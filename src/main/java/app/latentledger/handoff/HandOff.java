package app.latentledger.handoff;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Set;

/**
 * Handing a finished file (a report PDF, a bundle) to the device: open it in the system's viewer,
 * print it, or share it (mail, messaging, cloud) where the platform offers that. What a device
 * can do is asked first, so a screen shows only the buttons that work. The calls may block while
 * the system starts a viewer: call them off the FX thread.
 */
public interface HandOff {
    /** What can be done with a file on this device. */
    enum Action {
        OPEN, PRINT, SHARE
    }

    /** The actions this device offers; empty on a machine with no desktop and no share service. */
    Set<Action> available();

    /**
     * Does {@code action} with {@code file}.
     *
     * @param title what the file is, for a share sheet's subject ("Report, Marsh residence")
     * @throws IOException when the device refuses or the action is not available
     */
    void run(Action action, Path file, String title) throws IOException;
}
