package app.latentledger.ui.chart;

import app.latentledger.fielddata.SaltreedDemo;
import app.latentledger.chart.psychro.ChartPoint;
import app.latentledger.chart.psychro.ChartViewport;
import app.latentledger.chart.timeline.CycleMark;
import app.latentledger.chart.timeline.TimeViewport;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The view models without a stage: resize, zoom, tap, step. */
class ChartViewModelTest {

    @Test
    void psychroViewportSurvivesAResizeAndTapReadsTheState() {
        PsychroChartViewModel vm = new PsychroChartViewModel(SaltreedDemo.single(UnitSystem.SI));
        vm.resize(1000, 700);
        ChartViewport vp = vm.viewportProperty().get();
        vm.zoom(2, vp.left() + 100, vp.top() + 100);
        var zoomed = vm.viewportProperty().get().range();
        vm.resize(1200, 800);
        assertEquals(zoomed, vm.viewportProperty().get().range(), "a resize keeps the zoom");
        vm.reset();
        ChartPoint leaving = vm.chart().data().overlays().get(0).leaving();
        ChartViewport whole = vm.viewportProperty().get();
        vm.tap(whole.x(leaving.dryBulbC()), whole.y(leaving.humidityRatio()));
        assertEquals(leaving, vm.selectedProperty().get());
        assertTrue(vm.readoutProperty().get().contains("°C") && vm.readoutProperty().get().contains("g/kg"),
                vm.readoutProperty().get());
        vm.tap(whole.left() + 2, whole.top() + 2);
        assertNull(vm.selectedProperty().get());
    }

    @Test
    void timelineStepsThroughCyclesAndBack() {
        TimelineViewModel vm = new TimelineViewModel(SaltreedDemo.week(UnitSystem.IP, 1));
        vm.resize(1000, 700);
        vm.zoomToCycle(5);
        vm.step(1);
        assertEquals(6, vm.selectedProperty().get());
        CycleMark c = vm.chart().data().cycles().get(6);
        TimeViewport vp = vm.viewportProperty().get();
        assertTrue(vp.startS() <= c.startS() && vp.endS() >= c.endS());
        vm.step(-1);
        vm.step(-1);
        assertEquals(4, vm.selectedProperty().get());
        vm.wholeLog();
        assertEquals(vm.chart().data().lastS() - vm.chart().data().firstS(), vm.viewportProperty().get().spanS(), 1e-9);
    }
}
