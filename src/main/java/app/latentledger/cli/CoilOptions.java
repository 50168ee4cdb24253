package app.latentledger.cli;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.coil.AirReading;
import app.latentledger.core.coil.CoilReadings;
import app.latentledger.core.coil.Condensate;
import app.latentledger.core.coil.OutdoorAir;
import app.latentledger.core.coil.Tolerances;
import app.latentledger.core.measure.AirflowBasis;
import app.latentledger.core.measure.AirflowPoint;
import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.measure.InvalidChoiceException;
import app.latentledger.core.measure.ProbeMatch;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.SitePressure;
import app.latentledger.core.settings.InstrumentTolerances;
import app.latentledger.core.units.Conversions;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads the {@code coil} command's options into {@link CoilReadings}, in SI, naming the option
 * typed in every refusal. Airflow, temperatures and tolerances are in the tech's units;
 * {@code --condensate} is always mL and {@code --condensate-floz} US fluid ounces. Outdoor air
 * ({@code --outdoor-db} with one humidity reading, and {@code --outdoor-fraction} in % of the
 * airflow by volume) comes as a pair or not at all; its readings share the {@code --tol-*} of the
 * other probes.
 */
final class CoilOptions {
    private static final Map<String, HumidityKind> HUMIDITY = new LinkedHashMap<>();

    private static final Map<HumidityKind, String> TOLERANCE_OPTION = Map.of(HumidityKind.WET_BULB, "tol-wb",
            HumidityKind.RELATIVE_HUMIDITY, "tol-rh", HumidityKind.DEW_POINT, "tol-dew-point");

    static {
        HUMIDITY.put("wb", HumidityKind.WET_BULB);
        HUMIDITY.put("rh", HumidityKind.RELATIVE_HUMIDITY);
        HUMIDITY.put("dew-point", HumidityKind.DEW_POINT);
    }

    private CoilOptions() {
    }

    /** @param defaults the tolerances a reading gets when no {@code --tol-*} option is given (from settings) */
    static CoilReadings read(Args args, UnitSystem units, SitePressure site, InstrumentTolerances defaults) {
        double p = site.pressurePa();
        double tolDb = tolerance(args, "tol-db", Quantity.TEMPERATURE_DIFFERENCE, units, defaults.dryBulbK());
        Map<HumidityKind, Double> tolHumidity = new LinkedHashMap<>();
        tolHumidity.put(HumidityKind.WET_BULB,
                tolerance(args, "tol-wb", Quantity.TEMPERATURE_DIFFERENCE, units, defaults.wetBulbK()));
        tolHumidity.put(HumidityKind.RELATIVE_HUMIDITY,
                tolerance(args, "tol-rh", Quantity.RELATIVE_HUMIDITY, units, defaults.relativeHumidityPct()));
        tolHumidity.put(HumidityKind.DEW_POINT,
                tolerance(args, "tol-dew-point", Quantity.TEMPERATURE_DIFFERENCE, units, defaults.dewPointK()));
        AirReading entering = air(args, units, p, "return", tolDb, tolHumidity);
        AirReading leaving = air(args, units, p, "supply", tolDb, tolHumidity);
        OutdoorAir outdoor = outdoor(args, units, p, tolDb, tolHumidity);

        Double airflow = UnitOptions.si(args, "airflow", Quantity.AIRFLOW, units);
        if (airflow == null) {
            throw new UsageException("--airflow is required (" + Quantity.AIRFLOW.symbol(units) + ")");
        }
        double airflowTol = tolerance(args, "tol-airflow-pct", Quantity.RELATIVE_HUMIDITY, units,
                defaults.airflowFraction() * 100) / 100.0;
        AirflowPoint at = airflowAt(args.value("airflow-at"));
        AirflowBasis basis;
        try {
            String basisText = args.value("airflow-basis");
            basis = basisText == null ? AirflowBasis.ACTUAL : AirflowBasis.parse("--airflow-basis", basisText);
        } catch (InvalidChoiceException e) {
            throw new UsageException(e.getMessage());
        }
        ProbeMatch probes = probes(args, units);

        Double coil = UnitOptions.si(args, "coil-temp", Quantity.TEMPERATURE, units);
        String kindText = args.value("coil-temp-kind");
        CoilTemperatureKind coilKind = null;
        if (coil != null) {
            try {
                coilKind = kindText == null ? CoilTemperatureKind.COIL_SURFACE
                        : CoilTemperatureKind.parse("--coil-temp-kind", kindText);
            } catch (InvalidChoiceException e) {
                throw new UsageException(e.getMessage());
            }
        } else if (kindText != null) {
            throw new UsageException("--coil-temp-kind needs --coil-temp");
        }
        double coilTol = tolerance(args, "tol-coil", Quantity.TEMPERATURE_DIFFERENCE, units,
                coilKind == null ? defaults.coilK() : Tolerances.coil(coilKind, defaults.coilK()));

        double nominal = nominalW(args);
        Condensate condensate = condensate(args, units, defaults.condensateFraction());
        try {
            return new CoilReadings(p, entering, leaving, airflow, airflowTol, at,
                    coil == null ? Double.NaN : coil, coilTol, coilKind, nominal, condensate, outdoor, basis, probes);
        } catch (InvalidInputException e) {
            String option = optionFor(e.field());
            if ("--nominal-tons".equals(option) && args.has("nominal-kw")) {
                option = "--nominal-kw";
            }
            throw UnitOptions.refused(e, units, option);
        }
    }

