package app.latentledger.fielddata;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;

/**
 * A second, independent log generator: a small physical model of a house, a DX coil that holds
 * water, a blower and real probes, integrated second by second, written without any of the
 * project's code (its own psychrometrics, its own coil model). It exists so the analysis is tested
 * on logs it was not built from: the truth of each file is the integral of this model, never the
 * tool's output, and the effects the analysis must survive are in it — blower-motor heat, unequal
 * probe lags, fan-off delays without status columns, fan-only airflow below cooling airflow,
 * moisture gains while the unit is off, outdoor weather driving the runtime.
 *
 * <p>Psychrometrics (own code): saturation pressure over water by Buck (1981), J. Appl. Meteor.
 * 20, 1527–1532, p_ws = 611.21·exp((18.678 − t/234.5)·t/(257.14 + t)) Pa; W = 0.621945 p_w/(p − p_w)
 * and h = 1.006 t + W(2501 + 1.86 t) kJ/kg (ASHRAE Handbook—Fundamentals 2017 ch. 1); dry-air density
 * p/(287.042 (t + 273.15)(1 + 1.607858 W)). Buck and Hyland–Wexler agree within 0.05 % over 0–50 °C.
 *
 * <p>Coil: during a run the supply approaches the coil's leaving state with time constant
 * {@link Config#coilTauS}; the water it takes from the air first wets the coil up to
 * {@link Config#coilHoldKg}, the rest drains. With the blower on and the compressor off, water
 * evaporates from the coil at a rate ṁ·ε·(W_s,sat − W_r), the air leaving at the return's
 * enthalpy (adiabatic) plus blower heat, ε falling as the coil dries. With the blower off the coil
 * only drains (nothing reaches the house through the duct) and the supply probe sits in still air
 * that drifts toward the duct's surroundings. Probes: first-order lags, the humidity sensor
 * slower than its thermistor, plus small noise.
 */
final class IndependentLog {
    /** What the still supply probe drifts toward when the blower stops. */
    enum StillAir { WARMS, COOLS }

    /** Everything one file is made from. */
    static final class Config {
        long seed = 7;
        int intervalS = 10;
        double pressurePa = 101_325;
        /** Cooling airflow and fan-only airflow, m³/s. */
        double airflowM3PerS = 0.57;
        double fanAirflowM3PerS = 0.57;
        /** Compressor schedule: on, off, on, off… seconds (ends with a rest). */
        double[] onOff = {900, 1200};
        int repeats = 8;
        double leadOffS = 900;
        /** Blower: run-on after each run (fan-off delay), s; or continuous. */
        double fanOffDelayS = 0;
        boolean continuousFan;
        double blowerHeatK = 0;
        /** Steady drop in humidity ratio across the coil when it runs, kg/kg, and supply dry-bulb drop, K. */
        double coilDropW = 0.0045;
        double coilDropK = 11;
        double coilTauS = 50;
        double coilHoldKg = 0.6;
        double drainTauS = 1200;
        double evapEffectiveness = 0.75;
        /** House: return dry bulb and humidity ratio at the start; moisture gain, kg/s; air mass, kg. */
        double returnDbC = 24.5;
        double returnW = 0.0110;
        double moistureGainKgPerS = 1.6 / 3600;
        /** Air plus the moisture buffering of furnishings, as an equivalent air mass, kg. */
        double houseAirKg = 40_000;
        double returnSwingK = 0.8;
        /** Outdoor air leaking in (and house air out), kg/s: brings the outdoor humidity ratio. */
        double infiltrationKgPerS = 0.05;
        /** Probe lags, s. */
        double supplyTempLagS = 20;
        double supplyRhLagS = 45;
        double returnTempLagS = 15;
        double returnRhLagS = 30;
        double noiseK = 0.03;
        double noiseRhPct = 0.25;
        StillAir stillAir = StillAir.WARMS;
        boolean statusColumns;
        /** Outdoor weather: mean and half swing, °C; when set, runs follow a load line instead of onOff. */
        boolean outdoor;
        double outdoorMeanC = 30;
        double outdoorSwingK = 6;
        double outdoorW = 0.016;
        double balanceC = 18;
        double continuousC = 40;
        double cycleS = 1200;
        double days = 7;
        /** Output: temperatures in °C or °F, header units, time style. */
        boolean celsius;
        boolean headerUnits;
        boolean usDates;
        String isoOffset = "-05:00";
    }

