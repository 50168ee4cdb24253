package app.latentledger.ui.render;

import app.latentledger.store.DemoScenario;
import app.latentledger.ui.AppShell;
import app.latentledger.ui.log.CycleLogAnalysis;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import app.latentledger.ui.session.LogAnalysisService;
import app.latentledger.ui.session.Screen;
import javafx.application.Platform;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.Scene;
import javafx.scene.image.WritableImage;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import javax.imageio.ImageIO;

/**
 * The {@code screens} command's renderer: each main screen in a scene of the tablet's size,
 * snapshot to PNG. On the demo it opens the complaint visit, whose before and after
 * reading sets show every screen with something on it, and gives it a demo logger file
 * ({@link DemoLog}) for the log screen. The charts are built before the snapshots, and slow jobs
 * run on the calling thread so each screen is complete when it is drawn. Also draws the results
 * screen in the dark theme.
 */
public final class PngScreens {
    /** Landscape and portrait tablet sizes the layouts are designed for. */
    static final int LONG_SIDE = 1280;
    static final int SHORT_SIDE = 800;

    /**
     * Renders every main screen of the app on the ledger in {@code dataFolder} (seeded with the
     * demo when empty) to PNG files in {@code outDir}, landscape and portrait.
     *
     * @return the files written
     */
    public List<Path> render(Path dataFolder, Path outDir) throws Exception {
        Files.createDirectories(outDir);
        boolean started = startToolkit();
        CompletableFuture<List<Path>> done = new CompletableFuture<>();
        Platform.runLater(() -> {
            try {
                done.complete(renderAll(dataFolder, outDir));
            } catch (Throwable t) {
                done.completeExceptionally(t);
            }
        });
        try {
            return done.get(120, TimeUnit.SECONDS);
        } finally {
            if (started) {
                Platform.exit();
            }
        }
    }

    /** Renders on the FX thread; usable from a test that already runs the toolkit. */
    public static List<Path> renderAll(Path dataFolder, Path outDir) {
        List<Path> files = new ArrayList<>();
        try (AppSession session = AppSession.open(dataFolder, LogAnalysisService.find(new CycleLogAnalysis()))) {
            try {
                DemoLog.seed(session);
            } catch (Exception e) {
                throw new IllegalStateException("cannot import the demo log: " + e.getMessage(), e);
            }
            session.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).ifPresent(session::openVisit);
            session.darkProperty().set(false);
            AppShell shell = new AppShell(session, Background.DIRECT, Background.DIRECT);
            shell.attachCharts();
            Scene previous = null;
            for (boolean portrait : new boolean[] {false, true}) {
                if (previous != null) {
                    previous.setRoot(new javafx.scene.layout.Pane());
                }
                // a scene of its own per orientation: its size is the tablet's, with no window around it
                Scene scene = shell.scene(portrait ? SHORT_SIDE : LONG_SIDE, portrait ? LONG_SIDE : SHORT_SIDE);
                previous = scene;
                for (Screen s : Screen.values()) {
                    showcase(session, s);
                    session.screenProperty().set(s);
                    files.add(write(scene, outDir.resolve(s.key() + (portrait ? "-portrait" : "-landscape") + ".png")));
                }
                session.darkProperty().set(true);
                showcase(session, Screen.RESULTS);
                session.screenProperty().set(Screen.RESULTS);
                files.add(write(scene, outDir.resolve("results-" + (portrait ? "portrait" : "landscape") + "-dark.png")));
                session.darkProperty().set(false);
                if (!portrait) {
                    // the outdoor theme for direct sun, then back to what was saved
                    var saved = session.settings();
                    session.saveSettings(saved.withChoice(app.latentledger.core.settings.SettingsCatalogue.THEME,
                            "outdoor"));
                    files.add(write(scene, outDir.resolve("results-landscape-outdoor.png")));
                    session.saveSettings(session.settings().withChoice(
                            app.latentledger.core.settings.SettingsCatalogue.THEME, saved.theme().key()));
                }
            }
        }
        return files;
    }

    /**
     * On the demo, the results screen shows the "before" set (a coil that does not dry, with its
     * findings) and every other screen the "after" set (so compare has a before to show).
     */
    private static void showcase(AppSession session, Screen s) {
        if (session.visit() == null || !session.visit().id().equals(DemoScenario.VISIT_COMPLAINT)) {
            return;
        }
        session.openReadingSet(s == Screen.RESULTS ? DemoScenario.READINGS_BEFORE : DemoScenario.READINGS_AFTER);
    }

    private static Path write(Scene scene, Path file) {
        WritableImage img = scene.snapshot(null);
        try {
            ImageIO.write(SwingFXUtils.fromFXImage(img, null), "png", file.toFile());
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file, e);
        }
        return file;
    }

    /** Starts JavaFX unless it already runs (a test); true when this call started it. */
    private static boolean startToolkit() throws InterruptedException {
        CountDownLatch ready = new CountDownLatch(1);
        boolean started = true;
        try {
            Platform.startup(ready::countDown);
        } catch (IllegalStateException alreadyRunning) {
            started = false;
            ready.countDown();
        }
        if (started) {
            Platform.setImplicitExit(false);
        }
        ready.await(30, TimeUnit.SECONDS);
        return started;
    }
}
