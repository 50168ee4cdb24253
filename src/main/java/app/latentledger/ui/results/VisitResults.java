package app.latentledger.ui.results;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.coil.CoilProcess;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.CoilVerdict;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.findings.Cautions;
import app.latentledger.core.findings.Evidence;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.psychro.MoistAirState;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.ReadingSetCheck;
import app.latentledger.ui.entry.Draft;
import app.latentledger.ui.entry.DraftRecords;
import app.latentledger.ui.entry.Slot;

import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;

/**
 * The results of a draft: its reading set through {@link ReadingSetCheck} (the same adapter the
 * commands and the report use, so the screen shows their numbers), worded for the screen. No
 * computation happens here beyond unit conversion for display.
 */
public final class VisitResults {
    private VisitResults() {
    }

    public static ResultSheet of(Draft draft, Site site, HvacSystem system, ThresholdSettings thresholds,
                                 UnitSystem units) {
        return work(draft, site, system, thresholds, units).sheet();
    }

    /**
     * The sheet and the coil check behind it (for the chart).
     *
     * @param sheet the worded results
     * @param coil  the coil check, or null while the readings are incomplete or refused
     */
    public record Outcome(ResultSheet sheet, CoilResult coil) {
    }

    /** The draft's coil check and its sheet, worked out once for both the figures and the chart. */
    public static Outcome work(Draft draft, Site site, HvacSystem system, ThresholdSettings thresholds,
                               UnitSystem units) {
        List<String> waiting = waitingFor(draft);
        if (!waiting.isEmpty()) {
            return new Outcome(incomplete("Waiting for " + String.join(", ", waiting),
                    "Results appear as soon as these readings are in."), null);
        }
        try {
            ReadingSet rs = DraftRecords.toReadingSet(draft, OffsetDateTime.now());
            CoilResult r = ReadingSetCheck.run(rs, system, site, thresholds, units);
            return new Outcome(of(r, units), r);
        } catch (InvalidInputException e) {
            return new Outcome(incomplete("Readings refused", e.message(units)), null);
        } catch (InvalidRecordException e) {
            return new Outcome(incomplete("Readings refused", e.getMessage()), null);
        }
    }

    /** What the coil check still needs, as a tech names it; empty when it can run. */
    public static List<String> waitingFor(Draft d) {
        List<String> out = new ArrayList<>();
        for (Slot s : List.of(Slot.RETURN_DRY_BULB, Slot.RETURN_HUMIDITY, Slot.SUPPLY_DRY_BULB,
                Slot.SUPPLY_HUMIDITY, Slot.AIRFLOW)) {
            if (!d.has(s)) {
                out.add(s.title(d.choice(s)).toLowerCase(java.util.Locale.ROOT).replace("rh", "RH"));
            }
        }
        return out;
    }

    /** The sheet of a finished coil check. */
    public static ResultSheet of(CoilResult r, UnitSystem units) {
        List<FindingCard> cards = new ArrayList<>();
        for (Finding f : r.findings()) {
            cards.add(card(f, units));
        }
        return new ResultSheet(r.verdict(), headline(r.verdict()), explanation(r.verdict()),
                state(r.entering(), units, "entering"), state(r.leaving(), units, "leaving"),
                performance(r, units), cards, Cautions.SAFETY_LINE);
    }

    public static String headline(CoilVerdict v) {
        return switch (v) {
            case DEHUMIDIFYING -> "Dehumidifying";
            case NOT_DEHUMIDIFYING -> "Not dehumidifying";
            case CANT_TELL -> "Can't tell from these readings";
        };
    }

    private static String explanation(CoilVerdict v) {
        return switch (v) {
            case DEHUMIDIFYING -> "The coil is colder than the return dew point and the air leaves drier.";
            case NOT_DEHUMIDIFYING -> "The coil cools the air but does not take water out of it.";
            case CANT_TELL -> "The margin or the moisture drop is within what the instruments can resolve.";
        };
    }

    private static ResultSheet incomplete(String headline, String why) {
        return new ResultSheet(null, headline, why, List.of(), List.of(), List.of(), List.of(), Cautions.SAFETY_LINE);
    }

