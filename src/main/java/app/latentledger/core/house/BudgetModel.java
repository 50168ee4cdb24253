package app.latentledger.core.house;

import app.latentledger.core.coil.AirReading;
import app.latentledger.core.coil.Propagation;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.Psychrometrics;
import app.latentledger.core.psychro.SaturationPressure;

import java.util.Arrays;

/**
 * The house's daily water balance for one {@link Scenario}, as a function of its uncertain inputs
 * (the order of {@link HouseInputs#uncertainInputs()}), so {@link Propagation} can carry every
 * tolerance to every result. SI: water flows in kg/s, mass flows of dry air in kg/s.
 *
 * <p><b>Gains</b> (each a dry-air stream times its humidity-ratio difference to the house air,
 * ASHRAE HoF 2017 ch. 1 mass balance; specific volume of the air moving through the opening, eq. 28):
 * <ul>
 *   <li>infiltration ṁ = Q_inf/v_o·(W_o − W_i), Q_inf by {@link Infiltration}; with unbalanced fans
 *       the quadrature total less the fan flow is counted here and the fan flow under ventilation;</li>
 *   <li>ventilation ṁ = (1 − ε_L)·Q_v/v_o·(W_o − W_i) ({@link Ventilation});</li>
 *   <li>internal generation ({@link InternalMoisture}, memory-only presets);</li>
 *   <li>return leak ṁ = f·ṁ_blower·RTF·(W_a − W_i) while the blower runs with the compressor (fan
 *       AUTO) ({@link ReturnLeak}).</li>
 * </ul>
 * <b>Removal</b> = steady removal (coil check) × runtime fraction × part-load latent fraction
 * (net of off-cycle re-evaporation, Henderson &amp; Rengarajan 1996 eq. 8b, or measured from a log);
 * the water removed during runs and the share re-evaporated are reported separately. With the
 * blower to AUTO the re-evaporated share is kept: LHR′ = LHR/(1 − share).
 *
 * <p><b>Equilibrium</b>: the coil is a straight process line to its ADP, so removal grows with the
 * coil's entering humidity ratio at slope ṁ_w,ss/(W_entering − W_ADP), anchored at the measured
 * removal; the entering air is the house air mixed with any return leak. {@link Equilibrium} finds
 * the unique W where gains equal removal (plus any dehumidifier).
 *
 * <p><b>Lower airflow</b>: {@link DxCoilWhatIf} (EnergyPlus ADP/BF with A₀ from the measured
 * bypass factor) gives the new removal and SHR, scaled by measured/model removal at the measured
 * flow; the sensible load is unchanged, so RTF′ = RTF·q_s/q_s′.
 */
public final class BudgetModel implements Propagation.Model {
    static final int IN_DB = 0, IN_H = 1, OUT_DB = 2, OUT_H = 3, G_DB = 4, G_H = 5, P_DB = 6, P_H = 7, S_DB = 8,
            S_H = 9, Q50 = 10, WIND = 11, NF = 12, VENT = 13, ERV = 14, INTERNAL = 15, STEADY = 16, ADP = 17,
            BF = 18, TOTAL = 19, AIRFLOW = 20, RTF = 21, LF = 22, REEVAP = 23;
    /** Number of inputs. */
    public static final int N_INPUTS = 24;

    /** Output indices. */
    public static final int Y_INFILTRATION = 0, Y_VENTILATION = 1, Y_INTERNAL = 2, Y_LEAK = 3, Y_GAINS = 4,
            Y_REMOVAL = 5, Y_BALANCE = 6, Y_LEAK_FRACTION = 7, Y_EQ_W = 8, Y_EQ_DEW_POINT = 9, Y_GROSS = 10,
            Y_REEVAPORATED = 11, Y_DEFICIT = 12, Y_SHR = 13, Y_LATENT = 14, Y_STEADY = 15, Y_RUNTIME = 16,
            Y_EQ_RH = 17, Y_DEHUMIDIFIER = 18, Y_INFILTRATION_FLOW = 19;
    /** Number of outputs. */
    public static final int N_OUTPUTS = 20;

    private static final HandbookEdition SI = HandbookEdition.SI;

    private final HouseInputs in;
    private final Scenario scenario;
    private final double p;
    private final double ratedMassFlow;

