package app.latentledger.ui.log;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.cycles.RunCycleAnalysis;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.psychro.InputLimits;
import app.latentledger.core.records.RecordKind;
import app.latentledger.store.LogRepository;
import app.latentledger.ui.bin.RecycleBinViewModel;
import app.latentledger.io.logcsv.DateOrder;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.visit.VisitLogs;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.TypedNumber;
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
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Executor;

/**
 * The log screen: a logger file to import into the visit (with what each column the importer does
 * not know by name holds, picked in words, and, when the visit's reading sets give none, the airflow), then its cycle summary, findings and timeline,
 * all from the {@link LogAnalysisService} the session was given. The import runs off the FX
 * thread; its progress and its results are applied on the FX thread. A visit opened with a log
 * already kept shows that log; every kept log of the visit is listed and can be shown again or
 * deleted (asked first, into the recycle bin). The import form closes once a log is shown and opens
 * again on request. Each message says which field it is about, so the screen shows it beside that
 * field.
 */
public final class LogImportViewModel {
    public static final String NOT_WIRED_MESSAGE = LogAnalysisService.NOT_WIRED_MESSAGE;

    /** Where a message belongs on the screen: beside the field or the part it is about. */
    public enum About {
        /** The list of kept logs (shown, deleted). */
        LOGS,
        /** The import as a whole (the file, its columns, its units), shown under the Import button. */
        IMPORT,
        /** The column picker: what each column of another logger's file holds. */
        COLUMNS, AIRFLOW, FAN_AIRFLOW, DATE_ORDER, TIME_ZONE
    }

    /**
     * One kept log as the list shows it.
     *
     * @param id    the log's id in the ledger
     * @param name  the file it came from
     * @param when  when it was kept, and its length in samples
     * @param shown true for the log whose figures the screen shows
     */
    public record KeptLog(String id, String name, String when, boolean shown) {
    }

    /** The date orders offered: key ("" decides from the file) and the words on the button. */
    public static final List<Map.Entry<String, String>> DATE_ORDERS = List.of(Map.entry("", "From the file"),
            Map.entry("mdy", "Month/day"), Map.entry("dmy", "Day/month"), Map.entry("ymd", "Year/month/day"));

    private static final DateTimeFormatter KEPT_AT = DateTimeFormatter.ofPattern("d MMM yyyy, HH:mm");

