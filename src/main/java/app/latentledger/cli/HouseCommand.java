package app.latentledger.cli;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.coil.AirReading;
import app.latentledger.core.coil.CoilCheck;
import app.latentledger.core.coil.CoilReadings;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.Estimate;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.house.HouseBudget;
import app.latentledger.core.house.HouseFacts;
import app.latentledger.core.house.HouseInputs;
import app.latentledger.core.house.HouseReadings;
import app.latentledger.core.house.HouseVisitReadings;
import app.latentledger.core.house.InternalMoisture;
import app.latentledger.core.house.MoistureBudget;
import app.latentledger.core.house.ScenarioResult;
import app.latentledger.core.house.SystemRemoval;
import app.latentledger.core.house.WhatIfRequest;
import app.latentledger.core.psychro.SitePressure;
import app.latentledger.core.psychro.StandardAtmosphere;
import app.latentledger.core.settings.Settings;
import app.latentledger.core.text.BalanceWords;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.LogConditions;
import app.latentledger.io.logcsv.DateOrder;
import app.latentledger.io.logcsv.HeaderMap;
import app.latentledger.io.logcsv.LogImport;
import app.latentledger.report.HouseEvidence;
import app.latentledger.report.ReportRefusedException;
import app.latentledger.report.VisitEvidence;
import app.latentledger.store.DataLocation;
import app.latentledger.store.Ledger;
import app.latentledger.visit.LogProblem;
import app.latentledger.visit.VisitLog;
import app.latentledger.visit.VisitLogs;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/** {@code house}: where the house's water comes from, what the system removes, and what would fix it. */
public final class HouseCommand implements Command {
    @Override
    public String name() {
        return "house";
    }

    @Override
    public String summary() {
        return "house moisture budget: gains vs removal, equilibrium dew point, fixes compared, dehumidifier size";
    }

    @Override
    public String usage() {
        return "usage: latent-ledger house (--visit ID | SYSTEM) HOUSE WEATHER [RUNTIME] [LEAK] [WHAT-IF]\n"
                + "                          [--units ip|si] [--elevation FT|M | --pressure PSIA|KPA] [--json]\n"
                + "  SYSTEM   the coil command's options: --return-* --supply-* --airflow ... [--nominal-tons T]\n"
                + "           (see: latent-ledger coil --help); in house, --outdoor-* is the weather, not mixed air\n"
                + "  --visit  a stored visit: its house facts and readings (HOUSE, WEATHER and LEAK options typed\n"
                + "           with it are stored with its site and visit), its latest reading set labelled after\n"
                + "           (else its latest), its kept log; give WHAT-IF and --runtime-fraction to override\n"
                + "  HOUSE    --floor-area FT2|M2 --bedrooms N [--ceiling-height FT|M (8 ft)] [--stories 1-3]\n"
                + "           [--occupants N (bedrooms + 1)] [--cfm50 CFM|L/S | --ach50 N] [--shelter-class 1-5]\n"
                + "           [--wind MPH|M/S (6.7 mph, 3 m/s)]\n"
                + "           [--ventilation CFM|L/S --ventilation-type exhaust|supply|balanced|erv\n"
                + "            [--erv-latent-effectiveness PCT (50)]]\n"
                + "  WEATHER  --outdoor-db T (--outdoor-rh PCT | --outdoor-dew-point T | --outdoor-wb T)\n"
                + "           [--indoor-db T (--indoor-rh | --indoor-dew-point | --indoor-wb)]\n"
                + "           (default: the return grille of the leak check, else the coil's return)\n"
                + "  RUNTIME  --runtime-fraction PCT | --log FILE [--log-units ip|si] [--map HEADER=field]...\n"
                + "           (read as 'log' reads it; --log-units: the file's temperatures, default --units)\n"
                + "  LEAK     --grille-db --plenum-db --space-db, each with one of -rh/-dew-point/-wb:\n"
                + "           return grille, return plenum, and the attic or crawlspace air around the duct\n"
                + "  WHAT-IF  [--what-if-airflow CFM|L/S] [--what-if-ach50 N] [--what-if-ventilation CFM|L/S]\n"
                + "  water in lb/day (kg/day with --units si), dehumidifiers in pints/day (L/day); ± is k = 2\n";
    }

