package app.latentledger.ui;

import app.latentledger.store.DemoScenario;
import app.latentledger.ui.log.CycleLogAnalysis;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import app.latentledger.ui.session.Screen;
import javafx.geometry.Orientation;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.ButtonBase;
import javafx.scene.control.ComboBoxBase;
import javafx.scene.control.Labeled;
import javafx.scene.control.ListCell;
import javafx.scene.control.ScrollBar;
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
 * Every screen at 1280 × 800 and upright at 800 × 1280, on the demo visit: each button, toggle,
 * key, drop-down and list row is at least 48 px both ways (a gloved fingertip, about 8 mm at
 * 150 px/in; common practice, no source), each scroll bar at least 16 px thick, no label cuts
 * its text to an ellipsis, no wrapped text breaks inside a word ("To/tal/ca/pa/cit/y": a word wider
 * than the width it wraps at), and every input box lies wholly inside the scroll pane showing it.
 */
@ExtendWith(ApplicationExtension.class)
class LayoutUiTest {
    @TempDir
    static Path dir;

    private AppSession session;
    private Stage stage;

    @Start
    void start(Stage stage) {
        this.stage = stage;
        session = AppSession.open(dir, new CycleLogAnalysis());
        session.openVisit(session.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow());
        show(1280, 800);
        stage.show();
    }

    private void show(int w, int h) {
        AppShell shell = new AppShell(session, Background.DIRECT, Background.DIRECT);
        shell.attachCharts();
        stage.setScene(shell.scene(w, h));
        stage.setWidth(w);
        stage.setHeight(h);
    }

    @AfterEach
    void close() {
        session.close();
    }

    @Test
    void landscapeEveryScreenHasGloveSizedTargetsAndNoCutText(FxRobot robot) {
        List<String> problems = walk(robot);
        assertTrue(problems.isEmpty(), String.join("\n", problems));
    }

    @Test
    void uprightEveryScreenHasGloveSizedTargetsAndNoCutText(FxRobot robot) {
        robot.interact(() -> show(800, 1280));
        List<String> problems = walk(robot);
        assertTrue(problems.isEmpty(), String.join("\n", problems));
    }

    /** 150 % text: the root's 18 px base at 27 px; every other size in the stylesheets is relative to it. */
    private void largeText(FxRobot robot) {
        robot.interact(() -> stage.getScene().getRoot().setStyle("-fx-font-size: 27px;"));
    }

    @Test
    void atOneAndAHalfTimesTheTextLyingDownNothingIsCut(FxRobot robot) {
        largeText(robot);
        List<String> problems = walk(robot);
        assertTrue(problems.isEmpty(), String.join("\n", problems));
    }

    @Test
    void atOneAndAHalfTimesTheTextUprightNothingIsCut(FxRobot robot) {
        robot.interact(() -> show(800, 1280));
        largeText(robot);
        List<String> problems = walk(robot);
        assertTrue(problems.isEmpty(), String.join("\n", problems));
    }

    @Test
    void theTextSizeFollowsTheRoot(FxRobot robot) {
        // the test above means something only if the screens' text really grows with the root
        robot.interact(() -> session.screenProperty().set(Screen.RESULTS));
        javafx.scene.control.Label verdict = robot.lookup(".verdict-word").queryAs(javafx.scene.control.Label.class);
        double normal = verdict.getFont().getSize();
        largeText(robot);
        robot.interact(() -> stage.getScene().getRoot().applyCss());
        assertTrue(verdict.getFont().getSize() >= normal * 1.45, normal + " → " + verdict.getFont().getSize());
    }

    @Test
    void resultsPutTheVerdictMarginAndWaterFirstAndGiveTheChartHalfTheWidth(FxRobot robot) {
        robot.interact(() -> session.screenProperty().set(Screen.RESULTS));
        var margin = scene(robot, "#key-dew-point-margin");
        var water = scene(robot, "#key-moisture-removal");
        var verdict = scene(robot, "#verdict");
        var chart = scene(robot, "#" + app.latentledger.ui.results.ResultsView.CHART_SLOT_ID);
        var screen = scene(robot, "#screen-results");
        // lying down the two figures lead the left column, under the verdict; the chart stands beside them
        assertTrue(margin.getMinY() >= verdict.getMaxY() && margin.getMinY() <= verdict.getMaxY() + 80,
                "margin right under the verdict: " + margin + " " + verdict);
        assertTrue(water.getMinY() >= margin.getMaxY() && water.getMaxY() <= screen.getMaxY(),
                "water removed next, on screen: " + water);
        assertTrue(chart.getMinY() >= verdict.getMaxY() && chart.getMinX() >= margin.getMaxX(),
                "chart under the verdict, beside the figures: " + chart);
        assertTrue(chart.getWidth() >= screen.getWidth() / 2, "chart " + chart.getWidth() + " of " + screen.getWidth());
    }

    @Test
    void everyBoxOnTheRecordScreenHasItsNameAboveIt(FxRobot robot) {
        // a placeholder alone is gone once the box is filled: then nobody can tell which box is which
        robot.interact(() -> session.screenProperty().set(Screen.RECORD));
        List<String> problems = new ArrayList<>();
        robot.interact(() -> {
            var inputs = robot.lookup("#screen-record .text-input").queryAll();
            var labels = robot.lookup("#screen-record .label").queryAllAs(javafx.scene.control.Label.class);
            assertTrue(inputs.size() >= 19, "boxes found: " + inputs.size());
            for (Node in : inputs) {
                boolean named = labels.stream().anyMatch(l -> l.getLabelFor() == in && l.isVisible()
                        && l.getText() != null && !l.getText().isBlank()
                        && l.localToScene(l.getLayoutBounds()).getMaxY() <= in.localToScene(in.getLayoutBounds()).getMinY());
                if (!named) {
                    problems.add("#" + in.getId() + " has no name above it");
                }
            }
        });
        assertTrue(problems.isEmpty(), String.join("\n", problems));
    }

