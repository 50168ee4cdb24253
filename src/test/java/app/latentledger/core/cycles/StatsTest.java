package app.latentledger.core.cycles;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Size;

import java.util.Arrays;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;

class StatsTest {
    /** Definition of the median: middle of the sorted values, mean of the two middle ones for an even count. */
    @Property(tries = 500)
    void medianIsTheMiddleOfTheSortedValues(@ForAll @Size(min = 1, max = 60)
                                            List<@DoubleRange(min = -5, max = 5) Double> values) {
        double[] a = values.stream().mapToDouble(Double::doubleValue).map(v -> Math.round(v * 2) / 2.0).toArray();
        double[] copy = a.clone();
        double[] sorted = a.clone();
        Arrays.sort(sorted);
        int n = sorted.length;
        double expected = n % 2 == 1 ? sorted[n / 2] : 0.5 * (sorted[n / 2 - 1] + sorted[n / 2]);
        assertEquals(expected, Stats.median(a, n), 0.0);
        assertEquals(Arrays.toString(copy), Arrays.toString(a), "input left unchanged");
    }

    /** Definition of the nearest-rank percentile: the ⌈q·n⌉-th smallest of the sorted values; the maximum the last. */
    @Property(tries = 500)
    void percentileIsTheNearestRankOfTheSortedValues(@ForAll @Size(min = 1, max = 60)
                                                     List<@DoubleRange(min = -5, max = 5) Double> values,
                                                     @ForAll @DoubleRange(min = 0.01, max = 1) double q) {
        double[] a = values.stream().mapToDouble(Double::doubleValue).map(v -> Math.round(v * 2) / 2.0).toArray();
        double[] copy = a.clone();
        double[] sorted = a.clone();
        Arrays.sort(sorted);
        int n = sorted.length;
        assertEquals(sorted[Math.max(0, (int) Math.ceil(q * n) - 1)], Stats.percentile(a, n, q), 0.0);
        assertEquals(sorted[n - 1], Stats.max(a, n), 0.0);
        assertEquals(Arrays.toString(copy), Arrays.toString(a), "input left unchanged");
    }
}
