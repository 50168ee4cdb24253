package app.latentledger.ui;

import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

import static org.junit.jupiter.api.Assertions.assertTrue;

/** The quick-check screen driven headless (TestFX + Monocle) as a tech would use it. */
@ExtendWith(ApplicationExtension.class)
class LedgerAppUiTest {

    @Start
    void start(Stage stage) {
        stage.setScene(LedgerApp.createScene(new QuickStateViewModel()));
        stage.show();
    }

    @Test
    void typingAWetBulbUpdatesTheDewPoint(FxRobot robot) {
        TextField wb = robot.lookup("#wet-bulb").queryAs(TextField.class);
        robot.clickOn(wb);
        robot.interact(wb::clear);
        robot.write("60");
        assertTrue("60".equals(wb.getText()), "typed: " + wb.getText());
        String result = robot.lookup("#result").queryAs(Label.class).getText() + " / " + robot.lookup("#problem").queryAs(Label.class).getText();
        // 80 °F db / 60 °F wb at sea level: dew point 45.6 °F (PsychroLib 2.5.0 GetTDewPointFromHumRatio, its
        // IP grid row ip_e0_db80_wbd20)
        assertTrue(result.contains("Dew point 45.6 °F"), result);
    }
}