    @Override
    public int run(Args args, CliContext context) throws IOException {
        Settings settings = CommandSettings.read(context);
        UnitSystem units = UnitOptions.units(args, settings.units());
        boolean json = args.flag("json");
        WhatIfRequest ask = HouseOptions.whatIf(args, units);
        double typedRtf = HouseOptions.runtimeFraction(args);
        String visitId = args.value("visit");
        HouseInputs in;
        String source;
        if (visitId != null) {
            // house facts and readings typed beside --visit are stored with its site and visit, as the
            // House screen stores what is typed there, so the report and the next run see them
            HouseFacts typedFacts = args.has("floor-area") ? HouseOptions.facts(args, units) : null;
            DataLocation location = DataLocation.resolve(context.dataDir());
            try (Ledger ledger = Ledger.open(location.folder(), Ledger.FirstRun.SEED_DEMO)) {
                VisitEvidence ev;
                try {
                    ev = VisitEvidence.load(ledger, Visits.find(ledger, visitId).id(), units);
                } catch (ReportRefusedException e) {
                    throw new UsageException(e.getMessage());
                }
                double p = StandardAtmosphere.pressurePa(ev.site().elevationM());
                HouseVisitReadings stored = ledger.houses().readings(ev.visit().id());
                HouseVisitReadings typed = new HouseVisitReadings(
                        or(HouseOptions.air(args, units, p, "outdoor", settings.tolerances(), false), stored.outdoor()),
                        or(HouseOptions.air(args, units, p, "grille", settings.tolerances(), false), stored.grille()),
                        or(HouseOptions.air(args, units, p, "plenum", settings.tolerances(), false), stored.plenum()),
                        or(HouseOptions.air(args, units, p, "space", settings.tolerances(), false), stored.space()),
                        stored.runtimeFraction());
                args.rejectUnknown();
                if (typedFacts != null) {
                    ledger.houses().saveFacts(ev.site().id(), typedFacts);
                }
                if (!typed.equals(stored)) {
                    ledger.houses().saveReadings(ev.visit().id(), typed);
                }
                HouseEvidence house = HouseEvidence.of(ledger, ev, ledger.settings().load().thresholds(), typedRtf);
                if (!house.ready()) {
                    throw new UsageException("visit " + Visits.shortId(ev.visit().id()) + ": " + house.refusal());
                }
                in = house.inputs();
                source = "visit " + ev.visit().id() + ", " + house.readingSetName();
            }
        } else {
            SitePressure site = UnitOptions.site(args, units, settings.defaultElevationM());
            HouseFacts facts = HouseOptions.facts(args, units);
            // the coil options never see --outdoor-*: here it is the weather, not air mixed into the coil
            CoilReadings coilReadings = CoilOptions.read(args.without("outdoor-"), units, site, settings.tolerances());
            double p = site.pressurePa();
            AirReading outdoor = HouseOptions.air(args, units, p, "outdoor", settings.tolerances(), true);
            AirReading indoor = HouseOptions.air(args, units, p, "indoor", settings.tolerances(), false);
            AirReading grille = HouseOptions.air(args, units, p, "grille", settings.tolerances(), false);
            AirReading plenum = HouseOptions.air(args, units, p, "plenum", settings.tolerances(), false);
            AirReading space = HouseOptions.air(args, units, p, "space", settings.tolerances(), false);
            String logFile = args.value("log");
            UnitSystem logUnits = units;
            String logUnitsText = args.value("log-units");
            if (logUnitsText != null) {
                try {
                    logUnits = UnitSystem.parse(logUnitsText);
                } catch (IllegalArgumentException e) {
                    throw new UsageException("--log-units " + e.getMessage());
                }
                if (logFile == null) {
                    throw new UsageException("--log-units needs --log FILE");
                }
            }
            Map<String, String> maps;
            try {
                maps = HeaderMap.parse(args.values("map"));
            } catch (IllegalArgumentException e) {
                throw new UsageException(e.getMessage());
            }
            args.rejectUnknown();
            if (logFile != null && Double.isFinite(typedRtf)) {
                throw new UsageException("give --runtime-fraction or --log, not both");
            }
            if (logFile == null && !Double.isFinite(typedRtf)) {
                throw new UsageException("give --runtime-fraction PCT (compressor runtime over the day) or --log FILE");
            }
            int leak = (grille != null ? 1 : 0) + (plenum != null ? 1 : 0) + (space != null ? 1 : 0);
            if (leak != 0 && leak != 3) {
                throw new UsageException("the return-leak check needs all three: --grille-db, --plenum-db, --space-db"
                        + " (each with one of -rh/-dew-point/-wb)");
            }
            CoilResult coil = CoilCheck.run(coilReadings, settings.thresholds(), units);
            if (!coil.adp().found()) {
                throw new UsageException("the coil readings give no process line (" + coil.adp().explanation()
                        + "); the budget needs a coil that removes water");
            }
            SystemRemoval system = logFile == null ? SystemRemoval.typed(coil, typedRtf)
                    : SystemRemoval.logged(coil, analyseLog(Path.of(logFile), logUnits, maps, p,
                    coilReadings.airflowM3PerS(), settings));
            // the house air: --indoor-*, else the return grille of the leak check, else the coil's return
            AirReading ret = grille != null ? grille : coilReadings.entering();
            AirReading house = indoor != null ? indoor : new AirReading("indoor", ret.dryBulbC(), ret.dryBulbTolK(),
                    ret.humidityKind(), ret.humiditySi(), ret.humidityTolSi());
            in = new HouseInputs(facts, new HouseReadings(house, outdoor, grille, plenum, space), system, p,
                    settings.thresholds());
            source = "options";
        }
        HouseBudget b;
        try {
            b = MoistureBudget.compute(in, ask, units);
        } catch (InvalidInputException e) {
            throw UnitOptions.refused(e, units, null);
        }
        context.out().print(json ? Json.print(HouseJson.of(b, units, source)) + "\n" : table(b, units, source));
        return Cli.OK;
    }

