package app.latentledger.bundle;

import app.latentledger.core.records.BinEntry;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.RecordKind;
import app.latentledger.core.records.VisitPaperwork;
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

    /** A visit with its site, its system, its readings, logs, snapshots, instruments and paperwork. */
    public static BundleContent ofVisit(Ledger ledger, String visitId) {
        return ofVisit(ledger, visitId, false);
    }

    /**
     * A visit as {@link #ofVisit(Ledger, String)}; with {@code withDeletions}, also the reading sets
     * and logs deleted from it that are still in the recycle bin, so the receiving ledger deletes
     * them too.
     */
    public static BundleContent ofVisit(Ledger ledger, String visitId, boolean withDeletions) {
        Visit v = ledger.visits().find(visitId)
                .orElseThrow(() -> new IllegalArgumentException("no visit with id " + visitId));
        Site site = ledger.sites().find(v.siteId()).orElseThrow();
        HvacSystem system = ledger.systems().find(v.systemId()).orElseThrow();
        List<BinEntry> deletions = !withDeletions ? List.of() : ledger.recycleBin().forSite(site.id()).stream()
                .filter(e -> e.visitId().equals(visitId) && e.kind() != RecordKind.VISIT).toList();
        return collect(ledger, BundleScope.VISIT, site, List.of(system), List.of(v), deletions);
    }

    /** A site with every system and visit at it. */
    public static BundleContent ofSite(Ledger ledger, String siteId) {
        return ofSite(ledger, siteId, false);
    }

    /**
     * A site as {@link #ofSite(Ledger, String)}; with {@code withDeletions}, also every system,
     * visit, reading set and log deleted at it that is still in the recycle bin.
     */
    public static BundleContent ofSite(Ledger ledger, String siteId, boolean withDeletions) {
        Site site = ledger.sites().find(siteId)
                .orElseThrow(() -> new IllegalArgumentException("no site with id " + siteId));
        List<Visit> visits = new ArrayList<>(ledger.visits().forSite(siteId));
        java.util.Collections.reverse(visits); // oldest first reads naturally in a bundle
        List<BinEntry> deletions = withDeletions ? ledger.recycleBin().forSite(siteId) : List.of();
        return collect(ledger, BundleScope.SITE, site, ledger.systems().forSite(siteId), visits, deletions);
    }

    private static BundleContent collect(Ledger ledger, BundleScope scope, Site site, List<HvacSystem> systems,
                                         List<Visit> visits, List<BinEntry> deletions) {
        List<Instrument> instruments = new ArrayList<>();
        List<BundleContent.InstrumentUse> uses = new ArrayList<>();
        List<VisitPaperwork> paperwork = new ArrayList<>();
        List<ReadingSet> readings = new ArrayList<>();
        List<ImportedLog> logs = new ArrayList<>();
        List<ResultsSnapshot> snapshots = new ArrayList<>();
        for (Visit v : visits) {
            instruments.addAll(ledger.instruments().forVisit(v.id()));
            ledger.paperwork().find(v.id()).ifPresent(paperwork::add);
            for (ReadingSet r : ledger.readings().forVisit(v.id())) {
                readings.add(r);
                for (Instrument i : ledger.instruments().usedOn(r.id())) {
                    uses.add(new BundleContent.InstrumentUse(r.id(), i.id()));
                }
                snapshots.addAll(ledger.snapshots().forSubject(SnapshotSubject.READING_SET, r.id()));
            }
            for (ImportedLog l : ledger.logs().forVisit(v.id())) {
                logs.add(l);
                snapshots.addAll(ledger.snapshots().forSubject(SnapshotSubject.LOG, l.id()));
            }
        }
        List<BundleContent.VisitHouse> house = new ArrayList<>();
        for (Visit v : visits) {
            app.latentledger.core.house.HouseVisitReadings h = ledger.houses().readings(v.id());
            if (!h.equals(app.latentledger.core.house.HouseVisitReadings.EMPTY)) {
                house.add(new BundleContent.VisitHouse(v.id(), h));
            }
        }
        return new BundleContent(scope, site, systems, visits, readings, logs, snapshots, instruments, uses, paperwork,
                deletions, ledger.houses().facts(site.id()).orElse(null), house);
    }

    public static void exportVisit(Ledger ledger, String visitId, Path file) throws IOException {
        exportVisit(ledger, visitId, file, false);
    }

    /** Writes a visit bundle; deletions travel only when {@code withDeletions}. */
    public static void exportVisit(Ledger ledger, String visitId, Path file, boolean withDeletions) throws IOException {
        BundleWriter.write(ofVisit(ledger, visitId, withDeletions), visitId, file);
    }

    public static void exportSite(Ledger ledger, String siteId, Path file) throws IOException {
        exportSite(ledger, siteId, file, false);
    }

    /** Writes a site bundle; deletions travel only when {@code withDeletions}. */
    public static void exportSite(Ledger ledger, String siteId, Path file, boolean withDeletions) throws IOException {
        BundleWriter.write(ofSite(ledger, siteId, withDeletions), siteId, file);
    }

    /**
     * What an import did (or, from {@link #preview}, would do).
     *
     * @param added          records not in the ledger before
     * @param alreadyPresent records already there with the same content
     * @param visitIds       the bundle's visits
     * @param deleted        records the bundle's deletions moved to this ledger's recycle bin
     * @param conflicts      for a preview: records whose copy here differs (an import would be refused)
     * @param addedByKind    added records by kind ("site", "system", "visit", "reading set", "log",
     *                       "snapshot", "instrument", "paperwork", "instrument choice", "house",
     *                       "house readings")
     */
    public record ImportSummary(int added, int alreadyPresent, List<String> visitIds, int deleted,
                                List<String> conflicts, java.util.Map<String, Integer> addedByKind) {
        public ImportSummary(int added, int alreadyPresent, List<String> visitIds) {
            this(added, alreadyPresent, visitIds, 0, List.of(), java.util.Map.of());
        }

        private static final List<String> ORDER = List.of("site", "system", "visit", "reading set", "log",
                "instrument", "instrument choice", "paperwork", "house", "house readings", "snapshot");

        /**
         * What the import adds, leaves and deletes in words a tech reads before confirming, e.g.
         * "Adds 1 site, 1 system, 1 visit, 2 reading sets. 0 already here. Moves 1 record to the recycle bin."
         */
        public String plainWords() {
            List<String> parts = new ArrayList<>();
            for (String kind : ORDER) {
                int n = addedByKind.getOrDefault(kind, 0);
                if (n > 0) {
                    String noun = switch (kind) {
                        case "paperwork" -> "visit's paperwork";
                        case "house" -> "house's facts";
                        case "house readings" -> "visit's house readings";
                        default -> kind;
                    };
                    boolean noPlural = n == 1 || kind.equals("paperwork") || kind.startsWith("house");
                    parts.add(n + " " + noun + (noPlural ? "" : "s"));
                }
            }
            StringBuilder b = new StringBuilder(parts.isEmpty() ? "Adds nothing new." : "Adds " + String.join(", ", parts) + ".");
            b.append(' ').append(alreadyPresent).append(alreadyPresent == 1 ? " record is" : " records are")
                    .append(" already here and stay as they are.");
            if (deleted > 0) {
                b.append(" Moves ").append(deleted).append(deleted == 1 ? " record" : " records")
                        .append(" to the recycle bin, as deleted where the bundle was made.");
            }
            if (!conflicts.isEmpty()) {
                b.append(" Cannot be imported: ").append(String.join("; ", conflicts))
                        .append(" from the copy already here.");
            }
            return b.toString();
        }
    }

    /**
     * Reads and checks a bundle and says what importing it would add, leave and delete, changing
     * nothing: what a screen shows before the tech confirms.
     */
    public static ImportSummary preview(Ledger ledger, Path file) throws BundleException {
        BundleContent content = BundleReader.read(file);
        Tally tally = new Tally(false);
        List<String> conflicts = new ArrayList<>();
        ledger.database().read(c -> {
            compare(ledger, content, tally, conflicts);
            return null;
        });
        return tally.summary(content, conflicts);
    }

    /**
     * Reads, checks and imports a bundle in one transaction. A record already in the ledger with
     * exactly the same content is left as is; one with the same id but other content refuses the
     * whole import, because either copy may be the one the tech trusts.
     */
    public static ImportSummary importBundle(Ledger ledger, Path file) throws BundleException {
        BundleContent content = BundleReader.read(file);
        Tally tally = new Tally(true);
        try {
            ledger.inTransaction(() -> {
                List<String> conflicts = new ArrayList<>();
                compare(ledger, content, tally, conflicts);
                if (!conflicts.isEmpty()) {
                    // thrown inside the transaction: everything above is rolled back
                    throw new ImportConflict(conflicts);
                }
            });
        } catch (ImportConflict e) {
            throw new BundleException("bundle refused: " + String.join("; ", e.conflicts)
                    + " from the copy already in this ledger (same id, other content); nothing was imported");
        }
        return tally.summary(content, List.of());
    }

    /** Counts, and saves when {@code save} is set. */
    private static final class Tally {
        final boolean save;
        int added;
        int present;
        int deleted;
        final java.util.Map<String, Integer> byKind = new java.util.LinkedHashMap<>();

        Tally(boolean save) {
            this.save = save;
        }

        ImportSummary summary(BundleContent content, List<String> conflicts) {
            List<String> visitIds = new ArrayList<>();
            content.visits().forEach(v -> visitIds.add(v.id()));
            return new ImportSummary(added, present, visitIds, deleted, List.copyOf(conflicts), java.util.Map.copyOf(byKind));
        }
    }

    private static void compare(Ledger ledger, BundleContent content, Tally t, List<String> conflicts) {
        put(ledger.sites().find(content.site().id()), content.site(), "site", content.site().id(), t, conflicts,
                () -> ledger.sites().save(content.site()));
        for (HvacSystem s : content.systems()) {
            put(ledger.systems().find(s.id()), s, "system", s.id(), t, conflicts, () -> ledger.systems().save(s));
        }
        for (Visit v : content.visits()) {
            put(ledger.visits().find(v.id()), v, "visit", v.id(), t, conflicts, () -> ledger.visits().save(v));
        }
        for (ReadingSet r : content.readings()) {
            put(ledger.readings().find(r.id()), r, "reading set", r.id(), t, conflicts, () -> ledger.readings().save(r));
        }
        for (ImportedLog l : content.logs()) {
            put(ledger.logs().find(l.id()), l, "log", l.id(), t, conflicts, () -> ledger.logs().save(l));
        }
        for (ResultsSnapshot s : content.snapshots()) {
            put(ledger.snapshots().find(s.id()), s, "snapshot", s.id(), t, conflicts, () -> ledger.snapshots().save(s));
        }
        for (Instrument i : content.instruments()) {
            put(ledger.instruments().find(i.id()), i, "instrument", i.id(), t, conflicts, () -> ledger.instruments().save(i));
        }
        java.util.Map<String, java.util.TreeSet<String>> uses = new java.util.LinkedHashMap<>();
        for (BundleContent.InstrumentUse u : content.instrumentUses()) {
            uses.computeIfAbsent(u.readingSetId(), k -> new java.util.TreeSet<>()).add(u.instrumentId());
        }
        for (var e : uses.entrySet()) {
            java.util.TreeSet<String> here = new java.util.TreeSet<>();
            ledger.instruments().usedOn(e.getKey()).forEach(i -> here.add(i.id()));
            put(here.isEmpty() ? Optional.empty() : Optional.of(here), e.getValue(), "instrument choice", e.getKey(), t,
                    conflicts, () -> ledger.instruments().useOn(e.getKey(), List.copyOf(e.getValue())));
        }
        for (VisitPaperwork w : content.paperwork()) {
            put(ledger.paperwork().find(w.visitId()), w, "paperwork", w.visitId(), t, conflicts,
                    () -> ledger.paperwork().save(w));
        }
        if (content.houseFacts() != null) {
            put(ledger.houses().facts(content.site().id()), content.houseFacts(), "house", content.site().id(), t,
                    conflicts, () -> ledger.houses().saveFacts(content.site().id(), content.houseFacts()));
        }
        for (BundleContent.VisitHouse h : content.houseReadings()) {
            app.latentledger.core.house.HouseVisitReadings here = ledger.houses().readings(h.visitId());
            put(here.equals(app.latentledger.core.house.HouseVisitReadings.EMPTY) ? Optional.empty() : Optional.of(here),
                    h.readings(), "house readings", h.visitId(), t, conflicts,
                    () -> ledger.houses().saveReadings(h.visitId(), h.readings()));
        }
        for (BinEntry d : content.deletions()) {
            if (live(ledger, d)) {
                if (t.save) {
                    ledger.recycleBin().delete(d.kind(), d.recordId(), d.deletedAt());
                }
                t.deleted++;
            }
        }
    }

    /** True when the deleted record is still live here (logs checked by id, without reading their samples). */
    private static boolean live(Ledger ledger, BinEntry d) {
        String id = d.recordId();
        return switch (d.kind()) {
            case SITE -> ledger.sites().find(id).isPresent();
            case SYSTEM -> ledger.systems().find(id).isPresent();
            case VISIT -> ledger.visits().find(id).isPresent();
            case READINGS -> ledger.readings().find(id).isPresent();
            case LOG -> ledger.logs().idsForVisit(d.visitId()).contains(id);
        };
    }

    private static <T> void put(Optional<T> existing, T incoming, String kind, String id, Tally t,
                                List<String> conflicts, Runnable save) {
        if (existing.isEmpty()) {
            if (t.save) {
                save.run();
            }
            t.added++;
            t.byKind.merge(kind, 1, Integer::sum);
        } else if (existing.get().equals(incoming)) {
            t.present++;
        } else {
            conflicts.add(kind + " " + id + " differs");
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
