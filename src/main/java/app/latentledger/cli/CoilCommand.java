package app.latentledger.cli;

import app.latentledger.core.text.DailyWaterWords;
import app.latentledger.core.InvalidInputException;
import app.latentledger.core.coil.CoilCheck;
import app.latentledger.core.coil.CoilProcess;
import app.latentledger.core.coil.CoilReadings;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.Estimate;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.coil.ShortcutFigures;
import app.latentledger.core.coil.WithheldRatios;
import app.latentledger.core.findings.Cautions;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.measure.AirflowPoint;
import app.latentledger.core.psychro.MoistAirState;
import app.latentledger.core.psychro.SitePressure;
import app.latentledger.core.settings.Settings;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.Ratio;
import app.latentledger.core.units.UnitSystem;

import java.util.HashMap;
import java.util.Map;

/** {@code coil}: is the coil dehumidifying, how much, and how sure are we. */
public final class CoilCommand implements Command {
    @Override
    public String name() {
        return "coil";
    }

    @Override
    public String summary() {
        return "coil check: sensible/latent split, moisture removal, ADP, coil vs dew point with uncertainty";
    }

    @Override
    public String usage() {
        return "usage: latent-ledger coil --return-db T (--return-wb T | --return-rh PCT | --return-dew-point T)\n"
                + "         --supply-db T (--supply-wb T | --supply-rh PCT | --supply-dew-point T) --airflow CFM|L/S\n"
                + "         [--airflow-at return|supply] [--airflow-basis actual|standard]\n"
                + "         [--coil-temp T [--coil-temp-kind coil-surface|evaporator-saturation]]\n"
                + "         [--same-probe] [--supply-dew-point-offset D]\n"
                + "         [--nominal-tons TONS | --nominal-kw KW] [--condensate ML | --condensate-floz FLOZ]\n"
                + "         [--condensate-minutes MIN] [--rh-target PCT] [--units ip|si] [--elevation FT|M | --pressure PSIA|KPA]\n"
                + "         [--tol-db D] [--tol-rh PCT] [--tol-wb D] [--tol-dew-point D] [--tol-coil D]\n"
                + "         [--tol-airflow-pct PCT] [--tol-condensate-pct PCT] [--json]\n"
                + "         [--outdoor-db T (--outdoor-wb T | --outdoor-rh PCT | --outdoor-dew-point T)\n"
                + "          --outdoor-fraction PCT [--tol-outdoor-fraction PCT]]\n"
                + "  return = air entering the coil (return plenum, or mixed air read after any outdoor-air intake);\n"
                + "  with --outdoor-* and --outdoor-fraction (outdoor air's share of the airflow by volume, %),\n"
                + "  return is the return air and the entering air is computed as the adiabatic mix\n"
                + "  (outdoor readings use the same --tol-db/--tol-wb/--tol-rh/--tol-dew-point; fraction ±5 %-points)\n"
                + "  tolerances are ± half-widths in °F (ip) or K (si); defaults from 'settings show' (out of the box\n"
                + "  ±0.5 °F db and wb, ±2 %RH, ±1 °F dew point and coil, ±10 % airflow, ±2 % condensate volume)\n"
                + "  --airflow-at: where the airflow was measured (default return; with outdoor air it is the coil's\n"
                + "  whole airflow, read downstream of the outdoor-air intake: return|mixed = entering air, or supply);\n"
                + "  --airflow-basis: actual (volume at the air's own state, default) or standard (cfm at 0.075 lb/ft³;\n"
                + "  most flow hoods, flow grids and fan flowmeters report this); at 5000 ft the two differ by ~18 %\n"
                + "  --coil-temp-kind: a suction-line temperature is refused (it includes the superheat)\n"
                + "  --same-probe: return and supply read with one instrument, or probes compared side by side\n"
                + "  (their offsets cancel in the humidity-ratio drop); --supply-dew-point-offset D: the supply probe's\n"
                + "  dew point minus the return probe's in the same air (°F or K), taken off the supply reading\n"
                + "  --condensate is in mL in both unit systems\n"
                + "  --rh-target: indoor RH target for findings (default: the stored setting, 60 % out of the box)\n"
                + "  --units, the elevation and every finding threshold default to the stored settings\n"
                + "  (latent-ledger [--data-dir DIR] settings show); no ledger yet means ip, sea level, the catalogue\n"
                + "  verdict: dehumidifying | not-dehumidifying | cant-tell (margin within its k = 2 uncertainty)\n";
    }