    public BudgetModel(HouseInputs in, Scenario scenario) {
        this.in = in;
        this.scenario = scenario;
        this.p = in.pressurePa();
        SystemRemoval s = in.system();
        double vIn = SI.specificVolumeM3PerKg(s.enteringDryBulbC(), s.enteringW(), p);
        double ratedFlow = Double.isFinite(s.nominalW()) ? s.nominalW() * DxCoilWhatIf.RATED_FLOW_PER_W
                : s.airflowM3PerS();
        this.ratedMassFlow = ratedFlow / vIn;
    }

    /** The nominal inputs. */
    public double[] nominal() {
        return in.uncertainInputs().stream().mapToDouble(u -> u.valueSi()).toArray();
    }

    @Override
    public double[] evaluate(double[] x, boolean clamp) {
        double[] y = new double[N_OUTPUTS];
        Arrays.fill(y, Double.NaN);
        HouseReadings r = in.readings();
        HouseFacts f = in.facts();
        SystemRemoval sys = in.system();
        double ti = x[IN_DB];
        double wi = w(r.indoor(), ti, x[IN_H], clamp);
        double to = x[OUT_DB];
        double wo = w(r.outdoor(), to, x[OUT_H], clamp);
        if (!Double.isFinite(wi) || !Double.isFinite(wo)) {
            return y;
        }
        double vo = SI.specificVolumeM3PerKg(to, wo, p);

        // infiltration and ventilation
        double q50 = Double.isFinite(scenario.q50M3PerS()) ? Math.min(x[Q50], scenario.q50M3PerS()) : x[Q50];
        double natural = switch (f.infiltrationMethod()) {
            case SHERMAN_GRIMSRUD -> Infiltration.shermanGrimsrudM3PerS(Infiltration.leakageAreaM2(q50), f.stories(),
                    f.shelterClass(), ti - to, Math.max(0, x[WIND]));
            case N_FACTOR -> q50 / x[NF];
            case NONE -> 0.0;
        };
        VentilationType type = scenario.addErv() ? VentilationType.ERV : f.ventilationType();
        double qv = type == VentilationType.NONE ? 0.0
                : Double.isFinite(scenario.ventilationM3PerS()) ? scenario.ventilationM3PerS() : x[VENT];
        double eps = scenario.addErv() ? Ventilation.DEFAULT_ERV_LATENT_EFFECTIVENESS
                : type == VentilationType.ERV ? x[ERV] : 0.0;
        double infFlow;
        double ventFlow;
        if (type.balanced()) {
            infFlow = natural;
            ventFlow = qv * Ventilation.moisturePassFraction(type, eps);
        } else {
            infFlow = Infiltration.combinedM3PerS(natural, qv, 0.0) - qv;
            ventFlow = qv;
        }
        double kInf = infFlow / vo;
        double kVent = ventFlow / vo;

        // return leak
        double leakF = Double.NaN;
        double wa = wi;
        if (r.hasLeakCheck()) {
            double wg = w(r.grille(), x[G_DB], x[G_H], clamp);
            double wp = w(r.plenum(), x[P_DB], x[P_H], clamp);
            double ws = w(r.space(), x[S_DB], x[S_H], clamp);
            leakF = ReturnLeak.fraction(wg, wp, ws);
            if (Double.isFinite(ws)) {
                wa = ws;
            }
        }
        double fb = scenario.sealReturnLeak() || !Double.isFinite(leakF) ? 0.0 : Math.max(0, Math.min(1, leakF));

        // the system
        double vIn = SI.specificVolumeM3PerKg(sys.enteringDryBulbC(), sys.enteringW(), p);
        double mBlower = x[AIRFLOW] / vIn;
        double rtf = Math.max(0, Math.min(1, x[RTF]));
        double lf = Math.max(0, x[LF]);
        double share0 = Math.max(0, Math.min(0.95, x[REEVAP]));
        double share = scenario.fanAuto() ? 0.0 : share0;
        double lfNet = scenario.fanAuto() ? Math.min(1.0, lf / (1 - share0)) : lf;
        double steady = Math.max(0, x[STEADY]);
        double wAdp = Psychrometrics.saturationHumidityRatio(x[ADP], p);
        double slope = sys.hasProcessLine() ? steady / Math.max(1e-6, sys.enteringW() - wAdp) : 0.0;
        double shr = sys.sensibleW() / sys.totalW();
        double latent = sys.totalW() - sys.sensibleW();
        if (Double.isFinite(scenario.airflowM3PerS()) && sys.hasProcessLine()) {
            DxCoilWhatIf coil = new DxCoilWhatIf(p, sys.enteringDryBulbC(), sys.enteringW(), mBlower,
                    x[BF], x[TOTAL], ratedMassFlow);
            DxCoilWhatIf.Point now = coil.at(mBlower);
            DxCoilWhatIf.Point next = coil.at(scenario.airflowM3PerS() / vIn);
            double scale = now.waterKgPerS() > 0 ? steady / now.waterKgPerS() : 1.0;
            steady = next.waterKgPerS() * scale;
            double sensibleNow = now.totalW() * now.shr();
            double sensibleNext = next.totalW() * next.shr();
            rtf = Math.min(1.0, rtf * sensibleNow / sensibleNext);
            slope = steady / Math.max(1e-6, sys.enteringW() - next.wAdp());
            shr = next.shr();
            latent = next.latentW() * scale;
            mBlower = next.massFlowKgPerS();
        }
        double kLeak = fb * mBlower * rtf;
        double internal = x[INTERNAL];
        double dehumidifier = scenario.dehumidifierKgPerS();

        // the day as found
        double inf = kInf * (wo - wi);
        double vent = kVent * (wo - wi);
        double leak = kLeak * (wa - wi);
        double gains = inf + vent + internal + leak;
        // equilibrium: the removal line is anchored where the coil was measured (its entering air)
        final double wAttic = wa;
        final double fLeak = fb;
        final double rFactor = rtf * lfNet;
        final double anchorSteady = steady;
        final double anchorW = sys.enteringW();
        final double sl = slope;
        double enteringNow = wi + fLeak * (wAttic - wi);
        double net = rFactor * Math.max(0.0, anchorSteady + sl * (enteringNow - anchorW));
        double gross = net / (1 - share);
        double removal = net + dehumidifier;
        final double kO = kInf + kVent;
        java.util.function.DoubleUnaryOperator residual = wx -> {
            double entering = wx + fLeak * (wAttic - wx);
            double coil = rFactor * Math.max(0.0, anchorSteady + sl * (entering - anchorW));
            return kO * (wo - wx) + kLeak * (wAttic - wx) + internal - coil - dehumidifier;
        };
        double wSat = Psychrometrics.saturationHumidityRatio(ti, p);
        double wEq = Equilibrium.solve(residual, 1e-5, wSat);
        double wTarget = Psychrometrics.humidityRatio(in.rhTargetPct() / 100.0 * SaturationPressure.pascals(ti), p);

        y[Y_INFILTRATION] = inf;
        y[Y_VENTILATION] = vent;
        y[Y_INTERNAL] = internal;
        y[Y_LEAK] = leak;
        y[Y_GAINS] = gains;
        y[Y_REMOVAL] = removal;
        y[Y_BALANCE] = gains - removal;
        y[Y_LEAK_FRACTION] = leakF;
        y[Y_EQ_W] = wEq;
        y[Y_EQ_DEW_POINT] = Double.isFinite(wEq)
                ? SaturationPressure.dewPointC(Psychrometrics.vaporPressurePa(wEq, p)) : Double.NaN;
        y[Y_EQ_RH] = Double.isFinite(wEq)
                ? 100 * Psychrometrics.vaporPressurePa(wEq, p) / SaturationPressure.pascals(ti) : Double.NaN;
        y[Y_GROSS] = gross;
        y[Y_REEVAPORATED] = gross - net;
        y[Y_DEFICIT] = residual.applyAsDouble(wTarget);
        y[Y_DEHUMIDIFIER] = residual.applyAsDouble(wTarget) + dehumidifier;
        y[Y_SHR] = shr;
        y[Y_LATENT] = latent;
        y[Y_STEADY] = steady;
        y[Y_RUNTIME] = rtf;
        y[Y_INFILTRATION_FLOW] = infFlow;
        return y;
    }

    private double w(AirReading r, double db, double humidity, boolean clamp) {
        return AirReading.humidityRatio(r.humidityKind(), p, db, humidity, clamp);
    }
}
