package app.latentledger.ui.results;

import app.latentledger.core.findings.Cautions;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.visit.ReadingSetCheck;
import app.latentledger.store.DemoScenario;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.entry.EntryViewModel;
import app.latentledger.ui.present.ResultSheet;
import app.latentledger.ui.present.VisitResults;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Slot;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

import static app.latentledger.ui.entry.Typing.type;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The results screen's view model without a window. The verdicts expected are those of the coil
 * check's three-way rule (CoilVerdict, docs/methods.md §9.7) on the demo's readings, whose story
 * (DemoScenario) was worked out with the core: "before" cools without drying, "after" dries.
 */
class ResultsViewModelTest {
    @TempDir
    Path dir;

    @Test
    void theVerdictFollowsEachAcceptedValue() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel entry = new EntryViewModel(s);
            ResultsViewModel results = new ResultsViewModel(s);
            assertEquals("incomplete", results.sheet().verdictKey());
            // the demo's "before" readings: supply no drier than the return, coil above the dew point
            type(entry, Slot.RETURN_DRY_BULB, "76");
            type(entry, Slot.RETURN_HUMIDITY, "66");
            type(entry, Slot.SUPPLY_DRY_BULB, "66.5");
            type(entry, Slot.SUPPLY_HUMIDITY, "62.8");
            entry.select(Slot.COIL_TEMPERATURE);
            entry.choose("evaporator-saturation");
            type(entry, Slot.COIL_TEMPERATURE, "64");
            assertTrue(results.sheet().headline().startsWith("Waiting for airflow"), results.sheet().headline());
            type(entry, Slot.AIRFLOW, "1410");
            assertEquals("not-dehumidifying", results.sheet().verdictKey());
            // a colder coil alone: below the dew point, but the air is not measurably drier yet
            type(entry, Slot.COIL_TEMPERATURE, "46");
            assertEquals("cant-tell", results.sheet().verdictKey());
            // then the "after" supply readings and airflow
            type(entry, Slot.RETURN_DRY_BULB, "75");
            type(entry, Slot.RETURN_HUMIDITY, "65");
            type(entry, Slot.SUPPLY_DRY_BULB, "57");
            type(entry, Slot.SUPPLY_HUMIDITY, "55");
            type(entry, Slot.AIRFLOW, "1080");
            assertEquals("dehumidifying", results.sheet().verdictKey());
            assertEquals("Dehumidifying", results.sheet().headline());
        }
    }

    @Test
    void theScreenShowsTheCommandsNumbersForAStoredReadingSet() {
        try (AppSession s = TestSessions.open(dir)) {
            s.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).ifPresent(s::openVisit);
            s.openReadingSet(DemoScenario.READINGS_BEFORE);
            ResultSheet sheet = new ResultsViewModel(s).sheet();
            ReadingSet rs = s.ledger().readings().find(DemoScenario.READINGS_BEFORE).orElseThrow();
            ResultSheet direct = VisitResults.of(ReadingSetCheck.run(rs, s.system(), s.site(), s.thresholds(),
                    s.units()), s.units());
            assertEquals(direct.performance(), sheet.performance(), "same adapter as the commands and the report");
            assertEquals("not-dehumidifying", sheet.verdictKey());
            assertFalse(sheet.findings().isEmpty(), "a coil that does not dry has findings");
            assertEquals(Cautions.SAFETY_LINE, sheet.safety());
            // 76 °F db / 66 °F wb at 39 ft: dew point 60.8 °F (the demo's notes, from the state command;
            // a printed IP psychrometric chart reads about 61 °F, from memory)
            assertEquals("60.8", sheet.entering().stream().filter(r -> r.key().equals("entering-dew-point"))
                    .findFirst().orElseThrow().value());
            assertTrue(sheet.performance("dew-point-margin").value().contains("±"), "margin with its uncertainty");
            // a per-day figure from a running rate is not a rating: it says so beside it
            assertTrue(sheet.performance("moisture-removal-daily").label().contains("if it ran all day"),
                    sheet.performance("moisture-removal-daily").label());
        }
    }
}
