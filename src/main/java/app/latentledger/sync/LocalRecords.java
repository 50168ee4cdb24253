package app.latentledger.sync;

import app.latentledger.bundle.BundleObjects;
import app.latentledger.core.house.HouseFacts;
import app.latentledger.core.house.HouseVisitReadings;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.RecordKind;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.records.VisitPaperwork;
import app.latentledger.store.Ledger;
import app.latentledger.sync.wire.HouseRecord;
import app.latentledger.sync.wire.SyncKind;
import app.latentledger.sync.wire.WireCodec;
import app.latentledger.sync.wire.WireHash;
import app.latentledger.sync.wire.WireRecord;
import com.google.gson.JsonObject;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;

/** The ledger's records as the wire sees them, and pulled records put into the ledger. */
final class LocalRecords {
    private final Ledger ledger;

    LocalRecords(Ledger ledger) {
        this.ledger = ledger;
    }

    /** One local record with its body and hash; {@code log} is set for a log (its samples are uploaded). */
    record Local(SyncKind kind, String id, JsonObject body, String hash, ImportedLog log) {
        static Local of(SyncKind kind, String id, JsonObject body) {
            return new Local(kind, id, body, WireHash.of(body), null);
        }
    }

    /** Every live record, parents before children (by {@link SyncKind} order). */
    List<Local> all() {
        List<Local> out = new ArrayList<>();
        for (Site s : ledger.sites().all()) {
            out.add(Local.of(SyncKind.SITE, s.id(), WireCodec.body(s)));
            for (HvacSystem y : ledger.systems().forSite(s.id())) {
                out.add(Local.of(SyncKind.SYSTEM, y.id(), WireCodec.body(y)));
            }
            for (Visit v : ledger.visits().forSite(s.id())) {
                out.add(Local.of(SyncKind.VISIT, v.id(), WireCodec.body(v)));
                visitParts(v, out);
            }
        }
        out.sort(Comparator.comparingInt(l -> l.kind().ordinal()));
        return out;
    }

    private void visitParts(Visit v, List<Local> out) {
        List<ReadingSet> readings = ledger.readings().forVisit(v.id());
        for (ReadingSet r : readings) {
            out.add(Local.of(SyncKind.READINGS, r.id(), WireCodec.body(r)));
        }
        for (ImportedLog l : ledger.logs().forVisit(v.id())) {
            out.add(log(l));
        }
        for (Instrument i : ledger.instruments().forVisit(v.id())) {
            out.add(Local.of(SyncKind.INSTRUMENT, i.id(), WireCodec.body(i, usedOn(i, readings))));
        }
        ledger.paperwork().find(v.id()).ifPresent(w -> out.add(Local.of(SyncKind.PAPERWORK, v.id(), WireCodec.body(w))));
        house(v).ifPresent(out::add);
    }

    private static Local log(ImportedLog l) {
        JsonObject body = WireCodec.body(l);
        return new Local(SyncKind.LOG, l.id(), body, WireHash.of(body), l);
    }

    private List<String> usedOn(Instrument i, List<ReadingSet> readings) {
        List<String> used = new ArrayList<>();
        for (ReadingSet r : readings) {
            if (ledger.instruments().usedOn(r.id()).stream().anyMatch(u -> u.id().equals(i.id()))) {
                used.add(r.id());
            }
        }
        return used;
    }

    private Optional<Local> house(Visit v) {
        HouseRecord h = new HouseRecord(v.id(), v.siteId(), ledger.houses().facts(v.siteId()).orElse(null),
                ledger.houses().readings(v.id()));
        return h.isEmpty() ? Optional.empty() : Optional.of(Local.of(SyncKind.HOUSE, v.id(), WireCodec.body(h)));
    }

