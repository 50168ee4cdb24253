package app.latentledger.ui;

import app.latentledger.core.settings.Settings;
import app.latentledger.ui.chart.ChartSlots;
import app.latentledger.ui.compare.CompareView;
import app.latentledger.ui.compare.CompareViewModel;
import app.latentledger.ui.entry.EntryViewModel;
import app.latentledger.ui.entry.ReadingsView;
import app.latentledger.ui.export.ExportView;
import app.latentledger.ui.export.ExportViewModel;
import app.latentledger.ui.export.ReportViewModel;
import app.latentledger.ui.house.HouseView;
import app.latentledger.ui.house.HouseViewModel;
import app.latentledger.ui.job.JobView;
import app.latentledger.ui.job.JobViewModel;
import app.latentledger.ui.log.LogImportViewModel;
import app.latentledger.ui.log.LogView;
import app.latentledger.ui.look.Icons;
import app.latentledger.ui.look.Reflowing;
import app.latentledger.ui.look.Theme;
import app.latentledger.ui.look.Ui;
import app.latentledger.ui.results.ResultsView;
import app.latentledger.ui.results.ResultsViewModel;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import app.latentledger.ui.session.Screen;
import app.latentledger.ui.settings.SettingsStore;
import app.latentledger.ui.settings.SettingsView;
import app.latentledger.ui.settings.SettingsViewModel;
import javafx.application.Platform;
import javafx.geometry.Pos;
import javafx.scene.Parent;
import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Pane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Executor;

/**
 * The frame around every screen: a header with the job in hand, Settings and the theme switch, the
 * screen list (a rail on the left in landscape, a bar at the bottom in portrait that wraps to a
 * second row rather than cut a word when the text is large), and the screen itself,
 * laid out over a {@link ShellViewModel}. It holds every view model for the life of the window
 * (views bind to them weakly).
 */
public final class AppShell extends BorderPane {
    private final AppSession session;
    private final ShellViewModel shell;
    private final Executor work;
    private final Executor fx;
    /** One writer of reports for the export and compare screens. */
    private ReportViewModel reports;
    // built on first use, so the first frame waits only for the first screen's view model
    private EntryViewModel entry;
    private ResultsViewModel results;
    private JobViewModel job;
    private LogImportViewModel logs;
    private HouseViewModel house;
    private CompareViewModel compare;
    private ExportViewModel export;
    private SettingsViewModel settings;
    private app.latentledger.ui.settings.OfficeViewModel office;
    /** True once the first frame is up and the charts may be built. */
    private boolean chartsAttached;
    private final Map<Screen, Parent> views = new EnumMap<>(Screen.class);
    private app.latentledger.ui.paperwork.VisitRecordModel record;
    /** The header's buttons: New set, Settings, the theme switch. */
    private final HBox headerButtons = new HBox(8);
    private final HBox headerRow = new HBox();
    private Label headerTitle;
    private Label headerContext;
    private final Pane rail = new VBox();
    private final FlowPane bar = new FlowPane();
    private final Map<Screen, ToggleButton> navButtons = new EnumMap<>(Screen.class);
    private boolean portrait;
    private boolean laidOut;

    public AppShell(AppSession session) {
        this(session, Background.worker(), Background.fx());
    }

    /**
     * @param work where slow jobs (log import, reports) run
     * @param fx   where their results are applied; {@link Background#DIRECT} for both renders a
     *             screen complete in one call (the {@code screens} command, tests)
     */
    public AppShell(AppSession session, Executor work, Executor fx) {
        this.session = session;
        this.shell = new ShellViewModel(session);
        this.work = work;
        this.fx = fx;
        setId("shell");
        setTop(header());
        ToggleGroup group = new ToggleGroup();
        for (Screen s : shell.screens()) {
            navButtons.put(s, navButton(s, group, 28));
        }
        // Settings sits in the header: one button fewer on the list keeps every word whole upright
        ToggleButton settingsButton = navButton(shell.headerScreen(), group, 24);
        navButtons.put(shell.headerScreen(), settingsButton);
        headerButtons.getChildren().add(1, settingsButton);
        rail.getStyleClass().addAll("nav", "rail");
        ((VBox) rail).setSpacing(8);
        bar.getStyleClass().addAll("nav", "bar");
        bar.setAlignment(Pos.CENTER);
        bar.setHgap(8);
        bar.setVgap(8);
        shell.screenProperty().addListener((o, a, b) -> show(b));
        sceneProperty().addListener((o, a, scene) -> {
            if (scene != null) {
                Theme.apply(scene, shell.themeProperty().get());
                scene.widthProperty().addListener((x, y, z) -> fit(scene));
                scene.heightProperty().addListener((x, y, z) -> fit(scene));
                fit(scene);
            }
        });
        shell.themeProperty().addListener((o, a, b) -> {
            if (getScene() != null) {
                Theme.apply(getScene(), b);
            }
        });
        placeNav();
        show(shell.screenProperty().get());
    }

