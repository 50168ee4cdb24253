package app.latentledger.ui.results;

import app.latentledger.ui.look.Icons;
import app.latentledger.ui.look.Ui;
import app.latentledger.ui.present.ResultSheet;
import javafx.beans.value.ObservableValue;
import javafx.geometry.Pos;
import javafx.scene.control.Label;
import javafx.scene.layout.HBox;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;

import java.util.List;

/** The verdict in words and with its own icon shape; colour only repeats what they say. */
public final class VerdictBanner extends HBox {
    private static final List<String> KINDS = List.of("dehumidifying", "not-dehumidifying", "cant-tell", "incomplete");

    public VerdictBanner(ObservableValue<ResultSheet> sheet, boolean compact) {
        super(16);
        getStyleClass().add("verdict");
        if (compact) {
            getStyleClass().add("compact");
        }
        setAlignment(Pos.CENTER_LEFT);
        StackPane icon = new StackPane();
        icon.setMinSize(compact ? 40 : 56, compact ? 40 : 56);
        Label word = Ui.label("", "verdict-word");
        word.setId(compact ? "live-verdict-word" : "verdict-word");
        Label why = Ui.wrapped("", "verdict-why");
        why.setId(compact ? "live-verdict-why" : "verdict-why");
        Label key = new Label();
        key.setId(compact ? "live-verdict-key" : "verdict-key");
        key.setManaged(false);
        key.setVisible(false);
        // "Waiting for …" names every missing reading: the headline wraps, never ends in "..."
        word.setWrapText(true);
        word.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        VBox words = new VBox(2, word, why);
        words.setMinWidth(0);
        javafx.scene.layout.HBox.setHgrow(words, javafx.scene.layout.Priority.ALWAYS);
        getChildren().addAll(icon, words, key);
        Runnable show = () -> {
            ResultSheet s = sheet.getValue();
            if (s == null) {
                return;
            }
            word.setText(s.headline());
            why.setText(s.explanation());
            key.setText(s.verdictKey());
            getStyleClass().removeAll(KINDS);
            getStyleClass().add(s.verdictKey());
            Icons i = switch (s.verdictKey()) {
                case "dehumidifying" -> Icons.VERDICT_YES;
                case "not-dehumidifying" -> Icons.VERDICT_NO;
                case "cant-tell" -> Icons.VERDICT_UNSURE;
                default -> Icons.WAITING;
            };
            icon.getChildren().setAll(i.node(compact ? 36 : 52));
        };
        sheet.addListener((o, a, b) -> show.run());
        show.run();
    }
}
