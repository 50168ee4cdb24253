// LatentVectors.java - test-vector generator for the part-load latent degradation model of
// Henderson & Rengarajan (1996), "linear decay" form (their Eq. 8b), as documented in the
// EnergyPlus Engineering Reference ("Latent Capacity Degradation"). Written from the published
// equations; two independent cross-checks are included (exact-integral form and a brute-force
// time-step simulation of the coil moisture inventory).
// Usage: javac LatentVectors.java && java LatentVectors > latent-vectors.csv   (summary on stderr)
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

public final class LatentVectors {

    static final double RATED_WB_DEPRESSION_C = 26.7 - 19.4; // rating-point Tdb - Twb used by EnergyPlus
    static final double TWET_MAX_S = 9999.0;                 // EnergyPlus upper limit on twet
    static final double SHR_SS = 0.75;                       // steady-state SHR used for the effective_shr column

    // ---------------- model pieces ----------------
    /** Thermostat cycling relation N = 4 Nmax X (1 - X) [cycles/h]. */
    static double cyclesPerHour(double nmax, double x) { return 4.0 * nmax * x * (1.0 - x); }
    static double onTimeS(double nmax, double x)  { return 3600.0 / (4.0 * nmax * (1.0 - x)); }
    static double offTimeS(double nmax, double x) { return 3600.0 / (4.0 * nmax * x); }

    /** Off-cycle re-evaporation, linear-decay form, in seconds of steady-state latent capacity
     *  (moisture energy / Q_L,ss). Rate = gamma*(1 - gamma*t/(2 twet)) until t = 2 twet/gamma. */
    static double evapLinear(double twet, double gamma, double t) {
        double tc = Math.min(t, 2.0 * twet / gamma);
        return gamma * tc - gamma * gamma * tc * tc / (4.0 * twet);
    }

    /** Variant: evaporation rate proportional to remaining coil moisture (first-order decay). */
    static double evapExp(double twet, double gamma, double t) {
        return twet * (1.0 - Math.exp(-gamma * t / twet));
    }

    /** Gross moisture condensed in an on-cycle of length t, seconds of Q_L,ss: integral of 1-exp(-s/tau). */
    static double grossOn(double tau, double t) { return t + tau * Math.expm1(-t / tau); }

    /** Solve grossOn(tau, to) = e for to (on-time needed to refill the coil before it drains). */
    static double timeToDrain(double e, double tau) {
        if (e <= 0.0) return 0.0;
        double lo = e, hi = e + tau;              // grossOn(lo) <= e <= grossOn(hi)
        for (int i = 0; i < 200; i++) {
            double mid = 0.5 * (lo + hi);
            if (grossOn(tau, mid) < e) lo = mid; else hi = mid;
        }
        return 0.5 * (lo + hi);
    }

    /** Same root by successive substitution with a 0.1 % relative stop (the scheme EnergyPlus documents). */
    static double timeToDrainSuccessive(double e, double tau) {
        double t = e + tau, prev;
        int guard = 0;
        do { prev = t; t = e - tau * Math.expm1(-prev / tau); }
        while (Math.abs((t - prev) / prev) > 0.001 && ++guard < 100000);
        return t;
    }

    /** H&R Eq. 8b as used by EnergyPlus: (ton - to)/(ton + tau(exp(-ton/tau)-1)), kept in [0,1]. */
    static double lhrRatio(double ton, double to, double tau) {
        double r = (ton - to) / grossOn(tau, ton);
        return Math.max(0.0, Math.min(1.0, r));
    }