    /** A scene for this shell, styled, at the given size. */
    public Scene scene(double width, double height) {
        Scene scene = new Scene(this, width, height);
        Theme.install(scene);
        return scene;
    }

    public AppSession session() {
        return session;
    }

    public EntryViewModel entry() {
        if (entry == null) {
            entry = new EntryViewModel(session);
        }
        return entry;
    }

    public ResultsViewModel results() {
        if (results == null) {
            results = new ResultsViewModel(session);
        }
        return results;
    }

    public JobViewModel job() {
        if (job == null) {
            job = new JobViewModel(session);
            shell.followJob(job);
        }
        return job;
    }

    /** The House screen's state: the visit's moisture budget, fixes, and the house facts and readings typed there. */
    public HouseViewModel house() {
        if (house == null) {
            house = new HouseViewModel(session);
        }
        return house;
    }

    public LogImportViewModel logs() {
        if (logs == null) {
            logs = new LogImportViewModel(session, work, fx);
        }
        return logs;
    }

    public CompareViewModel compare() {
        if (compare == null) {
            compare = new CompareViewModel(session, reports());
        }
        return compare;
    }

    /** The Record screen's state: paperwork, instruments, set label, deleting, recycle bin, bundle import. */
    public app.latentledger.ui.paperwork.VisitRecordModel record() {
        if (record == null) {
            record = new app.latentledger.ui.paperwork.VisitRecordModel(session, work, fx);
        }
        return record;
    }

    public ExportViewModel export() {
        if (export == null) {
            export = new ExportViewModel(session, reports());
        }
        return export;
    }

    public ReportViewModel reports() {
        if (reports == null) {
            reports = new ReportViewModel(session, work, fx);
        }
        return reports;
    }

    /** Settings → Office: syncing this tablet's ledger with the office server, off the screen's thread. */
    public app.latentledger.ui.settings.OfficeViewModel office() {
        if (office == null) {
            office = new app.latentledger.ui.settings.OfficeViewModel(
                    () -> new app.latentledger.sync.OfficeSync(session.ledger()),
                    work == Background.DIRECT ? work : app.latentledger.ui.settings.OfficeViewModel.officeThread(), fx);
        }
        return office;
    }

    /** The settings screen's view model, saving through the session so every screen follows. */
    public SettingsViewModel settings() {
        if (settings == null) {
            settings = new SettingsViewModel(new SettingsStore() {
                @Override
                public Settings load() {
                    return session.settings();
                }

                @Override
                public void save(Settings changed) {
                    session.saveSettings(changed);
                }
            });
            session.settingsProperty().addListener((o, a, b) -> settings.showSaved(b));
        }
        return settings;
    }

    /**
     * Builds the charts into the screens that have a slot for one (results, compare) and into those
     * built later. Called after the first frame: drawing a chart is the heaviest part of a screen.
     */
    public void attachCharts() {
        if (chartsAttached) {
            return;
        }
        chartsAttached = true;
        views.forEach(this::wireCharts);
    }

    private void wireCharts(Screen s, Parent v) {
        if (s == Screen.RESULTS) {
            ChartSlots.psychro(((ResultsView) v).chartSlot(), results().chart());
        } else if (s == Screen.COMPARE) {
            ChartSlots.psychro(((CompareView) v).chartSlot(), compare().chart());
        }
    }

    /** Keeps a number typed but not entered (the app is pausing or closing). */
    public void keepPending() {
        if (entry != null) {
            entry.keepPending();
        }
    }

    /** Builds the screens not shown yet, one per pulse, so the first switch to each is instant. */
    public void prepareOtherScreens() {
        for (Screen s : Screen.values()) {
            Platform.runLater(() -> view(s));
        }
    }

