package app.latentledger.chart.source;

import app.latentledger.chart.psychro.ChartPoint;
import app.latentledger.chart.psychro.CoilProcessOverlay;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.CoilTemperatureSource;

/**
 * A coil check as the psychrometric chart draws it. The one place the chart learns from a coil
 * result, so the app and the report draw the same thing.
 */
public final class CoilChartSource {
    private CoilChartSource() {
    }

    /**
     * @param name e.g. "Before" or "After"; labels the points "Before return", "Before supply"
     */
    public static CoilProcessOverlay overlay(String name, CoilResult r) {
        String enteringLabel = r.mixed() ? name + " mixed" : name + " return";
        ChartPoint entering = new ChartPoint(enteringLabel, r.entering().dryBulbC(), r.entering().humidityRatio());
        ChartPoint leaving = new ChartPoint(name + " supply", r.leaving().dryBulbC(), r.leaving().humidityRatio());
        double adp = r.adp().found() ? r.adp().temperatureC() : Double.NaN;
        // the ADP is drawn on its own; mark a coil temperature only when one was measured
        double coil = r.coilTemperatureSource() == CoilTemperatureSource.MEASURED ? r.coilTemperatureC() : Double.NaN;
        return new CoilProcessOverlay(name, entering, leaving, adp, coil, r.entering().dewPointC());
    }

    /** Extra points worth marking beside a coil process: the return and outdoor air of a mix. */
    public static java.util.List<ChartPoint> contextPoints(String name, CoilResult r) {
        java.util.List<ChartPoint> points = new java.util.ArrayList<>();
        if (r.mixed()) {
            points.add(new ChartPoint(name + " return", r.returnAir().dryBulbC(), r.returnAir().humidityRatio()));
        }
        if (r.outdoorAir() != null) {
            points.add(new ChartPoint(name + " outdoor", r.outdoorAir().dryBulbC(), r.outdoorAir().humidityRatio()));
        }
        return points;
    }
}