    /**
     * The kept log's analysis, by the same import and analysis path (and defaults) as {@code log}.
     * One adapter, so a change to how logs are read stays here.
     */
    private static AirReading or(AirReading typed, AirReading stored) {
        return typed != null ? typed : stored;
    }

    /** The log read and analysed exactly as {@code log} reads it (one service: {@link VisitLogs}). */
    static RunCycleReport analyseLog(Path file, UnitSystem units, Map<String, String> maps, double pressurePa,
                                     double airflowM3PerS, Settings settings) {
        LogImport imported;
        try {
            imported = VisitLogs.read(file, new VisitLogs.ReadOptions(units, maps, DateOrder.AUTO, null), null);
        } catch (LogProblem e) {
            throw new UsageException(e.getMessage());
        }
        LogConditions conditions;
        try {
            conditions = LogConditions.checked(pressurePa, "", airflowM3PerS, "--airflow", Double.NaN);
        } catch (InvalidInputException e) {
            throw UnitOptions.refused(e, units, "--airflow");
        }
        if (conditions.refused()) {
            throw UnitOptions.refused(conditions.refusal(), units, "--airflow");
        }
        VisitLog analysed = VisitLogs.analyse("", file.getFileName().toString(), imported.series(), conditions,
                settings.thresholds(), units, imported, List.of(), "");
        if (!analysed.analysed()) {
            throw new UsageException(file + ": " + analysed.refusal());
        }
        return analysed.report();
    }

