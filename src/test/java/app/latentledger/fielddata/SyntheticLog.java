package app.latentledger.fielddata;

import app.latentledger.core.cycles.Channel;
import app.latentledger.core.cycles.LogSeries;
import app.latentledger.core.cycles.TimeOrigin;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.Psychrometrics;
import app.latentledger.core.psychro.SaturationPressure;

import java.io.IOException;
import java.io.Writer;
import java.time.LocalDateTime;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;

/**
 * Invented logger records from known cycles, for tests, the field-data samples and the benchmark.
 * Nothing here is measured data.
 *
 * <p>The coil follows the model the analysis is judged against: during a run the humidity-ratio
 * drop rises as ΔW_ss·(1 − e^(−s/τ)) and the supply dry bulb falls to return − ΔT_ss with time
 * constant τ_T; the coil stores water up to t_wet seconds of steady removal. With the blower on in a
 * rest, water comes back at the linear-decay rate γ·ΔW_ss·(1 − γ·s/(2·t_wet)) of Henderson &
 * Rengarajan (1996), started where the coil's remaining water puts it, and the supply sits on the
 * return's constant-enthalpy line (adiabatic evaporation). With the blower off the supply probe
 * drifts back towards the return slowly (τ 600 s for dry bulb, 900 s for humidity ratio).
 */
public final class SyntheticLog {
    /** Blower behaviour in the rests. */
    public enum Blower { AUTO, CONTINUOUS, DELAY }

    /** Scenario parameters; change the public fields, then call {@link #generate}. */
    public static final class Scenario {
        public double intervalS = 10;
        /** Rest before the first run, s. */
        public double leadOffS = 1200;
        /** Alternating run and rest lengths, s: {on, off, on, off, ...}. */
        public double[] onOff = {1200, 600};
        /** Repeat {@link #onOff} until this much time is covered (0: once). */
        public double fillToS = 0;
        public Blower blower = Blower.AUTO;
        public double fanDelayS = 0;
        public double returnDbC = 24.0;
        public double returnRhPct = 55.0;
        /** Daily swing of the return dry bulb, K (peak), humidity ratio held. */
        public double returnDailySwingK = 0;
        public double splitK = 11.0;
        public double supplyLagS = 1.0;
        public double steadyDryingW = 0.0016;
        public double tauS = 45;
        public double twetS = 1000;
        public double gamma = 1.5;
        public double pressurePa = 101_325;
        public double noiseK = 0;
        public double noiseRhPct = 0;
        public double supplyRhOffsetPct = 0;
        public long seed = 1;
        /** Clock time of the first sample (for ISO time columns). */
        public LocalDateTime start = LocalDateTime.of(2026, 7, 14, 0, 0);
        public ZoneOffset offset = ZoneOffset.ofHours(-4);
    }

    /** The generated record, SI. */
    public static final class Rows {
        public final Scenario scenario;
        public final double[] t;
        public final double[] returnDb;
        public final double[] returnRh;
        public final double[] supplyDb;
        public final double[] supplyRh;
        public final byte[] compressor;
        public final byte[] fan;
        /** True run starts and stops, s. */
        public final List<double[]> runs;
        /** Samples where the supply humidity had to be held below saturation (the model's W was not kept). */
        public final int cappedSamples;

        Rows(Scenario s, int n, List<double[]> runs, double[][] v, byte[] c, byte[] f, int capped) {
            this.scenario = s;
            this.t = v[0];
            this.returnDb = v[1];
            this.returnRh = v[2];
            this.supplyDb = v[3];
            this.supplyRh = v[4];
            this.compressor = c;
            this.fan = f;
            this.runs = runs;
            this.cappedSamples = capped;
        }

        public int size() {
            return t.length;
        }

        /** As a series, with or without the status columns. */
        public LogSeries series(boolean withStatus) {
            return series(withStatus, null);
        }

        /** As a series whose first sample is at the scenario's clock time and offset. */
        public LogSeries seriesWithClock(boolean withStatus) {
            return series(withStatus, new TimeOrigin(scenario.start.toEpochSecond(scenario.offset),
                    scenario.offset.getTotalSeconds(), true));
        }

        private LogSeries series(boolean withStatus, TimeOrigin origin) {
            Map<Channel, double[]> a = new EnumMap<>(Channel.class);
            a.put(Channel.RETURN_DB, returnDb);
            a.put(Channel.RETURN_RH, returnRh);
            a.put(Channel.SUPPLY_DB, supplyDb);
            a.put(Channel.SUPPLY_RH, supplyRh);
            Map<Channel, byte[]> st = new EnumMap<>(Channel.class);
            if (withStatus) {
                st.put(Channel.COMPRESSOR, compressor);
                st.put(Channel.FAN, fan);
            }
            return new LogSeries(t, a, st, origin);
        }

