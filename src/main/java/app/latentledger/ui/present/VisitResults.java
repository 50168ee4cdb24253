package app.latentledger.ui.present;

import app.latentledger.core.text.DailyWaterWords;
import app.latentledger.core.coil.CoilProcess;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.CoilVerdict;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.coil.WithheldRatios;
import app.latentledger.core.findings.Cautions;
import app.latentledger.core.findings.Evidence;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.psychro.MoistAirState;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.Ratio;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;

/**
 * A coil check worded for the screen: the results sheet, the verdict's headline and the finding
 * cards the results, compare and log screens share. The check itself comes from the session (the
 * same adapter the commands and the report use, so the screen shows their numbers); nothing here
 * computes beyond unit conversion for display.
 */
public final class VisitResults {
    private VisitResults() {
    }

    /** The sheet while the coil check still waits for readings, named as a tech names them. */
    public static ResultSheet waiting(List<String> readings) {
        return incomplete("Waiting for " + String.join(", ", readings),
                "Results appear as soon as these readings are in.");
    }

    /** The sheet when the record or the coil check refused the readings, with the reason. */
    public static ResultSheet refused(String why) {
        return incomplete("Readings refused", why);
    }

    /** The sheet of a finished coil check. */
    public static ResultSheet of(CoilResult r, UnitSystem units) {
        List<FindingCard> cards = new ArrayList<>();
        for (Finding f : r.findings()) {
            cards.add(card(f, units));
        }
        return new ResultSheet(r.verdict(), headline(r.verdict()), explanation(r.verdict()),
                state(r.entering(), units, "entering"), state(r.leaving(), units, "leaving"),
                performance(r, units), cards, Cautions.SAFETY_LINE, marginSentence(r, units));
    }

    /** Whose dew point the coil is held against: the return's, or the mix's when outdoor air comes in. */
    public static String enteringAir(CoilResult r) {
        return r.mixed() ? "entering" : "return";
    }

    /** The dew-point margin in the one wording the screen, the report and the command line share. */
    public static String marginSentence(CoilResult r, UnitSystem units) {
        var e = r.estimate(Measurand.DEW_POINT_MARGIN);
        if (e == null || !e.exists()) {
            return "";
        }
        return app.latentledger.core.text.MarginWords.sentence(units, e.valueSi(), e.expandedSi(), enteringAir(r));
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
        return new ResultSheet(null, headline, why, List.of(), List.of(), List.of(), List.of(), Cautions.SAFETY_LINE,
                "");
    }

    private static List<Row> state(MoistAirState s, UnitSystem u, String prefix) {
        String t = Quantity.TEMPERATURE.symbol(u);
        return List.of(
                new Row(prefix + "-dry-bulb", "Dry bulb", Shown.of(Quantity.TEMPERATURE, u, s.dryBulbC()), t),
                new Row(prefix + "-wet-bulb", "Wet bulb", Shown.of(Quantity.TEMPERATURE, u, s.wetBulbC()), t),
                new Row(prefix + "-dew-point", "Dew point", Shown.of(Quantity.TEMPERATURE, u, s.dewPointC()), t),
                new Row(prefix + "-rh", "Relative humidity", Shown.of(Quantity.RELATIVE_HUMIDITY, u,
                        s.relativeHumidityPct()), Quantity.RELATIVE_HUMIDITY.symbol(u)),
                new Row(prefix + "-humidity-ratio", "Humidity ratio", Shown.of(Quantity.HUMIDITY_RATIO_FINE, u,
                        s.humidityRatio()), Quantity.HUMIDITY_RATIO_FINE.symbol(u)),
                new Row(prefix + "-enthalpy", "Enthalpy", Shown.of(Quantity.ENTHALPY, u, s.enthalpyJPerKg()),
                        Quantity.ENTHALPY.symbol(u)));
    }

