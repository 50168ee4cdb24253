package app.latentledger.core.coil;

/**
 * Condensate caught at the drain against the air-side moisture removal ṁ_da (W₁ − W₂)
 * (ASHRAE HoF 2017 ch. 1, eq. 42), both with their uncertainty. Condensate is a lower bound in
 * practice: water held on a coil that has not run long enough, re-evaporated by a running fan or
 * lost to a dry trap never reaches the container (docs/methods.md §9.2, common practice).
 *
 * @param condensate    water caught, kg/s, with U
 * @param airside       air-side moisture removal, kg/s, with U
 * @param difference    condensate − air side, kg/s, with U (propagated jointly, so correlated
 *                      inputs are counted once)
 */
public record CondensateCheck(Estimate condensate, Estimate airside, Estimate difference) {
    /** (condensate − air side) / air side; NaN when the air side removes nothing. */
    public double relativeDifference() {
        return airside.valueSi() > 0 ? difference.valueSi() / airside.valueSi() : Double.NaN;
    }

    /** True when the two disagree beyond the uncertainty of their difference. */
    public boolean disagreeBeyondUncertainty() {
        return difference.clearlyPositive() || difference.clearlyNegative();
    }
}