    /** Brute-force periodic simulation, 0.1 s steps with exact per-step integrals.
     *  Returns moisture drained in the last cycle divided by ton (fraction of steady-state latent x on-time). */
    static double simulate(double twet, double gamma, double tau, double ton, double tevap, boolean expDecay) {
        final double dt = 0.1;
        final int cycles = 200;
        final double tdry = 2.0 * twet / gamma;
        double m = 0.0, drained = 0.0;             // coil moisture inventory, s of Q_L,ss
        int nOn = (int) Math.round(ton / dt), nEv = (int) Math.round(tevap / dt);
        for (int c = 0; c < cycles; c++) {
            drained = 0.0;
            for (int i = 0; i < nOn; i++) {        // on-cycle: latent capacity rises as 1-exp(-t/tau)
                double t0 = i * dt, t1 = t0 + dt;
                m += dt + tau * (Math.exp(-t1 / tau) - Math.exp(-t0 / tau));
                if (m > twet) { drained += m - twet; m = twet; }   // holding capacity reached: excess drains
            }
            for (int i = 0; i < nEv; i++) {        // fan-on off-cycle: re-evaporation
                double ev;
                if (expDecay) {
                    ev = m * (1.0 - Math.exp(-gamma * dt / twet));
                } else {
                    double a = Math.min(i * dt, tdry), b = Math.min((i + 1) * dt, tdry);
                    ev = gamma * (b - a) - gamma * gamma * (b * b - a * a) / (4.0 * twet);
                }
                m = Math.max(0.0, m - ev);
            }                                      // fan-off remainder of the off-cycle: nothing happens
        }
        return drained / ton;
    }

    // ---------------- one evaluated row ----------------
    static final class Row {
        String id, fanMode;
        double twet, gamma, nmax, tau, qlRatio = 1.0, wbDep = RATED_WB_DEPRESSION_C;
        double x, n, ton, toff, fanDelay = Double.NaN;
        // results
        double twetEff, gammaEff, tevap, tevapCapped, evap, to, lhr, shrEff, gross, netGross, netOn, netOnSim, netOnExp;
    }

    static double maxSolverDiff = 0.0, maxSimDiff = 0.0, maxSimDiffExp = 0.0;

    static Row evaluate(Row r) {
        r.twetEff = Math.min(r.twet / r.qlRatio, TWET_MAX_S);
        r.gammaEff = r.gamma / r.qlRatio * (r.wbDep / RATED_WB_DEPRESSION_C);
        // evaporation period: whole off-cycle (continuous fan) or the fan-off delay (cycling fan)
        if ("continuous".equals(r.fanMode)) r.tevap = r.toff;
        else if ("cycling_delay".equals(r.fanMode)) r.tevap = Math.min(r.fanDelay, r.toff);
        else r.tevap = 0.0; // cycling fan, no delay
        r.tevapCapped = Math.min(r.tevap, 2.0 * r.twetEff / r.gammaEff);
        r.evap = evapLinear(r.twetEff, r.gammaEff, r.tevapCapped);
        r.to = timeToDrain(r.evap, r.tau);
        if (r.evap > 1.0) {
            double d = Math.abs(timeToDrainSuccessive(r.evap, r.tau) - r.to) / r.to;
            maxSolverDiff = Math.max(maxSolverDiff, d);
        }
        r.lhr = lhrRatio(r.ton, r.to, r.tau);
        r.shrEff = Math.max(SHR_SS, Math.min(1.0, 1.0 - (1.0 - SHR_SS) * r.lhr));
        r.gross = grossOn(r.tau, r.ton);
        double net = Math.max(0.0, r.gross - r.evap);
        r.netGross = net / r.gross;
        r.netOn = net / r.ton;
        r.netOnSim = simulate(r.twetEff, r.gammaEff, r.tau, r.ton, r.tevap, false);
        maxSimDiff = Math.max(maxSimDiff, Math.abs(r.netOnSim - r.netOn));
        double netExp = Math.max(0.0, r.gross - evapExp(r.twetEff, r.gammaEff, r.tevap));
        r.netOnExp = netExp / r.ton;
        double simExp = simulate(r.twetEff, r.gammaEff, r.tau, r.ton, r.tevap, true);
        maxSimDiffExp = Math.max(maxSimDiffExp, Math.abs(simExp - r.netOnExp));
        return r;
    }

