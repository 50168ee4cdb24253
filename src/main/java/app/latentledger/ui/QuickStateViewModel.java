package app.latentledger.ui;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.MoistAirState;
import app.latentledger.core.psychro.SitePressure;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;

import java.util.Locale;

/**
 * State of the quick moist-air screen: what the tech typed (as text, in IP) and what the core
 * computed from it. The view only binds to these properties.
 */
public final class QuickStateViewModel {
    private final UnitSystem units = UnitSystem.IP;
    private final StringProperty elevation = new SimpleStringProperty("0");
    private final StringProperty dryBulb = new SimpleStringProperty("80");
    private final StringProperty wetBulb = new SimpleStringProperty("67");
    private final ReadOnlyStringWrapper result = new ReadOnlyStringWrapper();
    private final ReadOnlyStringWrapper problem = new ReadOnlyStringWrapper("");

    public QuickStateViewModel() {
        elevation.addListener((o, a, b) -> recompute());
        dryBulb.addListener((o, a, b) -> recompute());
        wetBulb.addListener((o, a, b) -> recompute());
        recompute();
    }

    public StringProperty elevationProperty() {
        return elevation;
    }

    public StringProperty dryBulbProperty() {
        return dryBulb;
    }

    public StringProperty wetBulbProperty() {
        return wetBulb;
    }

    /** The computed state, several lines, or empty while the input is refused. */
    public ReadOnlyStringProperty resultProperty() {
        return result.getReadOnlyProperty();
    }

    /** Why the input is refused, naming the field, value and range; empty when accepted. */
    public ReadOnlyStringProperty problemProperty() {
        return problem.getReadOnlyProperty();
    }

    private void recompute() {
        try {
            SitePressure site = SitePressure.fromElevation(
                    Quantity.ELEVATION.fromDisplay(units, number("elevation", elevation.get())));
            MoistAirState s = MoistAirState.fromWetBulb(site.pressurePa(),
                    Quantity.TEMPERATURE.fromDisplay(units, number("dry bulb", dryBulb.get())),
                    Quantity.TEMPERATURE.fromDisplay(units, number("wet bulb", wetBulb.get())),
                    HandbookEdition.of(units));
            result.set(String.format(Locale.ROOT,
                    "Dew point %.1f °F%nRelative humidity %.1f %%%nHumidity ratio %.1f gr/lb%nEnthalpy %.2f Btu/lb",
                    Quantity.TEMPERATURE.toDisplay(units, s.dewPointC()), s.relativeHumidityPct(),
                    Quantity.HUMIDITY_RATIO_FINE.toDisplay(units, s.humidityRatio()),
                    Quantity.ENTHALPY.toDisplay(units, s.enthalpyJPerKg())));
            problem.set("");
        } catch (InvalidInputException e) {
            result.set("");
            problem.set(e.message(units));
        } catch (IllegalArgumentException e) {
            result.set("");
            problem.set(e.getMessage());
        }
    }

    private static double number(String field, String text) {
        try {
            return Double.parseDouble(text.trim().replace(',', '.'));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(field + " '" + text + "' is not a number");
        }
    }
}