    /** The file and what the model integrated. */
    record Truth(String csv, double removedKg, double returnedKg, int runs, double medianOnS, List<double[]> hours,
                 double offGainPerS) {
        double share() {
            return returnedKg / removedKg;
        }
    }

    private IndependentLog() {
    }

    static double pws(double t) {
        return 611.21 * Math.exp((18.678 - t / 234.5) * t / (257.14 + t));
    }

    static double w(double pw, double p) {
        return 0.621945 * pw / (p - pw);
    }

    static double pw(double w, double p) {
        return p * w / (0.621945 + w);
    }

    static double h(double t, double w) {
        return 1.006 * t + w * (2501 + 1.86 * t);
    }

    static double rhOf(double t, double w, double p) {
        return 100 * pw(w, p) / pws(t);
    }

    static double density(double t, double w, double p) {
        return p / (287.042 * (t + 273.15) * (1 + 1.607858 * w));
    }

    /** Dry bulb on the line h = const at humidity ratio w. */
    static double tAt(double hKj, double w) {
        return (hKj - 2501 * w) / (1.006 + 1.86 * w);
    }

    /** Schedule as [start, stop) pairs of compressor runs in seconds, and the end of the log. */
    private static List<double[]> schedule(Config c, double[] end) {
        List<double[]> runs = new ArrayList<>();
        if (c.outdoor) {
            double total = c.days * 86_400;
            double t = 0;
            while (t + c.cycleS <= total) {
                double out = outdoor(c, t + c.cycleS / 2);
                double f = Math.max(0, Math.min(1, (out - c.balanceC) / (c.continuousC - c.balanceC)));
                double on = f * c.cycleS;
                if (on >= 120 && on <= c.cycleS - 120) {
                    runs.add(new double[] {t, t + on});
                } else if (on > c.cycleS - 120) {
                    runs.add(new double[] {t, t + c.cycleS - 120});
                }
                t += c.cycleS;
            }
            end[0] = total;
            return runs;
        }
        double t = c.leadOffS;
        for (int r = 0; r < c.repeats; r++) {
            for (int k = 0; k + 1 < c.onOff.length; k += 2) {
                runs.add(new double[] {t, t + c.onOff[k]});
                t += c.onOff[k] + c.onOff[k + 1];
            }
        }
        end[0] = t;
        return runs;
    }

    static double outdoor(Config c, double t) {
        // warmest at 15:00 when the log starts at midnight
        return c.outdoorMeanC + c.outdoorSwingK * Math.cos(2 * Math.PI * (t / 86_400.0 - 15 / 24.0));
    }

