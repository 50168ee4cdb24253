package app.latentledger.ui.render;

import app.latentledger.Main;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import javax.imageio.ImageIO;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * {@code --data-dir NEW screens --out DIR} on Monocle (the surefire configuration): a new data
 * folder gets the demo, and every screen comes out at the tablet size, landscape and portrait.
 */
class ScreensCommandTest {
    /**
     * Starts the toolkit the TestFX way first: the renderer then finds it running and leaves it
     * running for the UI tests that share this JVM (it only exits a toolkit it started itself).
     */
    @org.junit.jupiter.api.BeforeAll
    static void toolkit() throws Exception {
        org.testfx.api.FxToolkit.registerPrimaryStage();
    }

    @TempDir
    Path data;
    @TempDir
    Path out;

    @Test
    void everyScreenIsDrawnInBothOrientations() throws Exception {
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        ByteArrayOutputStream e = new ByteArrayOutputStream();
        int code = Main.commandLine().run(List.of("--data-dir", data.resolve("new").toString(), "screens", "--out",
                out.toString()), new PrintStream(o, true, StandardCharsets.UTF_8), new PrintStream(e, true, StandardCharsets.UTF_8));
        assertEquals(0, code, e.toString(StandardCharsets.UTF_8));
        for (String screen : List.of("job", "readings", "results", "logs", "compare", "export", "settings")) {
            check(out.resolve(screen + "-landscape.png"), 1280, 800);
            check(out.resolve(screen + "-portrait.png"), 800, 1280);
        }
        check(out.resolve("results-landscape-dark.png"), 1280, 800);
        assertTrue(Files.exists(data.resolve("new").resolve("ledger.db")), "the demo was seeded into the new folder");
        try (app.latentledger.store.Ledger l = app.latentledger.store.Ledger.open(data.resolve("new"))) {
            assertEquals(1, l.logs().idsForVisit(app.latentledger.store.DemoScenario.VISIT_COMPLAINT).size(),
                    "the demo visit got its logger file, once");
        }
    }

    @Test
    void theDemoLogIsTheFieldDataSampleItNames() throws Exception {
        try (var in = DemoLog.class.getResourceAsStream(DemoLog.RESOURCE)) {
            assertTrue(java.util.Arrays.equals(Files.readAllBytes(Path.of("field-data-samples", DemoLog.FILE_NAME)),
                    in.readAllBytes()), "the resource must stay a copy of the invented sample");
        }
    }

    @Test
    void withoutOutTheCommandIsRefused() {
        ByteArrayOutputStream e = new ByteArrayOutputStream();
        int code = Main.commandLine().run(List.of("--data-dir", data.toString(), "screens"),
                new PrintStream(new ByteArrayOutputStream()), new PrintStream(e, true, StandardCharsets.UTF_8));
        assertEquals(2, code);
        assertTrue(e.toString(StandardCharsets.UTF_8).contains("screens needs --out DIR"));
    }

    private static void check(Path png, int width, int height) throws Exception {
        BufferedImage img = ImageIO.read(png.toFile());
        assertEquals(width, img.getWidth(), png.toString());
        assertEquals(height, img.getHeight(), png.toString());
        // not a blank frame: the header's bottom rule and the page background differ
        int top = img.getRGB(width / 2, 5);
        boolean varied = false;
        for (int y = 0; y < height && !varied; y += 7) {
            varied = img.getRGB(width / 3, y) != top;
        }
        assertTrue(varied, png + " is one flat colour");
    }
}
