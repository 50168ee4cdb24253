package app.latentledger.chart.psychro;

import java.util.Objects;

/**
 * A coil process to draw over the chart: air entering and leaving the coil, the process line
 * extended to the apparatus dew point, the coil surface temperature on the saturation curve and
 * the entering air's dew point.
 *
 * @param name              shown in the legend ("Before", "After"; "" for a single process)
 * @param adpC              apparatus dew point, °C, or NaN when not known
 * @param coilTempC         measured coil (suction saturation or surface) temperature, °C, or NaN
 * @param enteringDewPointC dew point of the entering air, °C, or NaN to leave it off
 */
public record CoilProcessOverlay(String name, ChartPoint entering, ChartPoint leaving, double adpC, double coilTempC,
                                 double enteringDewPointC) {
    public CoilProcessOverlay {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(entering, "entering");
        Objects.requireNonNull(leaving, "leaving");
    }
}