        /** Rows in the given layout. */
        public void write(Writer out, Layout layout) throws IOException {
            String d = layout.delimiter;
            out.write(String.join(d, layout.headers));
            for (String[] x : layout.extra) {
                out.write(d + x[0]);
            }
            out.write('\n');
            StringBuilder b = new StringBuilder(128);
            for (int i = 0; i < t.length; i++) {
                b.setLength(0);
                b.append(layout.time(scenario, t[i]));
                b.append(d).append(layout.temp(returnDb[i])).append(d).append(layout.num(returnRh[i], 1));
                b.append(d).append(layout.temp(supplyDb[i])).append(d).append(layout.num(supplyRh[i], 1));
                if (layout.status) {
                    b.append(d).append(compressor[i]).append(d).append(fan[i]);
                }
                for (String[] x : layout.extra) {
                    b.append(d).append(x[1]);
                }
                b.append('\n');
                out.write(b.toString());
            }
        }
    }

    /** How a record is written: headers in order time, return db, return rh, supply db, supply rh[, compressor, fan]. */
    public static final class Layout {
        public enum Time { ISO_OFFSET, ISO_LOCAL, SECONDS }

        public String[] headers = {"time", "return_db", "return_rh", "supply_db", "supply_rh", "compressor", "fan"};
        public String delimiter = ",";
        public boolean decimalComma;
        public boolean ip = true;
        public boolean status = true;
        public Time time = Time.ISO_OFFSET;
        public DateTimeFormatter localFormat = DateTimeFormatter.ISO_LOCAL_DATE_TIME;
        /** Extra trailing columns (header, constant value), e.g. a logger's battery voltage. */
        public String[][] extra = {};

        String time(Scenario s, double elapsed) {
            long sec = (long) Math.floor(elapsed);
            switch (time) {
                case SECONDS:
                    return num(elapsed, 0);
                case ISO_LOCAL:
                    return s.start.plusSeconds(sec).format(localFormat);
                default:
                    return OffsetDateTime.of(s.start.plusSeconds(sec), s.offset).format(DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ssXXX"));
            }
        }

        String temp(double c) {
            return num(ip ? c * 1.8 + 32 : c, 2);
        }

        String num(double v, int decimals) {
            String s = String.format(Locale.ROOT, "%." + decimals + "f", v);
            return decimalComma ? s.replace('.', ',') : s;
        }
    }

    private SyntheticLog() {
    }

