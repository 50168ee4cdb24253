package app.latentledger.cli;

import app.latentledger.core.records.Timestamps;
import app.latentledger.bundle.BundleException;
import app.latentledger.bundle.Bundles;
import app.latentledger.core.findings.Cautions;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.SnapshotSubject;
import app.latentledger.core.records.Visit;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.DataLocation;
import app.latentledger.store.Ledger;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * {@code visits}: the field records on this tablet — list, show, export to a bundle, import a
 * bundle. The ledger is opened at {@link DataLocation} and gets the demo scenario when new.
 */
public final class VisitsCommand implements Command {
    @Override
    public String name() {
        return "visits";
    }

    @Override
    public String summary() {
        return "stored visits: list, show, export and import bundles";
    }

    @Override
    public String usage() {
        return "usage: latent-ledger [--data-dir DIR] visits list [--json]\n"
                + "       latent-ledger [--data-dir DIR] visits show ID [--units ip|si] [--json]\n"
                + "       latent-ledger [--data-dir DIR] visits export ID FILE [--with-deletions] [--json]\n"
                + "       latent-ledger [--data-dir DIR] visits export-site SITE_ID FILE [--with-deletions] [--json]\n"
                + "       latent-ledger [--data-dir DIR] visits import FILE [--dry-run] [--json]\n"
                + "       latent-ledger [--data-dir DIR] visits check [--repair] [--remove] [--json]\n"
                + VisitRecords.usage()
                + "  ID: a visit id or its first characters (at least 4) as 'visits list' shows them\n"
                + "  export writes one visit with its site, system, readings, logs and snapshots;\n"
                + "  export-site writes a site with all its systems and visits (SITE_ID as in 'visits list --json')\n"
                + "  --with-deletions: also carry what was deleted there (still in the recycle bin), so the importing\n"
                + "  ledger moves the same records to its own bin\n"
                + "  import checks the whole bundle first and changes nothing when it refuses it; --dry-run only says\n"
                + "  what it would add, leave and delete\n"
                + "  check lists stored reading sets and logs that fail today's checks; --repair makes failing\n"
                + "      optional values missing; --remove moves a record that cannot be repaired so to the recycle bin\n"
                + "  data folder: --data-dir, else $" + DataLocation.ENV + ", else the app's private storage\n";
    }

