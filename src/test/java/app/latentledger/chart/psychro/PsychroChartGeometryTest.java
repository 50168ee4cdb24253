package app.latentledger.chart.psychro;

import app.latentledger.chart.draw.RecordingPainter;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.MoistAirState;
import app.latentledger.core.psychro.Psychrometrics;
import app.latentledger.core.psychro.SitePressure;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.EnumSource;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** What the chart draws, measured from a recording, against the core and against PsychroLib. */
class PsychroChartGeometryTest {
    private static final double SEA_LEVEL_PA = SitePressure.SEA_LEVEL.pressurePa();

    private static PsychroChartData empty(UnitSystem units, double pressurePa) {
        return new PsychroChartData(units, pressurePa, "test", List.of(), List.of());
    }

    @ParameterizedTest
    @EnumSource(UnitSystem.class)
    @DisplayName("every plotted saturation point maps back to the core's Ws (HoF 2017 ch. 1 eq. 23) within a pixel")
    void saturationCurveMatchesCoreSaturationHumidityRatio(UnitSystem units) {
        for (double p : new double[] {SEA_LEVEL_PA, SitePressure.fromElevation(1600).pressurePa()}) {
            ChartGeometry g = new ChartGeometry(empty(units, p));
            RecordingPainter.Polyline sat = g.polyline("saturation");
            assertTrue(sat.xs().length > 100, "saturation sampled finely: " + sat.xs().length);
            for (int i = 0; i < sat.xs().length; i++) {
                double db = g.vp.dryBulbC(sat.xs()[i]);
                double expectedY = g.vp.y(Psychrometrics.saturationHumidityRatio(db, p));
                assertEquals(expectedY, sat.ys()[i], 1.0, "at " + db + " °C, " + p + " Pa");
            }
        }
    }

    @Test
    @DisplayName("the saturation curve passes PsychroLib 2.5.0's Ws at 80 °F sea level (grid row ip_e0_db80_wbd0) within a pixel")
    void saturationCurveAgreesWithPsychroLib() {
        PsychroLibRow row = PsychroLibRow.get("ip_e0_db80_wbd0");
        ChartGeometry g = new ChartGeometry(empty(UnitSystem.IP, row.pressurePa()));
        double x = g.vp.x(row.dryBulbC());
        double y = g.vp.y(row.humidityRatio());
        assertTrue(ChartGeometry.distance(g.polyline("saturation"), x, y) < 1.0);
    }

    @ParameterizedTest
    @CsvSource({"ip_e0_db80_rh50, 50", "ip_e0_db70_rh30, 30", "ip_e5280_db90_rh20, 20", "si_e0_db25_rh60, 60",
        "si_e1600_db30_rh40, 40"})
    @DisplayName("PsychroLib 2.5.0 grid states lie on the chart's RH curve of their RH within a pixel")
    void psychroLibStatesLieOnTheirRelativeHumidityCurve(String caseId, int rh) {
        PsychroLibRow row = PsychroLibRow.get(caseId);
        UnitSystem units = caseId.startsWith("ip") ? UnitSystem.IP : UnitSystem.SI;
        ChartGeometry g = new ChartGeometry(empty(units, row.pressurePa()));
        double d = ChartGeometry.distance(g.polyline("rh:" + rh), g.vp.x(row.dryBulbC()), g.vp.y(row.humidityRatio()));
        assertTrue(d < 1.0, caseId + " is " + d + " px off the " + rh + " % curve");
    }

    @Test
    @DisplayName("a core state at (db, W) plotted on the chart lies on the RH curve of its RH, every 10 % at 60–100 °F")
    void coreStatesLieOnTheirRelativeHumidityCurve() {
        ChartGeometry g = new ChartGeometry(empty(UnitSystem.IP, SEA_LEVEL_PA));
        for (int rh = 10; rh <= 90; rh += 10) {
            RecordingPainter.Polyline curve = g.polyline("rh:" + rh);
            for (double dbF = 60; dbF <= 100; dbF += 10) {
                MoistAirState s = MoistAirState.fromRelativeHumidity(SEA_LEVEL_PA, (dbF - 32) / 1.8, rh,
                        HandbookEdition.IP);
                double x = g.vp.x(s.dryBulbC());
                double y = g.vp.y(s.humidityRatio());
                if (g.vp.contains(x, y)) {
                    assertTrue(ChartGeometry.distance(curve, x, y) < 1.0, rh + " % at " + dbF + " °F");
                }
            }
        }
    }

    @Test
    @DisplayName("the 60 °F wet-bulb line passes PsychroLib's 80 °F db / 60 °F wb state (row ip_e0_db80_wbd20)")
    void wetBulbLineAgreesWithPsychroLib() {
        PsychroLibRow row = PsychroLibRow.get("ip_e0_db80_wbd20");
        ChartGeometry g = new ChartGeometry(empty(UnitSystem.IP, row.pressurePa()));
        double d = ChartGeometry.distance(g.polyline("wet-bulb:60"), g.vp.x(row.dryBulbC()),
                g.vp.y(row.humidityRatio()));
        assertTrue(d < 1.0, d + " px");
    }