    public static Rows generate(Scenario s) {
        Random rnd = new Random(s.seed);
        List<double[]> runs = new ArrayList<>();
        double clock = s.leadOffS;
        int k = 0;
        double end;
        // once through onOff, or repeated until fillToS is covered
        while (s.fillToS > 0 ? clock + s.onOff[k % s.onOff.length] < s.fillToS : k < s.onOff.length) {
            double on = s.onOff[k % s.onOff.length];
            double off = s.onOff[(k + 1) % s.onOff.length];
            runs.add(new double[] {clock, clock + on});
            clock += on + off;
            k += 2;
        }
        end = s.fillToS > 0 ? s.fillToS : clock;
        int n = (int) Math.floor(end / s.intervalS) + 1;
        double[][] v = new double[5][n];
        byte[] comp = new byte[n];
        byte[] fan = new byte[n];
        HandbookEdition ed = HandbookEdition.SI;
        double p = s.pressurePa;
        double wr0 = Psychrometrics.humidityRatio(s.returnRhPct / 100 * SaturationPressure.pascals(s.returnDbC), p);
        double coilWater = 0;           // s of steady removal held on the coil
        int run = -1;                   // index of the current or last run
        double tsPrev = s.returnDbC;    // supply dry bulb at the previous sample
        double wsPrev = wr0;
        double edgeTs = tsPrev;         // supply dry bulb when the current phase began
        int phase = 0;                  // 0 rest before any run, 1 running, 2 resting
        double evapPosition = 0;        // position on the linear-decay curve, s
        boolean drifting = false;       // blower-off drift of the supply probe under way
        double driftTs = 0;
        double driftWs = 0;
        int capped = 0;
        for (int i = 0; i < n; i++) {
            double t = i * s.intervalS;
            double tr = s.returnDbC + s.returnDailySwingK * Math.sin(2 * Math.PI * t / 86_400.0);
            double wr = wr0;
            // which phase is t in: run j covers [start, stop)
            int j = run;
            while (j + 1 < runs.size() && t >= runs.get(j + 1)[0]) {
                j++;
            }
            boolean on = j >= 0 && t < runs.get(j)[1];
            int newPhase = on ? 1 : j >= 0 ? 2 : 0;
            if (newPhase != phase || j != run) {
                edgeTs = tsPrev;
                if (newPhase == 2) {
                    // where on the linear-decay curve the remaining water puts the coil: t_wet − E(s0) = water
                    double e = Math.max(0, s.twetS - coilWater);
                    evapPosition = positionFor(e, s.twetS, s.gamma);
                }
                phase = newPhase;
                run = j;
                drifting = false;
            }
            double ts;
            double ws;
            boolean fanOn;
            if (phase == 1) {
                double sOn = t - runs.get(run)[0];
                double dw = s.steadyDryingW * (1 - Math.exp(-sOn / s.tauS));
                ws = wr - dw;
                ts = (tr - s.splitK) + (edgeTs - (tr - s.splitK)) * Math.exp(-sOn / s.supplyLagS);
                // water stored over this sample interval, capped at the holding capacity
                double a = sOn;
                double b = sOn + s.intervalS;
                coilWater = Math.min(s.twetS, coilWater + (b - a) + s.tauS * (Math.exp(-b / s.tauS) - Math.exp(-a / s.tauS)));
                fanOn = true;
            } else {
                double sOff = phase == 2 ? t - runs.get(run)[1] : Double.POSITIVE_INFINITY;
                double blowerS = s.blower == Blower.CONTINUOUS ? Double.POSITIVE_INFINITY
                        : s.blower == Blower.DELAY ? s.fanDelayS : 0;
                fanOn = s.blower == Blower.CONTINUOUS || sOff < blowerS;
                if (fanOn && phase == 2) {
                    double pos = evapPosition + sOff;
                    ws = wr + s.steadyDryingW * rate(pos, s);
                    double hr = ed.enthalpyJPerKg(tr, wr) / 1000;
                    double evap0 = onEnthalpyLine(hr, wr + s.steadyDryingW * rate(evapPosition, s));
                    ts = onEnthalpyLine(hr, ws) + (edgeTs - evap0) * Math.exp(-sOff / s.supplyLagS);
                    // water leaves the coil over this interval (linear decay, never below empty)
                    double lost = evapIntegral(pos + s.intervalS, s) - evapIntegral(pos, s);
                    coilWater = Math.max(0, coilWater - lost);
                } else if (phase == 2) {
                    if (!drifting) {
                        driftTs = tsPrev; // the probe starts from where it was when the air stopped
                        driftWs = wsPrev;
                        drifting = true;
                    }
                    double since = sOff - (s.blower == Blower.DELAY ? s.fanDelayS : 0);
                    ts = tr + (driftTs - tr) * Math.exp(-since / 600.0);
                    ws = wr + (driftWs - wr) * Math.exp(-since / 900.0);
                } else {
                    ts = tr - 0.2; // duct gains: supply slightly below return before any run
                    ws = wr;
                }
            }
            double wsat = Psychrometrics.saturationHumidityRatio(ts, p);
            if (ws > 0.995 * wsat) {
                ws = 0.995 * wsat;
                capped++;
            }
            tsPrev = ts;
            wsPrev = ws;
            double rhr = rh(wr, tr, p);
            double rhs = rh(ws, ts, p);
            v[0][i] = t;
            v[1][i] = tr + s.noiseK * rnd.nextGaussian();
            v[2][i] = clampRh(rhr + s.noiseRhPct * rnd.nextGaussian());
            v[3][i] = ts + s.noiseK * rnd.nextGaussian();
            v[4][i] = clampRh(rhs + s.supplyRhOffsetPct + s.noiseRhPct * rnd.nextGaussian());
            comp[i] = (byte) (phase == 1 ? 1 : 0);
            fan[i] = (byte) (fanOn ? 1 : 0);
        }
        return new Rows(s, n, runs, v, comp, fan, capped);
    }

    private static double rate(double pos, Scenario s) {
        return Math.max(0, s.gamma * (1 - s.gamma * pos / (2 * s.twetS)));
    }

    /** Dry bulb on the constant-enthalpy line through h (kJ/kg) at humidity ratio w, SI eq. 32 solved for t. */
    private static double onEnthalpyLine(double hKj, double w) {
        return (hKj - 2501 * w) / (1.006 + 1.86 * w);
    }

    /** ∫₀^pos of the linear-decay rate γ(1 − γ·x/(2·t_wet)), capped at the dry-out time. */
    private static double evapIntegral(double pos, Scenario s) {
        double x = Math.min(pos, 2 * s.twetS / s.gamma);
        return s.gamma * x - s.gamma * s.gamma * x * x / (4 * s.twetS);
    }

    /** The position s0 on the decay curve where E(s0) = evaporated already (water missing from a full coil). */
    private static double positionFor(double missing, double twet, double gamma) {
        double dry = 2 * twet / gamma;
        if (missing >= twet) {
            return dry;
        }
        // γ s − γ² s² /(4 t_wet) = missing  →  smaller root
        double a = gamma * gamma / (4 * twet);
        return (gamma - Math.sqrt(gamma * gamma - 4 * a * missing)) / (2 * a);
    }

    private static double rh(double w, double t, double p) {
        return Psychrometrics.relativeHumidityPct(Psychrometrics.vaporPressurePa(w, p), t);
    }

    private static double clampRh(double v) {
        return Math.max(0, Math.min(100, v));
    }
}
