package app.latentledger.ui.results;

import app.latentledger.ui.look.Ui;
import app.latentledger.ui.present.Row;
import javafx.scene.control.Label;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.Priority;

import java.util.List;

/** Rows of figures: label, value, unit. Each value label carries the row's key as its id. */
final class FigureTable extends GridPane {
    FigureTable() {
        setHgap(12);
        setVgap(6);
        ColumnConstraints label = new ColumnConstraints();
        label.setHgrow(Priority.ALWAYS);
        getColumnConstraints().addAll(label, new ColumnConstraints(), new ColumnConstraints());
    }

    void show(String title, List<Row> rows) {
        getChildren().clear();
        add(Ui.label(title, "subheading"), 0, 0, 3, 1);
        int r = 1;
        for (Row row : rows) {
            boolean words = row.value().startsWith(app.latentledger.core.units.Ratio.NOT_MEASURABLE);
            // a withheld ratio says why in words, which wrap in the value column instead of widening it
            Label v = words ? Ui.wrapped(row.value(), "figure-words") : Ui.label(row.value(), "figure-value");
            v.setId("figure-" + row.key());
            add(Ui.wrapped(row.label(), "figure-label"), 0, r);
            Label unit = Ui.label(row.unit(), "muted");
            if (words) {
                v.setMaxWidth(220);
            } else {
                v.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
            }
            unit.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
            add(v, 1, r);
            add(unit, 2, r);
            r++;
        }
    }
}
