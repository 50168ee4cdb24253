package app.latentledger.cli;

import app.latentledger.core.coil.Estimate;
import app.latentledger.core.findings.Evidence;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.house.HouseBudget;
import app.latentledger.core.house.InternalMoisture;
import app.latentledger.core.house.ScenarioResult;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The {@code house --json} object: water in lb/day (kg/day with {@code --units si}), dehumidifier
 * capacities in pints/day (L/day), temperatures in °F (°C); each figure {value, uncertainty} with the
 * uncertainty expanded (k = 2); null for "does not exist".
 */
final class HouseJson {
    private HouseJson() {
    }

    static Map<String, Object> of(HouseBudget b, UnitSystem units, String source) {
        ScenarioResult s = b.asFound();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("units", units.key());
        m.put("source", source);
        m.put("infiltrationMethod", b.method().key());
        Map<String, Object> gains = new LinkedHashMap<>();
        gains.put("infiltration", water(s.infiltration(), units));
        gains.put("ventilation", water(s.ventilation(), units));
        gains.put("internal", water(s.internal(), units));
        gains.put("returnLeak", water(s.returnLeak(), units));
        gains.put("total", water(s.gains(), units));
        m.put("gains", gains);
        m.put("removal", water(s.removal(), units));
        m.put("removedDuringRuns", water(s.removedInRuns(), units));
        m.put("reevaporated", water(s.reevaporated(), units));
        m.put("balance", water(s.balance(), units));
        m.put("runtimeFraction", value(s.runtimeFraction(), Quantity.FRACTION_PERCENT, units));
        m.put("runtimeSource", b.inputs().system().runtimeSource());
        m.put("latentFractionSource", b.inputs().system().latentSource());
        m.put("equilibriumIndoorDewPoint", value(s.equilibriumDewPointC(), Quantity.TEMPERATURE, units));
        m.put("equilibriumIndoorRh", value(s.equilibriumRhPct(), Quantity.RELATIVE_HUMIDITY, units));
        m.put("rhTarget", b.inputs().rhTargetPct());
        m.put("dewPointBenchmark", Quantity.TEMPERATURE.toDisplay(units, b.inputs().dewPointMaxC()));
        m.put("returnLeakFraction", s.leakFraction().exists() ? Map.of("value", s.leakFraction().valueSi(),
                "uncertainty", s.leakFraction().expandedSi()) : null);
        List<Object> whatIf = new ArrayList<>();
        for (ScenarioResult w : b.whatIfs()) {
            Map<String, Object> o = new LinkedHashMap<>();
            o.put("key", w.scenario().key());
            o.put("change", w.scenario().change());
            o.put("shr", value(w.shr(), Quantity.DIMENSIONLESS, units));
            o.put("latent", value(w.latentW(), Quantity.POWER, units));
            o.put("moistureRemoval", value(w.steadyRemoval(), Quantity.WATER_RATE, units));
            o.put("removal", water(w.removal(), units));
            o.put("balance", water(w.balance(), units));
            o.put("runtimeFraction", value(w.runtimeFraction(), Quantity.FRACTION_PERCENT, units));
            o.put("equilibriumIndoorDewPoint", value(w.equilibriumDewPointC(), Quantity.TEMPERATURE, units));
            o.put("equilibriumIndoorRh", value(w.equilibriumRhPct(), Quantity.RELATIVE_HUMIDITY, units));
            whatIf.add(o);
        }
        m.put("whatIf", whatIf);
        Map<String, Object> d = new LinkedHashMap<>();
        d.put("needed", pints(b.dehumidifier().needed(), units));
        d.put("ratedPortable65F", pints(b.dehumidifier().portable65F(), units));
        d.put("ratedWholeHome73F", pints(b.dehumidifier().wholeHome73F(), units));
        d.put("rated80F", pints(b.dehumidifier().rated80F(), units));
        d.put("extrapolated", b.dehumidifier().extrapolated());
        m.put("dehumidifier", d);
        m.put("memoryOnly", List.of("internal: " + InternalMoisture.MEMORY_ONLY));
        m.put("findings", findings(b, units));
        m.put("cautions", b.cautions());
        return m;
    }

    private static List<Object> findings(HouseBudget b, UnitSystem units) {
        List<Object> out = new ArrayList<>();
        for (Finding f : b.findings()) {
            Map<String, Object> x = new LinkedHashMap<>();
            x.put("code", f.code().key());
            x.put("severity", f.severity().key());
            x.put("message", f.message());
            x.put("technical", f.technical());
            List<Object> ev = new ArrayList<>();
            for (Evidence e : f.evidence()) {
                Map<String, Object> y = new LinkedHashMap<>();
                y.put("key", e.key());
                y.put("label", e.label());
                y.put("value", value(new Estimate(e.valueSi(), e.uncertaintySi()), e.quantity(), units));
                y.put("unit", e.quantity().symbol(units));
                ev.add(y);
            }
            x.put("evidence", ev);
            x.put("nextChecks", f.nextChecks());
            out.add(x);
        }
        return out;
    }

    private static Object water(Estimate e, UnitSystem units) {
        return value(e, Quantity.WATER_MASS_DAILY, units);
    }

    private static Double pints(double kgPerS, UnitSystem units) {
        return Quantity.WATER_RATE_DAILY.toDisplay(units, kgPerS);
    }

    static Map<String, Object> value(Estimate e, Quantity q, UnitSystem units) {
        if (!e.exists()) {
            return null;
        }
        Quantity spread = q == Quantity.TEMPERATURE ? Quantity.TEMPERATURE_DIFFERENCE : q;
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("value", q.toDisplay(units, e.valueSi()));
        m.put("uncertainty", Double.isFinite(e.expandedSi()) ? spread.toDisplay(units, e.expandedSi()) : null);
        return m;
    }
}
