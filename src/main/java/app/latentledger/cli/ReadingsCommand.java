package app.latentledger.cli;

import app.latentledger.core.coil.CoilReadings;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.findings.Cautions;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.psychro.SitePressure;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Ids;
import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.SetLabel;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.StatedAccuracy;
import app.latentledger.core.records.Visit;
import app.latentledger.core.settings.InstrumentTolerances;
import app.latentledger.core.settings.Settings;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.ReadingSetCheck;
import app.latentledger.core.visit.StoredReadings;
import app.latentledger.store.Ledger;

import java.time.OffsetDateTime;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * {@code readings add VISIT}: records a reading set on a visit from the {@code coil} command's
 * reading options, checks it the way the app does ({@link ReadingSetCheck}) and prints its id and
 * verdict. Instruments named with {@code --instrument} are the visit's (added to it when new); their
 * stated accuracy fills every tolerance not typed with a {@code --tol-*} option.
 */
public final class ReadingsCommand implements Command {
    /** ±300 Pa (about ±0.09 inHg): a field barometer's usual stated accuracy (common practice, no source). */
    static final double DEFAULT_PRESSURE_TOL_PA = 300;

    private static final List<String> NOT_HERE = List.of("outdoor-db", "outdoor-wb", "outdoor-rh", "outdoor-dew-point",
            "outdoor-fraction", "tol-outdoor-fraction", "nominal-tons", "nominal-kw", "elevation", "rh-target");

    @Override
    public String name() {
        return "readings";
    }

    @Override
    public String summary() {
        return "record a reading set on a visit (add) and see its verdict";
    }

    @Override
    public String usage() {
        return "usage: latent-ledger [--data-dir DIR] readings add VISIT\n"
                + "         --return-db T (--return-wb T | --return-rh PCT | --return-dew-point T)\n"
                + "         --supply-db T (--supply-wb T | --supply-rh PCT | --supply-dew-point T) --airflow CFM|L/S\n"
                + "         [--airflow-at return|supply] [--airflow-method TEXT]\n"
                + "         [--coil-temp T [--coil-temp-kind coil-surface|evaporator-saturation]]\n"
                + "         [--condensate ML | --condensate-floz FLOZ] [--condensate-minutes MIN]\n"
                + "         [--pressure PSIA|KPA [--tol-pressure PSI|KPA]] [--units ip|si]\n"
                + "         [--tol-db D] [--tol-rh PCT] [--tol-wb D] [--tol-dew-point D] [--tol-coil D]\n"
                + "         [--tol-airflow-pct PCT] [--tol-condensate-pct PCT]\n"
                + "         [--label before|after|other] [--notes TEXT] [--instrument NAME]... [--taken-at ISO-8601] [--json]\n"
                + "  the reading options are the coil command's; the site's elevation and the system's nominal size\n"
                + "  are the visit's (a measured station pressure may be given with --pressure)\n"
                + "  --instrument: one of the visit's instruments by name or id (see: visits instruments VISIT); a new\n"
                + "  name is added to the visit; stated accuracies fill the tolerances not given with --tol-*\n"
                + "  prints the new reading set's id and its verdict: dehumidifying | not-dehumidifying | cant-tell\n";
    }