    /** One record as it is here now, or empty when it is not live here. */
    Optional<Local> find(SyncKind kind, String id) {
        return switch (kind) {
            case SITE -> ledger.sites().find(id).map(s -> Local.of(kind, id, WireCodec.body(s)));
            case SYSTEM -> ledger.systems().find(id).map(s -> Local.of(kind, id, WireCodec.body(s)));
            case VISIT -> ledger.visits().find(id).map(v -> Local.of(kind, id, WireCodec.body(v)));
            case READINGS -> ledger.readings().find(id).map(r -> Local.of(kind, id, WireCodec.body(r)));
            case LOG -> ledger.logs().find(id).map(LocalRecords::log);
            case INSTRUMENT -> ledger.instruments().find(id).map(i -> Local.of(kind, id,
                    WireCodec.body(i, usedOn(i, ledger.readings().forVisit(i.visitId())))));
            case PAPERWORK -> ledger.paperwork().find(id).map(w -> Local.of(kind, id, WireCodec.body(w)));
            case HOUSE -> ledger.visits().find(id).flatMap(this::house);
        };
    }

    /** Whether the record is in this ledger's recycle bin. */
    boolean inBin(SyncKind kind, String id) {
        RecordKind k = binKind(kind);
        return k != null && ledger.recycleBin().find(k, id).isPresent();
    }

    /** The recycle bin's kind for a synced kind; null for parts that are deleted only with their visit. */
    static RecordKind binKind(SyncKind kind) {
        return switch (kind) {
            case SITE -> RecordKind.SITE;
            case SYSTEM -> RecordKind.SYSTEM;
            case VISIT -> RecordKind.VISIT;
            case READINGS -> RecordKind.READINGS;
            case LOG -> RecordKind.LOG;
            case INSTRUMENT, PAPERWORK, HOUSE -> null;
        };
    }

    static SyncKind syncKind(RecordKind kind) {
        return switch (kind) {
            case SITE -> SyncKind.SITE;
            case SYSTEM -> SyncKind.SYSTEM;
            case VISIT -> SyncKind.VISIT;
            case READINGS -> SyncKind.READINGS;
            case LOG -> SyncKind.LOG;
        };
    }

    /**
     * Saves a pulled record through its repository (the same checks as entering it). A log needs
     * its samples' bytes.
     */
    void save(WireRecord r, byte[] samples) {
        JsonObject b = r.body();
        switch (r.kind()) {
            case SITE -> ledger.sites().save(WireCodec.site(b));
            case SYSTEM -> ledger.systems().save(WireCodec.system(b));
            case VISIT -> ledger.visits().save(WireCodec.visit(b));
            case READINGS -> ledger.readings().save(WireCodec.readingSet(b));
            case LOG -> ledger.logs().save(WireCodec.log(b, samples));
            case INSTRUMENT -> instrument(WireCodec.instrument(b));
            case PAPERWORK -> ledger.paperwork().save(WireCodec.paperwork(b));
            case HOUSE -> {
                HouseRecord h = WireCodec.house(b);
                HouseFacts facts = h.facts();
                if (facts != null) {
                    ledger.houses().saveFacts(h.siteId(), facts);
                }
                HouseVisitReadings readings = h.readings();
                ledger.houses().saveReadings(h.visitId(), readings);
            }
        }
    }

    /** The instrument, and its choice on exactly the reading sets it lists (each must be here). */
    private void instrument(BundleObjects.InstrumentObject o) {
        Instrument i = o.instrument();
        ledger.instruments().save(i);
        for (ReadingSet r : ledger.readings().forVisit(i.visitId())) {
            LinkedHashSet<String> ids = new LinkedHashSet<>();
            ledger.instruments().usedOn(r.id()).forEach(u -> ids.add(u.id()));
            boolean changed = o.usedOn().contains(r.id()) ? ids.add(i.id()) : ids.remove(i.id());
            if (changed) {
                ledger.instruments().useOn(r.id(), List.copyOf(ids));
            }
        }
    }

    /**
     * Moves a record to the recycle bin as deleted at the office.
     *
     * @return false when this kind is deleted only with its visit (nothing was done)
     */
    boolean delete(SyncKind kind, String id, java.time.OffsetDateTime at) {
        RecordKind k = binKind(kind);
        if (k == null) {
            return false;
        }
        ledger.recycleBin().delete(k, id, at);
        return true;
    }
}
