package app.latentledger.cli;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Ids;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.SignOff;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.StatedAccuracy;
import app.latentledger.core.records.Visit;
import app.latentledger.core.records.VisitPaperwork;
import app.latentledger.core.records.VisitPurpose;
import app.latentledger.core.settings.Settings;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.Ledger;
import java.time.ZoneId;
import app.latentledger.io.logcsv.DateOrder;
import app.latentledger.visit.VisitLogs;
import app.latentledger.visit.VisitLog;
import app.latentledger.visit.LogProblem;

import java.nio.file.Path;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The recording subcommands of {@code visits}: {@code new}, {@code notes}, {@code instruments},
 * {@code sign-off} and {@code attach-log}. Each saves through the ledger's repositories (the same
 * checks as the app) and prints the id it made or changed.
 */
final class VisitRecords {
    static final List<String> SUBCOMMANDS = List.of("new", "notes", "instruments", "sign-off", "attach-log");

    private VisitRecords() {
    }

    static String usage() {
        return "       latent-ledger [--data-dir DIR] visits new SYSTEM --technician NAME\n"
                + "             [--purpose complaint|commissioning|before|after|follow-up] [--started-at ISO-8601] [--notes TEXT] [--json]\n"
                + "       latent-ledger [--data-dir DIR] visits notes VISIT [--customer-words TEXT] [--work-done TEXT] [--json]\n"
                + "       latent-ledger [--data-dir DIR] visits instruments VISIT [--json]\n"
                + "       latent-ledger [--data-dir DIR] visits instruments VISIT --name NAME [--serial TEXT]\n"
                + "             [--calibrated YYYY-MM-DD] [--acc-db D] [--acc-rh PCT] [--acc-wb D] [--acc-dew-point D]\n"
                + "             [--acc-coil D] [--acc-airflow-pct PCT] [--units ip|si] [--json]\n"
                + "       latent-ledger [--data-dir DIR] visits sign-off VISIT (--technician NAME | --customer NAME)\n"
                + "             [--remark TEXT] [--json]\n"
                + "       latent-ledger [--data-dir DIR] visits attach-log VISIT FILE [--map HEADER=field]... [--time-zone ZONE]\n"
                + "             [--units ip|si] [--json]\n"
                + "  SYSTEM: a system id or its first characters (see: systems list SITE); the visit is at its site\n"
                + "  --acc-*: the instrument's stated accuracy (± °F or K; %RH; % of the airflow reading); it fills the\n"
                + "  tolerances of the reading sets it takes (readings add --instrument NAME)\n"
                + "  attach-log keeps a data-logger CSV with the visit once it reads and analyses, as the app does;\n"
                + "  clock times written without a UTC offset are read in --time-zone, else the site's zone (sites edit\n"
                + "  --time-zone), else this computer's; the zone used is kept with the log\n";
    }

