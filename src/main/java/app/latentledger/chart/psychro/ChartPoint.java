package app.latentledger.chart.psychro;

import java.util.Objects;

/**
 * One moist-air state to plot.
 *
 * @param label         what the tech calls it ("Return", "Supply", "Outdoor")
 * @param dryBulbC      dry bulb, °C
 * @param humidityRatio kg water per kg dry air, 0 up to saturation
 */
public record ChartPoint(String label, double dryBulbC, double humidityRatio) {
    public ChartPoint {
        Objects.requireNonNull(label, "label");
        if (!Double.isFinite(dryBulbC) || !Double.isFinite(humidityRatio) || humidityRatio < 0) {
            throw new IllegalArgumentException("chart point '" + label + "' needs a finite dry bulb and a humidity ratio"
                    + " of at least 0, got " + dryBulbC + " °C, " + humidityRatio + " kg/kg");
        }
    }
}