    @Override
    public int run(Args args, CliContext context) throws IOException {
        List<String> words = args.positionals();
        if (words.isEmpty()) {
            throw new UsageException("visits needs a subcommand: list, show, export, export-site, import, check, "
                    + String.join(", ", VisitRecords.SUBCOMMANDS) + "\n" + usage());
        }
        String sub = words.get(0);
        if (VisitRecords.SUBCOMMANDS.contains(sub)) {
            return VisitRecords.run(sub, args, context);
        }
        boolean json = args.flag("json");
        boolean withDeletions = args.flag("with-deletions");
        boolean dryRun = args.flag("dry-run");
        UnitSystem units = sub.equals("show") ? UnitOptions.units(args) : UnitSystem.IP;
        boolean repair = sub.equals("check") && args.flag("repair");
        boolean remove = sub.equals("check") && args.flag("remove");
        args.rejectUnknown();
        switch (sub) {
            case "list":
                expect(words, 1, "visits list");
                break;
            case "show":
                expect(words, 2, "visits show ID");
                break;
            case "export":
                expect(words, 3, "visits export ID FILE");
                break;
            case "export-site":
                expect(words, 3, "visits export-site SITE_ID FILE");
                break;
            case "import":
                expect(words, 2, "visits import FILE");
                break;
            case "check":
                expect(words, 1, "visits check [--repair] [--remove]");
                break;
            default:
                throw new UsageException("unknown visits subcommand '" + sub + "'\n" + usage());
        }
        DataLocation location = DataLocation.resolve(context.dataDir());
        try (Ledger ledger = Ledger.open(location.folder(), Ledger.FirstRun.SEED_DEMO)) {
            Object result;
            String text;
            switch (sub) {
                case "list": {
                    List<Map<String, Object>> rows = list(ledger);
                    result = rows;
                    text = listTable(rows, location);
                    break;
                }
                case "show": {
                    Visit v = Visits.find(ledger, words.get(1));
                    result = showJson(ledger, v, units);
                    text = showTable(ledger, v, units);
                    break;
                }
                case "export": {
                    Visit v = Visits.find(ledger, words.get(1));
                    Path file = exportTarget(words.get(2));
                    try {
                        Bundles.exportVisit(ledger, v.id(), file, withDeletions);
                    } catch (IOException e) {
                        throw new UsageException("cannot write " + file + ": " + e.getMessage());
                    }
                    result = exported(file, "visit", v.id());
                    text = "Exported visit " + v.id() + " to " + file + " (" + Files.size(file) + " bytes)\n";
                    break;
                }
                case "export-site": {
                    String siteId = words.get(1);
                    Site site = ledger.sites().find(siteId).orElseThrow(() ->
                            new UsageException("no site with id '" + siteId + "' (see: visits list --json, field siteId)"));
                    Path file = exportTarget(words.get(2));
                    try {
                        Bundles.exportSite(ledger, site.id(), file, withDeletions);
                    } catch (IOException e) {
                        throw new UsageException("cannot write " + file + ": " + e.getMessage());
                    }
                    result = exported(file, "site", site.id());
                    text = "Exported site " + site.name() + " (" + site.id() + ") to " + file + " ("
                            + Files.size(file) + " bytes)\n";
                    break;
                }
                case "check": {
                    List<VisitsCheck.Finding> found = VisitsCheck.run(ledger, repair, remove);
                    result = VisitsCheck.json(found);
                    text = VisitsCheck.table(found);
                    break;
                }
                default: {
                    Path file = Path.of(words.get(1));
                    Bundles.ImportSummary s;
                    try {
                        s = dryRun ? Bundles.preview(ledger, file) : Bundles.importBundle(ledger, file);
                    } catch (BundleException e) {
                        throw new UsageException(e.getMessage());
                    }
                    Map<String, Object> m = new LinkedHashMap<>();
                    m.put("file", file.toString());
                    m.put("added", s.added());
                    m.put("alreadyPresent", s.alreadyPresent());
                    m.put("visits", s.visitIds());
                    m.put("deleted", s.deleted());
                    m.put("addedByKind", s.addedByKind());
                    if (dryRun) {
                        m.put("conflicts", s.conflicts());
                    }
                    result = m;
                    text = (dryRun ? "Would import " : "Imported ") + file + ": " + s.added() + " records "
                            + (dryRun ? "to add" : "added") + " " + s.addedByKind() + ", " + s.alreadyPresent()
                            + " already present" + (s.deleted() > 0 ? ", " + s.deleted() + (dryRun ? " to delete" : " deleted")
                            + " (into the recycle bin)" : "") + "; visits " + String.join(", ", s.visitIds()) + "\n"
                            + (s.conflicts().isEmpty() ? "" : "Refused as it stands: " + String.join("; ", s.conflicts()) + "\n");
                }
            }
            context.out().print(json ? Json.print(result) + "\n" : text);
        }
        return Cli.OK;
    }

    private static void expect(List<String> words, int count, String form) {
        if (words.size() != count) {
            throw new UsageException("usage: latent-ledger visits " + form.substring("visits ".length())
                    + " (got " + (words.size() - 1) + " argument" + (words.size() == 2 ? "" : "s") + ")");
        }
    }

    private static List<Map<String, Object>> list(Ledger ledger) {
        List<Map<String, Object>> rows = new ArrayList<>();
        for (Visit v : ledger.visits().all()) {
            Site site = ledger.sites().find(v.siteId()).orElseThrow();
            HvacSystem system = ledger.systems().find(v.systemId()).orElseThrow();
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("id", v.id());
            m.put("site", site.name());
            m.put("siteId", site.id());
            m.put("system", system.label());
            m.put("systemId", system.id());
            m.put("date", Timestamps.text(v.startedAt()));
            m.put("purpose", v.purpose().key());
            m.put("technician", v.technician());
            m.put("readingSets", ledger.readings().forVisit(v.id()).size());
            m.put("logs", ledger.logs().idsForVisit(v.id()).size());
            m.put("latestVerdict", latestVerdict(ledger, v, site, system));
            rows.add(m);
        }
        return rows;
    }