    static int run(String sub, Args args, CliContext context) {
        List<String> words = args.positionals();
        boolean json = args.flag("json");
        try (Ledger ledger = LedgerRecords.open(context)) {
            Settings settings = ledger.settings().load();
            UnitSystem units = UnitOptions.units(args, settings.units());
            Map<String, Object> result;
            String text;
            switch (sub) {
                case "new": {
                    need(words, 2, "visits new SYSTEM --technician NAME");
                    HvacSystem system = LedgerRecords.system(ledger, words.get(1));
                    String technician = args.value("technician");
                    String purposeText = args.value("purpose");
                    String startedText = args.value("started-at");
                    String notes = args.value("notes");
                    args.rejectUnknown();
                    if (technician == null) {
                        throw new UsageException("visits new needs --technician NAME");
                    }
                    VisitPurpose purpose = purposeText == null ? VisitPurpose.COMPLAINT : refusing(() ->
                            VisitPurpose.parse("--purpose", purposeText));
                    OffsetDateTime started = time("--started-at", startedText);
                    Visit v = LedgerRecords.refusing(units, null, () -> {
                        Visit made = new Visit(Ids.newId(), system.siteId(), system.id(), started, technician, purpose,
                                notes);
                        ledger.visits().save(made);
                        return made;
                    });
                    Site site = ledger.sites().find(v.siteId()).orElseThrow();
                    result = LedgerRecords.made(v.id(), "visit");
                    result.put("siteId", v.siteId());
                    result.put("systemId", v.systemId());
                    text = "Started visit " + v.id() + " at " + site.name() + ", " + system.label() + "\n";
                    break;
                }
                case "notes": {
                    need(words, 2, "visits notes VISIT");
                    Visit v = LedgerRecords.visit(ledger, words.get(1));
                    String words1 = args.value("customer-words");
                    String done = args.value("work-done");
                    args.rejectUnknown();
                    VisitPaperwork w = ledger.paperwork().forVisit(v.id());
                    if (words1 != null || done != null) {
                        VisitPaperwork changed = w.withNotes(words1 == null ? w.customerWords() : words1,
                                done == null ? w.workDone() : done);
                        w = LedgerRecords.refusing(units, null, () -> {
                            ledger.paperwork().save(changed);
                            return changed;
                        });
                    }
                    result = LedgerRecords.made(v.id(), "visit");
                    result.put("customerWords", w.customerWords());
                    result.put("workDone", w.workDone());
                    text = "Visit " + v.id() + "\n  customer's words: " + orDash(w.customerWords())
                            + "\n  work done:        " + orDash(w.workDone()) + "\n";
                    break;
                }
                case "instruments": {
                    need(words, 2, "visits instruments VISIT");
                    Visit v = LedgerRecords.visit(ledger, words.get(1));
                    String name = args.value("name");
                    if (name == null) {
                        args.rejectUnknown();
                        List<Object> rows = new ArrayList<>();
                        StringBuilder b = new StringBuilder();
                        for (Instrument i : ledger.instruments().forVisit(v.id())) {
                            rows.add(instrumentJson(i, units));
                            b.append(String.format("%-36s  %s%s%n", i.id(), i.describe(), accuracyText(i.accuracy(), units)));
                        }
                        context.out().print(json ? Json.print(rows) + "\n"
                                : b.length() == 0 ? "no instruments recorded on visit " + v.id() + "\n" : b.toString());
                        return Cli.OK;
                    }
                    Instrument i = instrument(args, v, name, units, ledger);
                    result = LedgerRecords.made(i.id(), "instrument");
                    result.putAll(instrumentJson(i, units));
                    text = "Added instrument " + i.describe() + ": " + i.id() + "\n";
                    break;
                }
                case "sign-off": {
                    need(words, 2, "visits sign-off VISIT (--technician NAME | --customer NAME)");
                    Visit v = LedgerRecords.visit(ledger, words.get(1));
                    String tech = args.value("technician");
                    String customer = args.value("customer");
                    String remark = args.value("remark");
                    args.rejectUnknown();
                    if ((tech == null) == (customer == null)) {
                        throw new UsageException("give one of --technician NAME or --customer NAME");
                    }
                    VisitPaperwork w = ledger.paperwork().forVisit(v.id());
                    VisitPaperwork signed = LedgerRecords.refusing(units, null, () -> {
                        SignOff s = new SignOff(tech != null ? tech : customer, OffsetDateTime.now(), remark);
                        VisitPaperwork changed = tech != null ? w.withTechnician(s) : w.withCustomer(s);
                        ledger.paperwork().save(changed);
                        return changed;
                    });
                    SignOff s = tech != null ? signed.technician() : signed.customer();
                    result = LedgerRecords.made(v.id(), "visit");
                    result.put("signedBy", s.name());
                    result.put("role", tech != null ? "technician" : "customer");
                    result.put("signedAt", s.signedAt().toString());
                    text = "Visit " + v.id() + " signed off by " + s.name() + " (" + result.get("role") + ") at "
                            + Visits.when(s.signedAt()) + "\n";
                    break;
                }
                default: {
                    need(words, 3, "visits attach-log VISIT FILE");
                    Visit v = LedgerRecords.visit(ledger, words.get(1));
                    Map<String, String> maps = maps(args.values("map"));
                    ZoneId chosen = zone(args.value("time-zone"));
                    args.rejectUnknown();
                    Attached kept = attach(ledger, v, Path.of(words.get(2)), units, maps, chosen, settings);
                    ImportedLog log = kept.log();
                    result = LedgerRecords.made(log.id(), "log");
                    result.put("visitId", v.id());
                    result.put("samples", log.samples().size());
                    result.put("channels", log.samples().channelNames());
                    result.put("timeZone", kept.zone() == null ? null : kept.zone().zone().getId());
                    result.put("timeZoneFrom", kept.zone() == null ? null
                            : kept.zone().from().name().toLowerCase(java.util.Locale.ROOT));
                    text = "Kept log " + log.sourceFileName() + " with visit " + Visits.shortId(v.id()) + ": " + log.id()
                            + " (" + log.samples().size() + " samples; " + String.join(", ", log.samples().channelNames())
                            + (kept.zone() == null ? "" : "; clock times read in " + kept.zone().words("computer"))
                            + ")\n";
                }
            }
            context.out().print(json ? Json.print(result) + "\n" : text);
            return Cli.OK;
        }
    }

