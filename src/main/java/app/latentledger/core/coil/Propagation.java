package app.latentledger.core.coil;

import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Propagation of instrument tolerances through a model y = f(x), two ways.
 *
 * <ul>
 *   <li><b>First order</b> (JCGM 100:2008, GUM §5.1.2; correlated inputs by §5.2.2):
 *       u_c²(y) = Σ_i Σ_j c_i c_j r_ij u(x_i) u(x_j), r_ij = 1 for i = j and for inputs in the same
 *       {@link UncertainInput#correlationGroup() correlation group}, 0 otherwise (so with no groups,
 *       Σ c_i² u²(x_i)); sensitivity coefficients c_i = ∂f/∂x_i taken numerically by
 *       central differences with steps of 10⁻³ u(x_i); where one side of a step leaves the
 *       physical range (RH above 100 %, no apparatus dew point), a one-sided difference is used.
 *       Expanded uncertainty U = k u_c, k = 2 (≈ 95 % for a near-normal output).</li>
 *   <li><b>Monte Carlo</b> (JCGM 101:2008, Supplement 1): draws every input from its rectangular
 *       distribution (inputs of one correlation group from one shared draw, scaled by each
 *       half-width), evaluates the model with readings past saturation held at it, and reports
 *       the standard deviation of the outputs (times k = 2, for comparison with the first-order U)
 *       and the probabilistically symmetric 95 % coverage interval.</li>
 * </ul>
 * Valid while the model is smooth over ± a few u around the readings; close to a threshold of the
 * model (an apparatus dew point that appears or vanishes) the Monte Carlo is the better guide.
 */
public final class Propagation {
    /** Coverage factor for the expanded uncertainty. */
    public static final double K = 2.0;

    /** A model: from the input vector to an output vector; NaN marks an output that does not exist. */
    @FunctionalInterface
    public interface Model {
        /**
         * @param x     inputs, in the order of the budget
         * @param clamp true to hold readings past saturation at the limit (Monte Carlo), false to
         *              return NaN for them (first order)
         */
        double[] evaluate(double[] x, boolean clamp);
    }

    /**
     * @param values     outputs at the readings
     * @param standard   combined standard uncertainty per output (NaN when not assessable)
     * @param expanded   k = 2 expanded uncertainty per output
     * @param low95      lower end of the 95 % coverage interval (Monte Carlo only; NaN otherwise)
     * @param high95     upper end of the 95 % coverage interval (Monte Carlo only; NaN otherwise)
     */
    public record Result(double[] values, double[] standard, double[] expanded, double[] low95, double[] high95) {
    }

    private Propagation() {
    }

    /** First-order (GUM) propagation. */
    public static Result firstOrder(List<UncertainInput> inputs, Model model) {
        double[] x0 = nominal(inputs);
        double[] y0 = model.evaluate(x0, false);
        double[][] cu = new double[x0.length][]; // c_i u(x_i) per output
        for (int i = 0; i < x0.length; i++) {
            double u = inputs.get(i).standardUncertainty();
            if (u == 0) {
                continue;
            }
            cu[i] = new double[y0.length];
            double h = u * 1e-3;
            double[] up = model.evaluate(shift(x0, i, h), false);
            double[] down = model.evaluate(shift(x0, i, -h), false);
            for (int j = 0; j < y0.length; j++) {
                double c;
                if (Double.isFinite(up[j]) && Double.isFinite(down[j])) {
                    c = (up[j] - down[j]) / (2 * h);
                } else if (Double.isFinite(up[j]) && Double.isFinite(y0[j])) {
                    c = (up[j] - y0[j]) / h;
                } else if (Double.isFinite(down[j]) && Double.isFinite(y0[j])) {
                    c = (y0[j] - down[j]) / h;
                } else {
                    c = Double.NaN;
                }
                cu[i][j] = c * u;
            }
        }
        double[] sumSq = new double[y0.length];
        for (int i = 0; i < x0.length; i++) {
            if (cu[i] == null) {
                continue;
            }
            for (int k = 0; k < x0.length; k++) {
                if (cu[k] == null || (k != i && !inputs.get(i).correlatedWith(inputs.get(k)))) {
                    continue;
                }
                for (int j = 0; j < y0.length; j++) {
                    sumSq[j] += cu[i][j] * cu[k][j];
                }
            }
        }
        double[] standard = new double[y0.length];
        double[] expanded = new double[y0.length];
        double[] none = new double[y0.length];
        Arrays.fill(none, Double.NaN);
        for (int j = 0; j < y0.length; j++) {
            standard[j] = Double.isFinite(y0[j]) ? Math.sqrt(sumSq[j]) : Double.NaN;
            expanded[j] = K * standard[j];
        }
        return new Result(y0, standard, expanded, none, none.clone());
    }

    /**
     * Monte Carlo propagation with {@code draws} trials from a seeded generator (repeatable).
     * Outputs that do not exist on a trial (NaN) are left out of that output's statistics.
     */
    public static Result monteCarlo(List<UncertainInput> inputs, Model model, int draws, long seed) {
        double[] x0 = nominal(inputs);
        double[] y0 = model.evaluate(x0, false);
        int m = y0.length;
        double[][] samples = new double[m][draws];
        int[] counts = new int[m];
        SplittableRandom random = new SplittableRandom(seed);
        double[] x = new double[x0.length];
        for (int d = 0; d < draws; d++) {
            java.util.Map<String, Double> shared = new java.util.HashMap<>();
            for (int i = 0; i < x0.length; i++) {
                double a = inputs.get(i).halfWidthSi();
                String group = inputs.get(i).correlationGroup();
                double draw = group == null ? 2 * random.nextDouble() - 1
                        : shared.computeIfAbsent(group, g -> 2 * random.nextDouble() - 1);
                x[i] = a == 0 ? x0[i] : x0[i] + a * draw;
            }
            double[] y = model.evaluate(x, true);
            for (int j = 0; j < m; j++) {
                if (Double.isFinite(y[j])) {
                    samples[j][counts[j]++] = y[j];
                }
            }
        }
        double[] standard = new double[m];
        double[] expanded = new double[m];
        double[] low = new double[m];
        double[] high = new double[m];
        for (int j = 0; j < m; j++) {
            int n = counts[j];
            if (n < 2) {
                standard[j] = expanded[j] = low[j] = high[j] = Double.NaN;
                continue;
            }
            double[] s = Arrays.copyOf(samples[j], n);
            double mean = 0;
            for (double v : s) {
                mean += v;
            }
            mean /= n;
            double ss = 0;
            for (double v : s) {
                ss += (v - mean) * (v - mean);
            }
            standard[j] = Math.sqrt(ss / (n - 1));
            expanded[j] = K * standard[j];
            Arrays.sort(s);
            low[j] = s[(int) Math.floor(0.025 * (n - 1))];
            high[j] = s[(int) Math.ceil(0.975 * (n - 1))];
        }
        return new Result(y0, standard, expanded, low, high);
    }

    private static double[] nominal(List<UncertainInput> inputs) {
        double[] x = new double[inputs.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = inputs.get(i).valueSi();
        }
        return x;
    }

    private static double[] shift(double[] x0, int i, double h) {
        double[] x = x0.clone();
        x[i] += h;
        return x;
    }
}