    @Override
    public int run(Args args, CliContext context) {
        Settings settings = CommandSettings.read(context);
        UnitSystem units = UnitOptions.units(args, settings.units());
        SitePressure site = UnitOptions.site(args, units, settings.defaultElevationM());
        CoilReadings readings = CoilOptions.read(args, units, site, settings.tolerances());
        ThresholdSettings thresholds = thresholds(args, settings);
        boolean json = args.flag("json");
        args.rejectUnknown();
        args.noPositionals();
        CoilResult result = CoilCheck.run(readings, thresholds, units);
        context.out().print(json ? Json.print(CoilJson.of(result, units)) + "\n" : table(result, site, units));
        return Cli.OK;
    }

    /** The stored thresholds, with {@code --rh-target} in place of the stored indoor RH target when given. */
    private static ThresholdSettings thresholds(Args args, Settings settings) {
        Double target = args.number("rh-target");
        if (target == null) {
            return settings.thresholds();
        }
        if (!(target > 0 && target < 100)) {
            throw UnitOptions.refused(new InvalidInputException("indoor RH target", Quantity.RELATIVE_HUMIDITY,
                    target, 1, 99, null), UnitSystem.IP, "--rh-target");
        }
        Map<String, Double> overrides = new HashMap<>(settings.thresholds().overridesSi());
        overrides.put(Thresholds.INDOOR_RH_TARGET.key(), target);
        return new ThresholdSettings(overrides);
    }

