package app.latentledger.chart.psychro;

import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.MoistAirState;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.List;
import java.util.Locale;

/**
 * What a tap on a plotted state shows: the full state from the core
 * ({@link MoistAirState#fromHumidityRatio}) in the chart's units and handbook edition.
 */
public final class StateReadout {
    private StateReadout() {
    }

    public static MoistAirState state(ChartPoint point, double pressurePa, UnitSystem units) {
        return MoistAirState.fromHumidityRatio(pressurePa, point.dryBulbC(), point.humidityRatio(),
                HandbookEdition.of(units));
    }

    /** The point's name, then one line per property: dry bulb, wet bulb, dew point, RH, W, h. */
    public static List<String> lines(ChartPoint point, double pressurePa, UnitSystem units) {
        MoistAirState s = state(point, pressurePa, units);
        return List.of(point.label(),
                row("Dry bulb", Quantity.TEMPERATURE, s.dryBulbC(), 1, units),
                row("Wet bulb", Quantity.TEMPERATURE, s.wetBulbC(), 1, units),
                row("Dew point", Quantity.TEMPERATURE, s.dewPointC(), 1, units),
                String.format(Locale.ROOT, "RH %.0f %%", s.relativeHumidityPct()),
                row("Humidity ratio", Quantity.HUMIDITY_RATIO_FINE, s.humidityRatio(), units == UnitSystem.IP ? 0 : 1,
                        units),
                row("Enthalpy", Quantity.ENTHALPY, s.enthalpyJPerKg(), 1, units));
    }

    static String row(String name, Quantity q, double si, int decimals, UnitSystem units) {
        return String.format(Locale.ROOT, "%s %." + decimals + "f %s", name, q.toDisplay(units, si), q.symbol(units));
    }
}
