package app.latentledger.store;

import app.latentledger.bundle.BundleFiles;
import app.latentledger.bundle.Bundles;
import app.latentledger.core.settings.Settings;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;

/**
 * A child process that imports bundles or saves settings in a loop until it is killed, printing
 * "begin …" before each write and "ok …" once the call has returned (acknowledged).
 * <pre>
 *   import DATA_DIR TEMPLATE_ZIP IDS_FILE START
 *   settings DATA_DIR SEED
 * </pre>
 */
public final class CrashChild {
    static final List<String> KEYS = List.of("tolRh", "tolDryBulb", "tolWetBulb", "tolDewPoint");

    private CrashChild() {
    }

    public static void main(String[] a) throws Exception {
        Path data = Path.of(a[1]);
        try (Ledger ledger = new Ledger(Database.open(data.resolve(Ledger.FILE_NAME)))) {
            System.out.println("ready");
            System.out.flush();
            if (a[0].equals("import")) {
                Map<String, byte[]> template = BundleFiles.entries(Path.of(a[2]));
                Set<String> ids = new HashSet<>(Files.readAllLines(Path.of(a[3])));
                for (int i = Integer.parseInt(a[4]); ; i++) {
                    Path zip = data.resolve("b" + i + ".zip");
                    BundleFiles.write(zip, BundleFiles.renamed(template, ids, "-c" + i));
                    System.out.println("begin " + i);
                    System.out.flush();
                    Bundles.importBundle(ledger, zip);
                    System.out.println("ok " + i);
                    System.out.flush();
                    Files.delete(zip);
                }
            }
            Random random = new Random(Long.parseLong(a[2]));
            while (true) {
                SettingsRepository.Stamped base = ledger.settings().loadStamped();
                String key = KEYS.get(random.nextInt(KEYS.size()));
                double value = 0.1 + random.nextInt(40) * 0.05;
                System.out.println("begin " + key + " " + value);
                System.out.flush();
                Settings next = base.settings().withNumber(key, value);
                ledger.settings().save(base, next);
                System.out.println("ok " + key + " " + value);
                System.out.flush();
            }
        }
    }
}
