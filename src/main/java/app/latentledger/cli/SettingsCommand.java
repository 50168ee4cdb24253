package app.latentledger.cli;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.findings.Cautions;
import app.latentledger.core.settings.ChoiceSetting;
import app.latentledger.core.settings.NumberSetting;
import app.latentledger.core.settings.SettingGroup;
import app.latentledger.core.settings.Settings;
import app.latentledger.core.settings.SettingsCatalogue;
import app.latentledger.core.settings.ShownNumber;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.DataLocation;
import app.latentledger.store.Ledger;
import app.latentledger.store.StoredSettings;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * {@code settings}: show, set and reset the tech's settings in the ledger of the data folder.
 * Numbers are typed and shown in the stored units. {@code show} on a tablet with no ledger shows
 * the defaults without creating one; {@code set} and {@code reset} create it as the app does.
 */
public final class SettingsCommand implements Command {
    @Override
    public String name() {
        return "settings";
    }

    @Override
    public String summary() {
        return "units, default elevation, instrument tolerances, RH target, finding thresholds, theme, paper";
    }

    @Override
    public String usage() {
        return "usage: latent-ledger [--data-dir DIR] settings show [--json]\n"
                + "       latent-ledger [--data-dir DIR] settings set KEY VALUE\n"
                + "       latent-ledger [--data-dir DIR] settings reset [KEY]\n"
                + "  KEY as 'settings show' lists it, e.g. units, defaultElevation, tolDryBulb, indoorRhTarget,\n"
                + "      coilHighAirflowPerTon, theme, paper\n"
                + "  VALUE in the stored units (settings set units si|ip first to change them); % settings in %\n"
                + "  reset without KEY puts every setting back to its default\n"
                + "  data folder: --data-dir, else $" + DataLocation.ENV + ", else the app's private storage\n";
    }

    @Override
    public int run(Args args, CliContext context) {
        List<String> words = args.positionals();
        boolean json = args.flag("json");
        args.rejectUnknown();
        if (words.isEmpty()) {
            throw new UsageException("settings needs a subcommand: show, set or reset\n" + usage());
        }
        DataLocation location = DataLocation.resolve(context.dataDir());
        switch (words.get(0)) {
            case "show":
                expect(words.size() == 1, "settings show [--json]");
                Settings shown = StoredSettings.read(location);
                context.out().print(json ? Json.print(showJson(shown)) + "\n" : showTable(shown, location));
                return Cli.OK;
            case "set":
                expect(words.size() == 3, "settings set KEY VALUE");
                return change(location, context, json, s -> set(s, words.get(1), words.get(2)), words.get(1));
            case "reset":
                expect(words.size() <= 2, "settings reset [KEY]");
                String key = words.size() == 2 ? words.get(1) : null;
                return change(location, context, json, s -> key == null ? Settings.DEFAULTS : reset(s, key), key);
            default:
                throw new UsageException("unknown settings subcommand '" + words.get(0) + "'\n" + usage());
        }
    }

    private int change(DataLocation location, CliContext context, boolean json,
                       java.util.function.UnaryOperator<Settings> change, String key) {
        try (Ledger ledger = Ledger.open(location.folder())) {
            // the change is applied to what was loaded and saved against that version: a change
            // another program made meanwhile to another key is kept, to the same key refused
            var base = ledger.settings().loadStamped();
            Settings next = ledger.settings().save(base, change.apply(base.settings())).settings();
            if (json) {
                context.out().print(Json.print(key == null ? showJson(next) : row(next, key)) + "\n");
            } else if (key == null) {
                context.out().print("Every setting back to its default in " + location + "\n");
            } else {
                Map<String, Object> r = row(next, key);
                context.out().print(key + " = " + text(r.get("value")) + unitSuffix(r) + "  (default "
                        + defaultText(key, r, next.units()) + unitSuffix(r) + ")\n");
            }
        }
        return Cli.OK;
    }

    private static Settings set(Settings s, String key, String value) {
        if (SettingsCatalogue.choice(key).isPresent()) {
            try {
                return s.withChoice(key, value);
            } catch (IllegalArgumentException e) {
                throw new UsageException(key + ": " + e.getMessage());
            }
        }
        if (SettingsCatalogue.number(key).isEmpty()) {
            throw new UsageException(SettingsCatalogue.unknownKey(key).getMessage());
        }
        double shown = Args.parseNumber(key, value);
        try {
            return s.withTyped(key, shown, s.units());
        } catch (InvalidInputException e) {
            throw UnitOptions.refused(e, s.units(), key);
        }
    }

