package app.latentledger.ui.log;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.cycles.RunCycleAnalysis;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.psychro.InputLimits;
import app.latentledger.core.psychro.StandardAtmosphere;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Visit;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.ui.chart.CoilCharts;
import app.latentledger.ui.chart.TimelineViewModel;
import app.latentledger.ui.present.FindingCard;
import app.latentledger.ui.present.Row;
import app.latentledger.ui.present.VisitResults;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import app.latentledger.ui.session.LogAnalysis;
import app.latentledger.ui.session.LogAnalysisService;
import app.latentledger.ui.session.LogRequest;
import javafx.beans.binding.Bindings;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Executor;

/**
 * The log screen: a logger file to import into the visit (with an optional header map and, when
 * the visit's reading sets give none, the airflow), then its cycle summary, findings and timeline,
 * all from the {@link LogAnalysisService} the session was given. The import runs off the FX
 * thread; its progress and its results are applied on the FX thread. A visit opened with a log
 * already kept shows that log.
 */
public final class LogImportViewModel {
    public static final String NOT_WIRED_MESSAGE = LogAnalysisService.NOT_WIRED_MESSAGE;

    private final AppSession session;
    private final Executor work;
    private final Executor fx;
    private final StringProperty file = new SimpleStringProperty("");
    private final StringProperty headerMap = new SimpleStringProperty("");
    private final StringProperty airflow = new SimpleStringProperty("");
    private final ReadOnlyBooleanWrapper airflowNeeded = new ReadOnlyBooleanWrapper(false);
    private final ReadOnlyStringWrapper airflowCaption = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper notes = new ReadOnlyStringWrapper("");
    private final ReadOnlyBooleanWrapper busy = new ReadOnlyBooleanWrapper(false);
    private final ReadOnlyDoubleWrapper progress = new ReadOnlyDoubleWrapper(0);
    private final ObservableList<Row> summary = FXCollections.observableArrayList();
    private final ObservableList<FindingCard> findings = FXCollections.observableArrayList();
    private final ObservableList<String> imported = FXCollections.observableArrayList();
    private final ReadOnlyObjectWrapper<TimelineViewModel> timeline = new ReadOnlyObjectWrapper<>();
    /** Counts jobs, so the answer of a job overtaken by another visit is dropped. */
    private int job;
    /** Last fraction sent to the FX thread, read and written on the worker. */
    private volatile double lastSent;

    public LogImportViewModel(AppSession session) {
        this(session, Background.worker(), Background.fx());
    }

    /**
     * @param work where the import and analysis run
     * @param fx   where their results are applied (the FX thread in the app)
     */
    public LogImportViewModel(AppSession session, Executor work, Executor fx) {
        this.session = session;
        this.work = work;
        this.fx = fx;
        session.visitProperty().addListener((o, a, b) -> refresh());
        session.draftProperty().addListener((o, a, b) -> showAirflowNeed());
        // other units or thresholds: show the kept log again in them
        session.settingsProperty().addListener((o, a, b) -> refresh());
        refresh();
    }

    public boolean wired() {
        return session.logAnalysis().wired();
    }

    /** The path of the file to import, as typed or picked. */
    public StringProperty fileProperty() {
        return file;
    }

    /** Another logger's headers, "RA Temp=return_db; RA RH=return_rh" (one per line also works). */
    public StringProperty headerMapProperty() {
        return headerMap;
    }

    /** Airflow typed in the tech's units, used when the visit's reading sets give none. */
    public StringProperty airflowProperty() {
        return airflow;
    }

    /** True when no reading set of the visit has an airflow: the screen asks for it. */
    public ReadOnlyBooleanProperty airflowNeededProperty() {
        return airflowNeeded.getReadOnlyProperty();
    }

