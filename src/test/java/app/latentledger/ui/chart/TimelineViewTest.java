package app.latentledger.ui.chart;

import app.latentledger.fielddata.SaltreedDemo;
import app.latentledger.chart.timeline.CycleMark;
import app.latentledger.chart.timeline.TimeViewport;
import app.latentledger.core.units.UnitSystem;
import javafx.geometry.Point2D;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.input.MouseButton;
import javafx.scene.input.ZoomEvent;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The cycle timeline driven headless: zoom from the week to one cycle. */
@ExtendWith(ApplicationExtension.class)
class TimelineViewTest {
    private TimelineView view;

    @Start
    void start(Stage stage) {
        view = new TimelineView(new TimelineViewModel(SaltreedDemo.week(UnitSystem.IP, 2)));
        stage.setScene(new Scene(view, 1280, 800));
        stage.show();
    }

    @Test
    void doubleTappingACycleZoomsToThatCycle(FxRobot robot) {
        Node canvas = robot.lookup("#timeline-canvas").query();
        TimeViewport whole = view.viewModel().viewportProperty().get();
        // pinch in twice around the first hours so single cycles are wide enough to hit
        Point2D scene = canvas.localToScene(whole.left() + 5, 300);
        for (int i = 0; i < 2; i++) {
            robot.interact(() -> canvas.fireEvent(new ZoomEvent(ZoomEvent.ZOOM, scene.getX(), scene.getY(), 0, 0,
                    false, false, false, false, true, false, 4.0, 4.0, null)));
        }
        TimeViewport vp = view.viewModel().viewportProperty().get();
        assertEquals(whole.spanS() / 16, vp.spanS(), 1.0);
        CycleMark c = view.viewModel().chart().data().cycles().get(3);
        double y = view.viewModel().layout().moisture().top() + view.viewModel().layout().moisture().height() / 2;
        robot.doubleClickOn(canvas.localToScreen(vp.x((c.startS() + c.onEndS()) / 2), y), MouseButton.PRIMARY);
        TimeViewport one = view.viewModel().viewportProperty().get();
        assertTrue(one.startS() <= c.startS() && one.endS() >= c.endS(), "the whole cycle is shown");
        assertTrue(one.spanS() <= c.durationS() * 1.25, "and little else: " + one.spanS() + " s");
        assertEquals(3, view.viewModel().selectedProperty().get());
        assertTrue(robot.lookup("#readout").queryAs(Label.class).getText().startsWith("Cycle 4\nOn "));
    }

    @Test
    void nextCycleStepsOneCycleAtATimeAndWholeLogReturns(FxRobot robot) {
        robot.clickOn("#next-cycle");
        robot.clickOn("#next-cycle");
        int selected = view.viewModel().selectedProperty().get();
        CycleMark c = view.viewModel().chart().data().cycles().get(selected);
        TimeViewport vp = view.viewModel().viewportProperty().get();
        assertTrue(vp.startS() <= c.startS() && vp.endS() >= c.endS());
        robot.clickOn("#whole-log");
        assertEquals(view.viewModel().chart().data().lastS(), view.viewModel().viewportProperty().get().endS(), 1e-9);
    }
}
