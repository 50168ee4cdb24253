package app.latentledger.ui.house;

import app.latentledger.cli.Cli;
import app.latentledger.core.house.HouseBudget;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.DemoScenario;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.session.AppSession;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The House screen's model gives the same budget as {@code house --visit} and stores each reading at once. */
class HouseViewModelTest {
    @TempDir
    Path dir;

    @Test
    void sameBudgetAsTheCommandAndEachReadingStoredAtOnce() {
        try (AppSession s = TestSessions.open(dir)) {
            s.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).ifPresent(s::openVisit);
            HouseViewModel vm = new HouseViewModel(s);
            HouseBudget b = vm.budgetProperty().get();
            assertNotNull(b, vm.refusalProperty().get());
            assertEquals("as-found", vm.fixRows().get(0).key());
            // a new data folder shows the demo house with a plausible budget: the house settles where its
            // gains meet removal, a dry-air-basis mass balance (ASHRAE HoF ch. 1) whose moisture lies between
            // the coil's apparatus dew point (low 50s °F on the demo coil) and the demo's 74–75 °F outdoor
            // and attic dew points, plus the internal sources
            double dpF = Quantity.TEMPERATURE.toDisplay(UnitSystem.IP, b.asFound().equilibriumDewPointC().valueSi());
            assertTrue(dpF > 50 && dpF < 75, "equilibrium dew point " + dpF + " °F");
            assertTrue(b.asFound().gains().valueSi() > 0 && b.asFound().removal().valueSi() > 0);
            assertEquals(b.whatIfs().size() + 1, vm.fixRows().size());
            assertTrue(vm.cautions().contains(app.latentledger.core.house.HouseFindings.COMBUSTION),
                    "the demo's fixes change house pressure: the combustion-appliance caution is on screen");
            assertTrue(vm.cautions().contains(app.latentledger.core.house.HouseFindings.ATTIC_HEAT));

            ByteArrayOutputStream out = new ByteArrayOutputStream();
            int code = Cli.standard().run(List.of("--data-dir", dir.toString(), "house", "--visit",
                    DemoScenario.VISIT_COMPLAINT, "--json", "--units", s.units().key()),
                    new PrintStream(out, true, StandardCharsets.UTF_8), System.err);
            assertEquals(0, code);
            JsonObject j = JsonParser.parseString(out.toString(StandardCharsets.UTF_8)).getAsJsonObject();
            assertEquals(j.getAsJsonObject("gains").getAsJsonObject("total").get("value").getAsDouble(),
                    Quantity.WATER_MASS_DAILY.toDisplay(s.units(), b.asFound().gains().valueSi()), 1e-9);

            // a wetter outdoor reading, stored at once, raises the gains
            var r = vm.readings();
            var o = r.outdoor();
            vm.keep(r.withOutdoor(new app.latentledger.core.coil.AirReading("outdoor", o.dryBulbC(), o.dryBulbTolK(),
                    o.humidityKind(), o.humiditySi() + 0.5, o.humidityTolSi())));
            assertEquals(o.humiditySi() + 0.5, s.ledger().houses().readings(DemoScenario.VISIT_COMPLAINT).outdoor()
                    .humiditySi(), 1e-12);
            assertTrue(vm.budgetProperty().get().asFound().gains().valueSi() > b.asFound().gains().valueSi());
        }
    }
}
