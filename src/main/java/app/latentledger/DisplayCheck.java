package app.latentledger;

import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * Whether a window can open here, decided before JavaFX starts: without a display JavaFX ends in
 * a stack trace a tech cannot act on. Only Linux and other X11/Wayland systems can lack one;
 * Windows, macOS and the phones always have a screen.
 */
final class DisplayCheck {
    /** Exit code when the app or {@code screens} is asked for where nothing can be shown. */
    static final int NO_DISPLAY = 2;

    private DisplayCheck() {
    }

    /**
     * The one line to print when {@code what} ("the app", "screens") cannot open a window, or
     * empty when a display is there (or the headless Monocle platform was chosen, as in tests).
     */
    static Optional<String> missing(String what, String osName, Map<String, String> env, String glassPlatform) {
        String os = osName == null ? "" : osName.toLowerCase(Locale.ROOT);
        if (os.startsWith("windows") || os.startsWith("mac")) {
            return Optional.empty();
        }
        if ("monocle".equalsIgnoreCase(glassPlatform) || present(env.get("DISPLAY"))
                || present(env.get("WAYLAND_DISPLAY"))) {
            return Optional.empty();
        }
        return Optional.of(message(what, "no DISPLAY or WAYLAND_DISPLAY is set"));
    }

    /** The same line when a display was named but JavaFX could not use it. */
    static String message(String what, String why) {
        return "latent-ledger: " + what + " needs a display (" + why + "; on a machine without a screen "
                + "run it under xvfb-run); every other command works without one: latent-ledger --help";
    }

    /** True for JavaFX's start-up failures that mean "no usable display", not a bug in the app. */
    static boolean isNoDisplayFailure(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            String m = t.getMessage();
            if (t instanceof UnsupportedOperationException && m != null
                    && (m.contains("DISPLAY") || m.contains("glass GTK library"))) {
                return true;
            }
        }
        return false;
    }

    private static boolean present(String value) {
        return value != null && !value.isBlank();
    }
}
