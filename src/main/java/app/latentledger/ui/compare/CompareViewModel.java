package app.latentledger.ui.compare;

import app.latentledger.chart.psychro.PsychroChartData;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.ui.chart.CoilCharts;
import app.latentledger.ui.chart.PsychroChartViewModel;
import app.latentledger.ui.export.ReportViewModel;
import app.latentledger.ui.present.Shown;
import app.latentledger.ui.present.VisitResults;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.CurrentCheck;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Objects;

/**
 * The compare screen: an earlier reading set of the same system beside the one being worked on,
 * each through the same coil check, with the change, the two coil processes drawn together on
 * the psychrometric chart, and the before/after report of the pair.
 */
public final class CompareViewModel {
    private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm");

    private final AppSession session;
    private final ObservableList<ReadingSet> earlier = FXCollections.observableArrayList();
    private final ObjectProperty<ReadingSet> chosen = new SimpleObjectProperty<>();
    private final ObservableList<CompareRow> rows = FXCollections.observableArrayList();
    private final ReadOnlyStringWrapper verdicts = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper marginNote = new ReadOnlyStringWrapper("");
    private final ReadOnlyObjectWrapper<PsychroChartData> chartData = new ReadOnlyObjectWrapper<>();
    private final ReportViewModel reports;
    /** Built on first use, after the first frame. */
    private PsychroChartViewModel chart;

    public CompareViewModel(AppSession session) {
        this(session, new ReportViewModel(session));
    }

    public CompareViewModel(AppSession session, ReportViewModel reports) {
        this.session = session;
        this.reports = reports;
        // the current check changes with the draft, the system and the settings: one listener for all three
        session.currentCheckProperty().addListener((o, a, b) -> refresh());
        chosen.addListener((o, a, b) -> recompute());
        refresh();
    }

    /** The before/after chart: the earlier set as "Before", the set in hand as "After". */
    public ReadOnlyObjectProperty<PsychroChartData> chartDataProperty() {
        return chartData.getReadOnlyProperty();
    }

    public PsychroChartViewModel chart() {
        if (chart == null) {
            chart = new PsychroChartViewModel(CoilCharts.orEmpty(chartData.get(), session.units()));
            chart.themeProperty().bind(javafx.beans.binding.Bindings.createObjectBinding(
                    () -> CoilCharts.theme(session.themeProperty().get()), session.themeProperty()));
            chartData.addListener((o, a, b) -> chart.show(b));
        }
        return chart;
    }

    public ReportViewModel reports() {
        return reports;
    }

    /** Writes the before/after report: the visit in hand against the visit of the chosen set. */
    public void beforeAfterReport() {
        if (chosen.get() == null) {
            return;
        }
        reports.beforeAfterReport(chosen.get().visitId());
    }

    /** Reading sets of this system other than the current one, oldest first. */
    public ObservableList<ReadingSet> earlier() {
        return earlier;
    }

    public ObjectProperty<ReadingSet> chosenProperty() {
        return chosen;
    }

    public ObservableList<CompareRow> rows() {
        return rows;
    }

