package app.latentledger.ui.house;

import app.latentledger.cli.Cli;
import app.latentledger.core.house.HouseBudget;
import app.latentledger.core.house.ScenarioResult;
import app.latentledger.core.settings.PaperSize;
import app.latentledger.core.text.BalanceWords;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.report.VisitReport;
import app.latentledger.store.DemoScenario;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.session.AppSession;
import javafx.scene.Scene;
import javafx.scene.control.ToggleButton;
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
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The house's water balance reads the same on the House screen, in the report's house section and
 * from the {@code house} command: for the Saltreed demo's complaint visit, each fix's balance sentence
 * appears word for word on all three, in one of the three forms a tech reads (gains, dries, about in
 * balance) and never as a bare signed "water gained".
 */
@ExtendWith(ApplicationExtension.class)
class BalanceWordsEverywhereTest {
    @TempDir
    static Path dir;

    private AppSession session;
    private HouseViewModel model;

    @Start
    void start(Stage stage) throws Exception {
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
}