    @ParameterizedTest
    @CsvSource({"ip_e0_db80_rh50", "ip_e5280_db70_rh60", "si_e0_db25_rh60", "si_e3000_db35_rh30"})
    @DisplayName("enthalpy and volume lines through PsychroLib 2.5.0's h and v give back its W at its dry bulb")
    void enthalpyAndVolumeLinesAgreeWithPsychroLib(String caseId) {
        PsychroLibRow row = PsychroLibRow.get(caseId);
        UnitSystem units = caseId.startsWith("ip") ? UnitSystem.IP : UnitSystem.SI;
        PsychroLines lines = new PsychroLines(units, row.pressurePa());
        double hSi = app.latentledger.core.units.Quantity.ENTHALPY.fromDisplay(units, row.enthalpyShown());
        double vSi = app.latentledger.core.units.Quantity.SPECIFIC_VOLUME.fromDisplay(units, row.volumeShown());
        // PsychroLib prints h and v to full precision; 0.5 % of W is far below a pixel on the chart
        assertEquals(row.humidityRatio(), lines.enthalpy(hSi).applyAsDouble(row.dryBulbC()),
                row.humidityRatio() * 0.005, "enthalpy line");
        assertEquals(row.humidityRatio(), lines.volume(vSi).applyAsDouble(row.dryBulbC()),
                row.humidityRatio() * 0.005, "volume line");
    }

    @Test
    @DisplayName("IP axes: dry bulb every 10 °F and humidity ratio in gr/lb, each label at its own value")
    void ipAxisTicksAreInInchPoundUnits() {
        ChartGeometry g = new ChartGeometry(empty(UnitSystem.IP, SEA_LEVEL_PA));
        List<RecordingPainter.Text> db = g.rec.ops(RecordingPainter.Text.class, "db-axis");
        List<String> dbLabels = db.stream().map(RecordingPainter.Text::text).toList();
        assertTrue(dbLabels.containsAll(List.of("40", "50", "60", "70", "80", "90", "100", "110")), dbLabels.toString());
        assertTrue(dbLabels.contains("Dry bulb, °F"));
        for (RecordingPainter.Text t : db) {
            if (t.text().matches("\\d+")) {
                double f = Double.parseDouble(t.text());
                assertEquals(g.vp.x((f - 32) / 1.8), t.x(), 1e-6, t.text());
            }
        }
        List<RecordingPainter.Text> w = g.rec.ops(RecordingPainter.Text.class, "w-axis");
        assertTrue(w.stream().anyMatch(t -> t.text().equals("Humidity ratio, gr/lb")));
        for (RecordingPainter.Text t : w) {
            if (t.text().matches("\\d+")) {
                double grains = Double.parseDouble(t.text());
                assertEquals(0, grains % 20, 1e-9, "gr/lb step of 20 at 800 px");
                assertEquals(g.vp.y(grains / 7000.0), t.y(), 1e-6, t.text());
            }
        }
    }

    @Test
    @DisplayName("SI axes: dry bulb in °C and humidity ratio in g/kg")
    void siAxisTicksAreInSiUnits() {
        ChartGeometry g = new ChartGeometry(empty(UnitSystem.SI, SEA_LEVEL_PA));
        List<String> db = g.rec.ops(RecordingPainter.Text.class, "db-axis").stream().map(RecordingPainter.Text::text)
                .toList();
        assertTrue(db.containsAll(List.of("0", "5", "10", "20", "30", "40", "45", "Dry bulb, °C")), db.toString());
        for (RecordingPainter.Text t : g.rec.ops(RecordingPainter.Text.class, "w-axis")) {
            if (t.text().matches("\\d+")) {
                assertEquals(g.vp.y(Double.parseDouble(t.text()) / 1000.0), t.y(), 1e-6, t.text());
            }
        }
        assertTrue(g.rec.texts().contains("Humidity ratio, g/kg"));
    }

    @Test
    @DisplayName("a before/after pair draws both processes, their ADPs, coil marks, dew points and a legend")
    void beforeAfterPairIsDrawnWithLegend() {
        PsychroChartData data = app.latentledger.fielddata.SaltreedDemo.beforeAfter(UnitSystem.IP);
        ChartGeometry g = new ChartGeometry(data);
        for (int i = 0; i < 2; i++) {
            assertEquals(1, g.rec.ops(RecordingPainter.Line.class, "process:" + i).size());
            assertEquals(2, g.rec.ops(RecordingPainter.Circle.class, "adp:" + i).size());
            // the triangle; the label's halo is a 4-point polygon
            assertEquals(1, g.rec.ops(RecordingPainter.Polygon.class, "coil:" + i).stream()
                    .filter(p -> p.xs().length == 3).count());
            assertEquals(1, g.rec.ops(RecordingPainter.Line.class, "dew-point:" + i).size());
        }
        // before: dashed line and square markers; after: solid and round
        assertEquals(app.latentledger.chart.draw.DashPattern.DASHED,
                g.rec.ops(RecordingPainter.Line.class, "process:0").get(0).stroke().dash());
        assertEquals(app.latentledger.chart.draw.DashPattern.SOLID,
                g.rec.ops(RecordingPainter.Line.class, "process:1").get(0).stroke().dash());
        assertEquals(1, g.rec.ops(RecordingPainter.Rect.class, "entering:0").size());
        assertEquals(1, g.rec.ops(RecordingPainter.Circle.class, "entering:1").size());
        List<String> legend = g.rec.ops(RecordingPainter.Text.class, "legend").stream()
                .map(RecordingPainter.Text::text).toList();
        assertTrue(legend.containsAll(List.of("Before", "After")), legend.toString());
        assertTrue(g.rec.balanced());
    }

