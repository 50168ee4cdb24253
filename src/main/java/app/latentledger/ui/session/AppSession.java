package app.latentledger.ui.session;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Ids;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.records.VisitPurpose;
import app.latentledger.core.settings.DisplayTheme;
import app.latentledger.core.settings.InstrumentTolerances;
import app.latentledger.core.settings.Settings;
import app.latentledger.core.settings.SettingsCatalogue;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.ReadingSetCheck;
import app.latentledger.store.Ledger;
import app.latentledger.store.SettingsConflictException;
import app.latentledger.store.SettingsRepository;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;

import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * The app's state for one run: the ledger, the visit and reading set being worked on, the screen
 * shown, and the tech's stored settings (units, theme, tolerances, thresholds, paper). Every
 * screen's view model reads from it; only it writes to the ledger and the draft store. A change of
 * settings is applied at once: view models that show numbers listen to {@link #unitsProperty()}
 * or {@link #settingsProperty()}.
 *
 * <p>The draft in hand is worked out here, once per change of draft, system or settings, as the
 * read-only {@link #currentCheckProperty() currentCheck}; screens read it and never work the draft
 * out themselves. Keeping a candidate works out its check once: a refusal stops the keep, an
 * acceptance stores the set and becomes the current check as it is.
 */
public final class AppSession implements AutoCloseable {
    private final Ledger ledger;
    private final Path dataFolder;
    private final DraftStore drafts;
    private final LogAnalysisService logAnalysis;
    private final ReadOnlyObjectWrapper<Settings> settings = new ReadOnlyObjectWrapper<>();
    private SettingsRepository.Stamped settingsBase;
    private final ReadOnlyObjectWrapper<UnitSystem> units = new ReadOnlyObjectWrapper<>();
    /** The app opens on what the system in hand is doing; Job and Readings are one tap away. */
    private final ObjectProperty<Screen> screen = new SimpleObjectProperty<>(Screen.RESULTS);
    private final BooleanProperty dark = new SimpleBooleanProperty(false);
    /** The saved theme (light, dark or outdoor); the header's dark switch flips between dark and the last bright one. */
    private final ReadOnlyObjectWrapper<DisplayTheme> theme = new ReadOnlyObjectWrapper<>(DisplayTheme.LIGHT);
    /** The bright theme the dark switch returns to: light or outdoor, whichever was chosen last. */
    private DisplayTheme bright = DisplayTheme.LIGHT;
    private final ReadOnlyObjectWrapper<Site> site = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyObjectWrapper<HvacSystem> system = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyObjectWrapper<Visit> visit = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyObjectWrapper<Draft> draft = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyObjectWrapper<CurrentCheck> currentCheck = new ReadOnlyObjectWrapper<>();
    private final CoilChecker checker;
    /** Checks of stored reading sets (an earlier set, the "before"), valid while system and settings stay. */
    private final Map<ReadingSet, Optional<CoilResult>> storedChecks = new LinkedHashMap<>(16, 0.75f, true) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<ReadingSet, Optional<CoilResult>> eldest) {
            return size() > 16;
        }
    };

    public AppSession(Ledger ledger, Path dataFolder, LogAnalysisService logAnalysis) {
        this(ledger, dataFolder, logAnalysis, CoilChecker.STANDARD);
    }

    /** A session whose coil checks go through {@code checker} (tests count them). */
    public AppSession(Ledger ledger, Path dataFolder, LogAnalysisService logAnalysis, CoilChecker checker) {
        this.ledger = ledger;
        this.dataFolder = dataFolder;
        this.drafts = new FileDraftStore(dataFolder);
        this.logAnalysis = logAnalysis;
        this.checker = checker;
        settingsBase = ledger.settings().loadStamped();
        Settings stored = settingsBase.settings();
        settings.set(stored);
        units.set(stored.units());
        showTheme(stored.theme());
        currentCheck.set(CurrentCheck.nothing(stored.units()));
        settings.addListener((o, a, b) -> {
            units.set(b.units());
            showTheme(b.theme());
            // the check depends on the units (handbook edition, wording) and the thresholds only
            if (a.units() != b.units() || !Objects.equals(a.thresholds(), b.thresholds())) {
                storedChecks.clear();
                workOut();
            }
            if (!Objects.equals(a.tolerances(), b.tolerances())) {
                applyToleranceRule();
            }
        });
        // the header's theme switch is a setting too: keep it for the next start
        dark.addListener((o, a, b) -> {
            DisplayTheme wanted = b ? DisplayTheme.DARK : bright;
            if (settings.get().theme() != wanted) {
                saveSettings(settings.get().withChoice(SettingsCatalogue.THEME, wanted.key()));
            }
        });
        // another program (the command line) may change settings while the app runs: look on every screen change
        screen.addListener((o, a, b) -> {
            reloadSettingsIfChanged();
            // instruments are ticked for a set on the Record screen: the readings' ± follow them
            applyToleranceRule();
        });
        openLatestVisit();
    }

    /**
     * Takes the stored settings again when another program changed them since they were loaded or
     * saved here, so the screens show them and the next save starts from them.
     *
     * @return true when they had changed
     */
    public boolean reloadSettingsIfChanged() {
        if (ledger.settings().version().equals(settingsBase.version())) {
            return false;
        }
        settingsBase = ledger.settings().loadStamped();
        settings.set(settingsBase.settings());
        return true;
    }

    /** Opens the ledger in {@code dataFolder} (seeding the demo when empty) with its stored settings. */
    public static AppSession open(Path dataFolder, LogAnalysisService logAnalysis) {
        return new AppSession(Ledger.open(dataFolder, Ledger.FirstRun.SEED_DEMO), dataFolder, logAnalysis);
    }

    /** Stores changed settings and applies them to every screen. */
    public void saveSettings(Settings changed) {
        try {
            // only what changed here is written; changes saved elsewhere meanwhile are kept
            settingsBase = ledger.settings().save(settingsBase, changed);
        } catch (SettingsConflictException e) {
            settingsBase = ledger.settings().loadStamped();
            settings.set(settingsBase.settings());
            throw e;
        }
        settings.set(settingsBase.settings());
    }

    /**
     * The ± a value freshly typed in {@code slot} gets: the one rule ({@link Tolerancing}), from the
     * stated accuracy of the instruments ticked for the set in hand over the tech's instrument
     * settings (which start from the one default table).
     *
     * @param valueSi the value typed, SI (an RH reading's ± depends on where it lies)
     */
    public double defaultToleranceSi(Slot slot, String choice, double valueSi) {
        return Tolerancing.of(tolerancesOfSet(), slot, choice, valueSi);
    }

    /** The tolerances readings of the set in hand start from: its ticked instruments' over the settings'. */
    public InstrumentTolerances tolerancesOfSet() {
        Draft d = draft.get();
        return d == null ? settings.get().tolerances() : tolerancesOf(d);
    }

    /**
     * Gives every reading of the set in hand whose ± the tech did not type the rule's ± again (the
     * instruments ticked for the set or the instrument settings changed), and keeps the draft when
     * anything changed.
     *
     * @return true when a tolerance changed
     */
    public boolean applyToleranceRule() {
        Draft d = draft.get();
        if (d == null) {
            return false;
        }
        Draft ruled = Tolerancing.apply(d, tolerancesOfSet());
        if (ruled.equals(d)) {
            return false;
        }
        try {
            keep(ruled);
            return true;
        } catch (RuntimeException e) {
            // a draft the rule's tolerances would make refused stays as it was; typing shows why
            return false;
        }
    }

    /** The visit with a draft in progress, else the newest visit. */
    private void openLatestVisit() {
        List<Visit> all = ledger.visits().all();
        Optional<Visit> inProgress = all.stream().filter(v -> !drafts.forVisit(v.id()).isEmpty()).findFirst();
        inProgress.or(() -> all.stream().findFirst()).ifPresent(this::openVisit);
    }

    /** Makes {@code v} the visit worked on, with its draft in progress or its latest reading set. */
    public void openVisit(Visit v) {
        site.set(ledger.sites().find(v.siteId()).orElseThrow());
        system.set(ledger.systems().find(v.systemId()).orElseThrow());
        visit.set(v);
        storedChecks.clear();
        List<String> kept = drafts.forVisit(v.id());
        if (!kept.isEmpty()) {
            openReadingSet(kept.get(0));
            return;
        }
        List<ReadingSet> sets = ledger.readings().forVisit(v.id());
        show(sets.isEmpty() ? Draft.empty(Ids.newId(), v.id())
                : DraftRecords.fromReadingSet(sets.get(sets.size() - 1)));
    }

    /** Opens one reading set of the current visit: its kept draft if any, else the stored record. */
    public void openReadingSet(String readingSetId) {
        Optional<ReadingSet> stored = ledger.readings().find(readingSetId);
        Optional<Draft> kept = drafts.find(readingSetId);
        Draft d = kept.map(k -> k.onBase(stored.orElse(null)))
                .orElseGet(() -> stored.map(DraftRecords::fromReadingSet)
                        .orElseGet(() -> Draft.empty(readingSetId, visit.get().id())));
        show(d);
    }

    /** Starts an empty reading set on the current visit (e.g. the "after" set). */
    public void newReadingSet() {
        show(Draft.empty(Ids.newId(), visit.get().id()));
    }

    /** Starts a visit now and opens it with an empty reading set. */
    public Visit startVisit(Site s, HvacSystem sys, VisitPurpose purpose,
                            String technician, String notes) {
        Visit v = new Visit(Ids.newId(), s.id(), sys.id(), OffsetDateTime.now(), technician, purpose, notes);
        ledger.visits().save(v);
        site.set(s);
        system.set(sys);
        visit.set(v);
        storedChecks.clear();
        show(Draft.empty(Ids.newId(), v.id()));
        return v;
    }

    /**
     * Keeps a candidate draft. Its check is worked out once: when the record or the coil check
     * refuses it, nothing is kept and the refusal is thrown; otherwise first the draft file (so
     * nothing typed is lost), then, once it makes a reading set, that record in the ledger in its
     * own transaction, and the same check becomes {@link #currentCheckProperty() the current one}.
     *
     * @throws app.latentledger.core.InvalidInputException naming field, value and accepted range
     * @throws app.latentledger.core.records.InvalidRecordException when the record refuses it
     */
    public void keep(Draft d) {
        Draft ruled = Tolerancing.apply(d, tolerancesOf(d));
        Draft timed = DraftRecords.complete(ruled) && ruled.takenAt() == null ? ruled.takenAt(OffsetDateTime.now()) : ruled;
        CurrentCheck c = workOut(timed, OffsetDateTime.now());
        if (c.refused()) {
            throw c.refusedBy();
        }
        drafts.save(timed);
        if (c.readings() != null) {
            ledger.readings().save(c.readings());
        }
        draft.set(timed);
        currentCheck.set(c);
    }

    private InstrumentTolerances tolerancesOf(Draft d) {
        return Tolerancing.forSet(settings.get().tolerances(), ledger.instruments().usedOn(d.readingSetId()));
    }

    /** Saves a changed system (e.g. its nominal size typed on the pad). */
    public void keep(HvacSystem changed) {
        ledger.systems().save(changed);
        system.set(changed);
        storedChecks.clear();
        workOut();
    }

    /**
     * The coil check of a stored reading set of this system (an earlier set to compare with, the
     * visit's "before"), or null when it lacks what the check needs or is refused. Kept while the
     * system and the settings stay the same, so typing on the pad never works an old set out again.
     */
    public CoilResult checkOf(ReadingSet rs) {
        if (system.get() == null || site.get() == null || !ReadingSetCheck.missing(rs).isEmpty()) {
            return null;
        }
        return storedChecks.computeIfAbsent(rs, r -> {
            try {
                return Optional.of(checker.check(r, system.get(), site.get(), thresholds(), units()));
            } catch (IllegalArgumentException e) {
                return Optional.empty();
            }
        }).orElse(null);
    }

    /** The draft in hand, worked out: read-only; it changes with the draft, the system and the settings. */
    public ReadOnlyObjectProperty<CurrentCheck> currentCheckProperty() {
        return currentCheck.getReadOnlyProperty();
    }

    public CurrentCheck currentCheck() {
        return currentCheck.get();
    }

    /** Shows another draft and works it out, once. */
    private void show(Draft d) {
        draft.set(d);
        workOut();
    }

    private void workOut() {
        currentCheck.set(draft.get() == null || system.get() == null ? CurrentCheck.nothing(units())
                : workOut(draft.get(), OffsetDateTime.now()));
    }

    private CurrentCheck workOut(Draft d, OffsetDateTime now) {
        return CurrentCheck.of(d, site.get(), system.get(), thresholds(), units(), checker, now);
    }

    public void addSite(Site s) {
        ledger.sites().save(s);
    }

    /**
     * Stores a corrected site (same id). When it is the site in hand, the visit is opened again so
     * its checks use the new elevation and the header shows the new name.
     */
    public void correctSite(Site s) {
        ledger.sites().save(s);
        if (site.get() != null && site.get().id().equals(s.id()) && visit.get() != null) {
            openVisit(visit.get());
        }
    }

    /**
     * After records went to or came back from the recycle bin: when the visit in hand is gone, the
     * latest remaining visit is opened instead, so no screen shows a record that is no longer there.
     */
    public void recordsChanged() {
        storedChecks.clear();
        Visit v = visit.get();
        if (v != null && ledger.visits().find(v.id()).isEmpty()) {
            openLatestVisit();
        }
    }

    public void addSystem(HvacSystem s) {
        ledger.systems().save(s);
    }

    /** Reading sets of every visit to the current system, oldest first, for comparing. */
    public List<ReadingSet> readingSetsOfSystem() {
        if (system.get() == null) {
            return List.of();
        }
        return ledger.visits().forSite(site.get().id()).stream()
                .filter(v -> v.systemId().equals(system.get().id()))
                .flatMap(v -> ledger.readings().forVisit(v.id()).stream())
                .sorted(Comparator.comparing(ReadingSet::takenAt))
                .toList();
    }

    public Ledger ledger() {
        return ledger;
    }

    public Path dataFolder() {
        return dataFolder;
    }

    public UnitSystem units() {
        return units.get();
    }

    /** The units the tech reads and types; changes when the setting does. */
    public ReadOnlyObjectProperty<UnitSystem> unitsProperty() {
        return units.getReadOnlyProperty();
    }

    /** The finding thresholds of the settings (the indoor RH target included). */
    public ThresholdSettings thresholds() {
        return settings.get().thresholds();
    }

    public Settings settings() {
        return settings.get();
    }

    /** Read-only to screens: change settings through {@link #saveSettings}. */
    public ReadOnlyObjectProperty<Settings> settingsProperty() {
        return settings.getReadOnlyProperty();
    }

    public LogAnalysisService logAnalysis() {
        return logAnalysis;
    }

    public ObjectProperty<Screen> screenProperty() {
        return screen;
    }

    public BooleanProperty darkProperty() {
        return dark;
    }

    /** The saved theme: light, dark or outdoor (high contrast for direct sun). */
    public ReadOnlyObjectProperty<DisplayTheme> themeProperty() {
        return theme.getReadOnlyProperty();
    }

    private void showTheme(DisplayTheme t) {
        if (t != DisplayTheme.DARK) {
            bright = t;
        }
        theme.set(t);
        dark.set(t == DisplayTheme.DARK);
    }

    public ReadOnlyObjectProperty<Site> siteProperty() {
        return site.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<HvacSystem> systemProperty() {
        return system.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<Visit> visitProperty() {
        return visit.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<Draft> draftProperty() {
        return draft.getReadOnlyProperty();
    }

    public Site site() {
        return site.get();
    }

    public HvacSystem system() {
        return system.get();
    }

    public Visit visit() {
        return visit.get();
    }

    public Draft draft() {
        return draft.get();
    }

    @Override
    public void close() {
        ledger.close();
    }
}
