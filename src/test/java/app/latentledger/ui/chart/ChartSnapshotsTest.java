package app.latentledger.ui.chart;

import app.latentledger.fielddata.SaltreedDemo;
import app.latentledger.chart.draw.Theme;
import app.latentledger.core.units.UnitSystem;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.Parent;
import javafx.scene.Scene;
import javafx.scene.image.WritableImage;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

import javax.imageio.ImageIO;
import java.awt.image.BufferedImage;
import java.io.File;
import java.io.IOException;
import java.util.HashSet;
import java.util.Set;
import java.util.concurrent.atomic.AtomicReference;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Renders both charts at 1280 × 800 in light and dark into target/screens/ for a person to look at,
 * and checks each image really holds a drawing (many distinct colours, not a blank canvas).
 */
@ExtendWith(ApplicationExtension.class)
class ChartSnapshotsTest {
    private Stage stage;

    @Start
    void start(Stage stage) {
        this.stage = stage;
        stage.setScene(new Scene(new javafx.scene.layout.Pane(), 1280, 800));
        stage.show();
    }

    @Test
    void psychrometricChartsRenderInBothThemesAndUnits(FxRobot robot) throws IOException {
        for (UnitSystem u : UnitSystem.values()) {
            for (Theme t : new Theme[] {Theme.LIGHT, Theme.DARK}) {
                PsychroChartViewModel vm = new PsychroChartViewModel(SaltreedDemo.beforeAfter(u));
                vm.themeProperty().set(t);
                shoot(robot, () -> new PsychroChartView(vm), "psychro-" + u.key() + "-" + t.name());
            }
        }
        // zoomed about the coil processes, then a tap on the after-supply state
        PsychroChartViewModel vm = new PsychroChartViewModel(SaltreedDemo.beforeAfter(UnitSystem.IP));
        shoot(robot, () -> new PsychroChartView(vm), "psychro-ip-zoomed");
        var supply = vm.chart().data().overlays().get(1).leaving();
        robot.interact(() -> {
            var vp = vm.viewportProperty().get();
            vm.zoom(3, vp.x(supply.dryBulbC()), vp.y(supply.humidityRatio()));
            var z = vm.viewportProperty().get();
            vm.tap(z.x(supply.dryBulbC()), z.y(supply.humidityRatio()));
        });
        save(robot, "psychro-ip-zoomed");
    }

    @Test
    void timelinesRenderWeekAndOneCycle(FxRobot robot) throws IOException {
        for (Theme t : new Theme[] {Theme.LIGHT, Theme.DARK}) {
            TimelineViewModel vm = new TimelineViewModel(SaltreedDemo.week(UnitSystem.IP, 7));
            vm.themeProperty().set(t);
            shoot(robot, () -> new TimelineView(vm), "timeline-week-" + t.name());
            robot.interact(() -> vm.zoomToCycle(40));
            save(robot, "timeline-cycle-" + t.name());
            robot.interact(() -> vm.zoomToCycle(2));
            robot.interact(() -> vm.zoom(1 / 40.0, vm.viewportProperty().get().left()));
            save(robot, "timeline-day-" + t.name());
        }
    }

    private void shoot(FxRobot robot, java.util.function.Supplier<Parent> view, String name) throws IOException {
        robot.interact(() -> stage.getScene().setRoot(view.get()));
        save(robot, name);
    }

    private void save(FxRobot robot, String name) throws IOException {
        robot.interact(() -> { });
        AtomicReference<WritableImage> img = new AtomicReference<>();
        robot.interact(() -> {
            stage.getScene().getRoot().layout();
            img.set(stage.getScene().snapshot(null));
        });
        BufferedImage bi = SwingFXUtils.fromFXImage(img.get(), null);
        File dir = new File("target/screens");
        dir.mkdirs();
        ImageIO.write(bi, "png", new File(dir, name + ".png"));
        Set<Integer> colours = new HashSet<>();
        for (int y = 0; y < bi.getHeight(); y += 3) {
            for (int x = 0; x < bi.getWidth(); x += 3) {
                colours.add(bi.getRGB(x, y));
            }
        }
        assertTrue(colours.size() > 50, name + " looks blank: " + colours.size() + " colours");
    }
}
