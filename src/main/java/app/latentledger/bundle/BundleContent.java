package app.latentledger.bundle;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.ResultsSnapshot;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The records in one bundle. The constructor checks they hold together: one site, its systems,
 * visits at that site on those systems, and readings, logs and snapshots of those visits.
 */
public record BundleContent(BundleScope scope, Site site, List<HvacSystem> systems, List<Visit> visits,
                            List<ReadingSet> readings, List<ImportedLog> logs, List<ResultsSnapshot> snapshots) {
    public BundleContent {
        systems = List.copyOf(systems);
        visits = List.copyOf(visits);
        readings = List.copyOf(readings);
        logs = List.copyOf(logs);
        snapshots = List.copyOf(snapshots);
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
    }

    private static void need(boolean ok, String problem) throws BundleException {
        if (!ok) {
            throw new BundleException("bundle refused: " + problem + "; nothing was imported");
        }
    }
}
