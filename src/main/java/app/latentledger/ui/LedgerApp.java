package app.latentledger.ui;

import app.latentledger.store.DataLocation;
import app.latentledger.ui.log.CycleLogAnalysis;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.LogAnalysisService;
import javafx.animation.AnimationTimer;
import javafx.application.Application;
import javafx.geometry.Dimension2D;
import javafx.scene.Scene;
import javafx.stage.Stage;

import java.lang.management.ManagementFactory;
import java.nio.file.Path;
import java.util.concurrent.CompletableFuture;

/**
 * The tablet app. Opens the ledger where {@link DataLocation} says (so {@code --data-dir} works as
 * for the commands; a new folder gets the Saltreed demo), on the visit in progress.
 *
 * <p>Start-up: the ledger opens while the toolkit starts, only the first screen is built before the
 * first frame, the others right after it. With {@code -Dlatentledger.timing=true} it prints when
 * each step was reached, in ms after the JVM started.
 */
public final class LedgerApp extends Application {
    /**
     * The ledger opened while the JavaFX toolkit starts: loading SQLite's native library and
     * checking the schema take about as long as the toolkit, and the two need not wait for
     * each other. Null when the app was launched some other way.
     */
    private static volatile CompletableFuture<AppSession> opening;

    private AppSession session;
    private AppShell shell;

    /** Called from the plain {@code Main} so a class-path launch finds the JavaFX runtime. */
    public static void launchWith(String[] args) {
        opening = CompletableFuture.supplyAsync(() -> openSession(args));
        Application.launch(LedgerApp.class, args);
    }

    /**
     * Opens the ledger and the visit in progress, off the FX thread while the toolkit is still
     * starting. The session works the open reading set out as it opens ({@link
     * AppSession#currentCheck()}), so the core's classes are loaded here and the first screen shows
     * that very check instead of working it out again.
     */
    private static AppSession openSession(String[] args) {
        Path dataDir = DataLocation.dataDirOption(args);
        return AppSession.open(DataLocation.resolve(dataDir).folder(), LogAnalysisService.find(new CycleLogAnalysis()));
    }

    @Override
    public void start(Stage stage) {
        mark("toolkit started");
        CompletableFuture<AppSession> started = opening;
        session = started != null ? started.join()
                : openSession(getParameters().getRaw().toArray(new String[0]));
        mark("ledger open");
        shell = new AppShell(session);
        mark("first screen built");
        Dimension2D size = TabletPlatform.windowSize();
        Scene scene = shell.scene(size.getWidth(), size.getHeight());
        stage.setTitle("Latent Ledger");
        stage.setScene(scene);
        // typed but not yet entered: keep it if it is a valid reading
        stage.setOnCloseRequest(e -> shell.keepPending());
        afterFirstFrame(shell);
        stage.show();
        mark("shown");
    }

    @Override
    public void stop() {
        if (session != null) {
            session.close();
        }
    }

    private static void mark(String what) {
        if (Boolean.getBoolean("latentledger.timing")) {
            System.out.println(what + " " + sinceJvmStart() + " ms after JVM start");
        }
    }

    private static long sinceJvmStart() {
        return System.currentTimeMillis() - ManagementFactory.getRuntimeMXBean().getStartTime();
    }

    private static void afterFirstFrame(AppShell shell) {
        new AnimationTimer() {
            private int pulses;

            @Override
            public void handle(long now) {
                // the second pulse runs after the first frame has been rendered
                if (++pulses == 2) {
                    mark("first frame");
                    stop();
                    // nothing can pause an app that has not drawn yet: ask for the event now
                    TabletPlatform.onPause(shell::keepPending);
                    // the first screen's chart next, then the other screens, one per pulse
                    javafx.application.Platform.runLater(shell::attachCharts);
                    shell.prepareOtherScreens();
                }
            }
        }.start();
    }
}