    private static Instrument instrument(Args args, Visit v, String name, UnitSystem units, Ledger ledger) {
        String serial = args.value("serial");
        String calibrated = args.value("calibrated");
        Double db = UnitOptions.si(args, "acc-db", Quantity.TEMPERATURE_DIFFERENCE, units);
        Double rh = args.number("acc-rh");
        Double wb = UnitOptions.si(args, "acc-wb", Quantity.TEMPERATURE_DIFFERENCE, units);
        Double dew = UnitOptions.si(args, "acc-dew-point", Quantity.TEMPERATURE_DIFFERENCE, units);
        Double coil = UnitOptions.si(args, "acc-coil", Quantity.TEMPERATURE_DIFFERENCE, units);
        Double airflowPct = args.number("acc-airflow-pct");
        args.rejectUnknown();
        if (ReadingsCommand.instrument(ledger.instruments().forVisit(v.id()), name) != null) {
            throw new UsageException("visit " + Visits.shortId(v.id()) + " already has an instrument named '" + name + "'");
        }
        LocalDate date;
        try {
            date = calibrated == null ? null : LocalDate.parse(calibrated);
        } catch (DateTimeParseException e) {
            throw new UsageException("--calibrated '" + calibrated + "' is not a date YYYY-MM-DD");
        }
        return LedgerRecords.refusing(units, null, () -> {
            Instrument i = new Instrument(Ids.newId(), v.id(), name, serial, date, new StatedAccuracy(db, rh, wb, dew, coil,
                    airflowPct == null ? null : airflowPct / 100));
            ledger.instruments().save(i);
            return i;
        });
    }

    /**
     * The CSV read, analysed and kept through {@link VisitLogs}, as the app's log screen does: clock
     * times without a UTC offset in the zone chosen, else the site's, else this computer's; kept with
     * the airflows it was analysed at and the zone used. Refused (nothing kept) when it does not analyse.
     */
    private static Attached attach(Ledger ledger, Visit v, Path file, UnitSystem units, Map<String, String> maps,
                                   ZoneId chosen, Settings settings) {
        VisitLogs.ReadOptions options = new VisitLogs.ReadOptions(units, maps, DateOrder.AUTO, chosen);
        VisitLogs.ClockZone zone = VisitLogs.clockZone(ledger, v, options);
        VisitLog a;
        try {
            a = VisitLogs.importAndKeep(ledger, v, file, options, Double.NaN, Double.NaN, settings.thresholds(), null);
        } catch (LogProblem e) {
            throw new UsageException(e.getMessage() + "; nothing was kept");
        }
        ImportedLog log = ledger.logs().find(a.logId()).orElseThrow();
        return new Attached(log, a.importReport().timeZone().isEmpty() ? null : zone);
    }

    /** A log kept with its visit, and the zone its clock times were read in (null: the file gave offsets). */
    private record Attached(ImportedLog log, VisitLogs.ClockZone zone) {
    }

