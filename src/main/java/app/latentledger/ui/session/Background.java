package app.latentledger.ui.session;

import javafx.application.Platform;

import java.util.concurrent.Executor;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;

/**
 * Where the screens run slow work (log import, PDF report) and where they apply its results. One
 * daemon worker: jobs run in the order asked and the ledger sees one writer besides the FX thread;
 * a daemon so a job in progress never keeps a closed app alive. Tests pass
 * {@link #DIRECT} for both to run everything on the calling thread.
 */
public final class Background {
    private static final ExecutorService WORKER = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "latent-ledger-worker");
        t.setDaemon(true);
        return t;
    });

    /** Runs a job on the calling thread (tests without a toolkit). */
    public static final Executor DIRECT = Runnable::run;

    private Background() {
    }

    /** Off the FX thread. */
    public static Executor worker() {
        return WORKER;
    }

    /** Back on the FX thread. */
    public static Executor fx() {
        return Platform::runLater;
    }
}