    @Test
    @DisplayName("the key sits below the plot, outside it, and names every kind of mark the chart draws")
    void keyIsOutsideThePlotAndNamesEveryMark() {
        for (double[] size : new double[][] {{1280, 800}, {640, 520}, {1000, 620}}) {
            PsychroChartData data = app.latentledger.fielddata.SaltreedDemo.beforeAfter(UnitSystem.IP);
            ChartGeometry g = new ChartGeometry(data, size[0], size[1]);
            List<RecordingPainter.Rect> box = g.rec.ops(RecordingPainter.Rect.class, "legend");
            assertFalse(box.isEmpty(), "a key box");
            double plotBottom = g.vp.top() + g.vp.height();
            assertTrue(box.get(0).y() >= plotBottom, "key top " + box.get(0).y() + " is inside the plot (bottom "
                    + plotBottom + ")");
            assertTrue(box.get(0).y() + box.get(0).height() <= size[1] + 0.5, "key leaves the chart");
            List<String> legend = g.rec.ops(RecordingPainter.Text.class, "legend").stream()
                    .map(RecordingPainter.Text::text).toList();
            // drawn: dew-point diamonds, ADP rings, coil triangles; each kind needs its words in the key
            assertFalse(g.rec.ops(RecordingPainter.Polygon.class, "dew-point:0").isEmpty());
            assertTrue(legend.contains("entering dew point"), legend.toString());
            assertTrue(legend.contains("apparatus dew point"), legend.toString());
            assertTrue(legend.contains("coil temperature"), legend.toString());
            // no key text runs past the chart's right edge (estimate of its width, as the key lays out)
            for (RecordingPainter.Text t : g.rec.ops(RecordingPainter.Text.class, "legend")) {
                assertTrue(t.x() + app.latentledger.chart.draw.TextMeasurer.ESTIMATE.width(t.text(), t.style().size(),
                        t.style().bold()) <= size[0], t.text() + " runs off at width " + size[0]);
            }
        }
    }

    @Test
    @DisplayName("the subtitle is shortened to fit a narrow chart, never cut")
    void subtitleFitsTheWidth() {
        PsychroChartData data = app.latentledger.fielddata.SaltreedDemo.single(UnitSystem.IP);
        for (double w : new double[] {420, 640, 1280}) {
            ChartGeometry g = new ChartGeometry(data, w, 600);
            RecordingPainter.Text sub = g.rec.ops(RecordingPainter.Text.class, "title").stream()
                    .filter(t -> t.text().startsWith("Site pressure")).findFirst().orElseThrow();
            double end = sub.x() + g.rec.measurer().width(sub.text(), sub.style().size(), false);
            assertTrue(end <= w, "'" + sub.text() + "' ends at " + end + " in a chart " + w + " wide");
        }
    }

    @Test
    @DisplayName("the ADP mark sits on the saturation curve at the overlay's ADP")
    void adpMarkSitsOnSaturation() {
        PsychroChartData data = app.latentledger.fielddata.SaltreedDemo.single(UnitSystem.IP);
        ChartGeometry g = new ChartGeometry(data);
        RecordingPainter.Circle ring = g.rec.ops(RecordingPainter.Circle.class, "adp:0").get(0);
        double adp = data.overlays().get(0).adpC();
        assertEquals(g.vp.x(adp), ring.cx(), 1e-9);
        assertTrue(ChartGeometry.distance(g.polyline("saturation"), ring.cx(), ring.cy()) < 1.0);
    }

    @Test
    @DisplayName("painted whole at print size, every label's anchor lies inside the chart area")
    void printSizedChartKeepsItsLabelsInside() {
        PsychroChart chart = new PsychroChart(app.latentledger.fielddata.SaltreedDemo.beforeAfter(UnitSystem.SI));
        RecordingPainter rec = new RecordingPainter();
        chart.paintWhole(rec, app.latentledger.chart.draw.Theme.LIGHT, 1000, 620);
        assertTrue(rec.balanced());
        for (RecordingPainter.Text t : rec.ops(RecordingPainter.Text.class, null)) {
            assertTrue(t.x() >= 0 && t.x() <= 1000 && t.y() >= 0 && t.y() <= 620, t.toString());
        }
    }
}
