package app.latentledger.ui.look;

import javafx.scene.Scene;

/** The two looks: a light, high-contrast one for sunlight and a dark one for attics and night. */
public final class Theme {
    public static final String DARK_CLASS = "theme-dark";
    private static final String CSS = Theme.class.getResource("/app/latentledger/ui/app.css").toExternalForm();

    private Theme() {
    }

    public static void install(Scene scene) {
        scene.getStylesheets().add(CSS);
    }

    public static void apply(Scene scene, boolean dark) {
        var classes = scene.getRoot().getStyleClass();
        classes.remove(DARK_CLASS);
        if (dark) {
            classes.add(DARK_CLASS);
        }
    }
}
