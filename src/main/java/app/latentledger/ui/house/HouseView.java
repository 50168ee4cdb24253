package app.latentledger.ui.house;

import app.latentledger.chart.house.MoistureBudgetChart;
import app.latentledger.core.house.HouseBudget;
import app.latentledger.core.house.ScenarioResult;
import app.latentledger.ui.chart.CanvasPainter;
import app.latentledger.ui.chart.FxTextMeasurer;
import app.latentledger.ui.look.Reflowing;
import app.latentledger.ui.look.Ui;
import javafx.geometry.Pos;
import javafx.scene.canvas.Canvas;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.scene.text.TextAlignment;

import java.util.EnumMap;
import java.util.Map;

/**
 * The House screen: the budget as one bar chart of gains against removal in pints/day (L/day) with
 * the equilibrium dew point; the fix planner as rows to tap — the chart then shows that fix's
 * budget beside the as-found figures in its row; and the house's facts and this visit's house
 * readings as boxes typed on the number pad, each stored at once. Landscape: boxes and pad on the
 * left, the answer on the right; upright: the answer above, boxes and pad below. Binds to
 * {@link HouseViewModel} only.
 */
public final class HouseView extends HBox implements Reflowing {
    private static final double CHART_W_WIDE = 620;
    private static final double CHART_H_WIDE = 300;
    private static final double CHART_W_UPRIGHT = 740;
    private static final double CHART_H_UPRIGHT = 280;

    private final HouseViewModel model; // strong reference: bindings hold their partner weakly
    private final Canvas canvas = new Canvas(CHART_W_WIDE, CHART_H_WIDE);
    private final Label refusal = Ui.wrapped("", "muted");
    private final VBox rows = new VBox(8);
    private final Label cautions = Ui.wrapped("", "house-cautions");
    private final ToggleGroup fixGroup = new ToggleGroup();
    private final Map<HouseField, ToggleButton> boxes = new EnumMap<>(HouseField.class);
    private final VBox answer;
    private final ScrollPane boxScroll;
    private final HousePadView pad;
    private ScenarioResult painted;

    public HouseView(HouseViewModel model) {
        this.model = model;
        getStyleClass().add("screen");
        setId("house-screen");
        setSpacing(16);
        Label title = Ui.label("Where the water comes from", "heading");
        title.setWrapText(true);
        refusal.setId("house-refusal");
        cautions.setId("house-cautions");
        // the fixes suggest attic, duct and ventilation work: their cautions stay in sight beside them,
        // in a column of their own, however far the list of fixes is scrolled
        ScrollPane fixes = Ui.scroll(rows);
        fixes.setId("house-fixes");
        fixes.setMinHeight(180); // room for a caution under its heading at 150 % text
        Label before = Ui.wrapped("Before any fix", "house-cautions-title");
        ScrollPane safety = Ui.scroll(new VBox(6, before, cautions));
        safety.setId("house-cautions-box");
        safety.getStyleClass().add("house-cautions-box");
        // wide enough for the longest word of the cautions (plus padding and scroll bar), at least 200 px
        app.latentledger.ui.look.NamedRows.keepWords(cautions);
        safety.minWidthProperty().bind(javafx.beans.binding.Bindings.max(200, cautions.minWidthProperty().add(48)));
        safety.setMinHeight(180);
        HBox.setHgrow(fixes, Priority.ALWAYS);
        HBox fixesAndCautions = new HBox(12, fixes, safety);
        VBox.setVgrow(fixesAndCautions, Priority.ALWAYS);
        answer = new VBox(12, title, refusal, canvas, Ui.label("Fixes compared — tap one", "subheading"),
                fixesAndCautions);
        safety.prefWidthProperty().bind(answer.widthProperty().multiply(0.38));
        safety.maxWidthProperty().bind(answer.widthProperty().multiply(0.38));
        HBox.setHgrow(answer, Priority.ALWAYS);

        HouseEntryViewModel e = model.entry();
        ToggleGroup boxGroup = new ToggleGroup();
        GridPane grid = new GridPane();
        grid.setHgap(8);
        grid.setVgap(8);
        for (int i = 0; i < 2; i++) {
            ColumnConstraints c = new ColumnConstraints();
            c.setPercentWidth(50);
            grid.getColumnConstraints().add(c);
        }
        int at = 0;
        for (HouseField f : HouseField.values()) {
            ToggleButton b = new ToggleButton();
            b.setId("house-box-" + f.key());
            b.getStyleClass().add("house-box");
            b.setToggleGroup(boxGroup);
            b.setWrapText(true);
            b.setAlignment(Pos.CENTER_LEFT);
            b.setTextAlignment(TextAlignment.LEFT);
            b.setMinHeight(Ui.MIN_TARGET_PX);
            // a box's name wraps between words, never inside one ("Occu/pants" at large text)
            app.latentledger.ui.look.NamedRows.keepWords(b);
            b.setMaxWidth(Double.MAX_VALUE);
            b.setMaxHeight(Double.MAX_VALUE);
            b.setOnAction(x -> {
                b.setSelected(true);
                e.selectedProperty().set(f);
            });
            boxes.put(f, b);
            if (f == HouseField.OUTDOOR_DB) {
                at += at % 2; // the visit's readings start on a row of their own
            }
            grid.add(b, at % 2, at / 2);
            at++;
        }
        Label houseWords = Ui.wrapped("The house (kept with the site), then this visit's readings"
                + " (kept with the visit): tap a box, type, Enter.", "muted");
        boxScroll = Ui.scroll(new VBox(8, houseWords, grid));
        boxScroll.setId("house-boxes");
        boxScroll.setMinHeight(150);
        pad = new HousePadView(e);
        e.selectedProperty().addListener((o, a, b) -> boxes.get(b).setSelected(true));
        e.revisionProperty().addListener((o, a, b) -> label());
        boxes.get(e.selectedProperty().get()).setSelected(true);
        label();

        model.budgetProperty().addListener((o, a, b) -> show());
        model.chartThemeProperty().addListener((o, a, b) -> paint(painted));
        show();
        setPortrait(false);
    }

