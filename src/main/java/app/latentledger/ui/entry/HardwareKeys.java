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
 */
final class HardwareKeys {
    private HardwareKeys() {
    }

    static void attach(Node pad, EntryViewModel vm) {
        EventHandler<KeyEvent> filter = e -> {
            if (!showing(pad) || pad.getScene().getFocusOwner() instanceof TextInputControl) {
                return;
            }
            if (handle(e, vm)) {
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

    private static boolean handle(KeyEvent e, EntryViewModel vm) {
        if (e.isControlDown() || e.isAltDown() || e.isMetaDown()) {
            return false;
        }
        KeypadViewModel pad = vm.pad();
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
            case ENTER -> vm.enterAndAdvance();
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