    @Override
    public int run(Args args, CliContext context) {
        List<String> words = args.positionals();
        if (words.size() != 2 || !words.get(0).equals("add")) {
            throw new UsageException("give: readings add VISIT …\n" + usage());
        }
        for (String o : NOT_HERE) {
            if (args.has(o)) {
                throw new UsageException("--" + o + " is not taken by readings add: " + why(o));
            }
        }
        boolean json = args.flag("json");
        try (Ledger ledger = LedgerRecords.open(context)) {
            Settings settings = ledger.settings().load();
            UnitSystem units = UnitOptions.units(args, settings.units());
            Visit visit = LedgerRecords.visit(ledger, words.get(1));
            Site site = ledger.sites().find(visit.siteId()).orElseThrow();
            HvacSystem system = ledger.systems().find(visit.systemId()).orElseThrow();

            String label = label(args.value("label"));
            String notes = args.value("notes");
            String method = args.value("airflow-method");
            OffsetDateTime at = takenAt(args.value("taken-at"));
            List<Instrument> known = ledger.instruments().forVisit(visit.id());
            List<Instrument> chosen = new ArrayList<>();
            List<Instrument> added = new ArrayList<>();
            for (String name : args.values("instrument")) {
                Instrument i = instrument(known, name);
                if (i == null) {
                    i = LedgerRecords.refusing(units, "--instrument", () -> new Instrument(Ids.newId(), visit.id(), name,
                            "", null, StatedAccuracy.NONE));
                    added.add(i);
                    known = new ArrayList<>(known);
                    known.add(i);
                }
                if (!chosen.contains(i)) {
                    chosen.add(i);
                }
            }
            InstrumentTolerances tolerances = Instrument.accuracyOf(chosen).over(settings.tolerances());
            SitePressure pressure = UnitOptions.site(args, units, site.elevationM());
            Double tolPressure = UnitOptions.si(args, "tol-pressure", Quantity.PRESSURE, units);
            if (tolPressure != null && !pressure.measured()) {
                throw new UsageException("--tol-pressure needs --pressure");
            }
            CoilReadings readings = CoilOptions.read(args, units, pressure, tolerances);
            args.rejectUnknown();

            List<String> described = new ArrayList<>();
            chosen.forEach(i -> described.add(i.describe()));
            Measurement station = pressure.measured() ? new Measurement(pressure.pressurePa(),
                    tolPressure == null ? DEFAULT_PRESSURE_TOL_PA : tolPressure) : null;
            ReadingSet set = LedgerRecords.refusing(units, null, () -> StoredReadings.of(Ids.newId(), visit.id(), at,
                    label, String.join("; ", described), readings, station, method, notes));
            LedgerRecords.refusing(units, null, () -> {
                ledger.inTransaction(() -> {
                    added.forEach(i -> ledger.instruments().save(i));
                    ledger.readings().save(set);
                    ledger.instruments().useOn(set.id(), chosen.stream().map(Instrument::id).toList());
                });
                return null;
            });
            added.forEach(i -> context.err().println("added instrument '" + i.name() + "' to the visit ("
                    + i.id() + "); no stated accuracy, so the settings' tolerances apply to what it reads"));

            CoilResult result = ReadingSetCheck.run(set, system, site, settings.thresholds(), units);
            Map<String, Object> m = LedgerRecords.made(set.id(), "readings");
            m.put("visitId", visit.id());
            m.put("label", set.label());
            m.put("verdict", result.verdict().key());
            List<String> codes = new ArrayList<>();
            result.findings().forEach(f -> codes.add(f.code().key()));
            m.put("findings", codes);
            m.put("instruments", chosen.stream().map(Instrument::id).toList());
            if (json) {
                context.out().print(Json.print(m) + "\n");
            } else {
                StringBuilder b = new StringBuilder("Added reading set " + set.id()
                        + (set.label().isEmpty() ? "" : " [" + set.label() + "]") + " to visit " + Visits.shortId(visit.id())
                        + "\n  verdict: " + result.verdict().key() + "\n");
                for (Finding f : result.findings()) {
                    b.append("  [").append(f.severity().key()).append("] ").append(f.code().key()).append(": ")
                            .append(f.message()).append('\n');
                }
                context.out().print(b.append(Cautions.SAFETY_LINE).append('\n'));
            }
            return Cli.OK;
        }
    }

    private static String why(String option) {
        return switch (option) {
            case "nominal-tons", "nominal-kw" -> "the system's nominal size is used (systems add)";
            case "elevation" -> "the site's elevation is used; give --pressure for a measured station pressure";
            case "rh-target" -> "the stored indoor RH target is used (settings set)";
            default -> "a reading set keeps the air entering the coil; record the mixed air as the return reading";
        };
    }

    private static String label(String text) {
        if (text == null) {
            return "";
        }
        try {
            return SetLabel.parse("--label", text).key();
        } catch (InvalidRecordException e) {
            throw new UsageException(e.getMessage());
        }
    }

    private static OffsetDateTime takenAt(String text) {
        if (text == null) {
            return OffsetDateTime.now();
        }
        try {
            return OffsetDateTime.parse(text);
        } catch (DateTimeParseException e) {
            throw new UsageException("--taken-at '" + text + "' is not an ISO-8601 date-time with offset,"
                    + " e.g. 2026-07-16T10:05:00-04:00");
        }
    }

    /** The visit's instrument with this name (any case) or id, or null. */
    static Instrument instrument(List<Instrument> known, String typed) {
        for (Instrument i : known) {
            if (i.id().equals(typed) || i.name().toLowerCase(Locale.ROOT).equals(typed.strip().toLowerCase(Locale.ROOT))) {
                return i;
            }
        }
        return null;
    }
}
