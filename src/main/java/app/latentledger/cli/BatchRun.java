package app.latentledger.cli;

import app.latentledger.core.settings.PaperSize;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.report.BatchVisitReport;
import app.latentledger.report.ReportRefusedException;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * The batch's work spread over a bounded pool (one thread per core, at most eight): rows are
 * checked and reports written in chunks, each result put back in its row's place, so the output is
 * in file order whatever finished first. A row's check keeps no shared state, and each report is its
 * own PDF document, so nothing is locked.
 */
final class BatchRun implements AutoCloseable {
    /** Rows per task: big enough that handing out work costs nothing next to a 20 µs check. */
    private static final int CHUNK = 64;

    private final ExecutorService pool;
    private final int threads;

    BatchRun(int threads) {
        this.threads = threads;
        AtomicInteger n = new AtomicInteger();
        this.pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "batch-" + n.incrementAndGet());
            t.setDaemon(true);
            return t;
        });
    }

    List<BatchCheck.Outcome> check(List<BatchCsv.Row> rows, BatchCheck check, BatchProgress progress) {
        BatchCheck.Outcome[] out = new BatchCheck.Outcome[rows.size()];
        AtomicInteger done = new AtomicInteger();
        List<Future<?>> tasks = new ArrayList<>();
        for (int from = 0; from < rows.size(); from += CHUNK) {
            int start = from;
            int end = Math.min(rows.size(), from + CHUNK);
            tasks.add(pool.submit(() -> {
                for (int i = start; i < end; i++) {
                    BatchCsv.Row row = rows.get(i);
                    out[i] = row.extra() > 0 ? tooMany(row) : check.check(row);
                }
                progress.done(done.addAndGet(end - start));
            }));
        }
        await(tasks);
        progress.finish();
        return Arrays.asList(out);
    }

    private static BatchCheck.Outcome tooMany(BatchCsv.Row row) {
        return new BatchCheck.Outcome(row, null, new BatchRefusal(row.line(), "", "row", "", "",
                "the row has " + row.extra() + " more cell" + (row.extra() == 1 ? "" : "s")
                        + " than the header has columns; a comma inside a name needs the cell in double quotes"));
    }

    /** One PDF per checked row into {@code folder}, named as {@code names} says. */
    void reports(List<BatchCheck.Outcome> outcomes, Map<Integer, String> names, Path folder, PaperSize paper,
                 UnitSystem units, BatchProgress progress) {
        List<BatchCheck.Outcome> checked = outcomes.stream().filter(o -> o.checked() != null).toList();
        AtomicInteger done = new AtomicInteger();
        List<Future<?>> tasks = new ArrayList<>();
        int chunk = Math.max(1, Math.min(16, checked.size() / (threads * 4) + 1));
        for (int from = 0; from < checked.size(); from += chunk) {
            List<BatchCheck.Outcome> part = checked.subList(from, Math.min(checked.size(), from + chunk));
            tasks.add(pool.submit(() -> {
                for (BatchCheck.Outcome o : part) {
                    BatchCheck.Checked c = o.checked();
                    try {
                        BatchVisitReport.write(c.site(), c.system(), c.visit(), c.set(), c.result(), paper, units,
                                folder.resolve(names.get(o.row().line())));
                    } catch (ReportRefusedException e) {
                        throw new UsageException(e.getMessage());
                    }
                    progress.done(done.incrementAndGet());
                }
            }));
        }
        await(tasks);
        progress.finish();
    }

    private static void await(List<Future<?>> tasks) {
        for (Future<?> f : tasks) {
            try {
                f.get();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("the batch was interrupted", e);
            } catch (ExecutionException e) {
                Throwable cause = e.getCause();
                if (cause instanceof RuntimeException r) {
                    throw r;
                }
                if (cause instanceof Error err) {
                    throw err;
                }
                throw new IllegalStateException(cause);
            }
        }
    }

    @Override
    public void close() {
        pool.shutdownNow();
    }
}
