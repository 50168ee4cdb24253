package app.latentledger.core.psychro;

import com.synerset.hvacengine.fluids.humidair.HumidAir;
import com.synerset.unitility.unitsystem.humidity.RelativeHumidity;
import com.synerset.unitility.unitsystem.thermodynamic.Pressure;
import com.synerset.unitility.unitsystem.thermodynamic.Temperature;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A second independent implementation: hvac-engine 1.2.0 (com.synerset, MIT, Maven Central). It
 * departs from the handbook in places (its own specific-heat polynomials, a full enthalpy-balance
 * wet bulb, an approximate dew point), so tolerances follow docs/methods.md §1 (outside checks): 0.02 g/kg W,
 * 0.05 %RH, 0.05 K dew point, 0.01 K wet bulb, 0.05 kJ/kg enthalpy — and only where dry bulb,
 * wet bulb and dew point are all above 0.01 °C, the region where it is valid (its dew point is
 * over water below 0 °C, and its solver fails near a 0 °C wet bulb).
 */
class HvacEngineCrossCheckTest {

    @Test
    void agreesAboveFreezingAtThreeElevations() {
        List<String> failures = new ArrayList<>();
        int compared = 0;
        for (double elevationM : new double[] {0, 1000, 2500}) {
            double p = StandardAtmosphere.pressurePa(elevationM);
            for (double db = 5; db <= 45; db += 5) {
                for (double rh = 30; rh <= 95; rh += 5) {
                    MoistAirState s = MoistAirState.fromRelativeHumidity(p, db, rh, HandbookEdition.SI);
                    if (s.wetBulbC() <= 0.01 || s.dewPointC() <= 0.01) {
                        continue;
                    }
                    HumidAir ref = HumidAir.of(Pressure.ofPascal(p), Temperature.ofCelsius(db),
                            RelativeHumidity.ofPercentage(rh));
                    String at = String.format("p %.0f Pa, %.0f °C, %.0f %%: ", p, db, rh);
                    compare(failures, at + "W g/kg", s.humidityRatio() * 1000,
                            ref.getHumidityRatio().getInKilogramPerKilogram() * 1000, 0.02);
                    compare(failures, at + "dew point", s.dewPointC(), ref.getDewPointTemperature().getInCelsius(), 0.05);
                    compare(failures, at + "wet bulb", s.wetBulbC(), ref.getWetBulbTemperature().getInCelsius(), 0.01);
                    compare(failures, at + "RH", s.relativeHumidityPct(), ref.getRelativeHumidity().getInPercent(), 0.05);
                    compare(failures, at + "h kJ/kg", s.enthalpyJPerKg() / 1000,
                            ref.getSpecificEnthalpy().getInKiloJoulesPerKiloGram(), 0.05);
                    compared++;
                }
            }
        }
        assertTrue(compared > 250, "compared " + compared + " states");
        assertTrue(failures.isEmpty(), failures.size() + " disagreements: " + failures.subList(0, Math.min(8, failures.size())));
    }

    private static void compare(List<String> failures, String what, double got, double want, double tol) {
        if (!(Math.abs(got - want) <= tol)) {
            failures.add(what + " " + got + " vs hvac-engine " + want);
        }
    }
}
