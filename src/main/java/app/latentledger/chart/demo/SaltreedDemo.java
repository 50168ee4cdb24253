package app.latentledger.chart.demo;

import app.latentledger.chart.psychro.ChartPoint;
import app.latentledger.chart.psychro.CoilProcessOverlay;
import app.latentledger.chart.psychro.PsychroChartData;
import app.latentledger.chart.timeline.CycleMark;
import app.latentledger.chart.timeline.TimelineData;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.MoistAirState;
import app.latentledger.core.psychro.Psychrometrics;
import app.latentledger.core.psychro.SitePressure;
import app.latentledger.core.units.UnitSystem;

import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * Invented scenario: a 3-ton system in a house on Gullwing Lane, Saltreed, before and after the
 * blower speed was lowered and the fan-off delay removed. Sea level. The numbers are made up to
 * look like such a call; the timeline is a synthetic week at 1 Hz.
 */
public final class SaltreedDemo {
    private SaltreedDemo() {
    }

    private static double f(double fahrenheit) {
        return (fahrenheit - 32) / 1.8;
    }

    /** The before/after chart: readings typed as °F dry bulb and wet bulb. */
    public static PsychroChartData beforeAfter(UnitSystem units) {
        double p = SitePressure.SEA_LEVEL.pressurePa();
        HandbookEdition e = HandbookEdition.of(units);
        CoilProcessOverlay before = overlay("Before", p, e, f(77), f(66.5), f(61), f(59.5), f(49));
        CoilProcessOverlay after = overlay("After", p, e, f(75.5), f(63.5), f(55.5), f(54), f(44));
        MoistAirState outdoor = MoistAirState.fromWetBulb(p, f(88), f(79), e);
        return new PsychroChartData(units, p, "Gullwing Lane, Saltreed — coil before and after",
                List.of(before, after), List.of(new ChartPoint("Outdoor", outdoor.dryBulbC(), outdoor.humidityRatio())));
    }

    private static CoilProcessOverlay overlay(String name, double p, HandbookEdition e, double inDb, double inWb,
                                              double outDb, double outWb, double coilC) {
        MoistAirState in = MoistAirState.fromWetBulb(p, inDb, inWb, e);
        MoistAirState out = MoistAirState.fromWetBulb(p, outDb, outWb, e);
        ChartPoint entering = new ChartPoint("Return", in.dryBulbC(), in.humidityRatio());
        ChartPoint leaving = new ChartPoint("Supply", out.dryBulbC(), out.humidityRatio());
        return new CoilProcessOverlay(name, entering, leaving, lineMeetsSaturation(p, entering, leaving), coilC,
                in.dewPointC());
    }

    /**
     * Where the straight entering→leaving line, carried on, meets the saturation curve: the demo's
     * stand-in for the coil check's apparatus dew point (found by bisection on the line parameter).
     */
    static double lineMeetsSaturation(double p, ChartPoint a, ChartPoint b) {
        // step out from the leaving state until the line is past saturation, then bisect
        double lo = 1;
        double hi = 1;
        while (below(p, a, b, hi)) {
            lo = hi;
            hi += 0.05;
            if (hi > 50) {
                return Double.NaN;
            }
        }
        for (int k = 0; k < 60; k++) {
            double s = 0.5 * (lo + hi);
            if (below(p, a, b, s)) {
                lo = s;
            } else {
                hi = s;
            }
        }
        return a.dryBulbC() + lo * (b.dryBulbC() - a.dryBulbC());
    }

    private static boolean below(double p, ChartPoint a, ChartPoint b, double s) {
        double db = a.dryBulbC() + s * (b.dryBulbC() - a.dryBulbC());
        double w = a.humidityRatio() + s * (b.humidityRatio() - a.humidityRatio());
        return w < Psychrometrics.saturationHumidityRatio(db, p);
    }

