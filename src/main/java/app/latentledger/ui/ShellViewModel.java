package app.latentledger.ui;

import app.latentledger.ui.job.JobViewModel;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Screen;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Site;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

import java.time.format.DateTimeFormatter;
import java.util.List;

/**
 * The frame's state: the job in hand as the header names it, the screens in the order a visit
 * walks through them, which one is shown, and the theme switch. {@link AppShell} only lays these
 * out.
 */
public final class ShellViewModel {
    private static final DateTimeFormatter DAY = DateTimeFormatter.ofPattern("yyyy-MM-dd");

    private final AppSession session;
    private final ReadOnlyStringWrapper context = new ReadOnlyStringWrapper("");
    /** The Job screen's choice of site and system, once that screen exists; null before. */
    private JobViewModel job;

    public ShellViewModel(AppSession session) {
        this.session = session;
        session.visitProperty().addListener((o, a, b) -> describe());
        session.systemProperty().addListener((o, a, b) -> describe());
        session.screenProperty().addListener((o, a, b) -> describe());
        describe();
    }

    /**
     * "Site · system · purpose date", or "No visit open". On the Job screen, while the site or system
     * picked there is not the open visit's, it names the pick and says no visit is open: the header
     * never names the visit of a site the tech has just left. Every other screen still works on the
     * open visit, so there it names that visit.
     */
    public ReadOnlyStringProperty contextText() {
        return context.getReadOnlyProperty();
    }

    /** Follows the Job screen's site and system picks (the shell calls this when it builds that screen). */
    public void followJob(JobViewModel jobScreen) {
        this.job = jobScreen;
        jobScreen.siteProperty().addListener((o, a, b) -> describe());
        jobScreen.systemProperty().addListener((o, a, b) -> describe());
        describe();
    }

    private void describe() {
        context.set(describeJob());
    }

    /**
     * The screens on the navigation, in the order a visit walks through them: job, readings,
     * results, logs, house, compare, export — seven, so the bar at the bottom of an upright tablet
     * keeps glove-sized buttons with whole words. The Record screen (notes, instruments, sign-off,
     * deleting, recycle bin) is opened from Export; Settings, not a step of a visit, from the header
     * ({@link #headerScreen()}).
     */
    public List<Screen> screens() {
        return java.util.Arrays.stream(Screen.values())
                .filter(s -> s != Screen.RECORD && s != headerScreen()).toList();
    }

    /** The screen reached from the header beside the theme switch rather than from the screen list. */
    public Screen headerScreen() {
        return Screen.SETTINGS;
    }

    /**
     * The button that lights while {@code s} is shown: its own (for Settings, the header's), or
     * Export's for the Record screen opened from Export.
     */
    public Screen lit(Screen s) {
        if (s == headerScreen()) {
            return s;
        }
        return screens().contains(s) ? s : Screen.EXPORT;
    }

    public ReadOnlyObjectProperty<Screen> screenProperty() {
        return session.screenProperty();
    }

    public void show(Screen s) {
        session.screenProperty().set(s);
    }

    /** Starts an empty reading set on the visit and goes to the readings to fill it. */
    public void newReadingSet() {
        session.newReadingSet();
        show(Screen.READINGS);
    }

    /** The theme switch; the session keeps it as a setting for the next start. */
    public BooleanProperty darkProperty() {
        return session.darkProperty();
    }

    /** The saved theme the screens are drawn in: light, dark or outdoor. */
    public javafx.beans.property.ReadOnlyObjectProperty<app.latentledger.core.settings.DisplayTheme> themeProperty() {
        return session.themeProperty();
    }

    private String describeJob() {
        if (job != null && session.screenProperty().get() == Screen.JOB && !pickIsOpenVisit()) {
            Site site = job.siteProperty().get();
            HvacSystem system = job.systemProperty().get();
            if (site != null) {
                return site.name() + "  ·  " + (system == null ? "no system yet" : system.label()) + "  ·  No visit open";
            }
        }
        if (session.visit() == null) {
            return "No visit open";
        }
        return session.site().name() + "  ·  " + session.system().label() + "  ·  "
                + JobViewModel.purposeWord(session.visit().purpose()) + " " + session.visit().startedAt().format(DAY);
    }

    private boolean pickIsOpenVisit() {
        Site site = job.siteProperty().get();
        HvacSystem system = job.systemProperty().get();
        return session.visit() != null && site != null && system != null
                && site.id().equals(session.site().id()) && system.id().equals(session.system().id());
    }
}
