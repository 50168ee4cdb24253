package app.latentledger.store;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

/**
 * Repository tests over a fresh ledger that holds the site "s1", its system "y1" and the visit
 * "v1" ({@link TestLedgers#withOneVisit}), opened before each test and closed after it.
 */
abstract class OneVisitLedger {
    @TempDir
    Path dir;
    Ledger ledger;

    @BeforeEach
    void openLedger() {
        ledger = TestLedgers.withOneVisit(dir.resolve("t.db"));
    }

    @AfterEach
    void closeLedger() {
        ledger.close();
    }
}