    private static javafx.geometry.Bounds scene(FxRobot robot, String id) {
        Node n = robot.lookup(id).query();
        return n.localToScene(n.getLayoutBounds());
    }

    private List<String> walk(FxRobot robot) {
        List<String> problems = new ArrayList<>();
        for (Screen s : Screen.values()) {
            robot.interact(() -> session.screenProperty().set(s));
            robot.interact(() -> check(s, stage.getScene().getRoot(), problems));
        }
        return problems;
    }

    /** A drop-down's shown row is part of the drop-down, which is the target measured. */
    private static boolean insideDropDown(Node n) {
        for (Node p = n.getParent(); p != null; p = p.getParent()) {
            if (p instanceof ComboBoxBase) {
                return true;
            }
        }
        return false;
    }

    /** A word wider than the text's wrapping width is broken between letters. */
    static void brokenWord(String name, String text, javafx.scene.text.Font font, double wrap, List<String> problems) {
        if (text == null || wrap <= 0) {
            return;
        }
        // the pieces JavaFX will not break inside (it breaks between words and after hyphens)
        for (String word : app.latentledger.ui.look.NamedRows.words(text)) {
            Text probe = new Text(word);
            probe.setFont(font);
            double w = probe.getLayoutBounds().getWidth();
            if (w > wrap + 0.5) {
                problems.add(name + " breaks '" + word + "' (" + Math.round(w) + " px) at a wrap of "
                        + Math.round(wrap) + " px in '" + text + "'");
            }
        }
    }

    /** An input box must lie inside the nearest scroll pane's viewport width (no sideways scroll on a tablet). */
    static void outsideViewport(String name, Node n, List<String> problems) {
        if (n.getScene() == null || n.getLayoutBounds().getWidth() <= 0) {
            return;
        }
        javafx.geometry.Bounds box = n.localToScene(n.getLayoutBounds());
        javafx.geometry.Bounds view = n.getScene().getRoot().localToScene(n.getScene().getRoot().getLayoutBounds());
        for (Node p = n.getParent(); p != null; p = p.getParent()) {
            if (p instanceof javafx.scene.control.ScrollPane sp) {
                javafx.geometry.Bounds vp = sp.getViewportBounds();
                // the viewport in scene coordinates: the pane's own box less its insets and bars
                javafx.geometry.Bounds paneBox = sp.localToScene(sp.getLayoutBounds());
                double left = paneBox.getMinX() + sp.snappedLeftInset();
                view = new javafx.geometry.BoundingBox(left, paneBox.getMinY(), vp.getWidth(), paneBox.getHeight());
                break;
            }
        }
        if (box.getMinX() < view.getMinX() - 0.5 || box.getMaxX() > view.getMaxX() + 0.5) {
            problems.add(name + " input spans x " + Math.round(box.getMinX()) + "–" + Math.round(box.getMaxX())
                    + " outside its view x " + Math.round(view.getMinX()) + "–" + Math.round(view.getMaxX()));
        }
    }

    static void check(Screen s, Node n, List<String> problems) {
        if (!n.isVisible()) {
            return;
        }
        var b = n.getLayoutBounds();
        String name = s + " " + n.getClass().getSimpleName() + (n.getId() == null ? "" : " #" + n.getId());
        if (n instanceof ButtonBase || n instanceof ComboBoxBase || (n instanceof ListCell<?> c && !c.isEmpty() && !insideDropDown(c))) {
            if (b.getWidth() < 48 || b.getHeight() < 48) {
                problems.add(name + " is " + b.getWidth() + " × " + b.getHeight()
                        + (n instanceof Labeled l ? " '" + l.getText() + "'" : ""));
            }
        }
        if (n instanceof ScrollBar bar) {
            double thick = bar.getOrientation() == Orientation.VERTICAL ? b.getWidth() : b.getHeight();
            if (thick < 16) {
                problems.add(name + " scroll bar is " + thick + " px thick");
            }
        }
        if (n instanceof Labeled l && l.getText() != null && !l.getText().isEmpty()) {
            for (Node child : l.getChildrenUnmodifiable()) {
                if (child instanceof Text t && t.getText() != null && !t.getText().equals(l.getText())
                        && (t.getText().endsWith("...") || t.getText().endsWith("…"))) {
                    problems.add(name + " shows '" + t.getText() + "' for '" + l.getText() + "'");
                }
            }
        }
        if (n instanceof Labeled l && l.isWrapText() && l.getText() != null) {
            for (Node child : l.getChildrenUnmodifiable()) {
                if (child instanceof Text t) {
                    brokenWord(name, l.getText(), l.getFont(), t.getWrappingWidth(), problems);
                }
            }
        } else if (n instanceof Text t && !(n.getParent() instanceof Labeled) && t.getWrappingWidth() > 0) {
            brokenWord(name, t.getText(), t.getFont(), t.getWrappingWidth(), problems);
        }
        if (n instanceof javafx.scene.control.TextInputControl || n instanceof ComboBoxBase) {
            outsideViewport(name, n, problems);
        }
        if (n instanceof Parent p) {
            for (Node c : p.getChildrenUnmodifiable()) {
                check(s, c, problems);
            }
        }
    }
}
