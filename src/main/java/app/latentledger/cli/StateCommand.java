package app.latentledger.cli;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.MoistAirState;
import app.latentledger.core.psychro.SitePressure;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;

/** {@code state}: the full moist-air state from a dry bulb and one humidity reading. */
public final class StateCommand implements Command {
    private static final List<String> HUMIDITY_OPTIONS =
            List.of("wet-bulb", "rh", "dew-point", "humidity-ratio", "grains", "grams");

    @Override
    public String name() {
        return "state";
    }

    @Override
    public String summary() {
        return "moist-air state from dry bulb plus wet bulb, RH, dew point or humidity ratio";
    }

    @Override
    public String usage() {
        return "usage: latent-ledger state --dry-bulb T (--wet-bulb T | --rh PCT | --dew-point T\n"
                + "                            | --humidity-ratio LB_PER_LB | --grains GR_PER_LB | --grams G_PER_KG)\n"
                + "                            [--units ip|si] [--elevation FT|M | --pressure PSIA|KPA] [--json]\n"
                + "  --units ip (default): °F, ft, psia, Btu/lb, ft³/lb;  si: °C, m, kPa, kJ/kg, m³/kg\n"
                + "  --elevation sets the standard-atmosphere pressure (ASHRAE HoF ch. 1 eq. 3); default sea level\n"
                + "  --grains goes with --units ip, --grams with --units si\n";
    }

    @Override
    public int run(Args args, CliContext context) {
        UnitSystem units = UnitOptions.units(args);
        SitePressure site = UnitOptions.site(args, units);
        MoistAirState state = read(args, units, site.pressurePa(), "");
        boolean json = args.flag("json");
        args.rejectUnknown();
        args.noPositionals();
        context.out().print(json ? Json.print(StateJson.of(state, units)) + "\n" : table(state, site, units));
        return Cli.OK;
    }

    /**
     * Reads {@code --<prefix>dry-bulb} and exactly one humidity option into a state; shared with
     * commands that take several states (prefix "return-", "supply-").
     */
    static MoistAirState read(Args args, UnitSystem units, double pressurePa, String prefix) {
        String dbOption = prefix + "dry-bulb";
        Double db = UnitOptions.si(args, dbOption, Quantity.TEMPERATURE, units);
        List<String> given = new ArrayList<>();
        for (String h : HUMIDITY_OPTIONS) {
            if (args.has(prefix + h)) {
                given.add("--" + prefix + h);
            }
        }
        if (db == null) {
            throw new UsageException("--" + dbOption + " is required");
        }
        if (given.size() != 1) {
            throw new UsageException("give exactly one of --" + prefix + "wet-bulb, --" + prefix + "rh, --"
                    + prefix + "dew-point, --" + prefix + "humidity-ratio, --" + prefix
                    + (units == UnitSystem.IP ? "grains" : "grams")
                    + (given.isEmpty() ? "" : " (got " + String.join(", ", given) + ")"));
        }
        String option = given.get(0).substring(2);
        String kind = option.substring(prefix.length());
        HandbookEdition edition = HandbookEdition.of(units);
        try {
            switch (kind) {
                case "wet-bulb":
                    return MoistAirState.fromWetBulb(pressurePa, db,
                            UnitOptions.si(args, option, Quantity.TEMPERATURE, units), edition);
                case "rh":
                    return MoistAirState.fromRelativeHumidity(pressurePa, db, args.number(option), edition);
                case "dew-point":
                    return MoistAirState.fromDewPoint(pressurePa, db,
                            UnitOptions.si(args, option, Quantity.TEMPERATURE, units), edition);
                case "humidity-ratio":
                    return MoistAirState.fromHumidityRatio(pressurePa, db, args.number(option), edition);
                case "grains":
                case "grams":
                    UnitSystem fineUnits = kind.equals("grains") ? UnitSystem.IP : UnitSystem.SI;
                    if (fineUnits != units) {
                        throw new UsageException("--" + option + " goes with --units " + fineUnits.key());
                    }
                    return MoistAirState.fromHumidityRatio(pressurePa, db,
                            UnitOptions.si(args, option, Quantity.HUMIDITY_RATIO_FINE, units), edition);
                default:
                    throw new IllegalStateException(kind);
            }
        } catch (InvalidInputException e) {
            String culprit = e.field().equals("dry bulb") ? "--" + dbOption : "--" + option;
            throw UnitOptions.refused(e, units, culprit);
        }
    }

    static String table(MoistAirState s, SitePressure site, UnitSystem units) {
        StringBuilder b = new StringBuilder();
        b.append("Moist-air state (ASHRAE Handbook—Fundamentals ch. 1, ")
                .append(units == UnitSystem.IP ? "IP" : "SI").append(" edition equations)\n");
        String where = site.measured() ? "measured"
                : "standard atmosphere at " + Format.fixed(Quantity.ELEVATION.toDisplay(units, site.elevationM()), 0)
                + " " + Quantity.ELEVATION.symbol(units);
        b.append(Format.row("pressure", Format.fixed(Quantity.PRESSURE.toDisplay(units, s.pressurePa()),
                units == UnitSystem.IP ? 3 : 3), Quantity.PRESSURE.symbol(units) + "  (" + where + ")"));
        b.append(temperature("dry bulb", s.dryBulbC(), units));
        b.append(temperature("wet bulb", s.wetBulbC(), units));
        b.append(temperature(s.dewPointC() < 0.01 ? "frost point" : "dew point", s.dewPointC(), units));
        b.append(Format.row("relative humidity", Format.fixed(s.relativeHumidityPct(), 1), "%"));
        b.append(Format.row("humidity ratio",
                Format.fixed(Quantity.HUMIDITY_RATIO_FINE.toDisplay(units, s.humidityRatio()), units == UnitSystem.IP ? 1 : 2),
                Quantity.HUMIDITY_RATIO_FINE.symbol(units) + "  (" + Format.fixed(s.humidityRatio(), 6) + " "
                        + Quantity.HUMIDITY_RATIO.symbol(units) + ")"));
        b.append(Format.row("degree of saturation", Format.fixed(s.degreeOfSaturation(), 3), ""));
        b.append(Format.row("enthalpy", Format.fixed(Quantity.ENTHALPY.toDisplay(units, s.enthalpyJPerKg()), 2),
                Quantity.ENTHALPY.symbol(units) + " of dry air"));
        b.append(Format.row("specific volume",
                Format.fixed(Quantity.SPECIFIC_VOLUME.toDisplay(units, s.specificVolumeM3PerKg()), units == UnitSystem.IP ? 2 : 4),
                Quantity.SPECIFIC_VOLUME.symbol(units) + " of dry air"));
        b.append(Format.row("density", Format.fixed(Quantity.DENSITY.toDisplay(units, s.densityKgPerM3()), 4),
                Quantity.DENSITY.symbol(units) + " of moist air"));
        return b.toString();
    }

    private static String temperature(String label, double c, UnitSystem units) {
        return Format.row(label, Format.fixed(Quantity.TEMPERATURE.toDisplay(units, c), 2), Quantity.TEMPERATURE.symbol(units));
    }
}
