package app.latentledger.cli;

import app.latentledger.core.settings.NumberSetting;
import app.latentledger.core.settings.SettingsCatalogue;
import app.latentledger.core.settings.ShownNumber;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.Test;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;

import static app.latentledger.cli.CoilCommandTest.run;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The default instrument tolerances read the same in the one table the app and the command line use
 * ({@link SettingsCatalogue}), in the coil command's help and in the field guide's table: a tech who
 * reads one of them must not find another figure in the next.
 */
class ToleranceDefaultsAgreeTest {
    /** Each tolerance setting and the words the field guide's table names it with. */
    private static final Map<String, String> GUIDE_NAMES = new LinkedHashMap<>();

    static {
        GUIDE_NAMES.put(SettingsCatalogue.TOL_DRY_BULB, "dry bulb");
        GUIDE_NAMES.put(SettingsCatalogue.TOL_RH, "RH");
        GUIDE_NAMES.put(SettingsCatalogue.TOL_WET_BULB, "wet bulb");
        GUIDE_NAMES.put(SettingsCatalogue.TOL_DEW_POINT, "dew point");
        GUIDE_NAMES.put(SettingsCatalogue.TOL_COIL, "coil surface");
        GUIDE_NAMES.put(SettingsCatalogue.TOL_AIRFLOW, "airflow");
        GUIDE_NAMES.put(SettingsCatalogue.TOL_CONDENSATE, "condensate");
    }

    private static String shown(String key) {
        NumberSetting n = SettingsCatalogue.number(key).orElseThrow();
        String unit = n.quantity().symbol(UnitSystem.IP);
        return "±" + ShownNumber.text(n.quantity().toDisplay(UnitSystem.IP, n.defaultSi())) + " " + unit;
    }

    @Test
    void theFieldGuidesTableGivesTheAppsDefaults() throws Exception {
        String guide = Files.readString(Path.of("docs", "field-guide.md")).replaceAll("\\s+", " ");
        int at = guide.indexOf("**Instrument tolerances**");
        assertTrue(at >= 0, "the field guide has its tolerance table");
        String table = guide.substring(at, guide.indexOf(". ", guide.indexOf("condensate ±", at)) + 1);
        for (Map.Entry<String, String> e : GUIDE_NAMES.entrySet()) {
            String said = e.getValue() + " " + shown(e.getKey());
            assertTrue(table.contains(said), "field guide says '" + said + "': " + table);
        }
    }

    @Test
    void theCoilHelpGivesTheAppsDefaults() {
        String help = run("coil --help").out().replaceAll("\\s+", " ");
        for (String key : GUIDE_NAMES.keySet()) {
            String v = shown(key);
            // the help writes "±2 %RH" for relative humidity, the unit glued to the number
            String said = key.equals(SettingsCatalogue.TOL_RH) ? v.replace(" %", " %RH") : v;
            assertTrue(help.contains(said), "coil --help says '" + said + "': " + help);
        }
    }
}
