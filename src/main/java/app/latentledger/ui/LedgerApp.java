package app.latentledger.ui;

import app.latentledger.store.DataLocation;
import app.latentledger.ui.log.LogAnalysisService;
import javafx.animation.AnimationTimer;
import javafx.application.Application;
import javafx.geometry.Dimension2D;
import javafx.scene.Scene;
import javafx.stage.Stage;

import java.lang.management.ManagementFactory;
import java.nio.file.Path;

/**
 * The tablet app. Opens the ledger where {@link DataLocation} says (so {@code --data-dir} works as
 * for the commands; a new folder gets the Saltreed demo), on the visit in progress.
 *
 * <p>Start-up timing: with {@code -Dlatentledger.timing=true} it prints, once, how long after the
 * JVM started the first frame was drawn.
 */
public final class LedgerApp extends Application {
    private AppSession session;
    private AppShell shell;

    /** Called from the plain {@code Main} so a class-path launch finds the JavaFX runtime. */
    public static void launchWith(String[] args) {
        Application.launch(LedgerApp.class, args);
    }

    @Override
    public void start(Stage stage) {
        Path dataDir = DataLocation.dataDirOption(getParameters().getRaw().toArray(new String[0]));
        session = AppSession.open(DataLocation.resolve(dataDir).folder(), LogAnalysisService.find());
        shell = new AppShell(session);
        Dimension2D size = TabletPlatform.windowSize();
        Scene scene = shell.scene(size.getWidth(), size.getHeight());
        stage.setTitle("Latent Ledger");
        stage.setScene(scene);
        // typed but not yet entered: keep it if it is a valid reading
        TabletPlatform.onPause(() -> shell.entry().keepPending());
        stage.setOnCloseRequest(e -> shell.entry().keepPending());
        if (Boolean.getBoolean("latentledger.timing")) {
            reportFirstFrame();
        }
        stage.show();
    }

    @Override
    public void stop() {
        if (session != null) {
            session.close();
        }
    }

    private static void reportFirstFrame() {
        new AnimationTimer() {
            private int pulses;

            @Override
            public void handle(long now) {
                // the second pulse runs after the first frame has been rendered
                if (++pulses == 2) {
                    long ms = System.currentTimeMillis() - ManagementFactory.getRuntimeMXBean().getStartTime();
                    System.out.println("first frame " + ms + " ms after JVM start");
                    stop();
                }
            }
        }.start();
    }
}