    /** {@code --time-zone ZONE}: a zone id or a fixed offset, as the log command reads it; null when not given. */
    private static ZoneId zone(String typed) {
        if (typed == null) {
            return null;
        }
        try {
            return ZoneId.of(typed.strip());
        } catch (java.time.DateTimeException e) {
            throw new UsageException("--time-zone '" + typed.strip() + "' is not a time zone: give a zone id such as"
                    + " America/Chicago or an offset such as -05:00");
        }
    }

    /** {@code --map HEADER=field} options, as the log command reads them. */
    private static Map<String, String> maps(List<String> values) {
        Map<String, String> m = new LinkedHashMap<>();
        for (String v : values) {
            int eq = v.lastIndexOf('=');
            if (eq <= 0 || eq == v.length() - 1) {
                throw new UsageException("--map '" + v + "' must be HEADER=field, e.g. --map \"RA Temp=return_db\"");
            }
            m.put(v.substring(0, eq), v.substring(eq + 1));
        }
        return m;
    }

    static Map<String, Object> instrumentJson(Instrument i, UnitSystem units) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("id", i.id());
        m.put("name", i.name());
        m.put("serial", i.serial());
        m.put("calibratedOn", i.calibratedOn() == null ? null : i.calibratedOn().toString());
        StatedAccuracy a = i.accuracy();
        Map<String, Object> acc = new LinkedHashMap<>();
        acc.put("dryBulb", temp(a.dryBulbK(), units));
        acc.put("relativeHumidityPct", a.relativeHumidityPct());
        acc.put("wetBulb", temp(a.wetBulbK(), units));
        acc.put("dewPoint", temp(a.dewPointK(), units));
        acc.put("coil", temp(a.coilK(), units));
        acc.put("airflowPct", a.airflowFraction() == null ? null : a.airflowFraction() * 100);
        acc.put("temperatureUnit", Quantity.TEMPERATURE_DIFFERENCE.symbol(units));
        m.put("statedAccuracy", acc);
        return m;
    }

    static String accuracyText(StatedAccuracy a, UnitSystem units) {
        List<String> parts = new ArrayList<>();
        String t = " " + Quantity.TEMPERATURE_DIFFERENCE.symbol(units);
        if (a.dryBulbK() != null) {
            parts.add("dry bulb ±" + Format.fixed(temp(a.dryBulbK(), units), 1) + t);
        }
        if (a.relativeHumidityPct() != null) {
            parts.add("RH ±" + Format.fixed(a.relativeHumidityPct(), 1) + " %");
        }
        if (a.wetBulbK() != null) {
            parts.add("wet bulb ±" + Format.fixed(temp(a.wetBulbK(), units), 1) + t);
        }
        if (a.dewPointK() != null) {
            parts.add("dew point ±" + Format.fixed(temp(a.dewPointK(), units), 1) + t);
        }
        if (a.coilK() != null) {
            parts.add("coil probe ±" + Format.fixed(temp(a.coilK(), units), 1) + t);
        }
        if (a.airflowFraction() != null) {
            parts.add("airflow ±" + Format.fixed(a.airflowFraction() * 100, 0) + " %");
        }
        return parts.isEmpty() ? "" : "; stated " + String.join(", ", parts);
    }

    private static Double temp(Double k, UnitSystem units) {
        return k == null ? null : Quantity.TEMPERATURE_DIFFERENCE.toDisplay(units, k);
    }

    private static String orDash(String s) {
        return s.isEmpty() ? "—" : s;
    }

    private static OffsetDateTime time(String option, String text) {
        if (text == null) {
            return OffsetDateTime.now();
        }
        try {
            return OffsetDateTime.parse(text);
        } catch (DateTimeParseException e) {
            throw new UsageException(option + " '" + text + "' is not an ISO-8601 date-time with offset,"
                    + " e.g. 2026-07-16T10:05:00-04:00");
        }
    }

    private static <T> T refusing(java.util.function.Supplier<T> parse) {
        try {
            return parse.get();
        } catch (InvalidRecordException e) {
            throw new UsageException(e.getMessage());
        }
    }

    private static void need(List<String> words, int count, String form) {
        if (words.size() != count) {
            throw new UsageException("usage: latent-ledger " + form);
        }
    }
}