    private static AirReading air(Args args, UnitSystem units, double p, String where, double tolDb,
                                  Map<HumidityKind, Double> tolHumidity) {
        String dbOption = where + "-db";
        Double db = UnitOptions.si(args, dbOption, Quantity.TEMPERATURE, units);
        List<String> given = new ArrayList<>();
        for (String h : HUMIDITY.keySet()) {
            if (args.has(where + "-" + h)) {
                given.add(h);
            }
        }
        if (db == null) {
            throw new UsageException("--" + dbOption + " is required");
        }
        if (given.size() != 1) {
            throw new UsageException("give exactly one of --" + where + "-wb, --" + where + "-rh, --" + where
                    + "-dew-point" + (given.isEmpty() ? "" : " (got " + given.size() + ")"));
        }
        String option = where + "-" + given.get(0);
        HumidityKind kind = HUMIDITY.get(given.get(0));
        double value = kind == HumidityKind.RELATIVE_HUMIDITY ? args.number(option)
                : UnitOptions.si(args, option, Quantity.TEMPERATURE, units);
        double tol = tolHumidity.get(kind);
        if (kind == HumidityKind.RELATIVE_HUMIDITY && !args.has("tol-rh")) {
            tol = Tolerances.relativeHumidityPct(value, tol); // ±3 % RH outside 10–90 % RH
        }
        try {
            AirReading r = new AirReading(where, db, tolDb, kind, value, tol);
            r.state(p, HandbookEdition.SI); // refuse an impossible reading here, naming its option
            return r;
        } catch (InvalidInputException e) {
            String culprit = e.field().endsWith("dry-bulb tolerance") ? "--tol-db"
                    : e.field().endsWith("tolerance") ? "--" + TOLERANCE_OPTION.get(kind)
                    : e.field().endsWith("dry bulb") ? "--" + dbOption
                    : e.field().endsWith("pressure") ? "--pressure" : "--" + option;
            throw UnitOptions.refused(e, units, culprit);
        }
    }

    /** The outdoor reading and fraction, or null when neither is given; one without the other is refused. */
    private static OutdoorAir outdoor(Args args, UnitSystem units, double p, double tolDb,
                                      Map<HumidityKind, Double> tolHumidity) {
        boolean reading = args.has("outdoor-db");
        for (String h : HUMIDITY.keySet()) {
            reading |= args.has("outdoor-" + h);
        }
        Double pct = args.number("outdoor-fraction");
        boolean tolGiven = args.has("tol-outdoor-fraction");
        if (!reading && pct == null) {
            if (tolGiven) {
                throw new UsageException("--tol-outdoor-fraction needs --outdoor-fraction and an outdoor reading");
            }
            return null;
        }
        if (pct == null) {
            throw new UsageException("the outdoor reading needs --outdoor-fraction PCT"
                    + " (outdoor air's share of the coil airflow by volume, %)");
        }
        if (!reading) {
            throw new UsageException("--outdoor-fraction needs an outdoor reading: --outdoor-db with one of"
                    + " --outdoor-wb, --outdoor-rh, --outdoor-dew-point");
        }
        AirReading air = air(args, units, p, "outdoor", tolDb, tolHumidity);
        double tolPct = tolerance(args, "tol-outdoor-fraction", Quantity.RELATIVE_HUMIDITY, units,
                Tolerances.OUTDOOR_FRACTION * 100);
        try {
            return new OutdoorAir(air, pct / 100.0, tolPct / 100.0);
        } catch (InvalidInputException e) {
            throw UnitOptions.refused(e, units,
                    e.field().endsWith("tolerance") ? "--tol-outdoor-fraction" : "--outdoor-fraction");
        }
    }

