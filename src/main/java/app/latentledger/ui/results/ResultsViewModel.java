package app.latentledger.ui.results;

import app.latentledger.chart.psychro.PsychroChartData;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.visit.ReadingSetCheck;
import app.latentledger.ui.chart.CoilCharts;
import app.latentledger.ui.chart.PsychroChartViewModel;
import app.latentledger.ui.present.ResultSheet;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.CurrentCheck;
import app.latentledger.ui.session.Draft;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;

import java.util.Locale;

/**
 * The results screen: the sheet of the session's current check (worked out once by the session
 * whenever an accepted value changes the draft, the system or the settings), and the
 * psychrometric chart of the same coil check. When the visit has a reading set labelled "before"
 * and the set in hand is another one, the chart draws the pair together.
 */
public final class ResultsViewModel {
    private final AppSession session;
    private final ReadOnlyObjectWrapper<ResultSheet> sheet = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyObjectWrapper<PsychroChartData> chartData = new ReadOnlyObjectWrapper<>();
    /** Built on first use: after the first frame, so the chart never delays it. */
    private PsychroChartViewModel chart;
    private String beforeKey;
    /** The reading set whose states the chart data holds, and the one the chart last drew. */
    private String chartSet = "";
    private String shownSet = "";
    private ReadingSet beforeSet;

    public ResultsViewModel(AppSession session) {
        this.session = session;
        session.currentCheckProperty().addListener((o, a, b) -> show(b));
        show(session.currentCheck());
    }

    public ReadOnlyObjectProperty<ResultSheet> sheetProperty() {
        return sheet.getReadOnlyProperty();
    }

    public ResultSheet sheet() {
        return sheet.get();
    }

    /** What the chart shows: the set in hand's coil process, with its "before" when there is one. */
    public ReadOnlyObjectProperty<PsychroChartData> chartDataProperty() {
        return chartData.getReadOnlyProperty();
    }

    /** The chart's view model, in the app's theme, following the readings. */
    public PsychroChartViewModel chart() {
        if (chart == null) {
            chart = new PsychroChartViewModel(CoilCharts.orEmpty(chartData.get(), session.units()));
            chart.themeProperty().bind(javafx.beans.binding.Bindings.createObjectBinding(
                    () -> CoilCharts.theme(session.themeProperty().get()), session.themeProperty()));
            chartData.addListener((o, a, b) -> {
                // a zoom made on one reading set does not carry over to the next
                if (chartSet.equals(shownSet)) {
                    chart.show(b);
                } else {
                    chart.showNewSet(b);
                }
                shownSet = chartSet;
            });
            shownSet = chartSet;
        }
        return chart;
    }

    private void show(CurrentCheck c) {
        if (c.draft() == null) {
            return;
        }
        sheet.set(c.sheet());
        chartSet = c.draft().visitId() + "/" + c.draft().readingSetId();
        CoilResult pairedWith = before(c.draft());
        // short: the header already names the site, and the chart's title shares its width with the plot
        String title = pairedWith != null && c.coil() != null ? "Before and after" : "This reading set";
        // drawn at the pressure the draft was worked out at (a measured station pressure if entered)
        chartData.set(CoilCharts.of(c.units(), c.pressurePa(), title, pairedWith, c.coil()));
    }

    /**
     * The coil check of the visit's "before" set when the draft is another set of the same visit.
     * The set is looked up again only when the visit or the set in hand changes, not on every keypad
     * entry; its check comes from the session, which keeps it while system and settings stay.
     */
    private CoilResult before(Draft d) {
        String key = d.visitId() + "/" + d.readingSetId();
        if (!key.equals(beforeKey)) {
            beforeKey = key;
            beforeSet = null;
            if (d.base() == null || !"before".equals(d.base().label().toLowerCase(Locale.ROOT))) {
                for (ReadingSet rs : session.ledger().readings().forVisit(d.visitId())) {
                    if (!rs.id().equals(d.readingSetId()) && "before".equals(rs.label().toLowerCase(Locale.ROOT))
                            && ReadingSetCheck.missing(rs).isEmpty()) {
                        beforeSet = rs;
                    }
                }
            }
        }
        return beforeSet == null ? null : session.checkOf(beforeSet);
    }
}
