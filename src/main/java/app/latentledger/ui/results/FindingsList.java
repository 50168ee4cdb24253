package app.latentledger.ui.results;

import app.latentledger.core.findings.Cautions;
import app.latentledger.ui.look.Icons;
import app.latentledger.ui.look.Ui;
import app.latentledger.ui.present.FindingCard;
import app.latentledger.ui.present.ResultSheet;
import javafx.beans.value.ObservableValue;
import javafx.collections.ObservableList;
import javafx.geometry.Pos;
import javafx.scene.control.Label;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;

import java.util.List;
import java.util.function.Supplier;

/**
 * Findings as cards (severity word and icon, the plain sentence, the tech's line, evidence, next
 * checks), always ending with the safety line.
 */
public final class FindingsList extends VBox {
    public FindingsList(ObservableValue<ResultSheet> sheet) {
        this(() -> sheet.getValue() == null ? List.of() : sheet.getValue().findings());
        sheet.addListener((o, a, b) -> refresh());
    }

    public FindingsList(ObservableList<FindingCard> cards) {
        this(() -> List.copyOf(cards));
        cards.addListener((javafx.collections.ListChangeListener<FindingCard>) c -> refresh());
    }

    private final Supplier<List<FindingCard>> cards;

    private FindingsList(Supplier<List<FindingCard>> cards) {
        super(10);
        this.cards = cards;
        setId("findings");
        refresh();
    }

    private void refresh() {
        getChildren().clear();
        getChildren().add(Ui.label("Findings", "heading"));
        List<FindingCard> list = cards.get();
        if (list.isEmpty()) {
            getChildren().add(Ui.wrapped("No findings for these readings.", "muted"));
        }
        for (FindingCard f : list) {
            getChildren().add(card(f));
        }
        Label safety = Ui.wrapped(Cautions.SAFETY_LINE, "safety");
        safety.setId("safety-line");
        getChildren().add(safety);
    }

    private static VBox card(FindingCard f) {
        Icons icon = switch (f.severity()) {
            case NOTE -> Icons.NOTE;
            case CHECK -> Icons.CHECK;
            case FIX -> Icons.FIX;
        };
        Label sev = Ui.label(f.severityWord(), "severity-word");
        sev.setGraphic(icon.node(24));
        sev.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        HBox head = new HBox(10, sev, Ui.wrapped(f.message(), "finding-message"));
        head.setAlignment(Pos.TOP_LEFT);
        VBox box = new VBox(4, head, Ui.wrapped(f.technical(), "finding-detail"));
        for (String e : f.evidence()) {
            box.getChildren().add(Ui.wrapped("• " + e, "finding-detail"));
        }
        if (!f.nextChecks().isEmpty()) {
            box.getChildren().add(Ui.label("Next checks", "subheading"));
            for (String n : f.nextChecks()) {
                box.getChildren().add(Ui.wrapped("→ " + n, "finding-detail"));
            }
        }
        box.getStyleClass().addAll("finding", f.severity().key());
        box.setId("finding-" + f.code());
        return box;
    }
}