    /** {@code --same-probe} and {@code --supply-dew-point-offset D} (°F or K, supply minus return). */
    private static ProbeMatch probes(Args args, UnitSystem units) {
        boolean same = args.flag("same-probe");
        Double offset = args.number("supply-dew-point-offset");
        double offsetSi = offset == null ? 0 : Quantity.TEMPERATURE_DIFFERENCE.fromDisplay(units, offset);
        try {
            return new ProbeMatch(same, offsetSi);
        } catch (InvalidInputException e) {
            throw UnitOptions.refused(e, units, "--supply-dew-point-offset");
        }
    }

    private static double tolerance(Args args, String option, Quantity q, UnitSystem units, double defaultSi) {
        Double v = args.number(option);
        if (v == null) {
            return defaultSi;
        }
        if (v < 0) {
            throw new UsageException("--" + option + " " + v + " refused: a tolerance is a ± half-width, 0 or more");
        }
        return q.fromDisplay(units, v);
    }

    private static AirflowPoint airflowAt(String text) {
        if (text == null || text.equalsIgnoreCase("return") || text.equalsIgnoreCase("entering")
                || text.equalsIgnoreCase("mixed")) {
            return AirflowPoint.ENTERING;
        }
        if (text.equalsIgnoreCase("supply") || text.equalsIgnoreCase("leaving")) {
            return AirflowPoint.LEAVING;
        }
        throw new UsageException("--airflow-at '" + text + "' not understood; accepted: return (or mixed), supply");
    }

    private static double nominalW(Args args) {
        Double tons = args.number("nominal-tons");
        Double kw = args.number("nominal-kw");
        if (tons != null && kw != null) {
            throw new UsageException("give --nominal-tons or --nominal-kw, not both");
        }
        if (tons != null) {
            return Quantity.POWER_LARGE.fromDisplay(UnitSystem.IP, tons);
        }
        return kw != null ? Quantity.POWER_LARGE.fromDisplay(UnitSystem.SI, kw) : Double.NaN;
    }

    private static Condensate condensate(Args args, UnitSystem units, double defaultFraction) {
        Double ml = args.number("condensate");
        Double floz = args.number("condensate-floz");
        Double minutes = args.number("condensate-minutes");
        double tolPct = tolerance(args, "tol-condensate-pct", Quantity.RELATIVE_HUMIDITY, units,
                defaultFraction * 100);
        if (ml != null && floz != null) {
            throw new UsageException("give --condensate (mL) or --condensate-floz, not both");
        }
        if (ml == null && floz == null) {
            if (minutes != null) {
                throw new UsageException("--condensate-minutes needs --condensate (mL) or --condensate-floz");
            }
            return null;
        }
        if (minutes == null) {
            throw new UsageException("--condensate needs --condensate-minutes");
        }
        double m3 = ml != null ? ml * 1e-6 : floz * Conversions.M3_PER_US_FL_OZ;
        String volumeOption = ml != null ? "--condensate" : "--condensate-floz";
        try {
            return new Condensate(m3, tolPct / 100.0, minutes * 60.0,
                    Math.min(Tolerances.CONDENSATE_TIMING_S, minutes * 30.0));
        } catch (InvalidInputException e) {
            // a refused volume is said in the unit it was typed in: mL for --condensate in either unit system
            UnitSystem said = e.quantity() == Quantity.WATER_VOLUME ? (ml != null ? UnitSystem.SI : UnitSystem.IP)
                    : units;
            throw UnitOptions.refused(e, said, e.field().contains("minutes") ? "--condensate-minutes"
                    : e.field().contains("tolerance") ? "--tol-condensate-pct" : volumeOption);
        }
    }

    private static String optionFor(String field) {
        switch (field) {
            case "airflow": return "--airflow";
            case "airflow tolerance": return "--tol-airflow-pct";
            case "coil temperature": return "--coil-temp";
            case "coil temperature tolerance": return "--tol-coil";
            case "nominal capacity": return "--nominal-tons";
            case "pressure": return "--pressure";
            default: return null;
        }
    }
}
