package app.latentledger.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Arrays;
import java.util.Locale;

/**
 * The log benchmark's ratio measured in thread CPU time instead of wall time, for a machine shared
 * with other builds: {@link LogImportBenchmark}'s same file and the same three jobs, run in turn
 * (bare parse, import, import + analysis, and the second reference: the bare parse with the
 * importer's own splitter) so a change of load hits all of them alike, and timed with
 * {@link ThreadMXBean#getCurrentThreadCpuTime()}, which counts only the time this thread ran. Waiting
 * for a core does not count; caches shared with other work still do. Prints medians and each
 * round's ratio (their spread) after warm-up rounds.
 *
 * <p>Run (after {@code mvn -B -Pjmh test-compile}):
 * {@code java -cp target/classes:target/test-classes:$(cat target/cp.txt) app.latentledger.bench.LogImportCpuMeasurement [rounds] [warm-up]},
 * the class path file made by {@code mvn -o -Pjmh dependency:build-classpath -Dmdep.outputFile=target/cp.txt
 * -Dmdep.includeScope=test}
 */
public final class LogImportCpuMeasurement {
    private LogImportCpuMeasurement() {
    }

    public static void main(String[] args) throws Exception {
        int rounds = args.length > 0 ? Integer.parseInt(args[0]) : 10;
        int warm = args.length > 1 ? Integer.parseInt(args[1]) : 3;
        LogImportBenchmark b = new LogImportBenchmark();
        b.write();
        ThreadMXBean cpu = ManagementFactory.getThreadMXBean();
        double[] bare = new double[rounds];
        double[] split = new double[rounds];
        double[] imp = new double[rounds];
        double[] all = new double[rounds];
        long sink = 0;
        try {
            for (int r = -warm; r < rounds; r++) {
                long t0 = cpu.getCurrentThreadCpuTime();
                sink += b.bareCsvParse();
                long t1 = cpu.getCurrentThreadCpuTime();
                sink += b.importOnly().series().size();
                long t2 = cpu.getCurrentThreadCpuTime();
                sink += b.importAndAnalyse().cycles().size();
                long t3 = cpu.getCurrentThreadCpuTime();
                sink += b.bareSplitterParse();
                long t4 = cpu.getCurrentThreadCpuTime();
                if (r >= 0) {
                    bare[r] = (t1 - t0) / 1e6;
                    imp[r] = (t2 - t1) / 1e6;
                    all[r] = (t3 - t2) / 1e6;
                    split[r] = (t4 - t3) / 1e6;
                }
            }
        } finally {
            b.delete();
        }
        double[] ratioAll = new double[rounds];
        double[] ratioImp = new double[rounds];
        double[] ratioSplit = new double[rounds];
        double[] ratioAllSplit = new double[rounds];
        double[] ratioImpSplit = new double[rounds];
        for (int r = 0; r < rounds; r++) {
            ratioAll[r] = all[r] / bare[r];
            ratioImp[r] = imp[r] / bare[r];
            ratioSplit[r] = split[r] / bare[r];
            ratioAllSplit[r] = all[r] / split[r];
            ratioImpSplit[r] = imp[r] / split[r];
        }
        System.out.printf(Locale.ROOT, "CPU ms, median of %d rounds after %d warm-up (sink %d)%n", rounds, warm, sink);
        System.out.printf(Locale.ROOT, "bare CSV parse      %8.0f (%.0f–%.0f)%n", median(bare), min(bare), max(bare));
        System.out.printf(Locale.ROOT, "import only         %8.0f (%.0f–%.0f)  ratio %.2f (%.2f–%.2f)%n", median(imp),
                min(imp), max(imp), median(ratioImp), min(ratioImp), max(ratioImp));
        System.out.printf(Locale.ROOT, "import + analysis   %8.0f (%.0f–%.0f)  ratio %.2f (%.2f–%.2f)%n", median(all),
                min(all), max(all), median(ratioAll), min(ratioAll), max(ratioAll));
        System.out.printf(Locale.ROOT, "bare splitter parse %8.0f (%.0f–%.0f)  ratio %.2f (%.2f–%.2f)%n", median(split),
                min(split), max(split), median(ratioSplit), min(ratioSplit), max(ratioSplit));
        System.out.printf(Locale.ROOT, "against the splitter parse: import %.2f (%.2f–%.2f), import + analysis %.2f (%.2f–%.2f)%n",
                median(ratioImpSplit), min(ratioImpSplit), max(ratioImpSplit),
                median(ratioAllSplit), min(ratioAllSplit), max(ratioAllSplit));
    }

    private static double median(double[] v) {
        double[] s = v.clone();
        Arrays.sort(s);
        int n = s.length;
        return n % 2 == 1 ? s[n / 2] : 0.5 * (s[n / 2 - 1] + s[n / 2]);
    }

    private static double min(double[] v) {
        return Arrays.stream(v).min().orElse(Double.NaN);
    }

    private static double max(double[] v) {
        return Arrays.stream(v).max().orElse(Double.NaN);
    }
}
