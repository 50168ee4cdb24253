package app.latentledger.store;

import java.nio.file.Path;

/**
 * Child process of {@link CrashSafetyTest}: saves reading sets in a loop and prints each id on its
 * own line only after the save call has returned. The parent kills it with SIGKILL at random.
 */
public final class CrashWriter {
    private CrashWriter() {
    }

    public static void main(String[] args) {
        Path file = Path.of(args[0]);
        String prefix = args[1];
        try (Database db = Database.open(file)) {
            Ledger ledger = new Ledger(db);
            if (ledger.visits().find("crash-visit").isEmpty()) {
                ledger.inTransaction(() -> {
                    ledger.sites().save(TestRecords.site("crash-site"));
                    ledger.systems().save(TestRecords.system("crash-system", "crash-site"));
                    ledger.visits().save(TestRecords.visit("crash-visit", "crash-site", "crash-system"));
                });
            }
            System.out.println("ready");
            System.out.flush();
            for (int n = 0; ; n++) {
                String id = prefix + "-" + n;
                ledger.readings().save(TestRecords.fullReadingSet(id, "crash-visit", n));
                System.out.println(id);
                System.out.flush();
            }
        }
    }
}
