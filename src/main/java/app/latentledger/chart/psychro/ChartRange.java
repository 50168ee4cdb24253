package app.latentledger.chart.psychro;

import app.latentledger.core.units.UnitSystem;

/**
 * A window on the chart in its own coordinates: dry bulb (°C) across, humidity ratio (kg/kg) up.
 */
public record ChartRange(double dbMinC, double dbMaxC, double wMin, double wMax) {

    public ChartRange {
        if (!(dbMaxC > dbMinC) || !(wMax > wMin)) {
            throw new IllegalArgumentException("chart range needs max above min: dry bulb " + dbMinC + "…" + dbMaxC
                    + " °C, humidity ratio " + wMin + "…" + wMax + " kg/kg");
        }
    }

    /**
     * The comfort-cooling window a field chart shows: 35–110 °F and 0–196 gr/lb in IP (0.028 lb/lb,
     * the top of the handbook's sea-level chart No. 1), 0–45 °C and 0–30 g/kg in SI. Common
     * practice, no source for the exact bounds.
     */
    public static ChartRange fieldDefault(UnitSystem units) {
        return units == UnitSystem.IP
                ? new ChartRange((35 - 32) / 1.8, (110 - 32) / 1.8, 0, 0.028)
                : new ChartRange(0, 45, 0, 0.030);
    }

    public double dbSpanC() {
        return dbMaxC - dbMinC;
    }

    public double wSpan() {
        return wMax - wMin;
    }
}
