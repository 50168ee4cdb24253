package app.latentledger.cli;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.coil.AirReading;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.house.HouseFacts;
import app.latentledger.core.house.VentilationType;
import app.latentledger.core.house.WhatIfRequest;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.settings.InstrumentTolerances;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Reads the {@code house} command's own options into SI: the house facts, the house and weather
 * readings, the return-leak trio and the what-ifs, naming the option typed in every refusal.
 */
final class HouseOptions {
    /** Ceiling height when none is given: 8 ft (common practice). */
    static final double DEFAULT_CEILING_FT = 8.0;

    private static final Map<String, String> FACT_OPTIONS = Map.ofEntries(Map.entry("floor area", "--floor-area"),
            Map.entry("ceiling height", "--ceiling-height"), Map.entry("stories", "--stories"),
            Map.entry("bedrooms", "--bedrooms"), Map.entry("occupants", "--occupants"),
            Map.entry("blower-door flow at 50 Pa", "--cfm50"), Map.entry("ACH50", "--ach50"),
            Map.entry("shelter class", "--shelter-class"), Map.entry("wind speed", "--wind"),
            Map.entry("ventilation airflow", "--ventilation"),
            Map.entry("ERV latent effectiveness", "--erv-latent-effectiveness"));

    private HouseOptions() {
    }

    static HouseFacts facts(Args args, UnitSystem units) {
        Double area = UnitOptions.si(args, "floor-area", Quantity.AREA, units);
        if (area == null) {
            throw new UsageException("--floor-area is required (" + Quantity.AREA.symbol(units) + ")");
        }
        Double height = UnitOptions.si(args, "ceiling-height", Quantity.LENGTH, units);
        Integer bedrooms = integer(args, "bedrooms");
        if (bedrooms == null) {
            throw new UsageException("--bedrooms is required");
        }
        Integer stories = integer(args, "stories");
        Integer occupants = integer(args, "occupants");
        Double cfm50 = UnitOptions.si(args, "cfm50", Quantity.AIRFLOW, units);
        Double ach50 = args.number("ach50");
        if (cfm50 != null && ach50 != null) {
            throw new UsageException("give --cfm50 or --ach50, not both");
        }
        Integer shelter = integer(args, "shelter-class");
        Double wind = UnitOptions.si(args, "wind", Quantity.WIND_SPEED, units);
        Double vent = UnitOptions.si(args, "ventilation", Quantity.AIRFLOW, units);
        String typeText = args.value("ventilation-type");
        Double erv = args.number("erv-latent-effectiveness");
        VentilationType type = VentilationType.NONE;
        if (vent != null && typeText == null) {
            throw new UsageException("--ventilation needs --ventilation-type exhaust|supply|balanced|erv");
        }
        if (typeText != null) {
            try {
                type = VentilationType.parse(typeText);
            } catch (IllegalArgumentException e) {
                throw new UsageException("--ventilation-type " + e.getMessage());
            }
            if (vent == null && type != VentilationType.NONE) {
                throw new UsageException("--ventilation-type needs --ventilation (" + Quantity.AIRFLOW.symbol(units) + ")");
            }
        }
        if (erv != null && type != VentilationType.ERV) {
            throw new UsageException("--erv-latent-effectiveness needs --ventilation-type erv");
        }
        try {
            return new HouseFacts(area, height != null ? height
                    : Quantity.LENGTH.fromDisplay(UnitSystem.IP, DEFAULT_CEILING_FT), stories == null ? 1 : stories,
                    bedrooms, occupants == null ? 0 : occupants, cfm50 == null ? Double.NaN : cfm50,
                    ach50 == null ? Double.NaN : ach50, shelter == null ? 0 : shelter, wind == null ? Double.NaN : wind,
                    type, vent == null ? 0.0 : vent, erv == null ? Double.NaN : erv / 100.0);
        } catch (InvalidInputException e) {
            throw UnitOptions.refused(e, units, FACT_OPTIONS.get(e.field()));
        }
    }