    /**
     * The view of a screen (for wiring the chart builds into their slots), built on first use:
     * only the first screen is built before the first frame.
     */
    public Parent view(Screen s) {
        return views.computeIfAbsent(s, k -> {
            Parent v = switch (k) {
                case JOB -> new JobView(job());
                case READINGS -> new ReadingsView(entry(), results());
                case RESULTS -> new ResultsView(results());
                case LOGS -> new LogView(logs());
                case HOUSE -> new HouseView(house());
                case COMPARE -> new CompareView(compare());
                case RECORD -> new app.latentledger.ui.paperwork.VisitRecordView(record());
                case EXPORT -> new ExportView(export());
                case SETTINGS -> new ReflowingSettings(new SettingsView(settings()).withSection(
                        new app.latentledger.ui.settings.OfficeView(office())));
            };
            if (laidOut) {
                ((Reflowing) v).setPortrait(portrait);
            }
            if (chartsAttached) {
                wireCharts(k, v);
            }
            return v;
        });
    }

    /** Lays everything out for an upright (portrait) or a landscape tablet. */
    public void setPortrait(boolean upright) {
        if (laidOut && upright == portrait) {
            return;
        }
        laidOut = true;
        portrait = upright;
        placeNav();
        views.values().forEach(v -> ((Reflowing) v).setPortrait(upright));
    }

    private void fit(Scene scene) {
        setPortrait(scene.getHeight() > scene.getWidth());
    }

    private void placeNav() {
        placeHeader((VBox) getTop());
        rail.getChildren().clear();
        bar.getChildren().clear();
        setLeft(null);
        setBottom(null);
        List<ToggleButton> list = shell.screens().stream().map(navButtons::get).toList();
        if (portrait) {
            bar.getChildren().addAll(list);
            setBottom(bar);
        } else {
            rail.getChildren().addAll(list);
            setLeft(rail);
        }
    }

    private void show(Screen s) {
        setCenter(view(s));
        // a screen opened from another (Record, from Export) lights its way in: Export
        navButtons.get(shell.lit(s)).setSelected(true);
    }

    private VBox header() {
        Label title = Ui.label("Latent Ledger", "app-title");
        Label context = Ui.label("", "context");
        context.setId("context");
        context.textProperty().bind(shell.contextText());
        Button newSet = Ui.button("new-reading-set", "New set", Icons.NEW, shell::newReadingSet);
        ToggleButton theme = new ToggleButton("Dark");
        theme.setId("theme-toggle");
        theme.setGraphic(Icons.THEME.node(24));
        theme.selectedProperty().bindBidirectional(shell.darkProperty());
        HBox right = headerButtons;
        right.getChildren().addAll(newSet, theme);
        right.setAlignment(Pos.CENTER_RIGHT);
        right.setMinWidth(Region.USE_PREF_SIZE);
        title.setMinWidth(Region.USE_PREF_SIZE);
        context.setWrapText(true);
        context.setMinWidth(0);
        HBox.setHgrow(context, Priority.ALWAYS);
        context.setMaxWidth(Double.MAX_VALUE);
        headerTitle = title;
        headerContext = context;
        headerRow.setSpacing(16);
        headerRow.setAlignment(Pos.CENTER_LEFT);
        VBox h = new VBox(headerRow);
        h.getStyleClass().add("header");
        placeHeader(h);
        return h;
    }

    /**
     * Landscape: the app's name, the job in hand, then the buttons, on one row. Upright the name
     * gives its room to the job in hand, so with Settings in the header the job's words still take
     * at most two lines and the screen list stays on screen under the keypad.
     */
    private void placeHeader(VBox h) {
        headerRow.getChildren().clear();
        h.getChildren().setAll(headerRow);
        if (portrait) {
            headerRow.getChildren().addAll(headerContext, headerButtons);
        } else {
            headerRow.getChildren().addAll(headerTitle, headerContext, headerButtons);
        }
    }

    private ToggleButton navButton(Screen s, ToggleGroup group, double iconPx) {
        ToggleButton b = new ToggleButton(s.title());
        b.setId("nav-" + s.key());
        b.setGraphic(icon(s).node(iconPx));
        b.setToggleGroup(group);
        // whole words at any text size: a button never narrower than its label
        b.setMinWidth(Region.USE_PREF_SIZE);
        b.setOnAction(e -> {
            // a tap on the lit button keeps it lit
            b.setSelected(true);
            shell.show(s);
        });
        return b;
    }

    private static Icons icon(Screen s) {
        return switch (s) {
            case JOB -> Icons.JOB;
            case READINGS -> Icons.READINGS;
            case RESULTS -> Icons.RESULTS;
            case LOGS -> Icons.LOGS;
            case HOUSE -> Icons.HOUSE;
            case RECORD -> Icons.NOTE;
            case COMPARE -> Icons.COMPARE;
            case EXPORT -> Icons.EXPORT;
            case SETTINGS -> Icons.SETTINGS;
        };
    }
}