    /** "Airflow, cfm" or "Airflow, L/s". */
    public ReadOnlyStringProperty airflowCaptionProperty() {
        return airflowCaption.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty statusProperty() {
        return status.getReadOnlyProperty();
    }

    /** What the import noticed (rows kept out, repeated times, columns not read). */
    public ReadOnlyStringProperty notesProperty() {
        return notes.getReadOnlyProperty();
    }

    /** True while a log is being read or analysed. */
    public ReadOnlyBooleanProperty busyProperty() {
        return busy.getReadOnlyProperty();
    }

    /** 0–1 of the file read. */
    public ReadOnlyDoubleProperty progressProperty() {
        return progress.getReadOnlyProperty();
    }

    public ObservableList<Row> summary() {
        return summary;
    }

    public ObservableList<FindingCard> findings() {
        return findings;
    }

    /** Logs already kept on this visit, by file name. */
    public ObservableList<String> imported() {
        return imported;
    }

    /** The timeline of the log shown, in the app's theme; null until one is shown. */
    public ReadOnlyObjectProperty<TimelineViewModel> timelineProperty() {
        return timeline.getReadOnlyProperty();
    }

    /** Imports and analyses the chosen file, off the FX thread. */
    public void importFile() {
        if (!wired()) {
            status.set(NOT_WIRED_MESSAGE);
            return;
        }
        if (busy.get()) {
            return;
        }
        String f = file.get() == null ? "" : file.get().strip();
        if (f.isEmpty() || !Files.isRegularFile(Path.of(f))) {
            status.set("Choose a log file first" + (f.isEmpty() ? "." : ": " + f + " is not a file."));
            return;
        }
        LogRequest request;
        try {
            request = request(parseMap(headerMap.get()));
        } catch (IllegalArgumentException e) {
            status.set("Not imported: " + e.getMessage());
            return;
        }
        Path path = Path.of(f);
        int mine = ++job;
        busy.set(true);
        progress.set(0);
        lastSent = 0;
        status.set("Reading " + path.getFileName() + "…");
        work.execute(() -> {
            try {
                LogAnalysis a = session.logAnalysis().importAndAnalyse(request, path, this::reported);
                fx.execute(() -> {
                    if (mine == job) {
                        show(a);
                        status.set("Imported " + a.source() + " and kept it with this visit."
                                + (Double.isNaN(request.airflowM3PerS()) ? " Give the airflow for water masses." : ""));
                        busy.set(false);
                        listKept();
                    }
                });
            } catch (Exception e) {
                fx.execute(() -> {
                    if (mine == job) {
                        status.set("Not imported: " + e.getMessage());
                        busy.set(false);
                    }
                });
            }
        });
    }

    /** The importer's progress, passed to the FX thread about once per percent. */
    private void reported(double fraction) {
        if (fraction - lastSent >= 0.01 || fraction >= 1.0) {
            lastSent = fraction;
            fx.execute(() -> progress.set(fraction));
        }
    }

    private void show(LogAnalysis a) {
        summary.setAll(a.summary());
        findings.clear();
        for (Finding x : a.findings()) {
            findings.add(VisitResults.card(x, session.units()));
        }
        notes.set(a.notes());
        progress.set(1);
        if (a.timeline() == null) {
            timeline.set(null);
            return;
        }
        TimelineViewModel t = new TimelineViewModel(a.timeline());
        t.themeProperty().bind(Bindings.createObjectBinding(() -> CoilCharts.theme(session.darkProperty().get()),
                session.darkProperty()));
        timeline.set(t);
    }

    private void clearShown() {
        summary.clear();
        findings.clear();
        notes.set("");
        timeline.set(null);
    }

    /** What the analysis needs from the visit: its pressure, its airflow, the units and thresholds. */
    private LogRequest request(Map<String, String> map) {
        Visit v = session.visit();
        List<ReadingSet> sets = session.ledger().readings().forVisit(v.id());
        double pressure = StandardAtmosphere.pressurePa(session.site().elevationM());
        for (ReadingSet rs : sets) {
            if (rs.stationPressurePa() != null) {
                // the visit's first measured station pressure, as the report takes it
                pressure = rs.stationPressurePa().valueSi();
                break;
            }
        }
        double flow = visitAirflow(sets);
        if (Double.isNaN(flow)) {
            flow = typedAirflow();
        }
        return new LogRequest(session.ledger(), v, pressure, flow, session.units(), session.thresholds(), map);
    }

    /** The airflow of the visit's last reading set that has one (the state the logger ran in), else NaN. */
    private static double visitAirflow(List<ReadingSet> sets) {
        double flow = Double.NaN;
        for (ReadingSet rs : sets) {
            if (rs.airflow() != null) {
                flow = rs.airflow().volume().valueSi();
            }
        }
        return flow;
    }

    private double typedAirflow() {
        String t = airflow.get() == null ? "" : airflow.get().strip();
        if (t.isEmpty()) {
            return Double.NaN;
        }
        UnitSystem u = session.units();
        double shown;
        try {
            shown = Double.parseDouble(t.replace(',', '.'));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("airflow '" + t + "' is not a number");
        }
        double si = Quantity.AIRFLOW.fromDisplay(u, shown);
        try {
            InputLimits.check("airflow", Quantity.AIRFLOW, si, RunCycleAnalysis.MIN_AIRFLOW_M3_PER_S,
                    RunCycleAnalysis.MAX_AIRFLOW_M3_PER_S, null);
        } catch (InvalidInputException e) {
            throw new IllegalArgumentException(e.message(u), e);
        }
        return si;
    }

    /** "A=b; C=d" or one per line; the header is everything before the last '='. */
    static Map<String, String> parseMap(String text) {
        Map<String, String> m = new LinkedHashMap<>();
        if (text == null) {
            return m;
        }
        for (String part : text.split("[;\\n]")) {
            String p = part.strip();
            if (p.isEmpty()) {
                continue;
            }
            int eq = p.lastIndexOf('=');
            if (eq <= 0 || eq == p.length() - 1) {
                throw new IllegalArgumentException("column name '" + p + "' must be HEADER=field, e.g. RA Temp=return_db");
            }
            m.put(p.substring(0, eq).strip(), p.substring(eq + 1).strip());
        }
        return m;
    }

    private void showAirflowNeed() {
        if (session.visit() == null) {
            airflowNeeded.set(false);
            return;
        }
        airflowNeeded.set(Double.isNaN(visitAirflow(session.ledger().readings().forVisit(session.visit().id()))));
        airflowCaption.set("Airflow, " + Quantity.AIRFLOW.symbol(session.units()));
    }

    private void listKept() {
        imported.clear();
        if (session.visit() == null) {
            return;
        }
        for (ImportedLog l : session.ledger().logs().forVisit(session.visit().id())) {
            imported.add(l.sourceFileName());
        }
    }

    /** A visit opened (or other settings): list its logs and show the latest kept one. */
    private void refresh() {
        int mine = ++job;
        clearShown();
        busy.set(false);
        listKept();
        showAirflowNeed();
        if (!wired()) {
            status.set(NOT_WIRED_MESSAGE);
            return;
        }
        status.set("");
        if (imported.isEmpty()) {
            return;
        }
        LogRequest request;
        try {
            request = request(Map.of());
        } catch (IllegalArgumentException e) {
            status.set("Not analysed: " + e.getMessage());
            return;
        }
        String name = imported.get(imported.size() - 1);
        status.set("Analysing " + name + ", kept on this visit…");
        work.execute(() -> {
            try {
                Optional<LogAnalysis> a = session.logAnalysis().latestKept(request);
                fx.execute(() -> {
                    if (mine == job) {
                        a.ifPresent(this::show);
                        status.set(a.map(x -> "Showing " + x.source() + ", kept on this visit.").orElse(""));
                    }
                });
            } catch (Exception e) {
                fx.execute(() -> {
                    if (mine == job) {
                        status.set("The log kept on this visit cannot be analysed: " + e.getMessage());
                    }
                });
            }
        });
    }
}
