package app.latentledger.report;

import app.latentledger.chart.axis.NiceTicks;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.CoilVerdict;
import app.latentledger.core.coil.Estimate;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.Severity;
import app.latentledger.core.units.UnitSystem;

import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * What a batch of systems came to, computed once for the summary PDF and the command's JSON: counts
 * by verdict, the systems needing attention (worst first), and the spread of four figures.
 *
 * <p>A system needs attention when its coil is not dehumidifying, when a finding calls for a fix,
 * when the check cannot tell, or when a finding asks for a closer look; in that order, then by line.
 *
 * @param source    the batch file's name
 * @param units     units every figure is shown in
 * @param generated when the summary was made
 * @param systems   every checked row, in file order
 * @param refused   every refused row, in file order
 */
public record BatchSummary(String source, UnitSystem units, OffsetDateTime generated, List<Entry> systems,
                           List<Refused> refused) {
    public BatchSummary {
        systems = List.copyOf(systems);
        refused = List.copyOf(refused);
    }

    /**
     * One checked system.
     *
     * @param line   line of the batch file
     * @param report the file name of its own report, or "" when none was written
     */
    public record Entry(int line, String site, String system, CoilResult result, String report) {
        public CoilVerdict verdict() {
            return result.verdict();
        }

        /** The most urgent finding's severity, or null when there is none. */
        public Severity worst() {
            Severity w = null;
            for (Finding f : result.findings()) {
                if (w == null || f.severity().compareTo(w) > 0) {
                    w = f.severity();
                }
            }
            return w;
        }

        /** 0 not dehumidifying, 1 a fix, 2 can't tell, 3 a check, 4 nothing to do. */
        public int attentionRank() {
            Severity w = worst();
            if (result.verdict() == CoilVerdict.NOT_DEHUMIDIFYING) {
                return 0;
            }
            if (w == Severity.FIX) {
                return 1;
            }
            if (result.verdict() == CoilVerdict.CANT_TELL) {
                return 2;
            }
            return w == Severity.CHECK ? 3 : 4;
        }

        /** The figure in the summary's units, NaN when it does not exist for this system. */
        public double shown(Measurand m, UnitSystem units) {
            Estimate e = result.estimate(m);
            return e.exists() && Double.isFinite(e.valueSi()) ? m.quantity().toDisplay(units, e.valueSi()) : Double.NaN;
        }
    }

    /** One refused row, as the command reported it. */
    public record Refused(int line, String column, String value, String range, String message) {
    }

    /** The four figures whose spread the summary plots, in its order. */
    public static final List<Measurand> PLOTTED = List.of(Measurand.SHR, Measurand.LATENT_PER_AIRFLOW,
            Measurand.AIRFLOW_PER_NOMINAL_CAPACITY, Measurand.DEW_POINT_MARGIN);

    /** Systems by verdict, every verdict present (0 when none). */
    public Map<CoilVerdict, Integer> counts() {
        Map<CoilVerdict, Integer> m = new EnumMap<>(CoilVerdict.class);
        for (CoilVerdict v : CoilVerdict.values()) {
            m.put(v, 0);
        }
        systems.forEach(e -> m.merge(e.verdict(), 1, Integer::sum));
        return m;
    }

    /** The systems needing attention, worst first, then in file order. */
    public List<Entry> attention() {
        return systems.stream().filter(e -> e.attentionRank() < 4)
                .sorted(Comparator.comparingInt(Entry::attentionRank).thenComparingInt(Entry::line)).toList();
    }

    /**
     * A histogram of one figure: bins of a nice width (1, 2 or 5 × 10ⁿ display units) covering every
     * value, and how many systems fall in each.
     *
     * @param from    left edge of the first bin
     * @param width   bin width, display units
     * @param counts  systems per bin
     * @param missing systems without this figure (e.g. no nameplate size, no coil temperature)
     */
    public record Histogram(Measurand measurand, String unit, double from, double width, int[] counts, int missing) {
        public int total() {
            int n = 0;
            for (int c : counts) {
                n += c;
            }
            return n;
        }
    }

    /** The histogram of {@code m} over the checked systems, with about ten bins; null when no system has it. */
    public Histogram histogram(Measurand m) {
        List<Double> values = new ArrayList<>();
        int missing = 0;
        for (Entry e : systems) {
            double v = e.shown(m, units);
            if (Double.isFinite(v)) {
                values.add(v);
            } else {
                missing++;
            }
        }
        String unit = m.quantity().symbol(units);
        if (values.isEmpty()) {
            return new Histogram(m, unit, 0, 1, new int[0], missing);
        }
        double lo = values.stream().mapToDouble(Double::doubleValue).min().orElseThrow();
        double hi = values.stream().mapToDouble(Double::doubleValue).max().orElseThrow();
        double span = hi - lo;
        double width = span > 0 ? NiceTicks.step(span, 10, 1) : niceWidthFor(lo);
        double from = Math.floor(lo / width) * width;
        int bins = Math.max(1, (int) Math.floor((hi - from) / width) + 1);
        int[] counts = new int[bins];
        for (double v : values) {
            int i = (int) Math.floor((v - from) / width);
            counts[Math.min(bins - 1, Math.max(0, i))]++;
        }
        return new Histogram(m, unit, from, width, counts, missing);
    }

    /** A bin width for values that are all equal: one nice step about a tenth of the value. */
    private static double niceWidthFor(double v) {
        double a = Math.abs(v);
        return a > 0 ? NiceTicks.step(a, 10, 1) : 1;
    }

    /** How the summary names a figure, e.g. "Latent capacity per cfm (Btu/h per cfm)". */
    public static String title(Measurand m, UnitSystem units) {
        String name = switch (m) {
            case SHR -> "Sensible heat ratio";
            case DEW_POINT_MARGIN -> "Dew-point margin (entering dew point minus coil)";
            default -> m.title(units);
        };
        String unit = m.quantity().symbol(units);
        return unit.isEmpty() ? name : name + " (" + unit + ")";
    }
}