    static String table(CoilResult r, SitePressure site, UnitSystem units) {
        StringBuilder b = new StringBuilder();
        CoilProcess q = r.process();
        b.append("Coil check (mass-flow method, ASHRAE Handbook—Fundamentals ch. 1; uncertainties k = 2)\n");
        String where = site.measured() ? "measured" : "standard atmosphere at "
                + Format.fixed(Quantity.ELEVATION.toDisplay(units, site.elevationM()), 0) + " " + Quantity.ELEVATION.symbol(units);
        b.append(Format.row("pressure", Format.fixed(Quantity.PRESSURE.toDisplay(units, site.pressurePa()), 3),
                Quantity.PRESSURE.symbol(units) + "  (" + where + ")"));
        if (r.mixed()) {
            air(b, r, units);
        } else {
            b.append("Air\n");
            b.append(Format.row("", "entering", "  leaving"));
            b.append(pair("dry bulb", Quantity.TEMPERATURE, r.entering().dryBulbC(), r.leaving().dryBulbC(), 1, units));
            b.append(pair("wet bulb", Quantity.TEMPERATURE, r.entering().wetBulbC(), r.leaving().wetBulbC(), 1, units));
            b.append(pair("dew point", Quantity.TEMPERATURE, r.entering().dewPointC(), r.leaving().dewPointC(), 1, units));
            b.append(Format.row("relative humidity", Format.fixed(r.entering().relativeHumidityPct(), 1),
                    String.format("%9s %%", Format.fixed(r.leaving().relativeHumidityPct(), 1))));
            b.append(pair("humidity ratio", Quantity.HUMIDITY_RATIO_FINE, r.entering().humidityRatio(),
                    r.leaving().humidityRatio(), units == UnitSystem.IP ? 1 : 2, units));
        }
        b.append(Format.row("airflow", Format.fixed(Quantity.AIRFLOW.toDisplay(units, r.readings().airflowM3PerS()), 0),
                r.readings().airflowBasis().label() + " " + Quantity.AIRFLOW.symbol(units) + " measured at "
                        + r.readings().airflowAt().key()
                        + (r.mixed() && r.readings().airflowAt() == AirflowPoint.ENTERING ? " (mixed)" : "") + " air"));
        b.append(Format.row("dry-air mass flow", Format.fixed(Quantity.WATER_RATE.toDisplay(units, q.massFlowKgPerS()),
                units == UnitSystem.IP ? 0 : 1), Quantity.WATER_RATE.symbol(units)));
        b.append("Capacity\n");
        b.append(est("sensible", Measurand.SENSIBLE, r, units, 0));
        b.append(est("latent", Measurand.LATENT, r, units, 0));
        b.append(est("total", Measurand.TOTAL, r, units, 0));
        b.append(Format.row("", Format.fixed(Quantity.POWER_LARGE.toDisplay(units, q.totalW()), 2),
                Quantity.POWER_LARGE.symbol(units)));
        b.append(est("sensible heat ratio", Measurand.SHR, r, units, 3));
        if (r.condensate() != null && r.condensate().usable()) {
            b.append(est("latent from condensate", Measurand.LATENT_FROM_CONDENSATE, r, units, 0));
            b.append(est("SHR from condensate", Measurand.SHR_FROM_CONDENSATE, r, units, 3));
        }
        b.append(est(Measurand.MOISTURE_REMOVAL.label(units), Measurand.MOISTURE_REMOVAL, r, units, 2));
        // a rate per day reads like a dehumidifier's rating unless it says it assumes a day of running
        b.append(Format.row("", DailyWaterWords.number(q.moistureRemovalKgPerS(), units),
                DailyWaterWords.unitAndWords(q.moistureRemovalKgPerS(), units)));
        b.append(est(Measurand.HUMIDITY_RATIO_DROP.label(units), Measurand.HUMIDITY_RATIO_DROP, r, units, units == UnitSystem.IP ? 1 : 2));
        b.append(est(Measurand.LATENT_PER_AIRFLOW.label(units), Measurand.LATENT_PER_AIRFLOW, r, units, 2));
        if (r.readings().hasNominalCapacity()) {
            b.append(est(Measurand.AIRFLOW_PER_NOMINAL_CAPACITY.label(units), Measurand.AIRFLOW_PER_NOMINAL_CAPACITY, r,
                    units, 0));
        } else {
            b.append("  " + Measurand.AIRFLOW_PER_NOMINAL_CAPACITY.label(units) + ": "
                    + Ratio.notMeasurable("no nameplate size given; add "
                            + (units == UnitSystem.IP ? "--nominal-tons" : "--nominal-kw"))
                    + "\n");
        }
        ShortcutFigures s = ShortcutFigures.of(units, r.readings().pressurePa(), r.readings().airflowM3PerS(), q,
                r.readings().airflowBasis());
        double[] c = s.scaledConstants();
        b.append("Standard-air shortcuts (cross-check only; constants × p/p0 = ")
                .append(Format.fixed(s.pressureRatio(), 4)).append(")\n");
        b.append(Format.row("sensible " + Format.fixed(c[0], 3), Format.fixed(Quantity.POWER.toDisplay(units, s.sensibleW()), 0),
                Quantity.POWER.symbol(units)));
        b.append(Format.row("latent " + Format.fixed(c[1], units == UnitSystem.IP ? 3 : 0),
                Format.fixed(Quantity.POWER.toDisplay(units, s.latentW()), 0), Quantity.POWER.symbol(units)));
        b.append(Format.row("total " + Format.fixed(c[2], 3), Format.fixed(Quantity.POWER.toDisplay(units, s.totalW()), 0),
                Quantity.POWER.symbol(units)));
        b.append("Coil\n");
        if (r.adp().found()) {
            b.append(est("apparatus dew point", Measurand.APPARATUS_DEW_POINT, r, units, 1));
            b.append(est("bypass factor", Measurand.BYPASS_FACTOR, r, units, 3));
        } else {
            b.append("  apparatus dew point: ").append(r.adp().explanation()).append('\n');
        }
        if (r.mixed()) {
            b.append(est("return dew point", Measurand.RETURN_DEW_POINT, r, units, 1));
            b.append(est("outdoor dew point", Measurand.OUTDOOR_DEW_POINT, r, units, 1));
        }
        b.append(est(r.mixed() ? "entering (mixed) dp" : "entering dew point", Measurand.ENTERING_DEW_POINT, r, units, 1));
        String source = switch (r.coilTemperatureSource()) {
            case MEASURED -> "measured " + r.readings().coilKind().label();
            case APPARATUS_DEW_POINT -> "apparatus dew point, from the same two readings as the drop";
            case NONE -> "none";
        };
        if (Double.isFinite(r.coilTemperatureC())) {
            b.append(est("coil temperature", Measurand.COIL_TEMPERATURE, r, units, 1).replaceAll("\n$", "")
                    .concat("  (" + source + ")\n"));
            b.append(est("dew-point margin", Measurand.DEW_POINT_MARGIN, r, units, 1));
        } else {
            b.append("  coil temperature: none (not measured, no apparatus dew point)\n");
        }
        if (r.condensate() != null) {
            b.append("Condensate\n");
            b.append(est("caught", Measurand.CONDENSATE_RATE, r, units, 2));
            b.append(est("air side", Measurand.MOISTURE_REMOVAL, r, units, 2));
            b.append(est("difference", Measurand.CONDENSATE_MINUS_AIRSIDE, r, units, 2));
        }
        b.append("Verdict: ").append(r.verdict().key()).append('\n');
        b.append("Findings\n");
        if (r.findings().isEmpty()) {
            b.append("  none\n");
        }
        for (Finding f : r.findings()) {
            b.append("  [").append(f.severity().key()).append("] ").append(f.code().key()).append(": ").append(f.message()).append('\n');
            b.append("      ").append(f.technical()).append('\n');
            for (String next : f.nextChecks()) {
                b.append("      - ").append(next).append('\n');
            }
        }
        b.append(Cautions.SAFETY_LINE).append('\n');
        return b.toString();
    }

