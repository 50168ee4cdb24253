package app.latentledger.cli;

import app.latentledger.core.coil.CoilProcess;
import app.latentledger.core.coil.CoilReadings;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.CondensateCheck;
import app.latentledger.core.coil.Estimate;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.coil.ShortcutFigures;
import app.latentledger.core.coil.UncertainInput;
import app.latentledger.core.findings.Cautions;
import app.latentledger.core.findings.Evidence;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** The {@code coil --json} object, every number in the tech's units, null for "does not exist". */
final class CoilJson {
    private CoilJson() {
    }

    static Map<String, Object> of(CoilResult r, UnitSystem units) {
        CoilReadings in = r.readings();
        CoilProcess q = r.process();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("units", units.key());
        m.put("pressure", Quantity.PRESSURE.toDisplay(units, in.pressurePa()));
        m.put("entering", StateJson.of(r.entering(), units));
        m.put("leaving", StateJson.of(r.leaving(), units));
        m.put("enteringSource", r.enteringSource());
        m.put("return", StateJson.of(r.returnAir(), units));
        m.put("outdoor", r.mixed() ? StateJson.of(r.outdoorAir(), units) : null);
        m.put("outdoorAirFraction", r.mixed()
                ? Quantity.FRACTION_PERCENT.toDisplay(units, in.outdoor().fraction()) : null);
        m.put("outdoorAirMassFraction", r.mixed()
                ? Quantity.FRACTION_PERCENT.toDisplay(units, r.mix().secondMassFraction()) : null);
        m.put("airflow", Quantity.AIRFLOW.toDisplay(units, in.airflowM3PerS()));
        m.put("airflowMeasuredAt", in.airflowAt().key());
        m.put("massFlowDryAir", Quantity.WATER_RATE.toDisplay(units, q.massFlowKgPerS()));
        m.put("sensible", Quantity.POWER.toDisplay(units, q.sensibleW()));
        m.put("latent", Quantity.POWER.toDisplay(units, q.latentW()));
        m.put("total", Quantity.POWER.toDisplay(units, q.totalW()));
        m.put(units == UnitSystem.IP ? "totalTons" : "totalKw", Quantity.POWER_LARGE.toDisplay(units, q.totalW()));
        m.put("shr", StateJson.finiteOrNull(q.sensibleHeatRatio()));
        m.put("moistureRemoval", Quantity.WATER_RATE.toDisplay(units, q.moistureRemovalKgPerS()));
        m.put("moistureRemovalDaily", Quantity.WATER_RATE_DAILY.toDisplay(units, q.moistureRemovalKgPerS()));
        m.put("humidityRatioDrop", Quantity.HUMIDITY_RATIO_FINE.toDisplay(units, q.humidityRatioDrop()));
        m.put("latentPerAirflow", Quantity.POWER_PER_AIRFLOW.toDisplay(units, q.latentPerAirflow()));
        m.put("airflowPerTon", shown(Quantity.AIRFLOW_PER_CAPACITY, units, q.airflowPerCapacity()));
        m.put("airflowPerNominalTon", shown(Quantity.AIRFLOW_PER_CAPACITY, units, r.airflowPerNominalCapacity()));
        m.put("shortcuts", shortcuts(ShortcutFigures.of(units, in.pressurePa(), in.airflowM3PerS(), q), units));
        m.put("apparatusDewPoint", shown(Quantity.TEMPERATURE, units, r.adp().temperatureC()));
        m.put("apparatusDewPointStatus", r.adp().status().key());
        m.put("bypassFactor", StateJson.finiteOrNull(r.adp().bypassFactor()));
        m.put("enteringDewPoint", shown(Quantity.TEMPERATURE, units, r.estimate(Measurand.ENTERING_DEW_POINT).valueSi()));
        m.put("leavingDewPoint", shown(Quantity.TEMPERATURE, units, r.estimate(Measurand.LEAVING_DEW_POINT).valueSi()));
        m.put("coilTemperature", shown(Quantity.TEMPERATURE, units, r.coilTemperatureC()));
        m.put("coilTemperatureSource", r.coilTemperatureSource());
        m.put("coilTemperatureKind", in.hasCoilTemperature() ? in.coilKind().key() : null);
        m.put("dewPointMargin", shown(Quantity.TEMPERATURE_DIFFERENCE, units,
                r.estimate(Measurand.DEW_POINT_MARGIN).valueSi()));
        m.put("verdict", r.verdict().key());
        m.put("uncertainty", uncertainty(r, units));
        m.put("condensate", condensate(r.condensate(), units));
        List<Object> findings = new ArrayList<>();
        for (Finding f : r.findings()) {
            findings.add(finding(f, units));
        }
        m.put("findings", findings);
        m.put("safety", Cautions.SAFETY_LINE);
        return m;
    }