    private static List<Row> state(MoistAirState s, UnitSystem u, String prefix) {
        String t = Quantity.TEMPERATURE.symbol(u);
        return List.of(
                new Row(prefix + "-dry-bulb", "Dry bulb", Shown.of(Quantity.TEMPERATURE, u, s.dryBulbC(), 1), t),
                new Row(prefix + "-wet-bulb", "Wet bulb", Shown.of(Quantity.TEMPERATURE, u, s.wetBulbC(), 1), t),
                new Row(prefix + "-dew-point", "Dew point", Shown.of(Quantity.TEMPERATURE, u, s.dewPointC(), 1), t),
                new Row(prefix + "-rh", "Relative humidity", Shown.number(s.relativeHumidityPct(), 0), "%"),
                new Row(prefix + "-humidity-ratio", "Moisture", Shown.of(Quantity.HUMIDITY_RATIO_FINE, u,
                        s.humidityRatio(), 1), Quantity.HUMIDITY_RATIO_FINE.symbol(u)),
                new Row(prefix + "-enthalpy", "Enthalpy", Shown.of(Quantity.ENTHALPY, u, s.enthalpyJPerKg(), 1),
                        Quantity.ENTHALPY.symbol(u)));
    }

    private static List<Row> performance(CoilResult r, UnitSystem u) {
        CoilProcess p = r.process();
        List<Row> rows = new ArrayList<>();
        rows.add(row(r, u, "total", "Total capacity", Measurand.TOTAL, Quantity.POWER, 0));
        rows.add(new Row("total-large", "Total capacity", Shown.of(Quantity.POWER_LARGE, u, p.totalW(), 2),
                Quantity.POWER_LARGE.symbol(u)));
        rows.add(row(r, u, "sensible", "Sensible", Measurand.SENSIBLE, Quantity.POWER, 0));
        rows.add(row(r, u, "latent", "Latent", Measurand.LATENT, Quantity.POWER, 0));
        rows.add(row(r, u, "shr", "Sensible heat ratio", Measurand.SHR, Quantity.DIMENSIONLESS, 2));
        rows.add(row(r, u, "moisture-removal", "Water removed", Measurand.MOISTURE_REMOVAL, Quantity.WATER_RATE, 2));
        rows.add(new Row("moisture-removal-daily", "Water removed per day",
                Shown.of(Quantity.WATER_RATE_DAILY, u, p.moistureRemovalKgPerS(), 0), Quantity.WATER_RATE_DAILY.symbol(u)));
        rows.add(row(r, u, "latent-per-airflow", "Latent per airflow", Measurand.LATENT_PER_AIRFLOW,
                Quantity.POWER_PER_AIRFLOW, 1));
        rows.add(row(r, u, "humidity-drop", "Moisture drop", Measurand.HUMIDITY_RATIO_DROP,
                Quantity.HUMIDITY_RATIO_FINE, 1));
        rows.add(row(r, u, "dew-point-margin", "Dew point minus coil", Measurand.DEW_POINT_MARGIN,
                Quantity.TEMPERATURE_DIFFERENCE, 1));
        rows.add(new Row("coil-temperature", "Coil temperature (" + coilSource(r) + ")",
                Shown.of(Quantity.TEMPERATURE, u, r.coilTemperatureC(), 1), Quantity.TEMPERATURE.symbol(u)));
        rows.add(new Row("airflow-per-nominal", "Airflow per nominal size",
                Shown.of(Quantity.AIRFLOW_PER_CAPACITY, u, r.airflowPerNominalCapacity(), 0),
                Quantity.AIRFLOW_PER_CAPACITY.symbol(u)));
        return rows;
    }

    private static String coilSource(CoilResult r) {
        return switch (r.coilTemperatureSource()) {
            case MEASURED -> "measured";
            case APPARATUS_DEW_POINT -> "apparatus dew point";
            case NONE -> "none";
        };
    }

    private static Row row(CoilResult r, UnitSystem u, String key, String label, Measurand m, Quantity q, int d) {
        return new Row(key, label, Shown.of(q, u, r.estimate(m), d), q.symbol(u));
    }

    /** A core finding worded for the screen. */
    public static FindingCard card(Finding f, UnitSystem u) {
        List<String> evidence = new ArrayList<>();
        for (Evidence e : f.evidence()) {
            int decimals = e.quantity() == Quantity.DIMENSIONLESS || e.quantity() == Quantity.POWER_LARGE ? 2
                    : e.quantity() == Quantity.POWER || e.quantity() == Quantity.AIRFLOW ? 0 : 1;
            String v = Shown.of(e.quantity(), u, new app.latentledger.core.coil.Estimate(e.valueSi(),
                    e.uncertaintySi()), decimals);
            String unit = e.quantity().symbol(u);
            evidence.add(e.label() + ": " + v + (unit.isEmpty() ? "" : " " + unit));
        }
        return new FindingCard(f.code().key(), f.severity(), f.message(), f.technical(), evidence, f.nextChecks());
    }
}
