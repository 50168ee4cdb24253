package app.latentledger.core.cycles;

/**
 * Part-load latent capacity model of Henderson, H.I. Jr. and K. Rengarajan (1996), "A Model to
 * Predict the Latent Capacity of Air Conditioners and Heat Pumps at Part-Load Conditions with
 * Constant Fan Operation", ASHRAE Transactions 102(1): 266–274, in its linear-decay form (their
 * eq. 8b) as documented in the EnergyPlus Engineering Reference ("Coils → Single-Speed Electric DX
 * Air Cooling Coil → Latent Capacity Degradation"). Equation labels E1–E8 are those of
 * docs/methods.md §3.6.
 *
 * <p>Times are in seconds; moisture amounts are in "seconds of steady-state latent capacity"
 * (moisture ÷ steady latent rate), which is how the paper and EnergyPlus write them. Valid for
 * single-stage equipment cycling on a thermostat, with the coil draining (full) when the compressor
 * stops; the evaporation period is capped at 2·t_wet/γ (E4), after which the linear law has dried
 * the coil.
 *
 * @param twetS       t_wet: coil moisture holding capacity ÷ steady latent rate (E1), s; 0–3000 s
 *                    (EnergyPlus input range)
 * @param gamma       γ: initial off-cycle evaporation rate ÷ steady latent rate; 0–5
 * @param tauS        τ: time constant of the on-cycle latent capacity, s; 0–500 s
 * @param nMaxPerHour N_max: thermostat cycling rate at 50 % runtime, cycles per hour; EnergyPlus accepts
 *                    0–5, up to 10 is allowed here for sensitivity studies
 * @param source      "fitted" when t_wet and γ came from the log, "default" otherwise
 */
public record LatentDegradationModel(double twetS, double gamma, double tauS, double nMaxPerHour, String source) {
    /** Rating-point entering wet-bulb depression 26.7 − 19.4 °C used by E2 (EnergyPlus ER). */
    public static final double RATED_WET_BULB_DEPRESSION_K = 26.7 - 19.4;
    /** Upper limit EnergyPlus puts on the scaled t_wet (E2), s. */
    public static final double TWET_CAP_S = 9999.0;

    /**
     * The values the EnergyPlus Input Output Reference suggests for Coil:Cooling:DX:SingleSpeed:
     * t_wet 1000 s, γ 1.5, τ 45 s, N_max 3 cycles/h.
     */
    public static final LatentDegradationModel DEFAULTS = new LatentDegradationModel(1000.0, 1.5, 45.0, 3.0, "default");

    public LatentDegradationModel {
        if (!(twetS > 0 && twetS <= TWET_CAP_S) || !(gamma > 0 && gamma <= 5) || !(tauS >= 0 && tauS <= 500)
                || !(nMaxPerHour > 0 && nMaxPerHour <= 10)) {
            throw new IllegalArgumentException("latent model parameters out of range: t_wet " + twetS
                    + " s (0–9999), gamma " + gamma + " (0–5), tau " + tauS + " s (0–500), N_max "
                    + nMaxPerHour + " per h (0–10)");
        }
    }

    /** The same model with t_wet and γ taken from a log. */
    public LatentDegradationModel withFitted(double fittedTwetS, double fittedGamma) {
        return new LatentDegradationModel(fittedTwetS, fittedGamma, tauS, nMaxPerHour, "fitted");
    }

    /**
     * E2, off-rated scaling: t_wet = min(t_wet·Q̇_L,rated/Q̇_L, 9999 s);
     * γ = γ·(Q̇_L,rated/Q̇_L)·(T_db,in − T_wb,in)/7.3 K.
     *
     * @param latentRatio          Q̇_L / Q̇_L,rated, &gt; 0
     * @param wetBulbDepressionK   entering dry bulb minus entering wet bulb, K
     */
    public LatentDegradationModel atConditions(double latentRatio, double wetBulbDepressionK) {
        double twet = Math.min(twetS / latentRatio, TWET_CAP_S);
        double g = gamma / latentRatio * (wetBulbDepressionK / RATED_WET_BULB_DEPRESSION_K);
        return new LatentDegradationModel(twet, g, tauS, nMaxPerHour, source);
    }

