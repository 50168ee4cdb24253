package app.latentledger.ui.chart;

import app.latentledger.chart.draw.Theme;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

/**
 * The strip beside a chart: the tapped item's readout and large buttons (at least 48 px, the touch
 * minimum) for zooming without a pinch.
 */
final class ChartSidePanel extends VBox {
    /** Smallest touch target, px (common practice for touch interfaces, no single source). */
    static final double TOUCH_PX = 48;
    static final double WIDTH_PX = 240;

    private final Label readout = new Label();
    private final Label heading = new Label();

    ChartSidePanel(String headingText, ReadOnlyStringProperty readoutText) {
        super(12);
        setPadding(new Insets(20, 18, 20, 18));
        setPrefWidth(WIDTH_PX);
        setMinWidth(WIDTH_PX);
        heading.setText(headingText);
        readout.setId("readout");
        readout.setWrapText(true);
        readout.textProperty().bind(readoutText);
        readout.setMinHeight(110);
        readout.setMaxWidth(Double.MAX_VALUE);
        readout.setAlignment(javafx.geometry.Pos.TOP_LEFT);
        getChildren().addAll(heading, readout);
    }

    Button addButton(String id, String text, Runnable action) {
        Button b = new Button(text);
        b.setId(id);
        b.setMinHeight(TOUCH_PX);
        b.setMinWidth(TOUCH_PX);
        b.setMaxWidth(Double.MAX_VALUE);
        b.setOnAction(e -> action.run());
        getChildren().add(b);
        return b;
    }

    void addSpacer() {
        Region r = new Region();
        VBox.setVgrow(r, Priority.ALWAYS);
        getChildren().add(r);
    }

    void applyTheme(Theme theme) {
        String text = theme.text().hex();
        setStyle("-fx-background-color: " + theme.background().hex() + "; -fx-border-color: transparent transparent "
                + "transparent " + theme.gridMajor().hex() + "; -fx-border-width: 0 0 0 1; -fx-font-size: "
                + theme.baseText() + "px;");
        heading.setStyle("-fx-text-fill: " + text + "; -fx-font-weight: bold; -fx-font-size: "
                + (theme.baseText() + 2) + "px;");
        readout.setStyle("-fx-text-fill: " + text + "; -fx-line-spacing: 4px; -fx-padding: 12;"
                + "-fx-background-color: " + theme.plotBackground().hex() + "; -fx-background-radius: 6;"
                + "-fx-border-color: " + theme.gridMajor().hex() + "; -fx-border-radius: 6;");
        for (var n : getChildren()) {
            if (n instanceof Button b) {
                b.setStyle("-fx-font-size: " + theme.baseText() + "px; -fx-base: " + theme.plotBackground().hex()
                        + "; -fx-text-fill: " + text + ";");
            }
        }
    }
}
