package app.latentledger.cli;

import app.latentledger.core.records.Ids;
import app.latentledger.core.records.Site;
import app.latentledger.core.settings.Settings;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.Ledger;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/** {@code sites}: add a site, correct one, or list them with their ids. */
public final class SitesCommand implements Command {
    @Override
    public String name() {
        return "sites";
    }

    @Override
    public String summary() {
        return "record a site (add), correct one (edit) or list the sites with their ids";
    }

    @Override
    public String usage() {
        return "usage: latent-ledger [--data-dir DIR] sites add --name NAME [--address TEXT] [--elevation FT|M]\n"
                + "                                              [--notes TEXT] [--time-zone ZONE] [--units ip|si] [--json]\n"
                + "       latent-ledger [--data-dir DIR] sites edit SITE [--name NAME] [--address TEXT] [--elevation FT|M]\n"
                + "                                              [--notes TEXT] [--time-zone ZONE|none] [--units ip|si] [--json]\n"
                + "       latent-ledger [--data-dir DIR] sites list [--json]\n"
                + "  --elevation sets the standard-atmosphere pressure of every reading set at the site\n"
                + "  (default: the stored default elevation, 'settings show'); prints the new site's id\n"
                + "  --time-zone the site's zone, an IANA region id such as America/Chicago: a logger's clock times\n"
                + "  written without a UTC offset are read in it (default: none, this computer's zone is used)\n"
                + "  edit changes only the options given; SITE is a site id or its first characters\n";
    }

    @Override
    public int run(Args args, CliContext context) {
        List<String> words = args.positionals();
        String sub = words.isEmpty() ? "" : words.get(0);
        boolean json = args.flag("json");
        try (Ledger ledger = LedgerRecords.open(context)) {
            Settings settings = ledger.settings().load();
            UnitSystem units = UnitOptions.units(args, settings.units());
            switch (sub) {
                case "add": {
                    SiteOptions o = SiteOptions.read(args, units);
                    expect(words, 1);
                    if (o.name() == null) {
                        throw new UsageException("sites add needs --name NAME");
                    }
                    Site site = LedgerRecords.refusing(units, "--elevation", () -> {
                        Site s = new Site(Ids.newId(), o.name(), o.address(), o.elevation() == null
                                ? settings.defaultElevationM() : o.elevation(), o.notes(), o.zone());
                        ledger.sites().save(s);
                        return s;
                    });
                    Map<String, Object> m = LedgerRecords.made(site.id(), "site");
                    m.put("name", site.name());
                    m.put("timeZone", site.timeZone().isEmpty() ? null : site.timeZone());
                    context.out().print(json ? Json.print(m) + "\n" : "Added site " + site.name() + ": " + site.id()
                            + zoneWords(site) + "\n");
                    return Cli.OK;
                }
                case "edit": {
                    if (words.size() != 2) {
                        throw new UsageException("sites edit needs the SITE to correct (see: sites list)");
                    }
                    Site was = LedgerRecords.site(ledger, words.get(1));
                    SiteOptions o = SiteOptions.read(args, units);
                    Site site = LedgerRecords.refusing(units, "--elevation", () -> {
                        Site s = new Site(was.id(), o.name() == null ? was.name() : o.name(),
                                o.address() == null ? was.address() : o.address(),
                                o.elevation() == null ? was.elevationM() : o.elevation(),
                                o.notes() == null ? was.notes() : o.notes(),
                                o.zone() == null ? was.timeZone()
                                        : o.zone().strip().equalsIgnoreCase("none") ? "" : o.zone());
                        ledger.sites().save(s);
                        return s;
                    });
                    Map<String, Object> m = RecordsView.site(site, units);
                    context.out().print(json ? Json.print(m) + "\n" : "Saved site " + site.name() + ": " + site.id()
                            + zoneWords(site) + "\n");
                    return Cli.OK;
                }
                case "list": {
                    args.rejectUnknown();
                    expect(words, 1);
                    List<Map<String, Object>> rows = new ArrayList<>();
                    StringBuilder b = new StringBuilder();
                    for (Site s : ledger.sites().all()) {
                        rows.add(RecordsView.site(s, units));
                        b.append(String.format("%-36s  %-28s  %-20s  %s%n", s.id(), s.name(),
                                s.timeZone().isEmpty() ? "(no zone)" : s.timeZone(), s.address()));
                    }
                    context.out().print(json ? Json.print(rows) + "\n" : b.toString());
                    return Cli.OK;
                }
                default:
                    throw new UsageException("sites needs a subcommand: add, edit or list\n" + usage());
            }
        }
    }

    /** " (time zone America/Chicago)" for a site with a zone, else "". */
    private static String zoneWords(Site s) {
        return s.timeZone().isEmpty() ? "" : " (time zone " + s.timeZone() + ")";
    }

    private static void expect(List<String> words, int count) {
        if (words.size() != count) {
            throw new UsageException("unexpected words after the subcommand: " + words.subList(1, words.size()));
        }
    }

    /** The options {@code sites add} and {@code sites edit} both take; null where not given. */
    private record SiteOptions(String name, String address, Double elevation, String notes, String zone) {
        static SiteOptions read(Args args, UnitSystem units) {
            SiteOptions o = new SiteOptions(args.value("name"), args.value("address"),
                    UnitOptions.si(args, "elevation", Quantity.ELEVATION, units), args.value("notes"),
                    args.value("time-zone"));
            args.rejectUnknown();
            return o;
        }
    }
}