    /** Each box's name and what it holds now. */
    private void label() {
        HouseEntryViewModel e = model.entry();
        boxes.forEach((f, b) -> b.setText(f.title() + "\n" + e.valueText(f)));
    }

    private void show() {
        HouseBudget b = model.budgetProperty().get();
        refusal.setText(model.refusalProperty().get());
        refusal.setManaged(!refusal.getText().isEmpty());
        refusal.setVisible(!refusal.getText().isEmpty());
        label();
        rows.getChildren().clear();
        cautions.setText(String.join("\n\n", model.cautions()));
        if (b == null) {
            paint(null);
            return;
        }
        for (HouseViewModel.FixRow r : model.fixRows()) {
            ToggleButton t = new ToggleButton(r.change() + "\n" + r.balance() + " · " + r.dewPoint()
                    + " · SHR " + r.shr());
            t.setId("fix-" + r.key());
            t.setToggleGroup(fixGroup);
            t.setMinHeight(Ui.MIN_TARGET_PX);
            t.setMinWidth(Ui.MIN_TARGET_PX);
            t.setMaxWidth(Double.MAX_VALUE);
            t.setWrapText(true);
            t.setAlignment(Pos.CENTER_LEFT);
            t.setTextAlignment(TextAlignment.LEFT);
            t.setOnAction(x -> {
                t.setSelected(true);
                paint(scenario(b, r.key()));
            });
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
        painted = s;
        var g = canvas.getGraphicsContext2D();
        g.clearRect(0, 0, canvas.getWidth(), canvas.getHeight());
        if (s != null) {
            MoistureBudgetChart.of(s, model.units()).paint(new CanvasPainter(g, FxTextMeasurer.system()),
                    model.chartThemeProperty().get(), canvas.getWidth(), canvas.getHeight());
        }
    }

    @Override
    public void setPortrait(boolean portrait) {
        canvas.setWidth(portrait ? CHART_W_UPRIGHT : CHART_W_WIDE);
        canvas.setHeight(portrait ? CHART_H_UPRIGHT : CHART_H_WIDE);
        getChildren().clear();
        if (portrait) {
            // the answer above; the boxes beside the pad below it
            HBox below = new HBox(12, boxScroll, pad);
            HBox.setHgrow(boxScroll, Priority.ALWAYS);
            // the pad sets the height below; the boxes scroll in it, leaving the fixes and cautions room
            boxScroll.setPrefViewportHeight(200);
            below.setMaxHeight(Region.USE_PREF_SIZE);
            pad.setMinWidth(410);
            pad.setMaxWidth(410);
            VBox.setVgrow(answer, Priority.ALWAYS);
            VBox upright = new VBox(12, answer, below);
            HBox.setHgrow(upright, Priority.ALWAYS);
            getChildren().add(upright);
        } else {
            // the boxes above the pad on the left; the answer takes the rest of the width
            pad.setMinWidth(Double.NEGATIVE_INFINITY);
            pad.setMaxWidth(Double.MAX_VALUE);
            boxScroll.setPrefViewportHeight(0); // the default: as tall as the boxes want
            VBox left = new VBox(12, boxScroll, pad);
            left.setMinWidth(440);
            left.setPrefWidth(460);
            left.setMaxWidth(460);
            getChildren().addAll(left, answer);
        }
        paint(painted);
    }
}