    private static List<Row> performance(CoilResult r, UnitSystem u) {
        CoilProcess p = r.process();
        List<Row> rows = new ArrayList<>();
        rows.add(row(r, u, "total", "Total capacity", Measurand.TOTAL, Quantity.POWER));
        rows.add(new Row("total-large", "Total capacity", Shown.of(Quantity.POWER_LARGE, u, p.totalW()),
                Quantity.POWER_LARGE.symbol(u)));
        rows.add(row(r, u, "sensible", "Sensible", Measurand.SENSIBLE, Quantity.POWER));
        rows.add(row(r, u, "latent", "Latent", Measurand.LATENT, Quantity.POWER));
        rows.add(ratioRow(r, u, "shr", "Sensible heat ratio", Measurand.SHR, WithheldRatios.shr(r)));
        rows.add(row(r, u, "moisture-removal", Measurand.MOISTURE_REMOVAL.title(u), Measurand.MOISTURE_REMOVAL, Quantity.WATER_RATE));
        // never a negative amount of water: a coil that leaves the air wetter says it adds water
        rows.add(new Row("moisture-removal-daily", DailyWaterWords.label(p.moistureRemovalKgPerS(), u),
                DailyWaterWords.number(p.moistureRemovalKgPerS(), u), Quantity.WATER_RATE_DAILY.symbol(u)));
        rows.add(row(r, u, "latent-per-airflow", Measurand.LATENT_PER_AIRFLOW.title(u), Measurand.LATENT_PER_AIRFLOW,
                Quantity.POWER_PER_AIRFLOW));
        rows.add(row(r, u, "humidity-drop", Measurand.HUMIDITY_RATIO_DROP.title(u), Measurand.HUMIDITY_RATIO_DROP,
                Quantity.HUMIDITY_RATIO_FINE));
        rows.add(marginRow(r, u));
        rows.add(new Row("coil-temperature", "Coil temperature (" + coilSource(r) + ")",
                Shown.of(Quantity.TEMPERATURE, u, r.coilTemperatureC()), Quantity.TEMPERATURE.symbol(u)));
        String adpWhyNot = WithheldRatios.apparatusDewPointWhyNot(r);
        rows.add(adpWhyNot.isEmpty() ? row(r, u, "apparatus-dew-point", "Apparatus dew point",
                Measurand.APPARATUS_DEW_POINT, Quantity.TEMPERATURE)
                : new Row("apparatus-dew-point", "Apparatus dew point", Ratio.notMeasurable(adpWhyNot), ""));
        rows.add(ratioRow(r, u, "bypass-factor", "Bypass factor", Measurand.BYPASS_FACTOR, WithheldRatios.bypassFactor(r)));
        if (r.condensate() != null && r.condensate().usable()) {
            // a steady catch more certain than the air side gives the latent and SHR beside the air-side figures
            rows.add(row(r, u, "latent-from-condensate", "Latent from the water caught",
                    Measurand.LATENT_FROM_CONDENSATE, Quantity.POWER));
            rows.add(ratioRow(r, u, "shr-from-condensate", "Sensible heat ratio from the water caught",
                    Measurand.SHR_FROM_CONDENSATE, WithheldRatios.shrFromCondensate(r)));
        }
        // what the tech switched on the pad, beside the figures it changes
        rows.add(new Row("airflow", "Airflow as read (" + (r.readings().airflowAt().key().equals("entering")
                ? "return side" : "supply side") + ")", Shown.of(Quantity.AIRFLOW, u, r.readings().airflowM3PerS()),
                r.readings().airflowBasis().label() + " " + Quantity.AIRFLOW.symbol(u)));
        rows.add(new Row("probes", "Humidity probes", r.readings().probes().sameInstrument() ? "one instrument"
                : "two probes", ""));
        if (r.readings().probes().hasOffset()) {
            rows.add(new Row("supply-dew-point-offset", "Supply probe offset taken off",
                    Shown.of(Quantity.TEMPERATURE_DIFFERENCE, u, r.readings().probes().supplyDewPointOffsetK()),
                    Quantity.TEMPERATURE_DIFFERENCE.symbol(u)));
        }
        String perTonWhyNot = WithheldRatios.airflowPerNominalWhyNot(r);
        String perTon = Measurand.AIRFLOW_PER_NOMINAL_CAPACITY.title(u);
        rows.add(perTonWhyNot.isEmpty() ? new Row("airflow-per-nominal", perTon,
                Shown.of(Quantity.AIRFLOW_PER_CAPACITY, u, r.airflowPerNominalCapacity()),
                Quantity.AIRFLOW_PER_CAPACITY.symbol(u))
                : new Row("airflow-per-nominal", perTon, Ratio.notMeasurable(perTonWhyNot), ""));
        return rows;
    }

    /** A ratio with its uncertainty, or "not measurable (why)" with no unit: never NaN, a bare dash or 0. */
    private static Row ratioRow(CoilResult r, UnitSystem u, String key, String label, Measurand m, Ratio ratio) {
        return ratio.measurable() ? row(r, u, key, label, m, m.quantity())
                : new Row(key, label, Ratio.notMeasurable(ratio.reason()), "");
    }

    /** "Coil against the return dew point  3.2 ± 2.3  °F warmer": which side, never a bare minus sign. */
    private static Row marginRow(CoilResult r, UnitSystem u) {
        var e = r.estimate(Measurand.DEW_POINT_MARGIN);
        String air = enteringAir(r);
        if (e == null || !e.exists()) {
            return new Row("dew-point-margin", app.latentledger.core.text.MarginWords.label(air), Shown.NONE,
                    Quantity.TEMPERATURE_DIFFERENCE.symbol(u));
        }
        String direction = app.latentledger.core.text.MarginWords.direction(u, e.valueSi());
        return new Row("dew-point-margin", app.latentledger.core.text.MarginWords.label(air),
                app.latentledger.core.text.MarginWords.number(u, e.valueSi(), e.expandedSi()),
                (Quantity.TEMPERATURE_DIFFERENCE.symbol(u) + " " + direction).trim());
    }

    private static String coilSource(CoilResult r) {
        return switch (r.coilTemperatureSource()) {
            case MEASURED -> "measured";
            case APPARATUS_DEW_POINT -> "apparatus dew point";
            case NONE -> "none";
        };
    }

    private static Row row(CoilResult r, UnitSystem u, String key, String label, Measurand m, Quantity q) {
        return new Row(key, label, Shown.of(q, u, r.estimate(m)), q.symbol(u));
    }

    /** A core finding worded for the screen. */
    public static FindingCard card(Finding f, UnitSystem u) {
        List<String> evidence = new ArrayList<>();
        for (Evidence e : f.evidence()) {
            // worded as the PDF words it: the same value prints the same string on screen and paper
            evidence.add(e.label() + ": " + DisplayNumber.withSpread(e.quantity(), u, e.valueSi(), e.uncertaintySi()));
        }
        return new FindingCard(f.code().key(), f.severity(), f.message(), f.technical(), evidence, f.nextChecks());
    }
}
