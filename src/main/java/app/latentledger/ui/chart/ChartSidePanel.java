package app.latentledger.ui.chart;

import app.latentledger.chart.draw.Theme;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

/**
 * The strip beside a chart: large buttons (at least 48 px, the touch minimum) for zooming or
 * stepping without a pinch, then the tapped item's readout. The buttons come first and the readout
 * box has a fixed height, so a tap that fills the readout never moves a button under the finger.
 */
final class ChartSidePanel extends VBox {
    /** Smallest touch target, px (common practice for touch interfaces, no single source). */
    static final double TOUCH_PX = 48;
    static final double WIDTH_PX = 220;
    /** Room for the longest readout (a state's seven lines) at the base text size. */
    private static final double READOUT_PX = 230;

    private final Label readout = new Label();
    private final Label heading = new Label();
    private int buttons;

    ChartSidePanel(String headingText, ReadOnlyStringProperty readoutText) {
        super(10);
        setPadding(new Insets(16, 14, 16, 14));
        setPrefWidth(WIDTH_PX);
        setMinWidth(WIDTH_PX);
        setMaxWidth(WIDTH_PX);
        heading.setText(headingText);
        heading.setWrapText(true);
        heading.setMinHeight(Region.USE_PREF_SIZE);
        readout.setId("readout");
        readout.setWrapText(true);
        readout.textProperty().bind(readoutText);
        readout.setMinHeight(READOUT_PX);
        readout.setPrefHeight(READOUT_PX);
        readout.setMaxHeight(READOUT_PX);
        readout.setMaxWidth(Double.MAX_VALUE);
        readout.setAlignment(javafx.geometry.Pos.TOP_LEFT);
        getChildren().addAll(heading, readout);
    }

    /** A button above the readout, in the order added. */
    Button addButton(String id, String text, Runnable action) {
        Button b = new Button(text);
        b.setId(id);
        b.setMinHeight(TOUCH_PX);
        b.setMinWidth(TOUCH_PX);
        b.setMaxWidth(Double.MAX_VALUE);
        b.setWrapText(true);
        b.setOnAction(e -> action.run());
        getChildren().add(buttons++, b);
        return b;
    }

    void applyTheme(Theme theme) {
        String text = theme.text().hex();
        setStyle("-fx-background-color: " + theme.background().hex() + "; -fx-border-color: transparent transparent "
                + "transparent " + theme.gridMajor().hex() + "; -fx-border-width: 0 0 0 1; -fx-font-size: "
                + theme.baseText() + "px;");
        heading.setStyle("-fx-text-fill: " + text + "; -fx-font-weight: bold; -fx-font-size: "
                + (theme.baseText() + 2) + "px; -fx-padding: 6 0 0 0;");
        readout.setStyle("-fx-text-fill: " + text + "; -fx-line-spacing: 2px; -fx-padding: 10;"
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
