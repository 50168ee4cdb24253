package app.latentledger.ui;

import app.latentledger.ui.job.JobViewModel;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Screen;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.StringBinding;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ReadOnlyObjectProperty;

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
    private final StringBinding context;

    public ShellViewModel(AppSession session) {
        this.session = session;
        context = Bindings.createStringBinding(this::describeJob, session.visitProperty(), session.systemProperty());
    }

    /** "Site · system · purpose date", or "No visit open". */
    public StringBinding contextText() {
        return context;
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
        if (session.visit() == null) {
            return "No visit open";
        }
        return session.site().name() + "  ·  " + session.system().label() + "  ·  "
                + JobViewModel.purposeWord(session.visit().purpose()) + " " + session.visit().startedAt().format(DAY);
    }
}
