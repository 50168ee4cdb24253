package app.latentledger.ui.look;

import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

/** Small builders so the views read as layout, not as styling code. */
public final class Ui {
    /** 48 px: the smallest target a gloved finger hits reliably (common practice, no source). */
    public static final double MIN_TARGET_PX = 48;

    private Ui() {
    }

    public static Label label(String text, String... styleClasses) {
        Label l = new Label(text);
        l.getStyleClass().addAll(styleClasses);
        return l;
    }

    public static Label wrapped(String text, String... styleClasses) {
        Label l = label(text, styleClasses);
        l.setWrapText(true);
        l.setMinHeight(Region.USE_PREF_SIZE);
        return l;
    }

    public static Button button(String id, String text, Icons icon, Runnable action) {
        Button b = new Button(text);
        b.setId(id);
        if (icon != null) {
            b.setGraphic(icon.node(24));
            b.setGraphicTextGap(10);
        }
        b.setMinHeight(MIN_TARGET_PX);
        // a button keeps its whole words at any text size; the rows holding buttons wrap instead
        b.setMinWidth(Region.USE_PREF_SIZE);
        b.setOnAction(e -> action.run());
        return b;
    }

    public static VBox panel(double spacing, Node... children) {
        VBox v = new VBox(spacing, children);
        v.getStyleClass().add("panel");
        return v;
    }

    public static ScrollPane scroll(Node content) {
        ScrollPane s = new ScrollPane(content);
        s.setFitToWidth(true);
        s.setHbarPolicy(ScrollPane.ScrollBarPolicy.NEVER);
        // a drag scrolls, as a finger, a stylus or single-touch mouse emulation expects
        s.setPannable(true);
        VBox.setVgrow(s, Priority.ALWAYS);
        return s;
    }

    /**
     * An input with its name above it (a placeholder alone is gone once the box is filled), the
     * name tied to the box for screen readers; the box takes the width it is given.
     */
    public static VBox labelled(String name, javafx.scene.control.Control input) {
        Label l = wrapped(name, "figure-label");
        l.setLabelFor(input);
        input.setMaxWidth(Double.MAX_VALUE);
        return new VBox(4, l, input);
    }

    public static Region grow() {
        Region r = new Region();
        javafx.scene.layout.HBox.setHgrow(r, Priority.ALWAYS);
        VBox.setVgrow(r, Priority.ALWAYS);
        return r;
    }

    /** The app's refused look ({@code .message.refused} in app.css) on {@code message} while {@code refused} holds. */
    public static void refusedWhen(Label message, javafx.beans.value.ObservableBooleanValue refused) {
        Runnable show = () -> {
            message.getStyleClass().remove("refused");
            if (refused.get()) {
                message.getStyleClass().add("refused");
            }
        };
        refused.addListener((o, was, now) -> show.run());
        show.run();
    }
}