    static Row fromRtf(String id, String fan, double twet, double gamma, double nmax, double tau, double x) {
        Row r = new Row();
        r.id = id; r.fanMode = fan; r.twet = twet; r.gamma = gamma; r.nmax = nmax; r.tau = tau; r.x = x;
        r.n = cyclesPerHour(nmax, x); r.ton = onTimeS(nmax, x); r.toff = offTimeS(nmax, x);
        return r;
    }

    /** Scenario given directly by on/off times (nmax column = Nmax implied by N = 4 Nmax X (1-X)). */
    static Row fromTimes(String id, String fan, double twet, double gamma, double tau, double ton, double toff) {
        Row r = new Row();
        r.id = id; r.fanMode = fan; r.twet = twet; r.gamma = gamma; r.tau = tau; r.ton = ton; r.toff = toff;
        r.x = ton / (ton + toff); r.n = 3600.0 / (ton + toff); r.nmax = r.n / (4.0 * r.x * (1.0 - r.x));
        return r;
    }

    static String f(double v, int d) {
        if (Double.isNaN(v)) return "";
        return String.format(Locale.ROOT, "%." + d + "f", v);
    }

    public static void main(String[] args) {
        List<Row> rows = new ArrayList<>();
        double[] xsFull = {0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 0.95};
        double[] xsShort = {0.2, 0.5, 0.8};
        // parameter sets: {id, twet_s, gamma, nmax_cph, tau_s}
        Object[][] sets = {
            {"P1_EPLUS_SUGGESTED", 1000.0, 1.5, 3.0, 45.0},
            {"P2_TWET1400",        1400.0, 1.5, 3.0, 45.0},
            {"P3_TWET990",          990.0, 1.5, 3.0, 45.0},
            {"P4_TWET1740",        1740.0, 1.5, 3.0, 45.0},
            {"P5_GAMMA1.0",        1000.0, 1.0, 3.0, 45.0},
            {"P6_GAMMA2.0",        1000.0, 2.0, 3.0, 45.0},
            {"P7_NMAX2.5",         1000.0, 1.5, 2.5, 45.0},
            {"P8_NMAX6",           1000.0, 1.5, 6.0, 45.0},
        };
        for (Object[] s : sets) {
            String id = (String) s[0];
            double[] xs = id.startsWith("P1") || id.startsWith("P2") ? xsFull : xsShort;
            for (double x : xs)
                rows.add(evaluate(fromRtf(id, "continuous", (double) s[1], (double) s[2], (double) s[3], (double) s[4], x)));
        }
        // cycling fan with a fan-off delay (EnergyPlus water-to-air HP form: off-time := fan delay)
        for (double delay : new double[]{60.0, 90.0, 180.0})
            for (double x : xsShort) {
                Row r = fromRtf("P1_FANDELAY" + (int) delay, "cycling_delay", 1000.0, 1.5, 3.0, 45.0, x);
                r.fanDelay = delay;
                rows.add(evaluate(r));
            }
        // off-rated scaling of twet and gamma (P1 at X = 0.5 and 0.8)
        double[][] scal = {{0.8, 7.3}, {1.25, 7.3}, {1.0, 5.0}, {1.0, 9.0}, {0.8, 5.0}};
        for (double[] sc : scal)
            for (double x : new double[]{0.5, 0.8}) {
                Row r = fromRtf("P1_SCALED_QL" + sc[0] + "_WBD" + sc[1], "continuous", 1000.0, 1.5, 3.0, 45.0, x);
                r.qlRatio = sc[0]; r.wbDep = sc[1];
                rows.add(evaluate(r));
            }
        // synthetic field scenarios (on/off times given directly)
        Object[][] scen = {
            {"S1_6CPH_5ON_5OFF",   300.0,  300.0, "continuous",    Double.NaN},
            {"S2_6CPH_5ON_5OFF",   300.0,  300.0, "cycling_delay", 90.0},
            {"S3_6CPH_5ON_5OFF",   300.0,  300.0, "cycling",       Double.NaN},
            {"S4_2CPH_20ON_10OFF", 1200.0, 600.0, "continuous",    Double.NaN},
            {"S5_2CPH_20ON_10OFF", 1200.0, 600.0, "cycling_delay", 90.0},
            {"S6_3CPH_10ON_10OFF", 600.0,  600.0, "continuous",    Double.NaN},
            {"S7_3CPH_10ON_10OFF", 600.0,  600.0, "cycling_delay", 90.0},
            {"S8_2CPH_6ON_24OFF",  360.0, 1440.0, "continuous",    Double.NaN},
            {"S9_1CPH_45ON_15OFF", 2700.0, 900.0, "continuous",    Double.NaN},
            {"S10_4CPH_3ON_12OFF", 180.0,  720.0, "cycling_delay", 180.0},
        };
        double[][] scenParams = {{1000.0, 1.5, 45.0}, {1400.0, 1.5, 45.0}};
        String[] scenTag = {"P1", "P2"};
        for (int p = 0; p < scenParams.length; p++)
            for (Object[] s : scen) {
                Row r = fromTimes(s[0] + "_" + scenTag[p], (String) s[3], scenParams[p][0], scenParams[p][1],
                        scenParams[p][2], (double) s[1], (double) s[2]);
                r.fanDelay = (double) s[4];
                rows.add(evaluate(r));
            }

        StringBuilder out = new StringBuilder();
        out.append("# latent-vectors.csv - part-load latent degradation test vectors (cycle timing -> fraction of steady-state latent removal)\n");
        out.append("# Model: Henderson & Rengarajan (1996) ASHRAE Trans. 102(1):266-274, linear-decay evaporation form (their Eq. 8b),\n");
        out.append("#   as documented in the EnergyPlus Engineering Reference (Coils > Single-Speed DX Cooling Coil > Latent Capacity Degradation)\n");
        out.append("#   and implemented in NREL/EnergyPlus (src/EnergyPlus/Coils/CoilCoolingDXCurveFitSpeed.cc calcEffectiveSHR;\n");
        out.append("#   src/EnergyPlus/WaterToAirHeatPumpSimple.cc CalcEffectiveSHR: cycling fan uses the fan delay as off-time, after Tang 2005).\n");
        out.append("# Equations (rated conditions unless ql_ratio/wb_dep_C differ): N = 4*Nmax*X*(1-X); ton = 3600/(4*Nmax*(1-X)); toff = 3600/(4*Nmax*X)\n");
        out.append("#   twet_eff = min(twet/ql_ratio, 9999); gamma_eff = gamma/ql_ratio*(wb_dep_C/7.3)   [ql_ratio = Q_L/Q_L,rated]\n");
        out.append("#   evap_time = toff (continuous fan) | min(fan_delay, toff) (cycling_delay) | 0 (cycling, no delay); evap_time_capped = min(evap_time, 2*twet_eff/gamma_eff)\n");
        out.append("#   evap_s = gamma*tc - gamma^2*tc^2/(4*twet) [tc = evap_time_capped]; to = evap_s - tau*(exp(-to/tau) - 1)\n");
        out.append("#   lhr_ratio = LHR/LHR_ss = max(0, min(1, (ton - to)/(ton + tau*(exp(-ton/tau) - 1)))); effective_shr = 1 - (1 - shr_ss)*lhr_ratio\n");
        out.append("# Extra columns derived here (not EnergyPlus): gross_s = ton + tau*(exp(-ton/tau)-1); net_over_gross_exact = max(0, gross_s - evap_s)/gross_s;\n");
        out.append("#   net_over_ss_ontime = max(0, gross_s - evap_s)/ton (what a log integration of net moisture per cycle / (steady rate x on-time) estimates);\n");
        out.append("#   net_over_ss_ontime_sim = same from a 0.1 s time-step moisture-inventory simulation (check);\n");
        out.append("#   net_over_ss_ontime_expdecay = same with evaporation proportional to remaining coil moisture: evap = twet*(1-exp(-gamma*evap_time/twet)).\n");
        out.append("# For S* scenarios on/off times are given; runtime_fraction = ton/(ton+toff), cycling_rate = 3600/(ton+toff), nmax_cph = implied Nmax.\n");
        out.append("# Units: seconds, cycles per hour, deg C; ratios dimensionless. RTF >= 1 gives lhr_ratio = 1 (not tabulated). Generator: LatentVectors.java\n");
        out.append("#   (kept beside this file; equations E1-E8 in docs/methods.md section 3.6).\n");
        out.append("case_id,fan_mode,twet_s,gamma,nmax_cph,tau_s,ql_ratio,wb_dep_C,twet_eff_s,gamma_eff,runtime_fraction,cycling_rate_cph,")
           .append("on_time_s,off_time_s,fan_delay_s,evap_time_s,evap_time_capped_s,evap_s,to_s,lhr_ratio,shr_ss,effective_shr,")
           .append("gross_s,net_over_gross_exact,net_over_ss_ontime,net_over_ss_ontime_sim,net_over_ss_ontime_expdecay\n");
        for (Row r : rows) {
            out.append(String.join(",",
                r.id, r.fanMode, f(r.twet, 1), f(r.gamma, 3), f(r.nmax, 4), f(r.tau, 1), f(r.qlRatio, 3), f(r.wbDep, 2),
                f(r.twetEff, 1), f(r.gammaEff, 4), f(r.x, 4), f(r.n, 4), f(r.ton, 2), f(r.toff, 2), f(r.fanDelay, 1),
                f(r.tevap, 2), f(r.tevapCapped, 2), f(r.evap, 3), f(r.to, 3), f(r.lhr, 5), f(SHR_SS, 2), f(r.shrEff, 5),
                f(r.gross, 3), f(r.netGross, 5), f(r.netOn, 5), f(r.netOnSim, 5), f(r.netOnExp, 5))).append('\n');
        }
        System.out.print(out);

        // summary on stderr: checks and the minimum on-time for any net removal after a fan-on off period
        System.err.printf(Locale.ROOT, "rows=%d maxRelDiff(bisection vs successive-substitution to)=%.2e%n", rows.size(), maxSolverDiff);
        System.err.printf(Locale.ROOT, "max|sim - closed form| linear=%.2e exp=%.2e%n", maxSimDiff, maxSimDiffExp);
        System.err.println("min on-time for net removal (to) vs fan-on off time, twet/gamma/tau sets:");
        double[][] ps = {{1000, 1.5, 45}, {1400, 1.5, 45}, {990, 1.5, 45}, {1740, 1.5, 45}};
        double[] offs = {0, 30, 60, 90, 180, 300, 600, 900, 1200, 1800};
        for (double[] p : ps) {
            StringBuilder sb = new StringBuilder(String.format(Locale.ROOT, "twet=%4.0f gamma=%.1f tau=%2.0f :", p[0], p[1], p[2]));
            for (double o : offs) {
                double e = evapLinear(p[0], p[1], Math.min(o, 2 * p[0] / p[1]));
                sb.append(String.format(Locale.ROOT, " off%4.0f->to%6.1f", o, timeToDrain(e, p[2])));
            }
            System.err.println(sb);
        }
        // break-even runtime fraction (lhr_ratio first > 0) for continuous fan
        for (double[] p : new double[][]{{1000, 1.5, 3, 45}, {1400, 1.5, 3, 45}, {1000, 1.5, 2.5, 45}, {1000, 1.5, 6, 45}}) {
            double xb = Double.NaN;
            for (int i = 1; i < 10000; i++) {
                double x = i / 10000.0;
                double ton = onTimeS(p[2], x), toff = offTimeS(p[2], x);
                double e = evapLinear(p[0], p[1], Math.min(toff, 2 * p[0] / p[1]));
                if (lhrRatio(ton, timeToDrain(e, p[3]), p[3]) > 0) { xb = x; break; }
            }
            System.err.printf(Locale.ROOT, "continuous fan twet=%.0f gamma=%.1f Nmax=%.1f tau=%.0f: lhr_ratio > 0 for X > %.4f%n", p[0], p[1], p[2], p[3], xb);
        }
    }
}