    private static Map<String, Object> shortcuts(ShortcutFigures s, UnitSystem units) {
        Map<String, Object> m = new LinkedHashMap<>();
        double[] c = s.scaledConstants();
        m.put("basis", units == UnitSystem.IP
                ? "1.08 × cfm × Δt, 0.68 × cfm × Δgr, 4.5 × cfm × Δh, each × p/p0"
                : "1.23 × L/s × Δt, 3010 × L/s × ΔW, 1.2 × L/s × Δh, each × p/p0");
        m.put("pressureRatio", s.pressureRatio());
        m.put("sensibleConstant", c[0]);
        m.put("latentConstant", c[1]);
        m.put("totalConstant", c[2]);
        m.put("sensible", Quantity.POWER.toDisplay(units, s.sensibleW()));
        m.put("latent", Quantity.POWER.toDisplay(units, s.latentW()));
        m.put("total", Quantity.POWER.toDisplay(units, s.totalW()));
        return m;
    }

    private static Map<String, Object> uncertainty(CoilResult r, UnitSystem units) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("coverageFactor", 2);
        m.put("method", "first-order GUM (JCGM 100:2008), numerical sensitivity coefficients,"
                + " rectangular instrument tolerances, independent probes");
        for (Measurand x : Measurand.values()) {
            Estimate e = r.estimate(x);
            if (e.exists()) {
                m.put(x.key(), shown(x.uncertaintyQuantity(), units, e.expandedSi()));
            }
        }
        Map<String, Object> tolerances = new LinkedHashMap<>();
        for (UncertainInput i : new app.latentledger.core.coil.CoilModel(r.readings()).inputs()) {
            if (i.halfWidthSi() > 0) {
                tolerances.put(i.key(), i.quantity().toDisplay(units, i.halfWidthSi()));
            }
        }
        m.put("inputTolerances", tolerances);
        return m;
    }

    private static Map<String, Object> condensate(CondensateCheck c, UnitSystem units) {
        if (c == null) {
            return null;
        }
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("rate", Quantity.WATER_RATE.toDisplay(units, c.condensate().valueSi()));
        m.put("rateUncertainty", shown(Quantity.WATER_RATE, units, c.condensate().expandedSi()));
        m.put("airside", Quantity.WATER_RATE.toDisplay(units, c.airside().valueSi()));
        m.put("airsideUncertainty", shown(Quantity.WATER_RATE, units, c.airside().expandedSi()));
        m.put("difference", Quantity.WATER_RATE.toDisplay(units, c.difference().valueSi()));
        m.put("differenceUncertainty", shown(Quantity.WATER_RATE, units, c.difference().expandedSi()));
        m.put("relativeDifference", StateJson.finiteOrNull(c.relativeDifference()));
        return m;
    }

    static Map<String, Object> finding(Finding f, UnitSystem units) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("code", f.code().key());
        m.put("severity", f.severity().key());
        m.put("message", f.message());
        m.put("technical", f.technical());
        List<Object> evidence = new ArrayList<>();
        for (Evidence e : f.evidence()) {
            Map<String, Object> x = new LinkedHashMap<>();
            x.put("key", e.key());
            x.put("label", e.label());
            x.put("value", shown(e.quantity(), units, e.valueSi()));
            Quantity uq = e.quantity() == Quantity.TEMPERATURE ? Quantity.TEMPERATURE_DIFFERENCE : e.quantity();
            x.put("uncertainty", shown(uq, units, e.uncertaintySi()));
            x.put("unit", e.quantity().symbol(units));
            evidence.add(x);
        }
        m.put("evidence", evidence);
        m.put("nextChecks", f.nextChecks());
        return m;
    }

    static Double shown(Quantity q, UnitSystem units, double si) {
        return Double.isFinite(si) ? q.toDisplay(units, si) : null;
    }
}
