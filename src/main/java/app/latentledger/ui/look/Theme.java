package app.latentledger.ui.look;

import app.latentledger.core.settings.DisplayTheme;
import javafx.scene.Scene;

/**
 * The three looks: light for daylight, dark for attics and night, and outdoor — black on white,
 * heavier borders and bold type — for a screen in direct sun. Each is a style class on the root
 * that swaps the looked-up colours of {@code app.css}.
 */
public final class Theme {
    public static final String DARK_CLASS = "theme-dark";
    public static final String OUTDOOR_CLASS = "theme-outdoor";
    private static final String CSS = Theme.class.getResource("/app/latentledger/ui/app.css").toExternalForm();

    private Theme() {
    }

    public static void install(Scene scene) {
        scene.getStylesheets().add(CSS);
    }

    public static void apply(Scene scene, boolean dark) {
        apply(scene, dark ? DisplayTheme.DARK : DisplayTheme.LIGHT);
    }

    public static void apply(Scene scene, DisplayTheme theme) {
        var classes = scene.getRoot().getStyleClass();
        classes.removeAll(DARK_CLASS, OUTDOOR_CLASS);
        if (theme == DisplayTheme.DARK) {
            classes.add(DARK_CLASS);
        } else if (theme == DisplayTheme.OUTDOOR) {
            classes.add(OUTDOOR_CLASS);
        }
    }
}