    private final AppSession session;
    private final Executor work;
    private final Executor fx;
    private final StringProperty file = new SimpleStringProperty("");
    private final ColumnPicks columns = new ColumnPicks();
    private final StringProperty airflow = new SimpleStringProperty("");
    private final StringProperty fanAirflow = new SimpleStringProperty("");
    private final StringProperty dateOrder = new SimpleStringProperty("");
    private final StringProperty timeZone = new SimpleStringProperty("");
    private final ReadOnlyStringWrapper timeZonePrompt = new ReadOnlyStringWrapper("");
    private final ReadOnlyBooleanWrapper airflowNeeded = new ReadOnlyBooleanWrapper(false);
    private final ReadOnlyStringWrapper airflowCaption = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper("");
    private final ReadOnlyObjectWrapper<About> about = new ReadOnlyObjectWrapper<>(About.IMPORT);
    private final BooleanProperty formOpen = new SimpleBooleanProperty(true);
    private final ObservableList<KeptLog> keptLogs = FXCollections.observableArrayList();
    private final ReadOnlyStringWrapper shownId = new ReadOnlyStringWrapper("");
    private final RecycleBinViewModel bin;
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
        this.bin = new RecycleBinViewModel(session.ledger());
        // a file chosen: its header row tells which columns need the tech's word
        file.addListener((o, a, b) -> columns.read(b));
        bin.onChange(this::afterDelete);
        session.visitProperty().addListener((o, a, b) -> refresh());
        session.draftProperty().addListener((o, a, b) -> showAirflowNeed());
        // other units or thresholds: show the kept log again in them
        session.settingsProperty().addListener((o, a, b) -> showAgain());
        // a log restored from (or deleted on) the Record screen's bin: list what is kept now
        session.screenProperty().addListener((o, a, b) -> {
            if (b == app.latentledger.ui.session.Screen.LOGS) {
                listKept();
                showDefaultZone();
            }
        });
        refresh();
    }

    public boolean wired() {
        return session.logAnalysis().wired();
    }

    /** The path of the file to import, as typed or picked. */
    public StringProperty fileProperty() {
        return file;
    }

    /** The chosen file's columns the importer does not know by name, each with what it holds. */
    public ColumnPicks columns() {
        return columns;
    }

    /** Airflow typed in the tech's units, used when the visit's reading sets give none. */
    public StringProperty airflowProperty() {
        return airflow;
    }

    /** Airflow with the blower alone (fan-only speed), typed in the tech's units; empty: same as during runs. */
    public StringProperty fanAirflowProperty() {
        return fanAirflow;
    }

    /** "mdy", "dmy", "ymd" or empty (decide from the file). */
    public StringProperty dateOrderProperty() {
        return dateOrder;
    }

    /** Zone of clock times written without a UTC offset, e.g. "America/Chicago"; empty: the site's, else the tablet's. */
    public StringProperty timeZoneProperty() {
        return timeZone;
    }

    /**
     * The zone used when none is typed, as the empty zone field says it: "The site's: America/Chicago"
     * or "This tablet's: Europe/Lisbon" (the rule of {@link VisitLogs#clockZone}).
     */
    public ReadOnlyStringProperty timeZonePromptProperty() {
        return timeZonePrompt.getReadOnlyProperty();
    }

    private void showDefaultZone() {
        app.latentledger.core.records.Site site = session.visit() == null ? null
                : session.ledger().sites().find(session.visit().siteId()).orElse(null);
        VisitLogs.ClockZone z = VisitLogs.clockZone(site, null, ZoneId.systemDefault());
        timeZonePrompt.set((z.from() == VisitLogs.ClockZone.From.SITE ? "The site's: " : "This tablet's: ")
                + z.zone().getId());
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

    /** The part of the screen the current message is about. */
    public ReadOnlyObjectProperty<About> aboutProperty() {
        return about.getReadOnlyProperty();
    }

    /** True while the import form is open; it closes once a log is shown. */
    public BooleanProperty formOpenProperty() {
        return formOpen;
    }

    /** The visit's kept logs, in import order, the one shown marked. */
    public ObservableList<KeptLog> keptLogs() {
        return keptLogs;
    }

    /** Id of the kept log whose figures are shown, "" when none. */
    public ReadOnlyStringProperty shownIdProperty() {
        return shownId.getReadOnlyProperty();
    }

    /** A deletion waiting for the tech's yes, or null. */
    public ReadOnlyObjectProperty<RecycleBinViewModel.PendingDelete> pendingDeleteProperty() {
        return bin.pendingProperty();
    }

    private void say(About where, String text) {
        about.set(where);
        status.set(text);
    }

    /** Shows one of the visit's kept logs again, with what it was kept with. */
    public void view(KeptLog log) {
        if (!wired() || log == null || session.visit() == null) {
            return;
        }
        bin.cancelDelete();
        LogRequest request;
        try {
            request = request(Map.of());
        } catch (FieldException e) {
            say(e.about, "Not analysed: " + e.getMessage());
            return;
        }
        int mine = ++job;
        busy.set(true);
        say(About.LOGS, "Analysing " + log.name() + ", kept on this visit…");
        work.execute(() -> {
            try {
                Optional<LogAnalysis> a = session.logAnalysis().kept(request, log.id());
                fx.execute(() -> {
                    if (mine == job) {
                        busy.set(false);
                        if (a.isPresent()) {
                            show(a.get());
                            formOpen.set(false);
                            say(About.LOGS, "Showing " + a.get().source() + ", kept on this visit.");
                        } else {
                            say(About.LOGS, log.name() + " is no longer kept on this visit.");
                        }
                        listKept();
                    }
                });
            } catch (Exception e) {
                fx.execute(() -> {
                    if (mine == job) {
                        busy.set(false);
                        say(About.LOGS, "The log " + log.name() + " cannot be analysed: " + e.getMessage());
                    }
                });
            }
        });
    }

    /** Step one of deleting a kept log: ask. */
    public void askDelete(KeptLog log) {
        if (log == null) {
            return;
        }
        bin.askDelete(RecordKind.LOG, log.id(), "the log " + log.name());
        say(About.LOGS, "");
    }

    /** Step two: the tech said yes; the log goes to the recycle bin with its samples. */
    public void confirmDelete() {
        bin.confirmDelete();
        say(About.LOGS, bin.messageProperty().get());
    }

    public void cancelDelete() {
        bin.cancelDelete();
        say(About.LOGS, "");
    }

    private void afterDelete() {
        String shown = shownId.get();
        listKept();
        if (!shown.isEmpty() && keptLogs.stream().noneMatch(k -> k.id().equals(shown))) {
            // the log on screen went to the bin: its figures go with it
            ++job;
            clearShown();
            if (keptLogs.isEmpty()) {
                formOpen.set(true);
            }
        }
    }

    /** Imports and analyses the chosen file, off the FX thread. */
    public void importFile() {
        if (!wired()) {
            say(About.IMPORT, NOT_WIRED_MESSAGE);
            return;
        }
        if (busy.get()) {
            return;
        }
        bin.cancelDelete();
        String f = file.get() == null ? "" : file.get().strip();
        if (f.isEmpty() || !Files.isRegularFile(Path.of(f))) {
            say(About.IMPORT, "Choose a log file first" + (f.isEmpty() ? "." : ": " + f + " is not a file."));
            return;
        }
        if (columns.picks().isEmpty() && columns.knownProperty().get().isEmpty()) {
            columns.read(f); // the file changed on disk, or was typed before it existed
        }
        String problem = columns.problem();
        if (problem != null) {
            say(About.COLUMNS, "Not imported: " + problem);
            return;
        }
        Map<String, String> map = columns.headerMap();
        LogRequest request;
        try {
            request = request(map);
        } catch (FieldException e) {
            say(e.about, "Not imported: " + e.getMessage());
            return;
        }
        Path path = Path.of(f);
        int mine = ++job;
        busy.set(true);
        progress.set(0);
        lastSent = 0;
        say(About.IMPORT, "Reading " + path.getFileName() + "…");
        work.execute(() -> {
            try {
                LogAnalysis a = session.logAnalysis().importAndAnalyse(request, path, this::reported);
                fx.execute(() -> {
                    if (mine == job) {
                        show(a);
                        busy.set(false);
                        listKept();
                        formOpen.set(false);
                        say(About.LOGS, "Imported " + a.source() + " and kept it with this visit."
                                + (airflowNeeded.get() && Double.isNaN(request.airflowM3PerS())
                                ? " Give the airflow for water masses." : ""));
                    }
                });
            } catch (Exception e) {
                fx.execute(() -> {
                    if (mine == job) {
                        String m = e.getMessage() == null ? e.toString() : e.getMessage();
                        say(m.contains("date order") ? About.DATE_ORDER : About.IMPORT, "Not imported: " + m);
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
        shownId.set(a.logId());
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
        // the saved theme, outdoor included, as the Results chart takes it
        t.themeProperty().bind(Bindings.createObjectBinding(() -> CoilCharts.theme(session.themeProperty().get()),
                session.themeProperty()));
        timeline.set(t);
    }

    private void clearShown() {
        shownId.set("");
        summary.clear();
        findings.clear();
        notes.set("");
        timeline.set(null);
    }

    /**
     * What the analysis needs besides the visit's own conditions ({@link VisitLogs} applies the one
     * rule): the typed airflows, the units, thresholds, the picked columns, date order and zone.
     */
    private LogRequest request(Map<String, String> map) {
        DateOrder order;
        ZoneId zone;
        try {
            order = dateOrder.get() == null || dateOrder.get().isBlank() ? DateOrder.AUTO
                    : DateOrder.parse(dateOrder.get());
        } catch (IllegalArgumentException e) {
            throw new FieldException(About.DATE_ORDER, e.getMessage());
        }
        try {
            zone = timeZone.get() == null || timeZone.get().isBlank() ? null : ZoneId.of(timeZone.get().strip());
        } catch (java.time.DateTimeException e) {
            throw new FieldException(About.TIME_ZONE, "time zone '" + timeZone.get().strip()
                    + "' is not known: give a zone such as America/Chicago or an offset such as -05:00");
        }
        return new LogRequest(session.ledger(), session.visit(), typedAirflow(airflow, "airflow", About.AIRFLOW),
                typedAirflow(fanAirflow, "fan-only airflow", About.FAN_AIRFLOW), session.units(), session.thresholds(),
                map, order, zone);
    }

    /** A typed value refused, with the field it belongs to. */
    private static final class FieldException extends IllegalArgumentException {
        private final About about;

        FieldException(About about, String message) {
            super(message);
            this.about = about;
        }
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

    private double typedAirflow(StringProperty box, String field, About where) {
        String t = box.get() == null ? "" : box.get().strip();
        if (t.isEmpty()) {
            return Double.NaN;
        }
        UnitSystem u = session.units();
        double shown;
        try {
            shown = TypedNumber.parse(field, t);
        } catch (NumberFormatException e) {
            throw new FieldException(where, e.getMessage());
        }
        double si = Quantity.AIRFLOW.fromDisplay(u, shown);
        try {
            InputLimits.check(field, Quantity.AIRFLOW, si, RunCycleAnalysis.MIN_AIRFLOW_M3_PER_S,
                    RunCycleAnalysis.MAX_AIRFLOW_M3_PER_S, null);
        } catch (InvalidInputException e) {
            throw new FieldException(where, e.message(u));
        }
        return si;
    }

    private void showAirflowNeed() {
        if (session.visit() == null) {
            airflowNeeded.set(false);
            return;
        }
        airflowNeeded.set(Double.isNaN(visitAirflow(session.ledger().readings().forVisit(session.visit().id()))));
        airflowCaption.set("Airflow, " + Quantity.AIRFLOW.symbol(session.units()));
    }

    /** The visit's kept logs, read without their samples. */
    private void listKept() {
        imported.clear();
        List<KeptLog> out = new java.util.ArrayList<>();
        if (session.visit() != null) {
            for (LogRepository.Listed l : session.ledger().logs().listForVisit(session.visit().id())) {
                imported.add(l.sourceFileName());
                out.add(new KeptLog(l.id(), l.sourceFileName(), "kept " + l.importedAt().format(KEPT_AT) + ", "
                        + l.samples() + " samples" + (l.timeZone().isEmpty() ? "" : ", clock in " + l.timeZone()),
                        l.id().equals(shownId.get())));
            }
        }
        keptLogs.setAll(out);
    }

    /** Other units or thresholds: the log on screen again, in them. */
    private void showAgain() {
        String shown = shownId.get();
        keptLogs.stream().filter(k -> k.id().equals(shown)).findFirst().ifPresentOrElse(this::view, this::refresh);
    }

    /** A visit opened (or other settings): list its logs and show the latest kept one. */
    private void refresh() {
        int mine = ++job;
        clearShown();
        busy.set(false);
        bin.cancelDelete();
        listKept();
        showDefaultZone();
        showAirflowNeed();
        formOpen.set(keptLogs.isEmpty());
        if (!wired()) {
            say(About.IMPORT, NOT_WIRED_MESSAGE);
            return;
        }
        say(About.LOGS, "");
        if (imported.isEmpty()) {
            return;
        }
        LogRequest request;
        try {
            request = request(Map.of());
        } catch (FieldException e) {
            say(e.about, "Not analysed: " + e.getMessage());
            return;
        }
        String name = imported.get(imported.size() - 1);
        say(About.LOGS, "Analysing " + name + ", kept on this visit…");
        work.execute(() -> {
            try {
                Optional<LogAnalysis> a = session.logAnalysis().latestKept(request);
                fx.execute(() -> {
                    if (mine == job) {
                        a.ifPresent(this::show);
                        listKept();
                        say(About.LOGS, a.map(x -> "Showing " + x.source() + ", kept on this visit.").orElse(""));
                    }
                });
            } catch (Exception e) {
                fx.execute(() -> {
                    if (mine == job) {
                        say(About.LOGS, "The log kept on this visit cannot be analysed: " + e.getMessage());
                    }
                });
            }
        });
    }
}