    static String table(HouseBudget b, UnitSystem units, String source) {
        StringBuilder t = new StringBuilder();
        ScenarioResult s = b.asFound();
        Quantity day = Quantity.WATER_MASS_DAILY;
        t.append("House moisture budget (").append(source).append("; uncertainties k = 2)\n");
        t.append("Where the water comes from                 per day            per hour\n");
        t.append(line("air leakage (" + b.method().key() + ")", s.infiltration(), units));
        t.append(line("ventilation", s.ventilation(), units));
        t.append(line("people and activities *", s.internal(), units));
        t.append(line("return-duct leak", s.returnLeak(), units));
        t.append(line("total gains", s.gains(), units));
        t.append("What the system removes\n");
        t.append(line("removed while running", s.removedInRuns(), units));
        t.append(line("put back by the blower", s.reevaporated(), units));
        t.append(line("net removal", s.removal(), units));
        t.append(line("balance (gains − removal)", s.balance(), units));
        t.append("  ").append(balanceWords(s, units)).append('\n');
        t.append(String.format(Locale.ROOT, "  runtime %s (%s), part-load latent fraction from %s%n",
                pct(s.runtimeFraction()), b.inputs().system().runtimeSource(), b.inputs().system().latentSource()));
        if (s.leakFraction().exists()) {
            t.append(String.format(Locale.ROOT, "  return leak fraction f = %.3f ± %.3f%n", s.leakFraction().valueSi(),
                    s.leakFraction().expandedSi()));
        }
        t.append("Equilibrium indoor humidity (gains = removal)\n");
        if (s.hasEquilibrium()) {
            t.append("  dew point ").append(temp(s.equilibriumDewPointC(), units)).append(", ")
                    .append(Format.fixed(s.equilibriumRhPct().valueSi(), 1)).append(" % RH at ")
                    .append(Format.fixed(Quantity.TEMPERATURE.toDisplay(units,
                            b.inputs().readings().indoor().dryBulbC()), 1))
                    .append(' ').append(Quantity.TEMPERATURE.symbol(units)).append("; target ")
                    .append(Format.fixed(b.inputs().rhTargetPct(), 0)).append(" % RH, dew point benchmark ")
                    .append(Format.fixed(Quantity.TEMPERATURE.toDisplay(units, b.inputs().dewPointMaxC()), 1))
                    .append(' ').append(Quantity.TEMPERATURE.symbol(units)).append('\n');
        } else {
            t.append("  none: the system cannot hold this house at any indoor humidity under these conditions\n");
        }
        t.append("Fixes compared                                     balance/day          eq. dew point     SHR\n");
        for (ScenarioResult w : b.whatIfs()) {
            t.append("  ").append(w.scenario().change()).append('\n');
            t.append("    ").append(balanceWords(w, units)).append('\n');
            t.append(String.format(Locale.ROOT, "  %-40s %22s %20s %7s%n", "", est(w.balance(), day, units),
                    w.hasEquilibrium() ? temp(w.equilibriumDewPointC(), units) : "none",
                    Format.fixed(w.shr().valueSi(), 3)));
        }
        if (b.whatIfs().isEmpty()) {
            t.append("  none offered for these readings\n");
        }
        t.append("Dehumidifier to hold the RH target: ")
                .append(Format.fixed(Quantity.WATER_RATE_DAILY.toDisplay(units, b.dehumidifier().needed()), 1))
                .append(' ').append(Quantity.WATER_RATE_DAILY.symbol(units)).append(" at the house; rated ")
                .append(Format.fixed(Quantity.WATER_RATE_DAILY.toDisplay(units, b.dehumidifier().portable65F()), 1))
                .append(" portable (65 °F/60 %), ")
                .append(Format.fixed(Quantity.WATER_RATE_DAILY.toDisplay(units, b.dehumidifier().wholeHome73F()), 1))
                .append(" whole-home (73 °F/60 %), ")
                .append(Format.fixed(Quantity.WATER_RATE_DAILY.toDisplay(units, b.dehumidifier().rated80F()), 1))
                .append(" (80 °F/60 %)").append(b.dehumidifier().extrapolated() ? " — extrapolated" : "").append('\n');
        t.append("* ").append(InternalMoisture.MEMORY_ONLY).append('\n');
        t.append("Findings\n");
        if (b.findings().isEmpty()) {
            t.append("  none\n");
        }
        for (Finding f : b.findings()) {
            t.append("  [").append(f.severity().key()).append("] ").append(f.code().key()).append(": ")
                    .append(f.message()).append('\n');
            t.append("      ").append(f.technical()).append('\n');
            for (String next : f.nextChecks()) {
                t.append("      - ").append(next).append('\n');
            }
        }
        for (String c : b.cautions()) {
            t.append(c).append('\n');
        }
        return t.toString();
    }

    private static String line(String label, Estimate e, UnitSystem units) {
        Quantity day = Quantity.WATER_MASS_DAILY;
        Estimate perHour = new Estimate(e.valueSi(), e.expandedSi());
        return String.format(Locale.ROOT, "  %-30s %22s %20s%n", label, est(e, day, units),
                est(perHour, Quantity.WATER_RATE, units));
    }

    /** The balance in words, as the House screen and the report say it ({@link BalanceWords}). */
    private static String balanceWords(ScenarioResult s, UnitSystem units) {
        return BalanceWords.sentence(units, s.balance().valueSi(), s.balance().expandedSi());
    }

    private static String est(Estimate e, Quantity q, UnitSystem units) {
        if (!e.exists()) {
            return "—";
        }
        String u = Double.isFinite(e.expandedSi()) ? " ± " + Format.fixed(q.toDisplay(units, e.expandedSi()), 2) : "";
        return Format.fixed(q.toDisplay(units, e.valueSi()), 2) + u + " " + q.symbol(units);
    }

    private static String temp(Estimate e, UnitSystem units) {
        String u = Double.isFinite(e.expandedSi())
                ? " ± " + Format.fixed(Quantity.TEMPERATURE_DIFFERENCE.toDisplay(units, e.expandedSi()), 1) : "";
        return Format.fixed(Quantity.TEMPERATURE.toDisplay(units, e.valueSi()), 1) + u + " "
                + Quantity.TEMPERATURE.symbol(units);
    }

    private static String pct(Estimate e) {
        return Format.fixed(100 * e.valueSi(), 0) + " %";
    }
}
