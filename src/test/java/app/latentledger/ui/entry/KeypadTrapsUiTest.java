package app.latentledger.ui.entry;

import app.latentledger.ui.AppShell;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import app.latentledger.ui.session.Screen;
import app.latentledger.ui.session.Slot;
import javafx.css.PseudoClass;
import javafx.geometry.Bounds;
import javafx.scene.Node;
import javafx.scene.control.Labeled;
import javafx.scene.input.KeyCode;
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

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Each keypad trap a tech met on a whole visit, walked by taps on the real screen (TestFX on
 * Monocle): the keys never move, a humidity-kind tap never erases a reading or carries the pad's
 * number into another unit, a refused number leaves the pad empty, a correction that disagrees
 * with a saved value is held (never refused about the other box) and stored once the pair agrees,
 * keyboard digits work, a save can be undone, and the pad walks the boxes in reading order.
 * Temperatures: °F = °C × 1.8 + 32 (exact definition of the scales).
 */
@ExtendWith(ApplicationExtension.class)
class KeypadTrapsUiTest {
    @TempDir
    static Path dir;

    private AppSession session;
    private EntryViewModel entry;

    @Start
    void start(Stage stage) {
        session = TestSessions.withNewVisit(dir);
        AppShell shell = new AppShell(session, Background.DIRECT, Background.DIRECT);
        session.screenProperty().set(Screen.READINGS);
        stage.setScene(shell.scene(1280, 800));
        stage.setWidth(1280);
        stage.setHeight(800);
        stage.show();
    }

    @AfterEach
    void close() {
        session.close();
    }

    private void open(FxRobot robot) {
        robot.interact(() -> session.screenProperty().set(Screen.READINGS));
        ReadingsView v = robot.lookup("#screen-readings").queryAs(ReadingsView.class);
        entry = v.viewModel();
    }

    private static void tapNumber(FxRobot robot, String number) {
        for (char c : number.toCharArray()) {
            robot.clickOn(c == '.' ? "#key-point" : "#key-" + c);
        }
    }

    private static void typeIn(FxRobot robot, Slot slot, String number) {
        robot.clickOn("#slot-" + slot.key());
        tapNumber(robot, number);
        robot.clickOn("#key-enter");
    }

    private static double f(double valueC) {
        return valueC * 1.8 + 32;
    }

    private String padText(FxRobot robot) {
        return entry.pad().text();
    }

    @Test
    void theKeysStayInOnePlaceOnEveryBoxAndWhenAnEntryIsRefused(FxRobot robot) {
        open(robot);
        Bounds seven = robot.lookup("#key-7").query().localToScene(robot.lookup("#key-7").query().getBoundsInLocal());
        Bounds enter = robot.lookup("#key-enter").query().localToScene(robot.lookup("#key-enter").query().getBoundsInLocal());
        assertTrue(enter.getMaxY() <= 800, "Enter is on screen: " + enter);
        for (Slot s : Slot.values()) {
            robot.clickOn("#slot-" + s.key());
            assertEquals(seven, bounds(robot, "#key-7"), "7 moved on " + s);
            assertEquals(enter, bounds(robot, "#key-enter"), "Enter moved on " + s);
        }
        typeIn(robot, Slot.RETURN_HUMIDITY, "999");
        assertTrue(entry.refusedProperty().get(), entry.messageProperty().get());
        assertEquals(seven, bounds(robot, "#key-7"), "a refusal message shrank or moved the keys");
    }

    private static Bounds bounds(FxRobot robot, String id) {
        Node n = robot.lookup(id).query();
        return n.localToScene(n.getBoundsInLocal());
    }

    @Test
    void changingTheHumidityKindKeepsTheSavedWetBulbAndEmptiesThePad(FxRobot robot) {
        open(robot);
        typeIn(robot, Slot.RETURN_DRY_BULB, "76");
        typeIn(robot, Slot.RETURN_HUMIDITY, "62");
        double savedWetBulbC = session.draft().value(Slot.RETURN_HUMIDITY).valueSi();
        assertEquals(62, f(savedWetBulbC), 1e-9);
        robot.clickOn("#slot-return-humidity");
        tapNumber(robot, "55");
        robot.clickOn("#choice-rh");
        assertEquals("", padText(robot), "55 typed as a wet bulb must not become 55 %");
        assertNotNull(session.draft().value(Slot.RETURN_HUMIDITY), "the tap erased the saved wet bulb");
        assertEquals("wet-bulb", session.draft().choice(Slot.RETURN_HUMIDITY));
        assertEquals(savedWetBulbC, session.draft().value(Slot.RETURN_HUMIDITY).valueSi(), 0);
        // a value of the new kind replaces the old one only when entered
        tapNumber(robot, "50");
        robot.clickOn("#key-enter");
        assertEquals("rh", session.draft().choice(Slot.RETURN_HUMIDITY));
        assertEquals(50, session.draft().value(Slot.RETURN_HUMIDITY).valueSi(), 1e-9);
    }

