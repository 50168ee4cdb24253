package app.latentledger.bundle;

import app.latentledger.core.house.HouseFacts;
import app.latentledger.core.house.HouseVisitReadings;
import app.latentledger.core.records.BinEntry;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.RecordKind;
import app.latentledger.core.records.VisitPaperwork;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.ResultsSnapshot;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The records in one bundle. {@link #checkConsistent()} checks they hold together: one site, its
 * systems, visits at that site on those systems; readings, logs, snapshots, instruments and
 * paperwork of those visits; and, only when the exporting tech asked for them, the deletions of
 * records at the site that the receiving ledger should make too.
 *
 * @param instrumentUses which instruments took which reading set
 * @param deletions      records deleted at the site (in the exporter's recycle bin); empty unless asked
 * @param houseFacts     the site's house facts (floor area, people, blower door, ventilation), or null
 * @param houseReadings  the house readings (weather, return-leak trio, runtime) of the visits that have any
 */
public record BundleContent(BundleScope scope, Site site, List<HvacSystem> systems, List<Visit> visits,
                            List<ReadingSet> readings, List<ImportedLog> logs, List<ResultsSnapshot> snapshots,
                            List<Instrument> instruments, List<InstrumentUse> instrumentUses,
                            List<VisitPaperwork> paperwork, List<BinEntry> deletions,
                            HouseFacts houseFacts, List<VisitHouse> houseReadings) {
    /** One instrument chosen for one reading set. */
    public record InstrumentUse(String readingSetId, String instrumentId) {
    }

    /** The house readings kept with one visit. */
    public record VisitHouse(String visitId, HouseVisitReadings readings) {
    }

    public BundleContent {
        systems = List.copyOf(systems);
        visits = List.copyOf(visits);
        readings = List.copyOf(readings);
        logs = List.copyOf(logs);
        snapshots = List.copyOf(snapshots);
        instruments = List.copyOf(instruments);
        instrumentUses = List.copyOf(instrumentUses);
        paperwork = List.copyOf(paperwork);
        deletions = List.copyOf(deletions);
        houseReadings = List.copyOf(houseReadings);
    }

    /** Content as format version 2 had it: no house facts or readings. */
    public BundleContent(BundleScope scope, Site site, List<HvacSystem> systems, List<Visit> visits,
                         List<ReadingSet> readings, List<ImportedLog> logs, List<ResultsSnapshot> snapshots,
                         List<Instrument> instruments, List<InstrumentUse> instrumentUses,
                         List<VisitPaperwork> paperwork, List<BinEntry> deletions) {
        this(scope, site, systems, visits, readings, logs, snapshots, instruments, instrumentUses, paperwork, deletions,
                null, List.of());
    }

    /** Content as format version 1 had it: no instruments, paperwork or deletions. */
    public BundleContent(BundleScope scope, Site site, List<HvacSystem> systems, List<Visit> visits,
                         List<ReadingSet> readings, List<ImportedLog> logs, List<ResultsSnapshot> snapshots) {
        this(scope, site, systems, visits, readings, logs, snapshots, List.of(), List.of(), List.of(), List.of());
    }

    /** Refuses content whose records point outside the bundle. */
    void checkConsistent() throws BundleException {
        Set<String> systemIds = new HashSet<>();
        for (HvacSystem s : systems) {
            need(s.siteId().equals(site.id()), "system " + s.id() + " belongs to site " + s.siteId() + ", not " + site.id());
            need(systemIds.add(s.id()), "system " + s.id() + " appears twice");
        }
        Set<String> visitIds = new HashSet<>();
        for (Visit v : visits) {
            need(v.siteId().equals(site.id()), "visit " + v.id() + " is at site " + v.siteId() + ", not " + site.id());
            need(systemIds.contains(v.systemId()), "visit " + v.id() + " names system " + v.systemId() + ", not in the bundle");
            need(visitIds.add(v.id()), "visit " + v.id() + " appears twice");
        }
        Set<String> readingIds = new HashSet<>();
        for (ReadingSet r : readings) {
            need(visitIds.contains(r.visitId()), "reading set " + r.id() + " names visit " + r.visitId() + ", not in the bundle");
            need(readingIds.add(r.id()), "reading set " + r.id() + " appears twice");
        }
        Set<String> logIds = new HashSet<>();
        for (ImportedLog l : logs) {
            need(visitIds.contains(l.visitId()), "log " + l.id() + " names visit " + l.visitId() + ", not in the bundle");
            need(logIds.add(l.id()), "log " + l.id() + " appears twice");
        }
        Set<String> snapshotIds = new HashSet<>();
        for (ResultsSnapshot s : snapshots) {
            Set<String> subjects = switch (s.subject()) {
                case READING_SET -> readingIds;
                case LOG -> logIds;
            };
            need(subjects.contains(s.subjectId()), "snapshot " + s.id() + " names " + s.subject().key() + " "
                    + s.subjectId() + ", not in the bundle");
            need(snapshotIds.add(s.id()), "snapshot " + s.id() + " appears twice");
        }
        java.util.Map<String, String> instrumentVisit = new java.util.HashMap<>();
        for (Instrument i : instruments) {
            need(visitIds.contains(i.visitId()), "instrument " + i.id() + " names visit " + i.visitId() + ", not in the bundle");
            need(instrumentVisit.put(i.id(), i.visitId()) == null, "instrument " + i.id() + " appears twice");
        }
        java.util.Map<String, String> readingVisit = new java.util.HashMap<>();
        readings.forEach(r -> readingVisit.put(r.id(), r.visitId()));
        Set<InstrumentUse> uses = new HashSet<>();
        for (InstrumentUse u : instrumentUses) {
            need(readingVisit.containsKey(u.readingSetId()), "instrument " + u.instrumentId() + " is used on reading set "
                    + u.readingSetId() + ", not in the bundle");
            need(u.instrumentId() != null && readingVisit.get(u.readingSetId()).equals(instrumentVisit.get(u.instrumentId())),
                    "instrument " + u.instrumentId() + " is not one of reading set " + u.readingSetId() + "'s visit");
            need(uses.add(u), "instrument " + u.instrumentId() + " is listed twice on reading set " + u.readingSetId());
        }
        Set<String> paperworkVisits = new HashSet<>();
        for (VisitPaperwork w : paperwork) {
            need(visitIds.contains(w.visitId()), "paperwork names visit " + w.visitId() + ", not in the bundle");
            need(paperworkVisits.add(w.visitId()), "paperwork of visit " + w.visitId() + " appears twice");
        }
        Set<String> houseVisits = new HashSet<>();
        for (VisitHouse h : houseReadings) {
            need(visitIds.contains(h.visitId()), "house readings name visit " + h.visitId() + ", not in the bundle");
            need(houseVisits.add(h.visitId()), "house readings of visit " + h.visitId() + " appear twice");
        }
        for (BinEntry d : deletions) {
            need(d.siteId().equals(site.id()) && d.kind() != RecordKind.SITE, "deletion of " + d.kind().key() + " "
                    + d.recordId() + " is not of a record at site " + site.id());
            need(!(d.kind() == RecordKind.VISIT && visitIds.contains(d.recordId()))
                    && !(d.kind() == RecordKind.READINGS && readingIds.contains(d.recordId()))
                    && !(d.kind() == RecordKind.LOG && logIds.contains(d.recordId()))
                    && !(d.kind() == RecordKind.SYSTEM && systemIds.contains(d.recordId())),
                    d.kind().key() + " " + d.recordId() + " is both in the bundle and deleted");
        }
    }

    private static void need(boolean ok, String problem) throws BundleException {
        if (!ok) {
            throw new BundleException("bundle refused: " + problem + "; nothing was imported");
        }
    }
}