    /**
     * The verdict of the visit's latest reading set, worked out as the app shows it
     * ({@link app.latentledger.core.visit.ReadingSetCheck}); "incomplete" when it lacks what the coil
     * check needs, "" when the visit has no reading set.
     */
    private static String latestVerdict(Ledger ledger, Visit v, Site site, HvacSystem system) {
        List<ReadingSet> sets = ledger.readings().forVisit(v.id());
        if (sets.isEmpty()) {
            return "";
        }
        ReadingSet latest = sets.get(sets.size() - 1);
        if (!app.latentledger.core.visit.ReadingSetCheck.missing(latest).isEmpty()) {
            return "incomplete";
        }
        var settings = ledger.settings().load();
        return app.latentledger.core.visit.ReadingSetCheck.run(latest, system, site, settings.thresholds(),
                settings.units()).verdict().key();
    }

    private static String listTable(List<Map<String, Object>> rows, DataLocation location) {
        StringBuilder b = new StringBuilder();
        b.append(String.format("%-8s  %-22s  %-13s  %-28s  %-24s  %-8s  %s%n", "id", "date", "purpose", "site", "system",
                "readings", "latest verdict"));
        for (Map<String, Object> r : rows) {
            b.append(String.format("%-8s  %-22s  %-13s  %-28s  %-24s  %-8s  %s%n", Visits.shortId((String) r.get("id")),
                    Visits.when(java.time.OffsetDateTime.parse((String) r.get("date"))), r.get("purpose"),
                    clip((String) r.get("site"), 28), clip((String) r.get("system"), 24), r.get("readingSets"),
                    r.get("latestVerdict")));
        }
        b.append(rows.size()).append(rows.size() == 1 ? " visit" : " visits").append(" in ").append(location).append('\n');
        return b.toString();
    }

    private static String clip(String s, int width) {
        return s.length() <= width ? s : s.substring(0, width - 1) + "…";
    }

    private static Map<String, Object> showJson(Ledger ledger, Visit v, UnitSystem units) {
        Site site = ledger.sites().find(v.siteId()).orElseThrow();
        HvacSystem system = ledger.systems().find(v.systemId()).orElseThrow();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("units", units.key());
        m.put("id", v.id());
        m.put("date", Timestamps.text(v.startedAt()));
        m.put("purpose", v.purpose().key());
        m.put("technician", v.technician());
        m.put("notes", v.notes());
        m.put("site", RecordsView.site(site, units));
        m.put("system", RecordsView.system(system, units));
        List<Object> readings = new ArrayList<>();
        for (ReadingSet r : ledger.readings().forVisit(v.id())) {
            Map<String, Object> rm = RecordsView.readingSet(r, units);
            rm.put("snapshots", ledger.snapshots().forSubject(SnapshotSubject.READING_SET, r.id()).size());
            readings.add(rm);
        }
        m.put("readingSets", readings);
        List<Object> logs = new ArrayList<>();
        for (ImportedLog l : ledger.logs().forVisit(v.id())) {
            Map<String, Object> lm = new LinkedHashMap<>();
            lm.put("id", l.id());
            lm.put("sourceFileName", l.sourceFileName());
            lm.put("importedAt", Timestamps.text(l.importedAt()));
            lm.put("samples", l.samples().size());
            lm.put("channels", l.samples().channelNames());
            logs.add(lm);
        }
        m.put("logs", logs);
        var w = ledger.paperwork().forVisit(v.id());
        Map<String, Object> pm = new LinkedHashMap<>();
        pm.put("customerWords", w.customerWords());
        pm.put("workDone", w.workDone());
        pm.put("technicianSignOff", w.technician() == null ? null : w.technician().name());
        pm.put("customerSignOff", w.customer() == null ? null : w.customer().name());
        m.put("paperwork", pm);
        List<Object> instruments = new ArrayList<>();
        ledger.instruments().forVisit(v.id()).forEach(i -> instruments.add(VisitRecords.instrumentJson(i, units)));
        m.put("instruments", instruments);
        m.put("safety", Cautions.SAFETY_LINE);
        return m;
    }

