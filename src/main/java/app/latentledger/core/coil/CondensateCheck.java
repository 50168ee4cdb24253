package app.latentledger.core.coil;

import app.latentledger.core.units.Ratio;

/**
 * Condensate caught at the drain against the air-side moisture removal ṁ_da (W₁ − W₂)
 * (ASHRAE HoF 2017 ch. 1, eq. 42), both with their uncertainty. Condensate is a lower bound in
 * practice: water held on a coil that has not run long enough, re-evaporated by a running fan or
 * lost to a dry trap never reaches the container (common practice, no source).
 *
 * <p>A timed catch is often far more certain than the air side (±2–3 % against ±50 % or more for
 * the latent from two humidity probes). When the catch is <b>steady</b> — at least
 * {@code condensateSteadyMinTime} long, and not clearly short of the air side (the sign of a coil
 * still wetting or a drain not yet running) — and more certain than the air-side latent, the
 * latent capacity and SHR are also given from it, and the verdict may use it.
 *
 * @param condensate          water caught, kg/s, with U
 * @param airside             air-side moisture removal, kg/s, with U
 * @param difference          condensate − air side, kg/s, with U (propagated jointly, so correlated
 *                            inputs are counted once)
 * @param latentFromCondensate latent capacity from the catch, W, with U
 * @param shrFromCondensate   sensible ÷ (sensible + latent from the catch), with U; NaN when not measurable
 * @param steady              true when the catch was long enough and not clearly short of the air side
 * @param moreCertain         true when the catch's relative uncertainty is below the air-side latent's
 */
public record CondensateCheck(Estimate condensate, Estimate airside, Estimate difference,
                              Estimate latentFromCondensate, Estimate shrFromCondensate,
                              boolean steady, boolean moreCertain) {
    /** The cross-check alone (latent from the catch not assessed). */
    public CondensateCheck(Estimate condensate, Estimate airside, Estimate difference) {
        this(condensate, airside, difference, new Estimate(Double.NaN, Double.NaN),
                new Estimate(Double.NaN, Double.NaN), false, false);
    }

    /** (condensate − air side) / air side; NaN when the air side removes nothing measurable. */
    public double relativeDifference() {
        return Ratio.of(difference.valueSi(), airside.valueSi(), Double.NaN);
    }

    /** True when the two disagree beyond the uncertainty of their difference. */
    public boolean disagreeBeyondUncertainty() {
        return difference.clearlyPositive() || difference.clearlyNegative();
    }

    /** True when the latent capacity and SHR from the catch are reported and may inform the verdict. */
    public boolean usable() {
        return steady && moreCertain && latentFromCondensate.exists();
    }

    /** True when a usable catch shows water leaving the air beyond its uncertainty. */
    public boolean showsDrying() {
        return usable() && condensate.clearlyPositive();
    }
}
