package app.latentledger.ui;

import app.latentledger.TradeWords;
import app.latentledger.core.settings.SettingsCatalogue;
import app.latentledger.store.DemoScenario;
import app.latentledger.ui.log.CycleLogAnalysis;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import app.latentledger.ui.session.Screen;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.Labeled;
import javafx.scene.control.TextInputControl;
import javafx.scene.text.Text;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Every screen of the demo complaint visit (the one with before/after sets and a logged day), each
 * label and text as it is shown, scanned for what a tech must not read ({@link TradeWords}): model
 * symbols, file references, command-line syntax, field keys, "NaN", labels misread in use. What a
 * tech types into a box (and the box's example of it) is the tech's own text and is not scanned.
 */
@ExtendWith(ApplicationExtension.class)
class TradeWordsUiTest {
    @TempDir
    static Path dir;

    private AppSession session;
    private Stage stage;

    @Start
    void start(Stage stage) {
        this.stage = stage;
        session = AppSession.open(dir, new CycleLogAnalysis());
        session.openVisit(session.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow());
        AppShell shell = new AppShell(session, Background.DIRECT, Background.DIRECT);
        shell.attachCharts();
        stage.setScene(shell.scene(1280, 800));
        stage.setWidth(1280);
        stage.setHeight(800);
        stage.show();
    }

    @AfterEach
    void close() {
        session.close();
    }

    @Test
    void noScreenShowsModelSymbolsFileNamesCommandSyntaxOrFieldKeys(FxRobot robot) {
        List<String> problems = new ArrayList<>();
        int[] scanned = {0};
        walk(robot, problems, scanned);
        // the same screens in SI: the names that carry a unit ("per kW (nominal)") change with it
        robot.interact(() -> session.saveSettings(session.settings().withChoice(SettingsCatalogue.UNITS, "si")));
        assertTrue(session.units() == app.latentledger.core.units.UnitSystem.SI, "the screens now show SI");
        walk(robot, problems, scanned);
        assertTrue(scanned[0] > 400, "the walk reached the screens' words: " + scanned[0] + " texts");
        assertTrue(problems.isEmpty(), String.join("\n", problems));
    }

    private void walk(FxRobot robot, List<String> problems, int[] scanned) {
        for (Screen s : Screen.values()) {
            robot.interact(() -> session.screenProperty().set(s));
            robot.interact(() -> scan(s, stage.getScene().getRoot(), problems, scanned));
        }
    }

    private static void scan(Screen s, Node n, List<String> problems, int[] scanned) {
        if (!n.isVisible() || n instanceof TextInputControl) {
            return;
        }
        if (n instanceof Labeled l) {
            scanned[0]++;
            problems.addAll(TradeWords.problems(s + " " + n.getClass().getSimpleName()
                    + (n.getId() == null ? "" : " #" + n.getId()), l.getText()));
        } else if (n instanceof Text t && !(t.getParent() instanceof Labeled)) {
            scanned[0]++;
            problems.addAll(TradeWords.problems(s + " Text", t.getText()));
        }
        if (n instanceof Parent p) {
            for (Node c : p.getChildrenUnmodifiable()) {
                scan(s, c, problems, scanned);
            }
        }
    }
}
