package app.latentledger.core.house;

import java.util.function.DoubleUnaryOperator;

/**
 * The indoor humidity ratio at which the house's water gains equal what is removed: the root of
 * the daily mass balance on the house air (dry-air basis, ASHRAE HoF ch. 1 mass balances)
 * r(W) = K_o(W_o − W) + K_d(W_a − W) + G − R(W) − D = 0.
 *
 * <p>Gains fall as the indoor W rises (K ≥ 0) and removal R rises with it, so r is non-increasing
 * and the root, when one exists in the bracket, is unique. Solved by bisection to 10⁻⁹ kg/kg. When
 * r is still positive at saturation of the indoor air, no equilibrium exists: the equipment cannot
 * hold the house at any indoor humidity.
 */
public final class Equilibrium {
    /** Convergence of the bisection, kg/kg. */
    public static final double TOLERANCE = 1e-9;

    private Equilibrium() {
    }

    /**
     * @param residual r(W), non-increasing
     * @param loW      lowest humidity ratio considered, kg/kg
     * @param hiW      highest (saturation of the indoor air), kg/kg
     * @return the root, {@code loW} when r(loW) ≤ 0, NaN when r(hiW) &gt; 0
     */
    public static double solve(DoubleUnaryOperator residual, double loW, double hiW) {
        if (residual.applyAsDouble(hiW) > 0) {
            return Double.NaN;
        }
        if (residual.applyAsDouble(loW) <= 0) {
            return loW;
        }
        double lo = loW;
        double hi = hiW;
        for (int i = 0; i < 100 && hi - lo > TOLERANCE; i++) {
            double mid = 0.5 * (lo + hi);
            if (residual.applyAsDouble(mid) > 0) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }
}
