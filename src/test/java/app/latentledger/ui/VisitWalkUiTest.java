package app.latentledger.ui;

import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import app.latentledger.ui.session.Screen;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.control.Labeled;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

import java.nio.file.Path;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A whole visit walked by taps only, headless (TestFX + Monocle): start the visit, enter readings on
 * the pad, watch the verdict, have an out-of-range value refused, close the app and open it again
 * on the same data folder. The verdicts expected are the coil check's rule (CoilVerdict) on the
 * demo's before/after readings (DemoScenario): the "before" coil cools without drying; a colder
 * coil alone is not yet proof; with the "after" supply readings the coil dries the air.
 */
@ExtendWith(ApplicationExtension.class)
class VisitWalkUiTest {
    @TempDir
    static Path dir;

    private Stage stage;
    private AppSession session;

    @Start
    void start(Stage stage) {
        this.stage = stage;
        open();
        stage.show();
    }

    @AfterEach
    void close() {
        if (session != null) {
            session.close();
        }
    }

    private void open() {
        session = TestSessions.open(dir);
        AppShell shell = new AppShell(session, Background.DIRECT, Background.DIRECT);
        // as the app does after its first frame: the charts and their buttons are on screen too
        shell.attachCharts();
        stage.setScene(shell.scene(1280, 800));
        // the primary stage is shared between tests: put it back to the landscape tablet size
        stage.setWidth(1280);
        stage.setHeight(800);
    }

    @Test
    void aVisitByTapsIsKeptAcrossARestart(FxRobot robot) {
        robot.clickOn("#nav-job");
        robot.clickOn("#technician");
        robot.interact(() -> robot.lookup("#technician").queryAs(javafx.scene.control.TextField.class).clear());
        robot.write("Pat Quill");
        robot.clickOn("#start-visit");
        assertEquals(Screen.READINGS, session.screenProperty().get());

        enter(robot, "return-dry-bulb", "76");
        enter(robot, "return-humidity", "66");
        enter(robot, "supply-dry-bulb", "66.5");
        enter(robot, "supply-humidity", "62.8");
        robot.clickOn("#slot-coil-temperature");
        assertEquals(app.latentledger.core.findings.Cautions.BEFORE_COIL_READINGS, text(robot, "#pad-message"));
        robot.clickOn("#choice-evaporator-saturation");
        enter(robot, "coil-temperature", "64");
        enter(robot, "airflow", "1410");
        assertEquals("not-dehumidifying", text(robot, "#live-verdict-key"));

        enter(robot, "coil-temperature", "46");
        assertEquals("cant-tell", text(robot, "#live-verdict-key"));
        enter(robot, "return-dry-bulb", "75");
        enter(robot, "return-humidity", "65");
        // wet bulb first: 57 °F dry bulb under the old 62.8 °F wet bulb would be refused, rightly
        enter(robot, "supply-humidity", "55");
        enter(robot, "supply-dry-bulb", "57");
        enter(robot, "airflow", "1080");
        assertEquals("dehumidifying", text(robot, "#live-verdict-key"));
        assertEquals("Dehumidifying", text(robot, "#live-verdict-word"));

        // out of range: refused with its message, the kept value stays
        enter(robot, "return-dry-bulb", "250");
        assertEquals("Not saved: return dry bulb 250 °F refused: accepted range -58 to 203 °F",
                text(robot, "#pad-message"));
        assertEquals("75.0", text(robot, "#value-return-dry-bulb"));

        robot.clickOn("#nav-results");
        assertEquals("dehumidifying", text(robot, "#verdict-key"));
        assertTrue(robot.lookup("#psychro-chart-slot #psychro-canvas").tryQuery().isPresent(),
                "the psychrometric chart sits in the results screen's slot");
        assertEquals(app.latentledger.core.findings.Cautions.SAFETY_LINE, text(robot, "#safety-line"));

        // close the app and open it again on the same data folder
        robot.interact(() -> {
            session.close();
            open();
        });
        robot.clickOn("#nav-readings");
        assertEquals("75.0", text(robot, "#value-return-dry-bulb"));
        assertEquals("65.0", text(robot, "#value-return-humidity"));
        assertEquals("57.0", text(robot, "#value-supply-dry-bulb"));
        assertEquals("55.0", text(robot, "#value-supply-humidity"));
        assertEquals("46.0", text(robot, "#value-coil-temperature"));
        assertEquals("± 1.8 °F", text(robot, "#tolerance-coil-temperature"));
        assertEquals("1,080", text(robot, "#value-airflow"));
        assertEquals("dehumidifying", text(robot, "#live-verdict-key"));
        assertEquals("Pat Quill", session.visit().technician());
    }

