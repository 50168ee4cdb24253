package app.latentledger.ui.settings;

import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.settings.Settings;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.Ledger;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.Scene;
import javafx.scene.control.ButtonBase;
import javafx.scene.control.Label;
import javafx.scene.control.Labeled;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextField;
import javafx.scene.image.PixelReader;
import javafx.scene.image.WritableImage;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

import javax.imageio.ImageIO;
import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The settings screen driven headless (TestFX + Monocle) as a tech would use it, and photographed. */
@ExtendWith(ApplicationExtension.class)
class SettingsViewTest {
    private static final String HIGH = Thresholds.COIL_HIGH_AIRFLOW_PER_TON.key();

    @TempDir
    static Path dir;

    private Stage stage;
    private Ledger ledger;

    @Start
    void start(Stage stage) throws IOException {
        this.stage = stage;
        Path folder = Files.createTempDirectory(dir, "tablet");
        ledger = Ledger.open(folder);
        stage.setScene(new Scene(SettingsScreen.create(ledger), 1280, 800));
        stage.show();
    }

    @AfterEach
    void close() {
        ledger.close();
    }

    private double storedHigh() {
        return Quantity.AIRFLOW_PER_CAPACITY.toDisplay(UnitSystem.IP,
                ledger.settings().load().thresholds().valueSi(Thresholds.COIL_HIGH_AIRFLOW_PER_TON));
    }

    private void type(FxRobot robot, String id, String text) {
        TextField field = robot.lookup("#" + id).queryAs(TextField.class);
        robot.interact(() -> ((ScrollPane) ((javafx.scene.layout.BorderPane) stage.getScene().getRoot()).getCenter())
                .setVvalue(field.localToScene(0, 0).getY() / stage.getScene().getRoot().getBoundsInLocal().getHeight()));
        robot.interact(() -> {
            field.requestFocus();
            field.selectAll();
        });
        robot.write(text);
        robot.type(KeyCode.ENTER);
    }

    @Test
    void changingAThresholdSavesItAndARefusedValueShowsItsMessage(FxRobot robot) {
        type(robot, "setting-" + HIGH, "400");
        assertEquals(400, storedHigh(), 1e-9, "saved on Enter");
        assertTrue(robot.lookup("#status").queryAs(Label.class).getText().startsWith("Saved"));

        type(robot, "setting-" + HIGH, "700");
        Label message = robot.lookup("#message-" + HIGH).queryAs(Label.class);
        assertEquals("airflow per ton above which latent removal suffers 700 cfm/ton refused: accepted range 225 to"
                + " 675 cfm/ton", message.getText());
        assertTrue(message.isVisible());
        assertEquals("400", robot.lookup("#setting-" + HIGH).queryAs(TextField.class).getText());
        assertEquals(400, storedHigh(), 1e-9, "the refused value changed nothing");

        robot.interact(() -> robot.lookup("#choice-theme-dark").queryAs(ButtonBase.class).fire());
        assertEquals(Settings.DEFAULTS.withChoice("theme", "dark").theme(), ledger.settings().load().theme());
        assertTrue(stage.getScene().getRoot().getStyleClass().contains("dark"));
    }

    @Test
    void touchTargetsAndTextAreLargeEnough(FxRobot robot) {
        robot.interact(() -> stage.getScene().getRoot().applyCss());
        robot.interact(() -> stage.getScene().getRoot().layout());
        List<String> small = new ArrayList<>();
        collect(stage.getScene().getRoot(), small);
        assertTrue(small.isEmpty(), String.join("\n", small));
    }

    private static void collect(Node n, List<String> small) {
        if ((n instanceof ButtonBase || n instanceof TextField) && n.isVisible()) {
            double h = n.getLayoutBounds().getHeight();
            if (h < 48) {
                small.add(n.getId() + " is " + h + " px tall");
            }
        }
        if (n instanceof Labeled && ((Labeled) n).getFont().getSize() < 16) {
            small.add(n.getId() + " text " + ((Labeled) n).getFont().getSize() + " px");
        }
        if (n instanceof TextField && ((TextField) n).getFont().getSize() < 18) {
            small.add(n.getId() + " field text " + ((TextField) n).getFont().getSize() + " px");
        }
        if (n instanceof Parent) {
            for (Node c : ((Parent) n).getChildrenUnmodifiable()) {
                collect(c, small);
            }
        }
    }

    /**
     * Saves snapshots to target/screens for a person to look at, and checks what a person would see
     * first: the light page is light and the dark theme really turns the page dark (mean relative
     * luminance, ITU-R BT.709 weights, over a grid of pixels).
     */
    @Test
    void screenshotsForAPersonToLookAt(FxRobot robot) throws IOException {
        WritableImage light = save(robot, "settings-light");
        type(robot, "setting-" + HIGH, "700");
        robot.interact(() -> ((ScrollPane) ((javafx.scene.layout.BorderPane) stage.getScene().getRoot()).getCenter())
                .setVvalue(0.25));
        save(robot, "settings-refused");
        robot.interact(() -> ((ScrollPane) ((javafx.scene.layout.BorderPane) stage.getScene().getRoot()).getCenter())
                .setVvalue(0.6));
        save(robot, "settings-thresholds");
        robot.interact(() -> ((ScrollPane) ((javafx.scene.layout.BorderPane) stage.getScene().getRoot()).getCenter())
                .setVvalue(1));
        save(robot, "settings-office");
        robot.interact(() -> robot.lookup("#choice-theme-dark").queryAs(ButtonBase.class).fire());
        robot.interact(() -> ((ScrollPane) ((javafx.scene.layout.BorderPane) stage.getScene().getRoot()).getCenter())
                .setVvalue(0));
        WritableImage dark = save(robot, "settings-dark");
        double l = meanLuminance(light);
        double d = meanLuminance(dark);
        assertTrue(l > 0.6, "the light page is mostly light: " + l);
        assertTrue(d < 0.4, "the dark theme turns the page dark: " + d);
    }

    private static double meanLuminance(WritableImage img) {
        PixelReader px = img.getPixelReader();
        double sum = 0;
        int n = 0;
        for (int y = 0; y < (int) img.getHeight(); y += 8) {
            for (int x = 0; x < (int) img.getWidth(); x += 8) {
                javafx.scene.paint.Color c = px.getColor(x, y);
                sum += 0.2126 * c.getRed() + 0.7152 * c.getGreen() + 0.0722 * c.getBlue();
                n++;
            }
        }
        return sum / n;
    }

    private WritableImage save(FxRobot robot, String name) throws IOException {
        AtomicReference<WritableImage> img = new AtomicReference<>();
        robot.interact(() -> {
            stage.getScene().getRoot().layout();
            img.set(stage.getScene().snapshot(null));
        });
        File out = new File("target/screens");
        out.mkdirs();
        ImageIO.write(SwingFXUtils.fromFXImage(img.get(), null), "png", new File(out, name + ".png"));
        assertEquals(1280, (int) img.get().getWidth());
        assertEquals(800, (int) img.get().getHeight());
        return img.get();
    }
}
