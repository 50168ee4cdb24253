package app.latentledger.ui.house;

import app.latentledger.cli.Cli;
import app.latentledger.core.house.HouseBudget;
import app.latentledger.core.house.HouseFindings;
import app.latentledger.core.house.ScenarioResult;
import app.latentledger.core.settings.PaperSize;
import app.latentledger.core.text.BalanceWords;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.report.VisitReport;
import app.latentledger.store.DemoScenario;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.session.AppSession;
import javafx.geometry.Bounds;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.control.ToggleButton;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The House screen on its own, headless (TestFX + Monocle): a row per fix, each a 48 px target to tap,
 * its balance in the same words as the report and the command line, the cautions beside the fixes,
 * and a keyboard typing on the pad.
 */
@ExtendWith(ApplicationExtension.class)
class HouseViewTest {
    @TempDir
    static Path dir;

    private AppSession session;
    private HouseViewModel model;

    @Start
    void start(Stage stage) throws IOException {
        session = TestSessions.open(Files.createTempDirectory(dir, "tablet"));
        session.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).ifPresent(session::openVisit);
        model = new HouseViewModel(session);
        stage.setScene(new Scene(new HouseView(model), 1280, 800));
        stage.show();
    }

    @AfterEach
    void close() {
        session.close();
    }

    @Test
    void aFactTappedOnThePadIsStoredAtOnceAndShownAfterARestart(FxRobot robot) throws IOException {
        tap(robot, "#house-box-bedrooms");
        tap(robot, "#house-key-5");
        tap(robot, "#house-key-enter");
        assertEquals(5, session.ledger().houses().facts(DemoScenario.SITE_HERON).orElseThrow().bedrooms());
        assertTrue(robot.lookup("#house-pad-message").queryAs(javafx.scene.control.Label.class).getText()
                .contains("Bedrooms 5 saved"));
        Path folder = session.dataFolder();
        robot.interact(() -> session.close());
        session = TestSessions.open(folder);
        session.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).ifPresent(session::openVisit);
        HouseViewModel again = new HouseViewModel(session);
        robot.interact(() -> robot.lookup("#house-screen").query().getScene().setRoot(new HouseView(again)));
        assertTrue(robot.lookup("#house-box-bedrooms").queryAs(ToggleButton.class).getText().endsWith("\n5"));
    }

    /**
     * A USB or Bluetooth keyboard types on the House pad as on the Readings pad: digits, the point,
     * minus for the sign, Backspace, Escape to clear and Enter to store (1 ft = 0.3048 m exactly,
     * international foot).
     */
    @Test
    void aHardwareKeyboardTypesOnThePad(FxRobot robot) {
        tap(robot, "#house-box-ceiling-height");
        Label display = robot.lookup("#house-pad-display").queryAs(Label.class);
        robot.type(KeyCode.DIGIT7, KeyCode.PERIOD, KeyCode.DIGIT5);
        assertEquals("7.5", display.getText());
        robot.type(KeyCode.BACK_SPACE);
        assertEquals("7.", display.getText());
        robot.type(KeyCode.MINUS);
        assertEquals("-7.", display.getText());
        robot.type(KeyCode.ESCAPE);
        assertEquals("", display.getText());
        robot.type(KeyCode.DIGIT9, KeyCode.ENTER);
        assertEquals(9 * 0.3048, session.ledger().houses().facts(DemoScenario.SITE_HERON).orElseThrow()
                .ceilingHeightM(), 1e-12, robot.lookup("#house-pad-message").queryAs(Label.class).getText());
        assertTrue(robot.lookup("#house-box-stories").queryAs(ToggleButton.class).isSelected(),
                "Enter moves on to the next box, as the pad's own Enter key does");
    }

    /**
     * The cautions that go with the fixes (attic heat, mold, combustion appliances and house
     * depressurisation, licensed practice) stay in sight beside the list of fixes, in the outdoor
     * theme, landscape and upright, and at 150 % text; the chart follows the outdoor palette.
     */
    @Test
    void theCautionsStayInSightBesideTheFixes(FxRobot robot) {
        robot.interact(() -> session.saveSettings(session.settings().withChoice(
                app.latentledger.core.settings.SettingsCatalogue.THEME, "outdoor")));
        assertEquals(app.latentledger.chart.draw.Theme.OUTDOOR, model.chartThemeProperty().get());
        String[][] looks = {{"1280", "800", "false", ""}, {"800", "1280", "true", ""},
                {"1280", "800", "false", "-fx-font-size: 27px;"}, {"800", "1280", "true", "-fx-font-size: 27px;"}};
        for (String[] look : looks) {
            String where = String.join(" ", look);
            robot.interact(() -> {
                HouseView v = new HouseView(model);
                v.setPortrait(Boolean.parseBoolean(look[2]));
                Scene scene = new Scene(v, Double.parseDouble(look[0]), Double.parseDouble(look[1]));
                app.latentledger.ui.look.Theme.install(scene);
                app.latentledger.ui.look.Theme.apply(scene, session.themeProperty().get());
                v.setStyle(look[3]);
                ((Stage) robot.lookup("#house-screen").query().getScene().getWindow()).setScene(scene);
                v.applyCss();
                v.layout();
            });
            org.testfx.util.WaitForAsyncUtils.waitForFxEvents();
            Label cautions = robot.lookup("#house-cautions").queryAs(Label.class);
            for (String c : new String[] {HouseFindings.ATTIC_HEAT, HouseFindings.MOLD, HouseFindings.COMBUSTION,
                    HouseFindings.LICENSED}) {
                assertTrue(cautions.getText().contains(c), where + ": " + c);
            }
            Node box = robot.lookup("#house-cautions-box").query();
            Node fixes = robot.lookup("#house-fixes").query();
            Bounds b = box.localToScene(box.getBoundsInLocal());
            Bounds f = fixes.localToScene(fixes.getBoundsInLocal());
            Bounds scene = new javafx.geometry.BoundingBox(0, 0, box.getScene().getWidth(), box.getScene().getHeight());
            assertTrue(scene.contains(b), where + ": the cautions are on screen " + b);
            assertTrue(b.getMinX() >= f.getMaxX() && b.getMinY() < f.getMaxY() && f.getMinY() < b.getMaxY(),
                    where + ": beside the fixes " + b + " " + f);
            assertTrue(b.getHeight() >= 120 && b.getWidth() >= 200, where + ": room to read them " + b);
            Bounds first = cautions.localToScene(cautions.getBoundsInLocal());
            assertTrue(first.getMinY() >= b.getMinY() && first.getMinY() < b.getMaxY() - 60,
                    where + ": the first caution starts in sight " + first + " in " + b);
        }
    }

    /**
     * The house's water balance reads the same on the House screen, in the report's house section and
     * from the {@code house} command: for the Saltreed demo's complaint visit, each fix's balance
     * sentence appears word for word on all three, in one of the three forms a tech reads (gains,
     * dries, about in balance) and never as a bare signed "water gained".
     */
    @Test
    void theScreenTheReportAndTheCommandSayTheBalanceInTheSameWords(FxRobot robot) throws Exception {
        assertEquals(UnitSystem.IP, session.units(), "the demo ledger's units, which the command reads too");
        HouseBudget b = model.budgetProperty().get();
        assertNotNull(b, model.refusalProperty().get());
        List<ScenarioResult> cases = new ArrayList<>(b.whatIfs());
        cases.add(0, b.asFound());

        Path pdf = dir.resolve("house-words.pdf");
        VisitReport.write(session.ledger(), DemoScenario.VISIT_COMPLAINT, null, PaperSize.LETTER, UnitSystem.IP, pdf);
        String paper;
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            PDFTextStripper s = new PDFTextStripper();
            s.setSortByPosition(true);
            paper = s.getText(doc).replaceAll("\\s+", " ");
        }
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        int code = Cli.standard().run(List.of("--data-dir", session.dataFolder().toString(), "house", "--visit",
                DemoScenario.VISIT_COMPLAINT), new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8));
        String command = out.toString(StandardCharsets.UTF_8);
        assertEquals(0, code, command);

        for (ScenarioResult c : cases) {
            String words = BalanceWords.sentence(UnitSystem.IP, c.balance().valueSi(), c.balance().expandedSi());
            assertTrue(words.matches("(The house gains about|The house dries by about|About in balance:) .* pints a day"),
                    words);
            String row = robot.lookup("#fix-" + c.scenario().key()).queryAs(ToggleButton.class).getText();
            assertTrue(row.contains(words), "screen: '" + words + "' in " + row);
            int fixes = Math.max(0, paper.indexOf("Fixes compared"));
            assertTrue(paper.contains(words), "report: '" + words + "' in "
                    + paper.substring(fixes, Math.min(paper.length(), fixes + 1200)));
            assertTrue(command.contains(words), "house command: '" + words + "' in\n" + command);
        }
        assertTrue(!paper.contains("Water gained per day") && !command.contains("water gained"),
                "no signed 'water gained' left");
    }

    private static void tap(FxRobot robot, String query) {
        robot.interact(() -> robot.lookup(query).queryAs(javafx.scene.control.ButtonBase.class).fire());
    }

    @Test
    void everyFixIsATargetToTap(FxRobot robot) {
        Set<Node> rows = robot.lookup(".toggle-button").match(n -> n.getId() != null && n.getId().startsWith("fix-"))
                .queryAll();
        assertEquals(model.fixRows().size(), rows.size());
        for (Node n : rows) {
            var b = n.getBoundsInLocal();
            assertTrue(b.getHeight() >= 48 && b.getWidth() >= 48, n.getId() + " " + b);
        }
        ToggleButton asFound = robot.lookup("#fix-as-found").queryAs(ToggleButton.class);
        assertTrue(asFound.isSelected(), "as found is shown first");
        String other = "#fix-" + model.fixRows().get(1).key();
        robot.clickOn(other);
        assertTrue(robot.lookup(other).queryAs(ToggleButton.class).isSelected());
    }
}
