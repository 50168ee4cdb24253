package app.latentledger.ui.house;

import app.latentledger.chart.draw.Theme;
import app.latentledger.chart.house.MoistureBudgetChart;
import app.latentledger.core.house.HouseBudget;
import app.latentledger.core.house.ScenarioResult;
import app.latentledger.ui.chart.CanvasPainter;
import app.latentledger.ui.chart.FxTextMeasurer;
import app.latentledger.ui.look.Reflowing;
import app.latentledger.ui.look.Ui;
import javafx.scene.canvas.Canvas;
import javafx.scene.control.Label;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.layout.VBox;

/**
 * The House screen: the budget as one bar chart of gains against removal in pints/day (L/day) with
 * the equilibrium dew point, and the fix planner as rows to tap — the chart then shows that fix's
 * budget beside the as-found figures in its row. Binds to {@link HouseViewModel} only.
 */
public final class HouseView extends VBox implements Reflowing {
    private static final double CHART_W = 760;
    private static final double CHART_H = 380;

    private final HouseViewModel model; // strong reference: bindings hold their partner weakly
    private final Canvas canvas = new Canvas(CHART_W, CHART_H);
    private final Label refusal = Ui.wrapped("", "muted");
    private final VBox rows = new VBox(8);
    private final ToggleGroup group = new ToggleGroup();

    public HouseView(HouseViewModel model) {
        this.model = model;
        getStyleClass().add("screen");
        setId("house-screen");
        setSpacing(12);
        Label title = Ui.label("Where the water comes from", "heading");
        getChildren().addAll(title, refusal, canvas, Ui.label("Fixes compared — tap one", "subheading"), Ui.scroll(rows));
        model.budgetProperty().addListener((o, a, b) -> show());
        show();
    }

    private void show() {
        HouseBudget b = model.budgetProperty().get();
        refusal.setText(model.refusalProperty().get());
        rows.getChildren().clear();
        if (b == null) {
            paint(null);
            return;
        }
        for (HouseViewModel.FixRow r : model.fixRows()) {
            ToggleButton t = new ToggleButton(r.change() + "\nwater gained " + r.balance() + " · settles at " + r.dewPoint()
                    + " · SHR " + r.shr());
            t.setId("fix-" + r.key());
            t.setToggleGroup(group);
            t.setMinHeight(Ui.MIN_TARGET_PX);
            t.setMinWidth(Ui.MIN_TARGET_PX);
            t.setMaxWidth(Double.MAX_VALUE);
            t.setWrapText(true);
            t.setOnAction(e -> paint(scenario(b, r.key())));
            rows.getChildren().add(t);
        }
        if (!rows.getChildren().isEmpty()) {
            ((ToggleButton) rows.getChildren().get(0)).setSelected(true);
        }
        paint(b.asFound());
    }

    private static ScenarioResult scenario(HouseBudget b, String key) {
        return b.whatIfs().stream().filter(w -> w.scenario().key().equals(key)).findFirst().orElse(b.asFound());
    }

    private void paint(ScenarioResult s) {
        var g = canvas.getGraphicsContext2D();
        g.clearRect(0, 0, CHART_W, CHART_H);
        if (s != null) {
            MoistureBudgetChart.of(s, model.units()).paint(new CanvasPainter(g, FxTextMeasurer.system()),
                    Theme.LIGHT, CHART_W, CHART_H);
        }
    }

    @Override
    public void setPortrait(boolean portrait) {
        // one column in both orientations; the chart keeps its drawn size
    }
}
