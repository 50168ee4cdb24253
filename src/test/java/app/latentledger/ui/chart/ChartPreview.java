package app.latentledger.ui.chart;

import app.latentledger.fielddata.SaltreedDemo;
import app.latentledger.chart.draw.Theme;
import app.latentledger.core.units.UnitSystem;
import javafx.application.Application;
import javafx.scene.Scene;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.stage.Stage;

/**
 * A window with both charts on the invented Saltreed demo data, for looking at them during
 * development (a test-scope launcher, never shipped): {@code java -cp target/classes:target/test-classes:target/lib/* app.latentledger.ui.chart.ChartPreview [si] [dark]}.
 */
public final class ChartPreview extends Application {

    /** Builds the preview's tab pane; the lead can place it in the app shell as it is. */
    public static TabPane createCharts(UnitSystem units, Theme theme) {
        PsychroChartViewModel psychro = new PsychroChartViewModel(SaltreedDemo.beforeAfter(units));
        psychro.themeProperty().set(theme);
        TimelineViewModel timeline = new TimelineViewModel(SaltreedDemo.week(units, 7));
        timeline.themeProperty().set(theme);
        Tab a = new Tab("Psychrometric chart", new PsychroChartView(psychro));
        Tab b = new Tab("Cycle timeline", new TimelineView(timeline));
        a.setClosable(false);
        b.setClosable(false);
        TabPane tabs = new TabPane(a, b);
        tabs.setStyle("-fx-font-size: 18px;");
        return tabs;
    }

    @Override
    public void start(Stage stage) {
        var args = getParameters().getRaw();
        UnitSystem units = args.contains("si") ? UnitSystem.SI : UnitSystem.IP;
        Theme theme = args.contains("dark") ? Theme.DARK : Theme.LIGHT;
        stage.setTitle("Latent Ledger — chart preview (invented demo data)");
        stage.setScene(new Scene(createCharts(units, theme), 1280, 800));
        stage.show();
    }

    /** Class-path launch needs a main that is not on the Application subclass's static path check. */
    public static void main(String[] args) {
        Application.launch(ChartPreview.class, args);
    }
}
