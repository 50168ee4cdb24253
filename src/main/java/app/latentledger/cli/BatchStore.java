package app.latentledger.cli;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.store.Ledger;

import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * {@code batch --store}: each checked row saved as a visit with its reading set, through the same
 * repositories and record checks as {@code sites add}, {@code systems add}, {@code visits new} and
 * {@code readings add}, one transaction per row (a row either lands whole or not at all). A site
 * already in the ledger with the same name, address and elevation is reused, and so is a system of that site
 * with the same label and nameplate size, so a second batch over the same houses adds visits to the
 * same systems rather than new houses.
 */
final class BatchStore {
    private final Ledger ledger;
    private final Map<String, Site> sites = new HashMap<>();
    private final Map<String, HvacSystem> systems = new HashMap<>();

    BatchStore(Ledger ledger) {
        this.ledger = ledger;
        for (Site s : ledger.sites().all()) {
            sites.putIfAbsent(key(s), s);
            for (HvacSystem y : ledger.systems().forSite(s.id())) {
                systems.putIfAbsent(key(y), y);
            }
        }
    }

    /** What was saved for one row. */
    record Stored(Site site, HvacSystem system, Visit visit, ReadingSet set) {
    }

    Stored store(BatchCheck.Checked c) {
        Site site = sites.get(key(c.site()));
        boolean newSite = site == null;
        if (newSite) {
            site = c.site();
        }
        HvacSystem wanted = new HvacSystem(c.system().id(), site.id(), c.system().label(), c.system().type(),
                c.system().nominalCapacityW(), c.system().refrigerant(), c.system().blowerType(),
                c.system().fanSetting(), c.system().thermostatNotes(), c.system().meteringDevice(), c.system().filter());
        HvacSystem system = systems.get(key(wanted));
        boolean newSystem = system == null;
        if (newSystem) {
            system = wanted;
        }
        Visit v = c.visit();
        Visit visit = new Visit(v.id(), site.id(), system.id(), v.startedAt(), v.technician(), v.purpose(), v.notes());
        Site s = site;
        HvacSystem y = system;
        ledger.inTransaction(() -> {
            if (newSite) {
                ledger.sites().save(s);
            }
            if (newSystem) {
                ledger.systems().save(y);
            }
            ledger.visits().save(visit);
            ledger.readings().save(c.set());
        });
        sites.putIfAbsent(key(s), s);
        systems.putIfAbsent(key(y), y);
        return new Stored(s, y, visit, c.set());
    }

    private static String key(Site s) {
        // the elevation too: a stored set without a station pressure is worked out at its site's elevation
        return norm(s.name()) + "\u0000" + norm(s.address()) + "\u0000" + Math.round(s.elevationM() * 10);
    }

    private static String key(HvacSystem y) {
        return y.siteId() + "\u0000" + norm(y.label()) + "\u0000" + Math.round(y.nominalCapacityW());
    }

    private static String norm(String s) {
        return String.join(" ", List.of(s.strip().toLowerCase(Locale.ROOT).split("\\s+")));
    }
}