    /** One air reading {@code --WHERE-db} with exactly one of {@code -rh/-dew-point/-wb}, or null when absent. */
    static AirReading air(Args args, UnitSystem units, double pressurePa, String where, InstrumentTolerances tol,
                          boolean required) {
        Double db = UnitOptions.si(args, where + "-db", Quantity.TEMPERATURE, units);
        List<String> given = new ArrayList<>();
        for (String h : List.of("rh", "dew-point", "wb")) {
            if (args.has(where + "-" + h)) {
                given.add(h);
            }
        }
        if (db == null && given.isEmpty()) {
            if (required) {
                throw new UsageException("--" + where + "-db is required with one of --" + where + "-rh, --" + where
                        + "-dew-point, --" + where + "-wb");
            }
            return null;
        }
        if (db == null) {
            throw new UsageException("--" + where + "-db is required with --" + where + "-" + given.get(0));
        }
        if (given.size() != 1) {
            throw new UsageException("give exactly one of --" + where + "-rh, --" + where + "-dew-point, --" + where
                    + "-wb" + (given.isEmpty() ? "" : " (got " + given.size() + ")"));
        }
        String option = where + "-" + given.get(0);
        HumidityKind kind = switch (given.get(0)) {
            case "rh" -> HumidityKind.RELATIVE_HUMIDITY;
            case "dew-point" -> HumidityKind.DEW_POINT;
            default -> HumidityKind.WET_BULB;
        };
        double value = kind == HumidityKind.RELATIVE_HUMIDITY ? args.number(option)
                : UnitOptions.si(args, option, Quantity.TEMPERATURE, units);
        double tolH = switch (kind) {
            case RELATIVE_HUMIDITY -> tol.relativeHumidityPct();
            case DEW_POINT -> tol.dewPointK();
            case WET_BULB -> tol.wetBulbK();
        };
        try {
            AirReading r = new AirReading(where, db, tol.dryBulbK(), kind, value, tolH);
            r.state(pressurePa, HandbookEdition.SI);
            return r;
        } catch (InvalidInputException e) {
            throw UnitOptions.refused(e, units, e.field().endsWith("dry bulb") ? "--" + where + "-db" : "--" + option);
        }
    }

    static WhatIfRequest whatIf(Args args, UnitSystem units) {
        Double airflow = UnitOptions.si(args, "what-if-airflow", Quantity.AIRFLOW, units);
        Double ach50 = args.number("what-if-ach50");
        Double vent = UnitOptions.si(args, "what-if-ventilation", Quantity.AIRFLOW, units);
        range("--what-if-airflow", airflow, 0.02, 10, Quantity.AIRFLOW, units);
        range("--what-if-ach50", ach50, HouseFacts.MIN_ACH50, HouseFacts.MAX_ACH50, Quantity.DIMENSIONLESS, units);
        range("--what-if-ventilation", vent, 0, HouseFacts.MAX_VENTILATION_M3_PER_S, Quantity.AIRFLOW, units);
        return new WhatIfRequest(airflow == null ? Double.NaN : airflow, ach50 == null ? Double.NaN : ach50,
                vent == null ? Double.NaN : vent);
    }

    /** {@code --runtime-fraction PCT} as 0–1, or NaN when absent. */
    static double runtimeFraction(Args args) {
        Double pct = args.number("runtime-fraction");
        if (pct == null) {
            return Double.NaN;
        }
        range("--runtime-fraction", pct / 100, 0.01, 1.0, Quantity.FRACTION_PERCENT, UnitSystem.IP);
        return pct / 100;
    }

    private static void range(String option, Double si, double min, double max, Quantity q, UnitSystem units) {
        if (si != null && !(si >= min && si <= max)) {
            throw UnitOptions.refused(new InvalidInputException(option.substring(2).replace('-', ' '), q, si, min, max,
                    null), units, option);
        }
    }

    private static Integer integer(Args args, String name) {
        Double v = args.number(name);
        if (v == null) {
            return null;
        }
        if (v != Math.rint(v)) {
            throw new UsageException("--" + name + " " + v + " refused: a whole number");
        }
        return (int) Math.rint(v);
    }
}