    @Test
    void everyTargetIsAtLeast48PxAndTextAtLeast18Px(FxRobot robot) {
        for (Screen s : Screen.values()) {
            robot.interact(() -> session.screenProperty().set(s));
            Set<Node> targets = robot.lookup(".button").queryAll();
            targets.addAll(robot.lookup(".toggle-button").queryAll());
            targets.addAll(robot.lookup(".text-field").queryAll());
            for (Node n : targets) {
                if (n.isVisible() && n.getScene() != null && n.getParent() != null) {
                    var b = n.getBoundsInLocal();
                    assertTrue(b.getHeight() >= 48 && b.getWidth() >= 48,
                            s + " " + n.getId() + " is " + b.getWidth() + " × " + b.getHeight());
                }
            }
            for (Node n : robot.lookup(".label").queryAll()) {
                if (n instanceof Labeled l && n.isVisible()) {
                    assertTrue(l.getFont().getSize() >= 16, s + " label '" + l.getText() + "' at " + l.getFont().getSize());
                }
            }
        }
        Label any = robot.lookup("#context").queryAs(Label.class);
        assertTrue(any.getFont().getSize() >= 18, "base font " + any.getFont().getSize());
    }

    @Test
    void uprightTheScreensReflowAndEverythingStaysOnScreen(FxRobot robot) {
        robot.interact(() -> {
            AppShell shell = new AppShell(session, Background.DIRECT, Background.DIRECT);
            shell.attachCharts();
            stage.setScene(shell.scene(800, 1280));
            stage.setWidth(800);
            stage.setHeight(1280);
        });
        for (Screen s : Screen.values()) {
            robot.interact(() -> session.screenProperty().set(s));
            for (String id : java.util.List.of("#nav-job", "#nav-export", "#theme-toggle")) {
                var b = robot.lookup(id).query().localToScene(robot.lookup(id).query().getLayoutBounds());
                assertTrue(b.getMaxY() <= 1280 && b.getMaxX() <= 800, s + " " + id + " off screen: " + b);
            }
        }
        robot.interact(() -> session.screenProperty().set(Screen.READINGS));
        var nav = robot.lookup("#nav-job").query().localToScene(robot.lookup("#nav-job").query().getLayoutBounds());
        assertTrue(nav.getMinY() > 1000, "upright, the screen list sits at the bottom: " + nav);
        var enter = robot.lookup("#key-enter").query().localToScene(robot.lookup("#key-enter").query().getLayoutBounds());
        assertTrue(enter.getMaxY() < nav.getMinY(), "the pad is above the screen list: " + enter);
    }

    /** Taps a box, the digits and Enter. */
    private static void enter(FxRobot robot, String slot, String number) {
        tap(robot, "#slot-" + slot);
        for (char c : number.toCharArray()) {
            tap(robot, c == '.' ? "#key-point" : c == '-' ? "#key-sign" : "#key-" + c);
        }
        tap(robot, "#key-enter");
    }

    /**
     * A tap: press and release at the node's centre, delivered to the node as the platform delivers
     * a touch-synthesised click. TestFX's clickOn does the same after gliding the pointer there,
     * which costs about half a second a tap; the pad is tapped ~80 times here.
     */
    private static void tap(FxRobot robot, String query) {
        Node n = robot.lookup(query).query();
        robot.interact(() -> {
            var b = n.getLayoutBounds();
            var p = n.localToScreen(b.getCenterX(), b.getCenterY());
            var s = n.localToScene(b.getCenterX(), b.getCenterY());
            for (var type : java.util.List.of(javafx.scene.input.MouseEvent.MOUSE_PRESSED,
                    javafx.scene.input.MouseEvent.MOUSE_RELEASED, javafx.scene.input.MouseEvent.MOUSE_CLICKED)) {
                boolean down = type == javafx.scene.input.MouseEvent.MOUSE_PRESSED;
                n.fireEvent(new javafx.scene.input.MouseEvent(type, s.getX(), s.getY(), p.getX(), p.getY(),
                        javafx.scene.input.MouseButton.PRIMARY, 1, false, false, false, false, down, false, false,
                        true, false, true, null));
            }
        });
    }

    private static String text(FxRobot robot, String query) {
        return robot.lookup(query).queryAs(Labeled.class).getText();
    }
}
