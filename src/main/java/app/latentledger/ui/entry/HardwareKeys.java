package app.latentledger.ui.entry;

import javafx.event.EventHandler;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.TextInputControl;
import javafx.scene.input.KeyEvent;

/**
 * Digits from a USB or Bluetooth keyboard (a 2-in-1 or a laptop) reach the pad as if tapped:
 * 0–9, the point, minus for the sign, Backspace, Delete or Escape to clear, Enter. Only while the
 * pad is on screen and no text field has the focus, so typing a site name elsewhere is untouched.
 * The one keyboard mapping of every number pad (readings and house), as {@link KeyGrid} is the one
 * key layout.
 */
public final class HardwareKeys {
    private HardwareKeys() {
    }

    static void attach(Node pad, EntryViewModel vm) {
        attach(pad, vm.pad(), vm::enterAndAdvance);
    }

    /**
     * Sends the keyboard's keys to {@code keys} while {@code pad} is showing.
     *
     * @param pad   the pad on screen (its scene gets the key filter)
     * @param keys  what the keys type into
     * @param enter what Enter does (the pad's own Enter key)
     */
    public static void attach(Node pad, KeypadViewModel keys, Runnable enter) {
        EventHandler<KeyEvent> filter = e -> {
            if (!showing(pad) || pad.getScene().getFocusOwner() instanceof TextInputControl) {
                return;
            }
            if (handle(e, keys, enter)) {
                e.consume();
            }
        };
        pad.sceneProperty().addListener((o, a, b) -> {
            if (a != null) {
                a.removeEventFilter(KeyEvent.KEY_PRESSED, filter);
            }
            if (b != null) {
                b.addEventFilter(KeyEvent.KEY_PRESSED, filter);
            }
        });
        Scene now = pad.getScene();
        if (now != null) {
            now.addEventFilter(KeyEvent.KEY_PRESSED, filter);
        }
    }

    private static boolean handle(KeyEvent e, KeypadViewModel pad, Runnable enter) {
        if (e.isControlDown() || e.isAltDown() || e.isMetaDown()) {
            return false;
        }
        switch (e.getCode()) {
            case DIGIT0, DIGIT1, DIGIT2, DIGIT3, DIGIT4, DIGIT5, DIGIT6, DIGIT7, DIGIT8, DIGIT9 -> {
                if (e.isShiftDown()) {
                    return false;
                }
                pad.digit(e.getCode().ordinal() - javafx.scene.input.KeyCode.DIGIT0.ordinal());
            }
            case NUMPAD0, NUMPAD1, NUMPAD2, NUMPAD3, NUMPAD4, NUMPAD5, NUMPAD6, NUMPAD7, NUMPAD8, NUMPAD9 ->
                    pad.digit(e.getCode().ordinal() - javafx.scene.input.KeyCode.NUMPAD0.ordinal());
            case PERIOD, DECIMAL -> pad.point();
            case MINUS, SUBTRACT -> pad.sign();
            case BACK_SPACE -> pad.backspace();
            case DELETE, ESCAPE -> pad.clear();
            case ENTER -> enter.run();
            default -> {
                return false;
            }
        }
        return true;
    }

    private static boolean showing(Node n) {
        if (n.getScene() == null) {
            return false;
        }
        for (Node p = n; p != null; p = p.getParent()) {
            if (!p.isVisible()) {
                return false;
            }
        }
        return n.getScene().getRoot() != null && isUnderRoot(n);
    }

    private static boolean isUnderRoot(Node n) {
        Node p = n;
        while (p.getParent() != null) {
            p = p.getParent();
        }
        return p == n.getScene().getRoot();
    }
}
