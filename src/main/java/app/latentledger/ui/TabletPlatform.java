package app.latentledger.ui;

import com.gluonhq.attach.display.DisplayService;
import com.gluonhq.attach.lifecycle.LifecycleEvent;
import com.gluonhq.attach.lifecycle.LifecycleService;
import javafx.geometry.Dimension2D;

import java.util.logging.Level;
import java.util.logging.Logger;

/**
 * What the app asks of the device through Gluon Attach, each with a desktop fallback: the screen
 * size (a tablet fills its screen; a desktop window opens at the 1280 × 800 tablet size) and the
 * pause event (a tablet pauses the app when the tech switches away or the screen goes off).
 */
final class TabletPlatform {
    /** The tablet size every layout is designed for, landscape. */
    static final Dimension2D DESKTOP_WINDOW = new Dimension2D(1280, 800);
    /** Held so the level set below is not lost when the logger is collected. */
    private static final Logger ATTACH_LOG = Logger.getLogger("com.gluonhq.attach.util.Platform");

    private TabletPlatform() {
    }

    /** Window size: the device screen on a tablet, else {@link #DESKTOP_WINDOW}. Call on the FX thread. */
    static Dimension2D windowSize() {
        ATTACH_LOG.setLevel(Level.WARNING);
        try {
            return DisplayService.create()
                    .filter(d -> d.isTablet() || d.isPhone())
                    .map(DisplayService::getScreenResolution)
                    .orElse(DESKTOP_WINDOW);
        } catch (RuntimeException | LinkageError e) {
            return DESKTOP_WINDOW;
        }
    }

    /** Runs {@code onPause} when the platform pauses the app; on a desktop nothing ever pauses it. */
    static void onPause(Runnable onPause) {
        try {
            LifecycleService.create().ifPresent(l -> l.addListener(LifecycleEvent.PAUSE, onPause));
        } catch (RuntimeException | LinkageError e) {
            // no lifecycle service on this platform: the window's close request still saves
        }
    }
}