    /** E3: thermostat cycles per hour at runtime fraction x, N = 4·N_max·x·(1 − x). */
    public double cyclesPerHour(double x) {
        return 4.0 * nMaxPerHour * x * (1.0 - x);
    }

    /** E3: on-time at runtime fraction x, t_on = 3600/(4·N_max·(1 − x)), s. */
    public double onTimeS(double x) {
        return 3600.0 / (4.0 * nMaxPerHour * (1.0 - x));
    }

    /** E3: off-time at runtime fraction x, t_off = 3600/(4·N_max·x), s. */
    public double offTimeS(double x) {
        return 3600.0 / (4.0 * nMaxPerHour * x);
    }

    /** E4: the time the coil can evaporate before the linear law has dried it, 2·t_wet/γ, s. */
    public double dryOutS() {
        return 2.0 * twetS / gamma;
    }

    /**
     * E4 + E5: moisture re-evaporated while air moves over the stopped coil for {@code evapS}
     * seconds, E = γ·t − γ²·t²/(4·t_wet) with t = min(evapS, 2·t_wet/γ), in seconds of steady
     * latent capacity. At full dry-out it equals t_wet (the whole inventory).
     */
    public double evaporatedS(double evapS) {
        double t = Math.max(0.0, Math.min(evapS, dryOutS()));
        return gamma * t - gamma * gamma * t * t / (4.0 * twetS);
    }

    /** Gross moisture condensed in an on-cycle of {@code onS} seconds: ∫₀^t (1 − e^(−s/τ)) ds = t + τ(e^(−t/τ) − 1). */
    public double grossOnS(double onS) {
        return tauS == 0 ? onS : onS + tauS * Math.expm1(-onS / tauS);
    }

    /**
     * E6: on-time t_o before condensate leaves the coil again after {@code evaporatedS} seconds of
     * moisture were re-evaporated: root of t_o + τ(e^(−t_o/τ) − 1) = E. Solved by bisection on
     * [E, E + τ], where the left side is monotone (EnergyPlus uses successive substitution; the
     * note's check shows both agree to 6·10⁻⁵).
     */
    public double drainDelayS(double evaporatedS) {
        if (evaporatedS <= 0) {
            return 0.0;
        }
        double lo = evaporatedS;
        double hi = evaporatedS + tauS;
        for (int i = 0; i < 100 && hi - lo > 1e-9 * hi; i++) {
            double mid = 0.5 * (lo + hi);
            if (grossOnS(mid) < evaporatedS) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /**
     * E7: LHR/LHR_ss = max(0, (t_on − t_o)/(t_on + τ(e^(−t_on/τ) − 1))), kept ≤ 1 (E8's clamp), for an
     * on-time {@code onS} after an evaporation period {@code evapS} with the blower on.
     */
    public double latentRatio(double onS, double evapS) {
        if (onS <= 0) {
            return 0.0;
        }
        double to = drainDelayS(evaporatedS(evapS));
        return Math.max(0.0, Math.min(1.0, (onS - to) / grossOnS(onS)));
    }

    /**
     * What a log measures: net moisture of the cycle ÷ (steady latent rate × on-time),
     * max(0, gross(t_on) − E)/t_on. It also charges the start-up ramp (docs/methods.md §3.6), so a
     * 5-min cycle with no evaporation scores 0.85, not 1.
     */
    public double netOverSteadyOnTime(double onS, double evapS) {
        if (onS <= 0) {
            return 0.0;
        }
        return Math.max(0.0, grossOnS(onS) - evaporatedS(evapS)) / onS;
    }

    /** E8: effective SHR = 1 − (1 − SHR_ss)·LHR/LHR_ss, within [SHR_ss, 1]. */
    public static double effectiveShr(double steadyShr, double latentRatio) {
        return Math.max(steadyShr, Math.min(1.0, 1.0 - (1.0 - steadyShr) * latentRatio));
    }
}