    static Truth generate(Config c) {
        Random rnd = new Random(c.seed);
        double[] endHolder = new double[1];
        List<double[]> runs = schedule(c, endHolder);
        double end = endHolder[0];
        double p = c.pressurePa;
        int n = (int) Math.floor(end);
        boolean[] comp = new boolean[n];
        boolean[] fan = new boolean[n];
        for (double[] r : runs) {
            for (int i = (int) r[0]; i < Math.min(n, (int) r[1]); i++) {
                comp[i] = true;
            }
        }
        for (int i = 0; i < n; i++) {
            fan[i] = c.continuousFan || comp[i];
        }
        if (!c.continuousFan && c.fanOffDelayS > 0) {
            for (double[] r : runs) {
                for (int i = (int) r[1]; i < Math.min(n, (int) (r[1] + c.fanOffDelayS)); i++) {
                    fan[i] = true;
                }
            }
        }
        double tr = c.returnDbC;
        double wr = c.returnW;
        double coilWater = 0;
        double tsTrue = tr;
        double wsTrue = wr;
        double runS = 0;
        double restS = 0;
        double stillS = 0;
        double tsAtStill = tr;
        double wsAtStill = wr;
        double tsAtStop = tr;
        // probes
        double pTs = tr;
        double pWs = wr;
        double pTr = tr;
        double pWr = wr;
        double removed = 0;
        double returned = 0;
        double offGainSum = 0;
        int offGainN = 0;
        StringBuilder b = new StringBuilder();
        String deg = c.celsius ? "°C" : "°F";
        String u = c.headerUnits ? " [" + deg + "]" : "";
        b.append("time,return_db").append(u).append(",return_rh,supply_db").append(u).append(",supply_rh");
        if (c.outdoor) {
            b.append(",outdoor_db").append(u).append(",outdoor_rh");
        }
        if (c.statusColumns) {
            b.append(",compressor,fan");
        }
        b.append('\n');
        List<double[]> hours = new ArrayList<>();
        double hourOn = 0;
        double hourT = 0;
        for (int i = 0; i < n; i++) {
            double t = i;
            double out = c.outdoor ? outdoor(c, t) : Double.NaN;
            double flow = comp[i] ? c.airflowM3PerS : c.fanAirflowM3PerS;
            double mdot = flow * density(tr, wr, p);
            if (comp[i]) {
                restS = 0;
                stillS = 0;
                runS += 1;
                double approach = 1 - Math.exp(-runS / c.coilTauS);
                double targetT = tr - c.coilDropK;
                // the air leaves the coil no drier than about 95 % RH at its leaving temperature
                double targetW = Math.min(wr, Math.max(wr - c.coilDropW, 0.95 * w(pws(targetT), p)));
                tsTrue = tr + (targetT - tr) * approach + c.blowerHeatK;
                wsTrue = wr + (targetW - wr) * approach;
                double took = mdot * (wr - wsTrue);
                removed += took;
                coilWater = Math.min(c.coilHoldKg, coilWater + took);
                tsAtStop = tsTrue;
            } else if (fan[i]) {
                runS = 0;
                restS += 1;
                stillS = 0;
                double hr = h(tr, wr);
                double wet = c.coilHoldKg > 0 ? Math.max(0, coilWater / c.coilHoldKg) : 0;
                // wet-coil surface sits near the return's adiabatic-saturation state: W_sat at the wet bulb
                double twb = wetBulb(tr, wr, p);
                double wsat = w(pws(twb), p);
                double eps = c.evapEffectiveness * Math.sqrt(wet);
                double dw = Math.max(0, eps * (wsat - wr));
                double evap = Math.min(coilWater, mdot * dw);
                coilWater -= evap;
                wsTrue = wr + evap / mdot;
                // leaving at the return's enthalpy, then the coil's leftover cold for the first seconds
                double coldLeft = (tsAtStop - c.blowerHeatK - tAt(hr, wsTrue)) * Math.exp(-restS / 25.0);
                tsTrue = tAt(hr, wsTrue) + Math.min(0, coldLeft) + c.blowerHeatK;
                returned += evap;
                tsAtStill = tsTrue;
                wsAtStill = wsTrue;
            } else {
                runS = 0;
                restS += 1;
                stillS += 1;
                coilWater *= Math.exp(-1.0 / c.drainTauS);
                if (c.stillAir == StillAir.WARMS) {
                    double target = tr + 1.5;
                    tsTrue = target + (tsAtStill - target) * Math.exp(-stillS / 300.0);
                    double wTarget = wr + 0.5 * (wsAtStill - wr);
                    wsTrue = wTarget + (wsAtStill - wTarget) * Math.exp(-stillS / 900.0);
                } else {
                    // the cold coil chills the still air a little before the duct warms it back
                    double recover = 1 - Math.exp(-stillS / 1800.0);
                    tsTrue = tsAtStill + (tr - tsAtStill) * recover - 2.0 * (1 - Math.exp(-stillS / 120.0)) * (1 - recover);
                    double wDry = wsAtStill - (wsAtStill - Math.min(wsAtStill, wr)) * (1 - Math.exp(-stillS / 240.0))
                            - 0.0008 * (1 - Math.exp(-stillS / 240.0));
                    wsTrue = Math.min(wDry, 0.97 * w(pws(tsTrue), p));
                }
            }
            // house: moisture gain, coil removal or return when the blower moves air; slow temperature swing
            double wSupplyToHouse = fan[i] ? wsTrue : wr;
            double mflow = fan[i] ? mdot : 0;
            double dwr = (c.moistureGainKgPerS + c.infiltrationKgPerS * (c.outdoorW - wr)
                    - mflow * (wr - wSupplyToHouse)) / c.houseAirKg;
            if (!comp[i] && !fan[i]) {
                offGainSum += dwr;
                offGainN++;
            }
            wr += dwr;
            tr = c.returnDbC + c.returnSwingK * (comp[i] ? -Math.min(1, runS / 900.0) : Math.min(1, restS / 1200.0) - 0.5);
            // probes (first-order lags, 1 s steps)
            pTs += (tsTrue - pTs) / c.supplyTempLagS;
            pWs += (wsTrue - pWs) / c.supplyRhLagS;
            pTr += (tr - pTr) / c.returnTempLagS;
            pWr += (wr - pWr) / c.returnRhLagS;
            if (c.outdoor) {
                hourOn += comp[i] ? 1 : 0;
                hourT += out;
                if ((i + 1) % 3600 == 0) {
                    hours.add(new double[] {hourT / 3600, hourOn / 3600});
                    hourOn = 0;
                    hourT = 0;
                }
            }
            if (i % c.intervalS != 0) {
                continue;
            }
            double rhS = Math.min(100, rhOf(pTs, pWs, p) + c.noiseRhPct * rnd.nextGaussian());
            double rhR = Math.min(100, rhOf(pTr, pWr, p) + c.noiseRhPct * rnd.nextGaussian());
            b.append(time(c, i)).append(',').append(temp(c, pTr + c.noiseK * rnd.nextGaussian())).append(',')
                    .append(fmt(rhR, 1)).append(',').append(temp(c, pTs + c.noiseK * rnd.nextGaussian())).append(',')
                    .append(fmt(rhS, 1));
            if (c.outdoor) {
                b.append(',').append(temp(c, out)).append(',').append(fmt(Math.min(100, rhOf(out, c.outdoorW, p)), 1));
            }
            if (c.statusColumns) {
                b.append(',').append(comp[i] ? 1 : 0).append(',').append(fan[i] ? 1 : 0);
            }
            b.append('\n');
        }
        double[] ons = runs.stream().filter(r -> r[1] <= end && r[0] > 0).mapToDouble(r -> r[1] - r[0]).sorted().toArray();
        double median = ons.length == 0 ? Double.NaN : ons.length % 2 == 1 ? ons[ons.length / 2]
                : 0.5 * (ons[ons.length / 2 - 1] + ons[ons.length / 2]);
        return new Truth(b.toString(), removed, returned, ons.length, median, hours,
                offGainN == 0 ? Double.NaN : offGainSum / offGainN);
    }

