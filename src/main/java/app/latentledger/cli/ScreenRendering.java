package app.latentledger.cli;

import java.nio.file.Path;
import java.util.List;

/**
 * Draws the app's screens to image files. The command line must run without JavaFX, so it only
 * knows this interface; {@link ScreensCommand} finds the JavaFX implementation by name at run
 * time ({@value ScreensCommand#RENDERER}).
 */
public interface ScreenRendering {
    /**
     * Renders every main screen of the app on the ledger in {@code dataFolder} (seeded with the
     * demo when empty) to PNG files in {@code outDir}, landscape and portrait.
     *
     * @return the files written
     */
    List<Path> render(Path dataFolder, Path outDir) throws Exception;
}
