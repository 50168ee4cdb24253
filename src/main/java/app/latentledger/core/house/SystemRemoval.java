package app.latentledger.core.house;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.Estimate;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.cycles.LatentDegradationModel;
import app.latentledger.core.cycles.RunCycleReport;

/**
 * What the system removes, from a coil check and a runtime: the steady removal rate and its
 * process line (ADP, bypass factor), the airflow, how long the compressor runs, the part-load
 * latent fraction and the share of removed water the blower puts back after each cycle. SI.
 * Uncertainties are expanded (k = 2), as the coil check and the log analysis report them.
 *
 * @param enteringDryBulbC      coil entering dry bulb, °C
 * @param enteringW             coil entering humidity ratio, kg/kg
 * @param airflowM3PerS         measured airflow, m³/s
 * @param airflowU              its expanded uncertainty, m³/s
 * @param massFlowKgPerS        dry-air mass flow, kg/s
 * @param steadyRemovalKgPerS   steady moisture removal, kg/s
 * @param steadyRemovalU        expanded uncertainty, kg/s
 * @param adpC                  apparatus dew point, °C
 * @param adpU                  expanded uncertainty, K
 * @param bypassFactor          measured bypass factor
 * @param bypassFactorU         expanded uncertainty
 * @param totalW                total capacity, W
 * @param sensibleW             sensible capacity, W
 * @param nominalW              nameplate capacity, W, or NaN
 * @param runtimeFraction       compressor runtime fraction over the day, 0–1
 * @param runtimeU              expanded uncertainty
 * @param runtimeSource         "typed" or "log"
 * @param latentFraction        net part-load latent fraction LHR/LHR_ss (re-evaporation netted out)
 * @param latentU               expanded uncertainty
 * @param latentSource          "log" or "henderson-rengarajan"
 * @param reevaporationShare    share of the water removed that blower-on rests put back, 0–1
 */
public record SystemRemoval(double enteringDryBulbC, double enteringW, double airflowM3PerS, double airflowU,
                            double massFlowKgPerS, double steadyRemovalKgPerS, double steadyRemovalU, double adpC,
                            double adpU, double bypassFactor, double bypassFactorU, double totalW, double sensibleW,
                            double nominalW, double runtimeFraction, double runtimeU, String runtimeSource,
                            double latentFraction, double latentU, String latentSource, double reevaporationShare) {
    /** ± runtime fraction of a typed value, k = 2 (common practice). */
    public static final double TYPED_RUNTIME_U = 0.05;
    /** ± runtime fraction measured from a log, k = 2 (common practice). */
    public static final double LOGGED_RUNTIME_U = 0.02;
    /** ± latent fraction from the Henderson–Rengarajan model with default parameters, k = 2 (common practice). */
    public static final double MODEL_LATENT_U = 0.10;
    /** ± latent fraction measured from a log, k = 2 (common practice). */
    public static final double LOGGED_LATENT_U = 0.05;

    /** True when the coil check found an apparatus dew point to anchor the process line. */
    public boolean hasProcessLine() {
        return Double.isFinite(adpC) && Double.isFinite(bypassFactor) && bypassFactor > 0 && bypassFactor < 1;
    }

    /**
     * From a coil check and a typed runtime fraction: the latent fraction comes from the
     * Henderson–Rengarajan model with EnergyPlus's suggested parameters, blower AUTO, at that
     * runtime (net of the start-up delay; no re-evaporation).
     */
    public static SystemRemoval typed(CoilResult coil, double runtimeFraction) {
        LatentDegradationModel m = LatentDegradationModel.DEFAULTS;
        double on = m.onTimeS(Math.min(runtimeFraction, 0.999));
        double lf = m.netOverSteadyOnTime(on, 0.0);
        return of(coil, runtimeFraction, TYPED_RUNTIME_U, "typed", lf, MODEL_LATENT_U, "henderson-rengarajan", 0.0);
    }

    /** From a coil check and a kept log's analysis (runtime, measured latent fraction, re-evaporation). */
    public static SystemRemoval logged(CoilResult coil, RunCycleReport log) {
        double rtf = log.runtimeFraction();
        if (!(rtf > 0 && rtf <= 1)) {
            throw new IllegalArgumentException("the log gives no runtime fraction (no complete cycles)");
        }
        boolean measured = Double.isFinite(log.latentFractionMeasured());
        double lf = measured ? log.latentFractionMeasured() : log.latentFractionPredicted();
        if (!Double.isFinite(lf)) {
            return typed(coil, rtf);
        }
        double share = Double.isFinite(log.reevaporationShare()) ? Math.max(0, Math.min(0.95, log.reevaporationShare()))
                : 0.0;
        return of(coil, rtf, LOGGED_RUNTIME_U, "log", Math.max(0, Math.min(1, lf)),
                measured ? LOGGED_LATENT_U : MODEL_LATENT_U, measured ? "log" : "henderson-rengarajan", share);
    }

    private static SystemRemoval of(CoilResult coil, double rtf, double rtfU, String rtfSource, double lf,
                                    double lfU, String lfSource, double share) {
        Estimate removal = coil.estimate(Measurand.MOISTURE_REMOVAL);
        Estimate adp = coil.estimate(Measurand.APPARATUS_DEW_POINT);
        Estimate bf = coil.estimate(Measurand.BYPASS_FACTOR);
        double airflow = coil.readings().airflowM3PerS();
        return new SystemRemoval(coil.entering().dryBulbC(), coil.entering().humidityRatio(), airflow,
                2 * airflow * coil.readings().airflowTolFraction() / Math.sqrt(3),
                coil.process().massFlowKgPerS(), removal.valueSi(), nanToZero(removal.expandedSi()),
                adp.valueSi(), nanToZero(adp.expandedSi()), bf.valueSi(), nanToZero(bf.expandedSi()),
                coil.process().totalW(), coil.process().sensibleW(), coil.readings().nominalCapacityW(), rtf, rtfU,
                rtfSource, lf, lfU, lfSource, share);
    }

    private static double nanToZero(double v) {
        return Double.isFinite(v) ? v : 0.0;
    }
}
