package app.latentledger.chart.timeline;

import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** What a tap on a cycle shows, in the tech's units. */
public final class CycleReadout {
    private CycleReadout() {
    }

    public static List<String> lines(int index, CycleMark c, UnitSystem units) {
        List<String> out = new ArrayList<>();
        out.add("Cycle " + (index + 1));
        out.add(String.format(Locale.ROOT, "On %.1f min, off %.1f min", (c.onEndS() - c.startS()) / 60,
                (c.endS() - c.onEndS()) / 60));
        out.add(mass("Removed", c.removedKg(), units));
        out.add(mass("Returned", c.returnedKg(), units));
        out.add(c.blowerInRest());
        out.add(Double.isNaN(c.onsetS()) ? "No moisture removal"
                : String.format(Locale.ROOT, "Removal began at %.1f min", (c.onsetS() - c.startS()) / 60));
        return out;
    }

    private static String mass(String name, double kg, UnitSystem units) {
        return String.format(Locale.ROOT, "%s %.2f %s", name, Quantity.WATER_MASS.toDisplay(units, kg),
                Quantity.WATER_MASS.symbol(units));
    }
}
