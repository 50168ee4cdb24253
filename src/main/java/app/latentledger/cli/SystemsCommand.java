package app.latentledger.cli;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Ids;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.SystemType;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.Ledger;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/** {@code systems}: add a system at a site with its details, or list a site's systems. */
public final class SystemsCommand implements Command {
    @Override
    public String name() {
        return "systems";
    }

    @Override
    public String summary() {
        return "record a system at a site with its details (add) or list a site's systems";
    }

    @Override
    public String usage() {
        return "usage: latent-ledger [--data-dir DIR] systems add SITE --label TEXT (--nominal-tons TONS | --nominal-kw KW)\n"
                + "           [--stages single-stage|two-stage|variable-capacity] [--refrigerant TEXT]\n"
                + "           [--metering-device TEXT] [--blower-type TEXT] [--blower-setting TEXT] [--filter TEXT]\n"
                + "           [--thermostat-notes TEXT] [--json]\n"
                + "       latent-ledger [--data-dir DIR] systems list SITE [--json]\n"
                + "  SITE: a site id or its first characters (see: sites list); --stages defaults to single-stage\n"
                + "  e.g. --metering-device TXV --blower-type \"ECM constant torque\" --blower-setting \"tap 3, fan auto\"\n"
                + "       --filter \"16x25x1 pleated, dirty\"; prints the new system's id\n";
    }

    @Override
    public int run(Args args, CliContext context) {
        List<String> words = args.positionals();
        String sub = words.isEmpty() ? "" : words.get(0);
        boolean json = args.flag("json");
        try (Ledger ledger = LedgerRecords.open(context)) {
            UnitSystem units = UnitOptions.units(args, ledger.settings().load().units());
            if (words.size() != 2 || !(sub.equals("add") || sub.equals("list"))) {
                throw new UsageException("give: systems add SITE … or systems list SITE\n" + usage());
            }
            Site site = LedgerRecords.site(ledger, words.get(1));
            if (sub.equals("list")) {
                args.rejectUnknown();
                List<Map<String, Object>> rows = new ArrayList<>();
                StringBuilder b = new StringBuilder();
                for (HvacSystem s : ledger.systems().forSite(site.id())) {
                    rows.add(RecordsView.system(s, units));
                    b.append(String.format("%-36s  %-24s  %s, %s %s%n", s.id(), s.label(), s.type().key(),
                            Format.fixed(Quantity.POWER_LARGE.toDisplay(units, s.nominalCapacityW()), 1),
                            Quantity.POWER_LARGE.symbol(units)));
                }
                context.out().print(json ? Json.print(rows) + "\n" : b.toString());
                return Cli.OK;
            }
            String label = args.value("label");
            Double tons = args.number("nominal-tons");
            Double kw = args.number("nominal-kw");
            String stages = args.value("stages");
            String refrigerant = args.value("refrigerant");
            String metering = args.value("metering-device");
            String blowerType = args.value("blower-type");
            String blowerSetting = args.value("blower-setting");
            String filter = args.value("filter");
            String thermostat = args.value("thermostat-notes");
            args.rejectUnknown();
            if (label == null) {
                throw new UsageException("systems add needs --label TEXT (how the tech tells it apart, e.g. \"Upstairs\")");
            }
            if ((tons == null) == (kw == null)) {
                throw new UsageException("systems add needs one of --nominal-tons TONS or --nominal-kw KW");
            }
            double watts = tons != null ? Quantity.POWER_LARGE.fromDisplay(UnitSystem.IP, tons)
                    : Quantity.POWER_LARGE.fromDisplay(UnitSystem.SI, kw);
            SystemType type;
            try {
                type = stages == null ? SystemType.SINGLE_STAGE : SystemType.parse("--stages", stages);
            } catch (InvalidRecordException e) {
                throw new UsageException(e.getMessage());
            }
            HvacSystem system = LedgerRecords.refusing(units, tons != null ? "--nominal-tons" : "--nominal-kw", () -> {
                HvacSystem s = new HvacSystem(Ids.newId(), site.id(), label, type, watts, refrigerant, blowerType,
                        blowerSetting, thermostat, metering, filter);
                ledger.systems().save(s);
                return s;
            });
            Map<String, Object> m = LedgerRecords.made(system.id(), "system");
            m.put("siteId", site.id());
            m.put("label", system.label());
            context.out().print(json ? Json.print(m) + "\n"
                    : "Added system " + system.label() + " at " + site.name() + ": " + system.id() + "\n");
            return Cli.OK;
        }
    }
}