    /** A single process (the "after" of the pair) for a plain coil-check chart. */
    public static PsychroChartData single(UnitSystem units) {
        PsychroChartData pair = beforeAfter(units);
        CoilProcessOverlay after = pair.overlays().get(1);
        return new PsychroChartData(units, pair.pressurePa(), "Gullwing Lane, Saltreed — coil check",
                List.of(new CoilProcessOverlay("", after.entering(), after.leaving(), after.adpC(), after.coilTempC(),
                        after.enteringDewPointC())), List.of());
    }

    /**
     * A synthetic week at 1 Hz: cycles of 8–16 min on and 6–14 min off that lengthen in the
     * afternoon, supply air falling on a 100 s time constant, moisture removal starting after the coil
     * wets (~2–3 min), and a 3 min fan-off delay that blows water back into the house.
     *
     * @param days number of days (7 gives the 604,800-sample benchmark case)
     */
    public static TimelineData week(UnitSystem units, int days) {
        int n = days * 86_400;
        double[] t = new double[n];
        double[] rdb = new double[n];
        double[] sdb = new double[n];
        double[] rw = new double[n];
        double[] sw = new double[n];
        boolean[] comp = new boolean[n];
        boolean[] fan = new boolean[n];
        List<CycleMark> cycles = new ArrayList<>();
        Random rnd = new Random(20260713L);
        double massFlowKgPerS = 0.55;
        double supplyDb = f(75);
        double supplyW = 0.0118;
        int i = 0;
        while (i < n) {
            double hourOfDay = (i % 86_400) / 3600.0;
            double load = 0.5 + 0.35 * Math.sin((hourOfDay - 9) / 24 * 2 * Math.PI);
            int on = (int) (60 * (8 + 8 * load + rnd.nextDouble() * 1.5));
            int off = (int) (60 * (14 - 8 * load + rnd.nextDouble() * 1.5));
            int delay = 180;
            int start = i;
            double removed = 0;
            double returned = 0;
            double onset = Double.NaN;
            for (int k = 0; k < on + off && i < n; k++, i++) {
                boolean compOn = k < on;
                boolean fanOn = k < on + delay;
                double hour = (i % 86_400) / 3600.0;
                double returnDb = f(75.5 + 1.2 * Math.sin((hour - 15) / 24 * 2 * Math.PI)) + rnd.nextGaussian() * 0.03;
                double returnW = 0.0116 + 0.0006 * Math.sin((hour - 13) / 24 * 2 * Math.PI) + rnd.nextGaussian() * 2e-6;
                double coilWet = compOn ? Math.min(1, Math.max(0, (k - 130) / 120.0)) : 0;
                double targetDb = compOn ? f(55.5) : returnDb;
                double targetW = compOn ? returnW - 0.0032 * coilWet
                        : fanOn ? returnW + 0.0030 * Math.exp(-(k - on) / 80.0) : returnW;
                supplyDb += (targetDb - supplyDb) / (compOn ? 100.0 : 160.0);
                supplyW += (targetW - supplyW) / 35.0;
                if (!fanOn) {
                    // still air at the supply sensor drifts to the duct's surroundings
                    supplyW += (returnW - supplyW) / 400.0;
                }
                t[i] = i;
                rdb[i] = returnDb;
                sdb[i] = supplyDb + rnd.nextGaussian() * 0.04;
                rw[i] = returnW;
                sw[i] = supplyW + rnd.nextGaussian() * 3e-6;
                comp[i] = compOn;
                fan[i] = fanOn;
                if (fanOn) {
                    double dw = returnW - supplyW;
                    if (dw > 0 && compOn) {
                        removed += dw * massFlowKgPerS;
                        if (Double.isNaN(onset) && dw > 0.0004) {
                            onset = i;
                        }
                    } else if (dw < 0) {
                        returned += -dw * massFlowKgPerS;
                    }
                }
            }
            double onEnd = Math.min(start + on, i);
            cycles.add(new CycleMark(start, onEnd, i, removed, returned, onset));
        }
        return new TimelineData(units, "Gullwing Lane, Saltreed — logged week", LocalDateTime.of(2026, 7, 13, 0, 0),
                t, rdb, sdb, rw, sw, comp, fan, cycles);
    }
}