    /** "Not dehumidifying → Dehumidifying". */
    public ReadOnlyStringProperty verdictsProperty() {
        return verdicts.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty statusProperty() {
        return status.getReadOnlyProperty();
    }

    /** How a reading set is named in the pick list. */
    public static String describe(ReadingSet rs) {
        return rs.takenAt().format(WHEN) + (rs.label().isEmpty() ? "" : " · " + rs.label());
    }

    private void refresh() {
        String current = session.draft() == null ? null : session.draft().readingSetId();
        List<ReadingSet> others = session.readingSetsOfSystem().stream()
                .filter(r -> !r.id().equals(current)).toList();
        ReadingSet keep = chosen.get();
        earlier.setAll(others);
        ReadingSet pick = keep != null && others.stream().anyMatch(r -> r.id().equals(keep.id()))
                ? others.stream().filter(r -> r.id().equals(keep.id())).findFirst().get()
                : latestBeforeCurrent(others);
        // an equal record read again raises no change event: work the rows out here then
        if (Objects.equals(pick, chosen.get())) {
            recompute();
        } else {
            chosen.set(pick);
        }
    }

    private ReadingSet latestBeforeCurrent(List<ReadingSet> others) {
        OffsetDateTime now = session.draft() == null || session.draft().takenAt() == null ? null
                : session.draft().takenAt();
        ReadingSet best = null;
        for (ReadingSet r : others) {
            if (now == null || !r.takenAt().isAfter(now)) {
                best = r;
            }
        }
        return best != null ? best : others.isEmpty() ? null : others.get(0);
    }

    private void recompute() {
        rows.clear();
        marginNote.set("");
        verdicts.set("");
        ReadingSet before = chosen.get();
        CurrentCheck now = session.currentCheck();
        CoilResult a = before == null ? null : session.checkOf(before);
        CoilResult b = now.coil();
        if (now.draft() != null) {
            chartData.set(CoilCharts.of(now.units(), now.pressurePa(), "Before and after", a, b));
        }
        if (before == null) {
            status.set("No other reading set of this system to compare with yet.");
            return;
        }
        if (a == null || b == null) {
            status.set(b == null ? "The current readings are not complete yet: "
                    + String.join(", ", now.waitingFor()) + "."
                    : "The earlier reading set has no airflow, so it cannot be worked out.");
            return;
        }
        UnitSystem u = session.units();
        for (CompareFigure f : CompareFigure.values()) {
            double x = f.read.applyAsDouble(a);
            double y = f.read.applyAsDouble(b);
            // printed as the report prints the same figures (DisplayNumber: decimals per quantity, signed change)
            int decimals = DisplayNumber.decimals(f.quantity, u);
            String change = Double.isFinite(x) && Double.isFinite(y)
                    ? DisplayNumber.signed(f.quantity.toDisplay(u, y) - f.quantity.toDisplay(u, x), decimals)
                    : f == CompareFigure.SHR ? withheldChange(a, b) : Shown.NONE;
            if (f == CompareFigure.MARGIN) {
                // which side of the dew point, in the words Results and the report use; the change too:
                // "2.0 colder" is a coil moved 2.0 further below the dew point
                rows.add(new CompareRow(f.key(), f.label(u), marginCell(u, x), marginCell(u, y),
                        Double.isFinite(x) && Double.isFinite(y) ? marginCell(u, y - x) : Shown.NONE, f.quantity.symbol(u)));
                continue;
            }
            rows.add(new CompareRow(f.key(), f.label(u), shown(f, u, x), shown(f, u, y), change, f.quantity.symbol(u)));
        }
        verdicts.set(VisitResults.headline(a.verdict()) + "  →  " + VisitResults.headline(b.verdict()));
        marginNote.set("Before: " + VisitResults.marginSentence(a, u) + ". After: " + VisitResults.marginSentence(b, u)
                + ".");
        status.set("Before: " + describe(before) + ".  After: the reading set on this visit.");
    }

    /**
     * The change of a sensible heat ratio withheld on one side or both, in words: "not measurable:
     * the coil removes no heat from the air (before)", the reason the check gave, never a bare dash.
     */
    static String withheldChange(CoilResult before, CoilResult after) {
        app.latentledger.core.units.Ratio x = app.latentledger.core.coil.WithheldRatios.shr(before);
        app.latentledger.core.units.Ratio y = app.latentledger.core.coil.WithheldRatios.shr(after);
        List<String> why = new ArrayList<>();
        if (!x.measurable()) {
            why.add(x.reason() + " (before)");
        }
        if (!y.measurable()) {
            why.add(y.reason() + " (after)");
        }
        return app.latentledger.core.units.Ratio.NOT_MEASURABLE + ": " + String.join("; ", why);
    }

    /** A figure as shown; a withheld ratio reads "not measurable", never a bare dash. */
    private static String shown(CompareFigure f, UnitSystem u, double si) {
        return f == CompareFigure.SHR && !Double.isFinite(si) ? app.latentledger.core.units.Ratio.NOT_MEASURABLE
                : Shown.of(f.quantity, u, si);
    }

    /** "3.2 warmer" or "13.6 colder": the coil against the dew point, no bare minus sign. */
    private static String marginCell(UnitSystem u, double marginK) {
        if (!Double.isFinite(marginK)) {
            return Shown.NONE;
        }
        return (app.latentledger.core.text.MarginWords.number(u, marginK, Double.NaN) + " "
                + app.latentledger.core.text.MarginWords.direction(u, marginK)).trim();
    }

    /** Both sets' dew-point margins as sentences ("Coil is … warmer than the return dew point — …"). */
    public javafx.beans.property.ReadOnlyStringProperty marginNoteProperty() {
        return marginNote.getReadOnlyProperty();
    }
}
