package app.latentledger.store;

import java.nio.file.Path;

/** Ledgers for tests: the invented Saltreed demo, or the few parent records a repository test needs. */
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

    /**
     * A new ledger in {@code file} holding the site "s1", its system "y1" and the visit "v1" of
     * {@link TestRecords}: the records a repository test saves its own beneath.
     */
    public static Ledger withOneVisit(Path file) {
        Ledger l = new Ledger(Database.open(file));
        l.sites().save(TestRecords.site("s1"));
        l.systems().save(TestRecords.system("y1", "s1"));
        l.visits().save(TestRecords.visit("v1", "s1", "y1"));
        return l;
    }
}