    /** Return, outdoor, the mix entering the coil, and supply, side by side. */
    private static void air(StringBuilder b, CoilResult r, UnitSystem units) {
        MoistAirState[] s = {r.returnAir(), r.outdoorAir(), r.entering(), r.leaving()};
        b.append("Air (entering = adiabatic mix of return and outdoor air, ASHRAE Handbook—Fundamentals ch. 1)\n");
        b.append(Format.row("", "return", String.format("%9s %9s %9s", "outdoor", "mixed", "supply")));
        quad(b, "dry bulb", Quantity.TEMPERATURE, s, MoistAirState::dryBulbC, 1, units);
        quad(b, "wet bulb", Quantity.TEMPERATURE, s, MoistAirState::wetBulbC, 1, units);
        quad(b, "dew point", Quantity.TEMPERATURE, s, MoistAirState::dewPointC, 1, units);
        quad(b, "relative humidity", Quantity.RELATIVE_HUMIDITY, s, MoistAirState::relativeHumidityPct, 1, units);
        quad(b, "humidity ratio", Quantity.HUMIDITY_RATIO_FINE, s, MoistAirState::humidityRatio,
                units == UnitSystem.IP ? 1 : 2, units);
        b.append(Format.row("outdoor air", Format.fixed(Quantity.FRACTION_PERCENT.toDisplay(units,
                r.readings().outdoor().fraction()), 1), "% of airflow by volume ("
                + Format.fixed(Quantity.FRACTION_PERCENT.toDisplay(units, r.mix().secondMassFraction()), 1)
                + " % of dry-air mass)"));
    }

    private static void quad(StringBuilder b, String label, Quantity q, MoistAirState[] s,
                             java.util.function.ToDoubleFunction<MoistAirState> f, int decimals, UnitSystem units) {
        String[] v = new String[s.length];
        for (int i = 0; i < s.length; i++) {
            v[i] = Format.fixed(q.toDisplay(units, f.applyAsDouble(s[i])), decimals);
        }
        b.append(Format.row(label, v[0], String.format("%9s %9s %9s %s", v[1], v[2], v[3], q.symbol(units))));
    }

    private static String pair(String label, Quantity qty, double a, double b, int decimals, UnitSystem units) {
        return Format.row(label, Format.fixed(qty.toDisplay(units, a), decimals),
                String.format("%9s %s", Format.fixed(qty.toDisplay(units, b), decimals), qty.symbol(units)));
    }

    private static String est(String label, Measurand m, CoilResult r, UnitSystem units, int decimals) {
        Estimate e = r.estimate(m);
        if (!e.exists()) {
            // the same words as the app and the report: "not measurable (why)"
            String why = switch (m) {
                case SHR -> WithheldRatios.shr(r).reason();
                case SHR_FROM_CONDENSATE -> WithheldRatios.shrFromCondensate(r).reason();
                case BYPASS_FACTOR -> WithheldRatios.bypassFactor(r).reason();
                default -> "";
            };
            return "  " + label + ": " + Ratio.notMeasurable(why) + "\n";
        }
        String u = Double.isFinite(e.expandedSi())
                ? "± " + Format.fixed(m.uncertaintyQuantity().toDisplay(units, e.expandedSi()), decimals) : "";
        return Format.row(label, Format.fixed(m.quantity().toDisplay(units, e.valueSi()), decimals),
                (u + " " + m.quantity().symbol(units)).trim());
    }
}