    /** Wet bulb by bisection on the adiabatic-saturation balance (own code). */
    static double wetBulb(double t, double w, double p) {
        double lo = -20;
        double hi = t;
        for (int k = 0; k < 60; k++) {
            double m = 0.5 * (lo + hi);
            double ws = w(pws(m), p);
            // h(t, w) = h(m, ws) − (ws − w)·4.186·m (water enters at the wet bulb)
            double f = h(m, ws) - (ws - w) * 4.186 * m - h(t, w);
            if (f > 0) {
                hi = m;
            } else {
                lo = m;
            }
        }
        return 0.5 * (lo + hi);
    }

    private static String temp(Config c, double tc) {
        return fmt(c.celsius ? tc : tc * 1.8 + 32, 2);
    }

    private static String fmt(double v, int d) {
        return String.format(Locale.ROOT, "%." + d + "f", v);
    }

    private static String time(Config c, int s) {
        java.time.LocalDateTime t = java.time.LocalDateTime.of(2026, 7, 6, 0, 0).plusSeconds(s);
        if (c.usDates) {
            int hour12 = t.getHour() % 12 == 0 ? 12 : t.getHour() % 12;
            return String.format(Locale.ROOT, "%d/%d/%d %d:%02d:%02d %s", t.getMonthValue(), t.getDayOfMonth(),
                    t.getYear(), hour12, t.getMinute(), t.getSecond(), t.getHour() < 12 ? "AM" : "PM");
        }
        return t + (t.getSecond() == 0 && t.toString().length() == 16 ? ":00" : "") + c.isoOffset;
    }
}
