package app.latentledger;

import app.latentledger.cli.Cli;
import app.latentledger.core.coil.Tolerances;
import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.settings.InstrumentTolerances;
import app.latentledger.ui.session.Slot;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * L6: the app's keypad and the command line start the same readings with the same tolerances, from
 * one table ({@link Tolerances}), so the same readings give the same verdict bands everywhere.
 * Values from the instruments' stated accuracy: ±10 % airflow (California Title 24 Part 6
 * RA3.7.2.2, 2013), ±3.5 psi suction gauge ≈ ±1.8 °F saturation for R-410A near 40 °F (RA3.2.2.2).
 */
class DefaultTolerancesTest {

    @Test
    @DisplayName("Keypad boxes, stored-settings defaults and the command line share one tolerance table")
    void oneTable() {
        assertEquals(0.10, Tolerances.AIRFLOW_FRACTION);
        assertEquals(1.8 / 1.8, Tolerances.EVAPORATOR_SATURATION_K);
        assertEquals(Tolerances.AIRFLOW_FRACTION, Slot.AIRFLOW.defaultToleranceSi("entering"));
        assertEquals(Tolerances.DEW_POINT_K, Slot.SUPPLY_HUMIDITY.defaultToleranceSi("dew-point"));
        assertEquals(Tolerances.RELATIVE_HUMIDITY_PCT, Slot.RETURN_HUMIDITY.defaultToleranceSi("rh"));
        assertEquals(Tolerances.WET_BULB_K, Slot.RETURN_HUMIDITY.defaultToleranceSi("wet-bulb"));
        assertEquals(Tolerances.COIL_K, Slot.COIL_TEMPERATURE.defaultToleranceSi("coil-surface"));
        assertEquals(Tolerances.EVAPORATOR_SATURATION_K, Slot.COIL_TEMPERATURE.defaultToleranceSi("evaporator-saturation"));
        assertEquals(Tolerances.DRY_BULB_K, Slot.RETURN_DRY_BULB.defaultToleranceSi(null));
        InstrumentTolerances d = InstrumentTolerances.DEFAULTS;
        assertEquals(List.of(Tolerances.DRY_BULB_K, Tolerances.RELATIVE_HUMIDITY_PCT, Tolerances.WET_BULB_K,
                        Tolerances.DEW_POINT_K, Tolerances.COIL_K, Tolerances.AIRFLOW_FRACTION, Tolerances.CONDENSATE_FRACTION),
                List.of(d.dryBulbK(), d.relativeHumidityPct(), d.wetBulbK(), d.dewPointK(), d.coilK(),
                        d.airflowFraction(), d.condensateFraction()));
        for (HumidityKind k : HumidityKind.values()) {
            assertEquals(Tolerances.humidity(k), d.humidity(k), k.key());
        }
        assertEquals(Tolerances.EVAPORATOR_SATURATION_K, d.coil(CoilTemperatureKind.EVAPORATOR_SATURATION));
        assertEquals(Tolerances.COIL_K, d.coil(CoilTemperatureKind.COIL_SURFACE));
    }

    @Test
    @DisplayName("The command line gives a gauge saturation reading ±1.8 °F and a 95 % RH supply ±3 % RH by default")
    void commandLineDefaults(@TempDir Path dir) {
        JsonObject j = json(dir, "coil", "--return-db", "75", "--return-dew-point", "55", "--supply-db", "55",
                "--supply-rh", "95", "--airflow", "1200", "--coil-temp", "40", "--coil-temp-kind", "evaporator-saturation",
                "--json");
        JsonObject tol = j.getAsJsonObject("uncertainty").getAsJsonObject("inputTolerances");
        assertEquals(1.8, tol.get("coilTemperature").getAsDouble(), 1e-9);
        assertEquals(3.0, tol.get("leavingHumidity").getAsDouble(), 1e-9, "capacitive RH outside 10–90 %");
        assertEquals(1.0, tol.get("enteringHumidity").getAsDouble(), 1e-9, "dew-point meter ±1 °F");
        assertEquals(120, tol.get("airflow").getAsDouble(), 1e-9, "±10 % of 1,200 cfm");
    }

    private static JsonObject json(Path dir, String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        String[] all = new String[args.length + 2];
        all[0] = "--data-dir";
        all[1] = dir.toString();
        System.arraycopy(args, 0, all, 2, args.length);
        int code = Cli.standard().run(List.of(all), new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        assertEquals(0, code, err.toString(StandardCharsets.UTF_8));
        return JsonParser.parseString(out.toString(StandardCharsets.UTF_8)).getAsJsonObject();
    }
}