    private static String showTable(Ledger ledger, Visit v, UnitSystem units) {
        Site site = ledger.sites().find(v.siteId()).orElseThrow();
        HvacSystem system = ledger.systems().find(v.systemId()).orElseThrow();
        StringBuilder b = new StringBuilder(RecordsView.visitHeader(v, site, system, units));
        List<ReadingSet> readings = ledger.readings().forVisit(v.id());
        if (readings.isEmpty()) {
            b.append("  no reading sets\n");
        }
        for (ReadingSet r : readings) {
            b.append(RecordsView.readingSetTable(r, system, units));
        }
        for (ImportedLog l : ledger.logs().forVisit(v.id())) {
            b.append(String.format("  log %s  %s: %d samples, %s%n", Visits.shortId(l.id()), l.sourceFileName(),
                    l.samples().size(), String.join(", ", l.samples().channelNames())));
        }
        for (var i : ledger.instruments().forVisit(v.id())) {
            b.append("  instrument ").append(i.describe()).append(VisitRecords.accuracyText(i.accuracy(), units)).append('\n');
        }
        var w = ledger.paperwork().forVisit(v.id());
        if (!w.customerWords().isEmpty()) {
            b.append("  customer's words: ").append(w.customerWords()).append('\n');
        }
        if (!w.workDone().isEmpty()) {
            b.append("  work done: ").append(w.workDone()).append('\n');
        }
        if (w.technician() != null) {
            b.append("  signed by the technician: ").append(w.technician().name()).append(", ")
                    .append(Visits.when(w.technician().signedAt())).append('\n');
        }
        if (w.customer() != null) {
            b.append("  signed by the customer: ").append(w.customer().name()).append(", ")
                    .append(Visits.when(w.customer().signedAt())).append('\n');
        }
        return b.append(Cautions.SAFETY_LINE).append('\n').toString();
    }

    /**
     * Where an export may go: a file name (not a folder) in a folder that exists or whose parent
     * does (one new folder is made; a mistyped path never makes a whole tree).
     */
    private static Path exportTarget(String word) {
        if (word.isBlank()) {
            throw new UsageException("the bundle file name is empty; give a file such as visit.zip");
        }
        Path file;
        try {
            file = Path.of(word);
        } catch (java.nio.file.InvalidPathException e) {
            throw new UsageException("'" + word + "' is not a usable file name: " + e.getReason());
        }
        Path absolute = file.toAbsolutePath().normalize();
        Path folder = absolute.getParent();
        if (folder == null || Files.isDirectory(absolute)) {
            throw new UsageException("cannot write " + word + ": it is a folder; give a file name such as visit.zip");
        }
        if (Files.exists(folder) && !Files.isDirectory(folder)) {
            throw new UsageException("cannot write " + word + ": " + folder + " is a file, not a folder");
        }
        Path above = folder.getParent();
        if (!Files.isDirectory(folder) && (above == null || !Files.isDirectory(above))) {
            // one new folder is made for the bundle, never a whole tree from a mistyped path
            throw new UsageException("cannot write " + word + ": folder " + above + " does not exist");
        }
        if (Files.isDirectory(folder) && !Files.isWritable(folder)) {
            throw new UsageException("cannot write " + word + ": no permission to create files in " + folder);
        }
        return file;
    }

    private static Map<String, Object> exported(Path file, String scope, String id) throws IOException {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("file", file.toString());
        m.put("scope", scope);
        m.put("id", id);
        m.put("bytes", Files.size(file));
        return m;
    }
}
