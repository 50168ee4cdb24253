package app.latentledger.ui.job;

import app.latentledger.store.DemoScenario;
import app.latentledger.ui.AppShell;
import app.latentledger.ui.log.CycleLogAnalysis;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import app.latentledger.ui.session.Screen;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The header while a tech picks another site on the Job screen, by taps on Monocle with the demo
 * ledger (the Heron Spit complaint visit open): it names the site and system picked and says no
 * visit is open there, instead of naming the visit of the site left behind; back on the open
 * visit's site, or on any other screen (whose work still goes to the open visit), it names that
 * visit again. Each message sits by the column it is about, and a new pick clears the old ones.
 */
@ExtendWith(ApplicationExtension.class)
class JobHeaderUiTest {
    @TempDir
    static Path dir;

    private AppSession session;

    @Start
    void start(Stage stage) {
        session = AppSession.open(dir, new CycleLogAnalysis());
        session.openVisit(session.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow());
        AppShell shell = new AppShell(session, Background.DIRECT, Background.DIRECT);
        stage.setScene(shell.scene(1280, 800));
        stage.show();
    }

    @AfterEach
    void close() {
        session.close();
    }

    private static String header(FxRobot robot) {
        return robot.lookup("#context").queryAs(Label.class).getText();
    }

    private static Node row(FxRobot robot, String listId, String startsWith) {
        return robot.lookup(listId + " .list-cell").match((ListCell<?> c) -> c.getText() != null
                && c.getText().startsWith(startsWith)).query();
    }

    @Test
    void pickingAnotherSiteShowsThatSiteWithNoVisitOpenNotTheLastVisit(FxRobot robot) {
        robot.clickOn("#nav-job");
        String open = header(robot);
        assertTrue(open.startsWith("Heron Spit Road residence"), open);

        robot.clickOn(row(robot, "#site-list", "Saltreed Marina office"));
        String picked = header(robot);
        assertTrue(picked.startsWith("Saltreed Marina office") && picked.contains("Office heat pump")
                && picked.contains("No visit open"), picked);
        assertFalse(picked.contains("Heron"), "the visit of the site left behind: " + picked);
        save(robot, "job 1280 × 800, another site picked");

        // the other screens still work on the Heron Spit visit, so there the header names it
        robot.clickOn("#nav-readings");
        assertEquals(open, header(robot));
        robot.clickOn("#nav-job");
        assertTrue(header(robot).startsWith("Saltreed Marina office"), header(robot));

        robot.clickOn(row(robot, "#site-list", "Heron Spit Road residence"));
        assertEquals(open, header(robot), "back on the open visit's site and system");
    }

    @Test
    void aStartedVisitIsNamedInTheHeaderAndItsMessageGoesWithTheNextPick(FxRobot robot) {
        robot.clickOn("#nav-job");
        robot.clickOn(row(robot, "#site-list", "Saltreed Marina office"));
        robot.clickOn("#start-visit");
        assertTrue(header(robot).startsWith("Saltreed Marina office") && !header(robot).contains("No visit open"),
                header(robot));
        robot.clickOn("#nav-job");
        Label status = robot.lookup("#job-status").queryAs(Label.class);
        assertTrue(status.getText().startsWith("Visit started"), status.getText());

        robot.clickOn(row(robot, "#site-list", "Heron Spit Road residence"));
        assertEquals("", status.getText(), "the Marina visit's message does not stay beside the Heron Spit site");
        assertTrue(header(robot).contains("No visit open"), header(robot));

        // a refused site is said beside the site fields, not in the Visit column
        robot.clickOn("#new-site-name").write("Saltreed pier kiosk");
        robot.interact(() -> robot.lookup("#new-site-elevation").queryAs(javafx.scene.control.TextField.class)
                .setText("99999"));
        robot.clickOn("#add-site");
        Label siteStatus = robot.lookup("#site-status").queryAs(Label.class);
        assertTrue(siteStatus.getText().startsWith("Site not added"), siteStatus.getText());
        assertTrue(isInside(siteStatus, robot.lookup("#new-site-name").query().getParent()), "by the site fields");
        assertEquals("", status.getText());
    }

    /** Saves what the screen looks like to target/screens, for a person to look at. */
    private static void save(FxRobot robot, String name) {
        robot.interact(() -> {
            try {
                java.io.File out = new java.io.File("target/screens");
                out.mkdirs();
                javax.imageio.ImageIO.write(javafx.embed.swing.SwingFXUtils.fromFXImage(
                        robot.lookup("#context").query().getScene().snapshot(null), null), "png",
                        new java.io.File(out, name + ".png"));
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        });
    }

    private static boolean isInside(Node n, Node parent) {
        for (Node p = n; p != null; p = p.getParent()) {
            if (p == parent) {
                return true;
            }
        }
        return false;
    }
}