    @Test
    void aRefusedNumberLeavesThePadEmptySoNewDigitsStartANewNumber(FxRobot robot) {
        open(robot);
        robot.clickOn("#slot-return-humidity");
        robot.clickOn("#choice-rh");
        tapNumber(robot, "120");
        robot.clickOn("#key-enter");
        assertTrue(entry.refusedProperty().get());
        tapNumber(robot, "80");
        assertEquals("80", padText(robot), "not 12080");
    }

    @Test
    void aCorrectedDryBulbBelowTheSavedWetBulbIsHeldAndStoredOnceThePairAgrees(FxRobot robot) {
        open(robot);
        typeIn(robot, Slot.RETURN_DRY_BULB, "80");
        typeIn(robot, Slot.RETURN_HUMIDITY, "66");
        typeIn(robot, Slot.RETURN_DRY_BULB, "62");
        String m = entry.messageProperty().get();
        assertFalse(entry.refusedProperty().get(), m);
        assertFalse(m.startsWith("Not saved"), m);
        assertTrue(m.contains("62.0"), m);
        // the stored set stays a valid one: 80 °F is still stored
        assertEquals(80, f(session.draft().value(Slot.RETURN_DRY_BULB).valueSi()), 1e-9);
        PseudoClass conflict = PseudoClass.getPseudoClass("conflict");
        assertTrue(robot.lookup("#slot-return-dry-bulb").query().getPseudoClassStates().contains(conflict));
        assertTrue(robot.lookup("#slot-return-humidity").query().getPseudoClassStates().contains(conflict));
        assertEquals("62.0", robot.lookup("#value-return-dry-bulb").queryAs(Labeled.class).getText(), "the box shows what was typed");
        // the pad moved to the box to check; a wet bulb that agrees stores both
        assertEquals(Slot.RETURN_HUMIDITY, entry.selectedProperty().get());
        tapNumber(robot, "55");
        robot.clickOn("#key-enter");
        assertEquals(62, f(session.draft().value(Slot.RETURN_DRY_BULB).valueSi()), 1e-9);
        assertEquals(55, f(session.draft().value(Slot.RETURN_HUMIDITY).valueSi()), 1e-9);
        assertFalse(robot.lookup("#slot-return-dry-bulb").query().getPseudoClassStates().contains(conflict));
    }

    @Test
    void digitsFromAHardwareKeyboardReachThePad(FxRobot robot) {
        open(robot);
        robot.clickOn("#slot-return-dry-bulb");
        robot.type(KeyCode.DIGIT7, KeyCode.DIGIT5, KeyCode.PERIOD, KeyCode.DIGIT5);
        assertEquals("75.5", padText(robot));
        robot.type(KeyCode.ENTER);
        assertEquals(75.5, f(session.draft().value(Slot.RETURN_DRY_BULB).valueSi()), 1e-9);
    }

    @Test
    void theLastSaveCanBeUndoneInOneShownStep(FxRobot robot) {
        open(robot);
        typeIn(robot, Slot.RETURN_DRY_BULB, "76");
        typeIn(robot, Slot.RETURN_DRY_BULB, "78");
        Labeled undo = robot.lookup("#key-undo").queryAs(Labeled.class);
        assertTrue(undo.isVisible() && undo.getText().contains("78"), undo.getText());
        robot.clickOn("#key-undo");
        assertEquals(76, f(session.draft().value(Slot.RETURN_DRY_BULB).valueSi()), 1e-9);
        assertFalse(robot.lookup("#key-undo").query().isVisible(), "one step only");
    }

    @Test
    void thePadWalksInReadingOrderAndANewSetStartsAtTheFirstBoxWithNoStaleMessage(FxRobot robot) {
        open(robot);
        typeIn(robot, Slot.AIRFLOW, "1200");
        assertEquals(Slot.CONDENSATE_VOLUME, entry.selectedProperty().get(), "after airflow comes the condensate");
        assertTrue(entry.messageProperty().get().startsWith("Saved"), entry.messageProperty().get());
        robot.interact(() -> session.newReadingSet());
        assertEquals(Slot.RETURN_DRY_BULB, entry.selectedProperty().get());
        assertEquals("", entry.messageProperty().get());
    }

    @Test
    void theWaitingLineNamesEveryMissingReadingWithoutAnEllipsis(FxRobot robot) {
        open(robot);
        Labeled word = robot.lookup("#live-verdict-word").queryAs(Labeled.class);
        assertTrue(word.getText().startsWith("Waiting for"), word.getText());
        String shown = robot.lookup("#live-verdict-word").queryAs(Labeled.class).getChildrenUnmodifiable().stream()
                .filter(n -> n instanceof Text).map(n -> ((Text) n).getText()).findFirst().orElse("");
        assertFalse(shown.contains("..."), shown);
        assertFalse(shown.contains("…"), shown);
        assertEquals(word.getText(), shown.replace("\n", " ").replaceAll(" +", " ").trim(),
                "the wrapped headline shows every word");
    }
}
