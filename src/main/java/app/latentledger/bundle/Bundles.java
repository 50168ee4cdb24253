package app.latentledger.bundle;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.ResultsSnapshot;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.SnapshotSubject;
import app.latentledger.core.records.Visit;
import app.latentledger.store.Ledger;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Export of a visit or a site from the ledger, and import of a bundle into it. */
public final class Bundles {
    private Bundles() {
    }

    /** A visit with its site, its system, its readings, logs and snapshots. */
    public static BundleContent ofVisit(Ledger ledger, String visitId) {
        Visit v = ledger.visits().find(visitId)
                .orElseThrow(() -> new IllegalArgumentException("no visit with id " + visitId));
        Site site = ledger.sites().find(v.siteId()).orElseThrow();
        HvacSystem system = ledger.systems().find(v.systemId()).orElseThrow();
        return collect(ledger, BundleScope.VISIT, site, List.of(system), List.of(v));
    }

    /** A site with every system and visit at it. */
    public static BundleContent ofSite(Ledger ledger, String siteId) {
        Site site = ledger.sites().find(siteId)
                .orElseThrow(() -> new IllegalArgumentException("no site with id " + siteId));
        List<Visit> visits = new ArrayList<>(ledger.visits().forSite(siteId));
        java.util.Collections.reverse(visits); // oldest first reads naturally in a bundle
        return collect(ledger, BundleScope.SITE, site, ledger.systems().forSite(siteId), visits);
    }

    private static BundleContent collect(Ledger ledger, BundleScope scope, Site site, List<HvacSystem> systems,
                                         List<Visit> visits) {
        List<ReadingSet> readings = new ArrayList<>();
        List<ImportedLog> logs = new ArrayList<>();
        List<ResultsSnapshot> snapshots = new ArrayList<>();
        for (Visit v : visits) {
            for (ReadingSet r : ledger.readings().forVisit(v.id())) {
                readings.add(r);
                snapshots.addAll(ledger.snapshots().forSubject(SnapshotSubject.READING_SET, r.id()));
            }
            for (ImportedLog l : ledger.logs().forVisit(v.id())) {
                logs.add(l);
                snapshots.addAll(ledger.snapshots().forSubject(SnapshotSubject.LOG, l.id()));
            }
        }
        return new BundleContent(scope, site, systems, visits, readings, logs, snapshots);
    }

    public static void exportVisit(Ledger ledger, String visitId, Path file) throws IOException {
        BundleWriter.write(ofVisit(ledger, visitId), visitId, file);
    }

    public static void exportSite(Ledger ledger, String siteId, Path file) throws IOException {
        BundleWriter.write(ofSite(ledger, siteId), siteId, file);
    }

    /** What an import did. */
    public record ImportSummary(int added, int alreadyPresent, List<String> visitIds) {
    }

    /**
     * Reads, checks and imports a bundle in one transaction. A record already in the ledger with
     * exactly the same content is left as is; one with the same id but other content refuses the
     * whole import, because either copy may be the one the tech trusts.
     */
    public static ImportSummary importBundle(Ledger ledger, Path file) throws BundleException {
        BundleContent content = BundleReader.read(file);
        int[] counts = new int[2];
        try {
            importContent(ledger, content, counts);
        } catch (ImportConflict e) {
            throw new BundleException("bundle refused: " + String.join("; ", e.conflicts)
                    + " from the copy already in this ledger (same id, other content); nothing was imported");
        }
        List<String> visitIds = new ArrayList<>();
        content.visits().forEach(v -> visitIds.add(v.id()));
        return new ImportSummary(counts[0], counts[1], visitIds);
    }

    private static void importContent(Ledger ledger, BundleContent content, int[] counts) {
        List<String> conflicts = new ArrayList<>();
        ledger.inTransaction(() -> {
            put(ledger.sites().find(content.site().id()), content.site(), "site " + content.site().id(), counts, conflicts,
                    () -> ledger.sites().save(content.site()));
            for (HvacSystem s : content.systems()) {
                put(ledger.systems().find(s.id()), s, "system " + s.id(), counts, conflicts, () -> ledger.systems().save(s));
            }
            for (Visit v : content.visits()) {
                put(ledger.visits().find(v.id()), v, "visit " + v.id(), counts, conflicts, () -> ledger.visits().save(v));
            }
            for (ReadingSet r : content.readings()) {
                put(ledger.readings().find(r.id()), r, "reading set " + r.id(), counts, conflicts, () -> ledger.readings().save(r));
            }
            for (ImportedLog l : content.logs()) {
                put(ledger.logs().find(l.id()), l, "log " + l.id(), counts, conflicts, () -> ledger.logs().save(l));
            }
            for (ResultsSnapshot s : content.snapshots()) {
                put(ledger.snapshots().find(s.id()), s, "snapshot " + s.id(), counts, conflicts, () -> ledger.snapshots().save(s));
            }
            if (!conflicts.isEmpty()) {
                // thrown inside the transaction: everything above is rolled back
                throw new ImportConflict(conflicts);
            }
        });
    }

    private static <T> void put(Optional<T> existing, T incoming, String what, int[] counts, List<String> conflicts,
                                Runnable save) {
        if (existing.isEmpty()) {
            save.run();
            counts[0]++;
        } else if (existing.get().equals(incoming)) {
            counts[1]++;
        } else {
            conflicts.add(what + " differs");
        }
    }

    /** A conflict found inside the import transaction. */
    static final class ImportConflict extends RuntimeException {
        private static final long serialVersionUID = 1L;
        private final transient List<String> conflicts;

        ImportConflict(List<String> conflicts) {
            super(String.join("; ", conflicts));
            this.conflicts = List.copyOf(conflicts);
        }
    }
}
