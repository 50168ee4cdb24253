package app.latentledger.cli;

import app.latentledger.core.psychro.MoistAirState;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.LinkedHashMap;
import java.util.Map;

/** A moist-air state as the JSON object every command prints it as, in the tech's units. */
final class StateJson {
    private StateJson() {
    }

    static Map<String, Object> of(MoistAirState s, UnitSystem units) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("units", units.key());
        m.put("pressure", Quantity.PRESSURE.toDisplay(units, s.pressurePa()));
        m.put("dryBulb", Quantity.TEMPERATURE.toDisplay(units, s.dryBulbC()));
        m.put("wetBulb", Quantity.TEMPERATURE.toDisplay(units, s.wetBulbC()));
        m.put("dewPoint", finiteOrNull(Quantity.TEMPERATURE.toDisplay(units, s.dewPointC())));
        m.put("relativeHumidity", s.relativeHumidityPct());
        m.put("humidityRatio", s.humidityRatio());
        m.put(units == UnitSystem.IP ? "grainsPerPound" : "gramsPerKilogram",
                Quantity.HUMIDITY_RATIO_FINE.toDisplay(units, s.humidityRatio()));
        m.put("degreeOfSaturation", s.degreeOfSaturation());
        m.put("vaporPressure", Quantity.PRESSURE.toDisplay(units, s.vaporPressurePa()));
        m.put("enthalpy", Quantity.ENTHALPY.toDisplay(units, s.enthalpyJPerKg()));
        m.put("specificVolume", Quantity.SPECIFIC_VOLUME.toDisplay(units, s.specificVolumeM3PerKg()));
        m.put("density", Quantity.DENSITY.toDisplay(units, s.densityKgPerM3()));
        return m;
    }

    static Double finiteOrNull(double v) {
        return Double.isFinite(v) ? v : null;
    }
}
