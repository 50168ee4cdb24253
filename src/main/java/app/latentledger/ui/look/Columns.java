package app.latentledger.ui.look;

import javafx.scene.Node;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Pane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;

import java.util.List;

/**
 * Parts of a screen side by side in landscape and stacked in portrait, each part keeping its
 * node (and so its bindings) across the change.
 */
public final class Columns extends StackPane implements Reflowing {
    private final List<Node> parts;
    private final double gap;

    public Columns(double gap, Node... parts) {
        this.parts = List.of(parts);
        this.gap = gap;
        setPortrait(false);
    }

    @Override
    public void setPortrait(boolean portrait) {
        Pane box = portrait ? new VBox(gap) : new HBox(gap);
        for (Node n : parts) {
            if (n instanceof javafx.scene.layout.Region r) {
                // side by side, equal shares whatever each part would like; stacked, its own height
                r.setPrefWidth(portrait ? javafx.scene.layout.Region.USE_COMPUTED_SIZE : 10);
            }
            if (n instanceof Reflowing r) {
                r.setPortrait(portrait);
            }
            box.getChildren().add(n);
            if (portrait) {
                VBox.setVgrow(n, Priority.ALWAYS);
            } else {
                HBox.setHgrow(n, Priority.ALWAYS);
            }
        }
        if (portrait && !(parts.get(0) instanceof javafx.scene.control.ScrollPane)) {
            javafx.scene.control.ScrollPane scroll = new javafx.scene.control.ScrollPane(box);
            scroll.setFitToWidth(true);
            scroll.setHbarPolicy(javafx.scene.control.ScrollPane.ScrollBarPolicy.NEVER);
            scroll.setPannable(true);
            getChildren().setAll(scroll);
        } else {
            getChildren().setAll(box);
        }
    }
}
