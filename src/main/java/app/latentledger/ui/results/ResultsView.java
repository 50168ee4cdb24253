package app.latentledger.ui.results;

import app.latentledger.ui.look.Reflowing;
import app.latentledger.ui.look.Ui;
import app.latentledger.ui.present.ResultSheet;
import javafx.scene.control.Label;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;

/**
 * The results screen: the verdict, both air states, what the coil does, a place for the
 * psychrometric chart, and the findings ending with the safety line. Binds only.
 */
public final class ResultsView extends VBox implements Reflowing {
    /** Id of the pane the psychrometric chart goes into when the chart build is merged. */
    public static final String CHART_SLOT_ID = "psychro-chart-slot";

    private final ResultsViewModel viewModel;
    private final FigureTable entering = new FigureTable();
    private final FigureTable leaving = new FigureTable();
    private final FigureTable performance = new FigureTable();
    private final StackPane chartSlot = new StackPane();
    private final VBox figures;
    private final VBox performancePanel;
    private final VBox enteringPanel;
    private final VBox leavingPanel;
    private final FindingsList findings;
    /**
     * The two numbers that answer a humidity call, read at a glance right under the verdict: side by
     * side across the screen upright, one above the other at the top of the left column lying down.
     */
    private javafx.scene.layout.Pane keyFigures = new HBox(24);

    public ResultsView(ResultsViewModel viewModel) {
        super(12);
        this.viewModel = viewModel;
        getStyleClass().add("screen");
        setId("screen-results");
        VerdictBanner banner = new VerdictBanner(viewModel.sheetProperty(), false);
        banner.setId("verdict");
        enteringPanel = Ui.panel(6, entering);
        leavingPanel = Ui.panel(6, leaving);
        HBox.setHgrow(enteringPanel, Priority.ALWAYS);
        HBox.setHgrow(leavingPanel, Priority.ALWAYS);
        chartSlot.setId(CHART_SLOT_ID);
        chartSlot.getStyleClass().add("slot-placeholder");
        chartSlot.getChildren().add(Ui.wrapped("Drawing the psychrometric chart…", "muted"));
        performancePanel = Ui.panel(6, performance);
        figures = new VBox(12, new HBox(16, enteringPanel, leavingPanel), performancePanel);
        findings = new FindingsList(viewModel.sheetProperty());
        getChildren().addAll(banner, new VBox());
        viewModel.sheetProperty().addListener((o, a, b) -> show(b));
        show(viewModel.sheet());
        setPortrait(false);
    }

    public ResultsViewModel viewModel() {
        return viewModel;
    }

    /** The pane to put the psychrometric chart in. */
    public StackPane chartSlot() {
        return chartSlot;
    }

    @Override
    public void setPortrait(boolean upright) {
        javafx.scene.Node body;
        javafx.scene.layout.Pane figuresNow = upright ? new HBox(24) : new VBox(12);
        figuresNow.getChildren().setAll(keyFigures.getChildren());
        keyFigures = figuresNow;
        keyFigures.setId("key-figures");
        if (upright) {
            // the two states side by side, their chart across the width right under them, then the rest
            figures.getChildren().clear();
            chartSlot.setMaxHeight(Region.USE_PREF_SIZE);
            body = new VBox(12, keyFigures, Ui.scroll(new VBox(12, new HBox(16, enteringPanel, leavingPanel),
                    chartSlot, performancePanel, Ui.panel(8, findings))));
            VBox.setVgrow(((VBox) body).getChildren().get(1), Priority.ALWAYS);
        } else {
            // left: the two key figures, fixed at the top, then the figures and findings scrolling;
            // right: the chart from under the verdict to the bottom, over half the width
            // on its side the chart takes the width, so the two states stack
            figures.getChildren().setAll(new VBox(12, enteringPanel, leavingPanel), performancePanel);
            javafx.scene.control.ScrollPane scroll = Ui.scroll(new VBox(12, figures, Ui.panel(8, findings)));
            VBox.setVgrow(scroll, Priority.ALWAYS);
            VBox left = new VBox(12, keyFigures, scroll);
            left.setPrefWidth(460);
            left.setMinWidth(400);
            left.setMaxWidth(520);
            HBox.setHgrow(chartSlot, Priority.ALWAYS);
            chartSlot.setMaxHeight(Double.MAX_VALUE);
            body = new HBox(16, left, chartSlot);
        }
        VBox.setVgrow(body, Priority.ALWAYS);
        getChildren().set(1, body);
    }

    private void show(ResultSheet s) {
        if (s == null) {
            return;
        }
        entering.show("Return (entering)", s.entering());
        leaving.show("Supply (leaving)", s.leaving());
        performance.show("What the coil does", s.performance());
        keyFigures.getChildren().clear();
        keyFigure(s, "dew-point-margin", s.marginWords().replaceFirst("^.* — ", ""));
        keyFigure(s, "moisture-removal", "while running");
        if (s.performance().isEmpty()) {
            performance.note(s.explanation());
        }
    }

    /** A figure read at a glance: its name, the number large, and one line on what it means. */
    private void keyFigure(ResultSheet s, String key, String meaning) {
        app.latentledger.ui.present.Row r = s.performance(key);
        if (r == null) {
            return;
        }
        Label value = Ui.wrapped(r.value() + " " + r.unit(), "key-figure-value");
        value.setId("key-" + key);
        Label words = Ui.wrapped(meaning, "muted");
        words.setId("key-" + key + "-meaning");
        VBox panel = Ui.panel(2, Ui.wrapped(r.label(), "muted"), value, words);
        HBox.setHgrow(panel, Priority.ALWAYS);
        panel.setMaxWidth(Double.MAX_VALUE);
        keyFigures.getChildren().add(panel);
    }
}
