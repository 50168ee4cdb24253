package app.latentledger.ui.results;

import app.latentledger.ui.look.NamedRows;
import app.latentledger.ui.look.Ui;
import app.latentledger.ui.present.Row;
import javafx.scene.control.Label;
import javafx.scene.layout.Region;

import java.util.List;

/**
 * Rows of figures: label, value, unit; where the pane is too narrow for all three, each label
 * stands over its value. Each value label carries the row's key as its id.
 */
final class FigureTable extends NamedRows {
    FigureTable() {
        super(2, 12, 6);
    }

    void show(String title, List<Row> rows) {
        clearRows();
        addWide(Ui.label(title, "subheading"));
        for (Row row : rows) {
            boolean words = row.value().startsWith(app.latentledger.core.units.Ratio.NOT_MEASURABLE);
            // a withheld ratio says why in words, which wrap in the value column instead of widening it
            Label v = words ? Ui.wrapped(row.value(), "figure-words") : Ui.label(row.value(), "figure-value");
            v.setId("figure-" + row.key());
            Label unit = Ui.label(row.unit(), "muted");
            if (words) {
                v.setMaxWidth(220);
            } else {
                v.setMinWidth(Region.USE_PREF_SIZE);
            }
            unit.setMinWidth(Region.USE_PREF_SIZE);
            addRow(name(row.label(), "figure-label"), v, unit);
        }
    }

    /** A line in words across the table, where there are no figures to show. */
    void note(String text) {
        addWide(Ui.wrapped(text));
    }
}
