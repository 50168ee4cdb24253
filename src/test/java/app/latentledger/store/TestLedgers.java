package app.latentledger.store;

import java.nio.file.Path;

/** Ledgers for tests that need the invented Saltreed demo, whatever the open call seeds itself. */
public final class TestLedgers {
    private TestLedgers() {
    }

    /** Opens the ledger in {@code dir} and adds the demo when it holds no site. */
    public static Ledger withDemo(Path dir) {
        Ledger l = Ledger.open(dir);
        if (l.sites().all().isEmpty()) {
            DemoScenario.seed(l);
        }
        return l;
    }
}
