package app.latentledger.ui.look;

import javafx.scene.Group;
import javafx.scene.Node;
import javafx.scene.shape.SVGPath;

/**
 * The app's own line icons, drawn on a 24 × 24 grid as SVG path data and stroked in the text
 * colour of the theme. Each verdict and severity has its own shape, so it reads without colour.
 */
public enum Icons {
    /** Dehumidifying: a drop with a tick beside it. */
    VERDICT_YES("M9 3 C9 3 3 10 3 14 A6 6 0 0 0 15 14 C15 10 9 3 9 3 Z M14 17 L17 20 L23 12"),
    /** Not dehumidifying: a drop crossed out. */
    VERDICT_NO("M12 3 C12 3 6 10 6 14 A6 6 0 0 0 18 14 C18 10 12 3 12 3 Z M3 21 L21 3"),
    /** Can't tell: a drop with a question mark. */
    VERDICT_UNSURE("M8 3 C8 3 2 10 2 14 A6 6 0 0 0 14 14 C14 10 8 3 8 3 Z M17 9 A3 3 0 1 1 20 12 C19 13 19 14 19 15 M19 19 L19 19.5"),
    /** Still waiting for readings: an hourglass. */
    WAITING("M6 3 L18 3 M6 21 L18 21 M7 3 C7 9 17 9 17 12 C17 15 7 15 7 21 M17 3 C17 9 7 9 7 12 C7 15 17 15 17 21"),
    NOTE("M12 3 A9 9 0 1 0 12.01 3 Z M12 11 L12 17 M12 7.5 L12 8"),
    CHECK("M12 3 L22 20 L2 20 Z M12 9 L12 14 M12 17 L12 17.5"),
    FIX("M8 2 L16 2 L22 8 L22 16 L16 22 L8 22 L2 16 L2 8 Z M8 8 L16 16 M16 8 L8 16"),
    JOB("M3 11 L12 3 L21 11 M5 9.5 L5 21 L19 21 L19 9.5 M10 21 L10 15 L14 15 L14 21"),
    READINGS("M4 3 L20 3 L20 21 L4 21 Z M7 6 L17 6 L17 9 L7 9 Z M7 12 L9 12 M11 12 L13 12 M15 12 L17 12 M7 15 L9 15 M11 15 L13 15 M15 15 L17 15 M7 18 L9 18 M11 18 L13 18 M15 18 L17 18"),
    RESULTS("M3 17 A9 9 0 0 1 21 17 M12 17 L16 10 M3 21 L21 21"),
    LOGS("M2 12 L5 12 L7 6 L10 18 L13 8 L15 14 L17 12 L22 12"),
    COMPARE("M4 21 L4 9 L9 9 L9 21 M15 21 L15 4 L20 4 L20 21 M2 21 L22 21"),
    EXPORT("M4 13 L4 21 L20 21 L20 13 M12 3 L12 16 M7 8 L12 3 L17 8"),
    /** The house's moisture budget: a house with a drop inside. */
    HOUSE("M3 11 L12 3 L21 11 M5 9.5 L5 21 L19 21 L19 9.5 M12 10 C12 10 9 14 9 16 A3 3 0 0 0 15 16 C15 14 12 10 12 10 Z"),
    /** Settings: three sliders. */
    SETTINGS("M3 6 L21 6 M3 12 L21 12 M3 18 L21 18 M8 3.5 L8 8.5 M16 9.5 L16 14.5 M11 15.5 L11 20.5"),
    THEME("M12 3 A9 9 0 1 0 12.01 3 Z M12 3 L12 21 M12 7 L16 7 M12 11 L20 11 M12 15 L18 15"),
    CAUTION("M12 3 L22 20 L2 20 Z M12 9 L12 14 M12 17 L12 17.5"),
    NEW("M12 4 L12 20 M4 12 L20 12"),
    FOLDER("M3 6 L9 6 L11 8 L21 8 L21 19 L3 19 Z");

    private final String path;

    Icons(String path) {
        this.path = path;
    }

    /** The icon as a node {@code size} px wide, styled by the {@code icon} class. */
    public Node node(double size) {
        SVGPath p = new SVGPath();
        p.setContent(path);
        p.getStyleClass().add("icon");
        p.setScaleX(size / 24);
        p.setScaleY(size / 24);
        // the group makes the layout see the scaled bounds
        Group g = new Group(p);
        g.getStyleClass().add("icon-" + name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'));
        return g;
    }
}