    private static Settings reset(Settings s, String key) {
        try {
            return s.reset(key);
        } catch (InvalidInputException e) {
            // the default of one of a pair may not fit the other's changed value (low vs high airflow)
            throw UnitOptions.refused(e, s.units(), key);
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
    }

    private static void expect(boolean ok, String form) {
        if (!ok) {
            throw new UsageException("usage: latent-ledger " + form);
        }
    }

    /** One setting as {@code show} gives it: value, unit, default, range and source in the stored units. */
    static Map<String, Object> row(Settings s, String key) {
        UnitSystem u = s.units();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("key", key);
        var choice = SettingsCatalogue.choice(key);
        if (choice.isPresent()) {
            ChoiceSetting c = choice.get();
            m.put("group", c.group().title());
            m.put("label", c.label());
            m.put("value", s.choice(key));
            m.put("unit", null);
            m.put("default", c.defaultValue());
            m.put("choices", c.choices());
            m.put("source", c.source());
        } else {
            NumberSetting n = SettingsCatalogue.number(key).orElseThrow();
            m.put("group", n.group().title());
            m.put("label", n.label());
            m.put("value", shown(n, u, s.numberSi(key)));
            m.put("unit", n.quantity().symbol(u));
            m.put("default", shown(n, u, n.defaultSi()));
            m.put("min", shown(n, u, n.minSi()));
            m.put("max", shown(n, u, n.maxSi()));
            m.put("source", n.source());
        }
        m.put("isDefault", s.isDefault(key));
        return m;
    }

    private static double shown(NumberSetting n, UnitSystem u, double si) {
        return Double.parseDouble(ShownNumber.text(n.quantity().toDisplay(u, si)));
    }

    private static Map<String, Object> showJson(Settings s) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("units", s.units().key());
        List<Object> rows = new ArrayList<>();
        for (String key : SettingsCatalogue.keys()) {
            rows.add(row(s, key));
        }
        m.put("settings", rows);
        return m;
    }

    private static String showTable(Settings s, DataLocation location) {
        StringBuilder b = new StringBuilder("Settings in " + location + " (values in " + s.units().key()
                + " units; * = changed from the default)\n");
        for (SettingGroup g : SettingGroup.values()) {
            b.append(g.title()).append('\n');
            for (String key : SettingsCatalogue.keys()) {
                Map<String, Object> r = row(s, key);
                if (!g.title().equals(r.get("group"))) {
                    continue;
                }
                // the table is read by a person: an untouched default at the shown decimals, as the app shows it
                String value = (Boolean.TRUE.equals(r.get("isDefault")) ? defaultText(key, r, s.units())
                        : text(r.get("value"))) + unitSuffix(r);
                // the range as the app's hint and a refusal print it, rounded inward to the shown precision
                String range = r.containsKey("choices") ? String.join(" | ", castList(r.get("choices")))
                        : numberRange(key, s.units()) + unitSuffix(r);
                b.append(String.format("  %s %-28s %14s   default %s; range %s%n", Boolean.TRUE.equals(r.get("isDefault"))
                        ? " " : "*", key, value, defaultText(key, r, s.units()) + unitSuffix(r), range));
                b.append("      ").append(r.get("label")).append(" — ").append(r.get("source")).append('\n');
            }
        }
        return b.append(Cautions.SAFETY_LINE).append('\n').toString();
    }

    /** A default as a person reads it: a number at its quantity's shown decimals (0.9, not 0.8598 Btu/lb). */
    private static String defaultText(String key, Map<String, Object> r, UnitSystem u) {
        return SettingsCatalogue.number(key).map(n -> ShownNumber.rounded(n.quantity(), u, n.defaultSi()))
                .orElseGet(() -> text(r.get("default")));
    }

    private static String numberRange(String key, UnitSystem u) {
        NumberSetting n = SettingsCatalogue.number(key).orElseThrow();
        return app.latentledger.core.InvalidInputException.range(n.quantity(), u, n.minSi(), n.maxSi());
    }

    @SuppressWarnings("unchecked")
    private static List<String> castList(Object o) {
        return (List<String>) o;
    }

    private static String text(Object v) {
        return v instanceof Double ? ShownNumber.text((Double) v) : String.valueOf(v);
    }

    private static String unitSuffix(Map<String, Object> r) {
        Object unit = r.get("unit");
        return unit == null || unit.toString().isEmpty() ? "" : " " + unit;
    }
}
