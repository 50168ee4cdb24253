package app.latentledger.cli;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Command-line options of one command: {@code --name value}, {@code --name=value}, bare
 * {@code --flag}s and positional words. Repeated options keep every value in order. Every option
 * a command does not read is reported, so a typo never passes silently.
 */
public final class Args {
    private final Map<String, List<String>> options = new LinkedHashMap<>();
    private final List<String> positionals = new ArrayList<>();
    private final Set<String> read;

    private Args() {
        read = new LinkedHashSet<>();
    }

    private Args(Set<String> sharedRead) {
        read = sharedRead;
    }

    /**
     * These options without the ones whose names start with any of {@code prefixes}, for a reader
     * that must not see them (e.g. {@code house} keeps its weather {@code --outdoor-*} away from the
     * coil options, where outdoor air means air mixed into the coil). Reading through the view counts
     * as reading here, so {@link #rejectUnknown()} stays exact.
     */
    Args without(String... prefixes) {
        Args view = new Args(read);
        for (Map.Entry<String, List<String>> e : options.entrySet()) {
            boolean hidden = false;
            for (String p : prefixes) {
                hidden |= e.getKey().startsWith(p);
            }
            if (!hidden) {
                view.options.put(e.getKey(), e.getValue());
            }
        }
        view.positionals.addAll(positionals);
        return view;
    }

    /**
     * @param words the words after the command name
     * @param flags option names that take no value (e.g. "json")
     */
    public static Args parse(List<String> words, Set<String> flags) {
        Args a = new Args();
        for (int i = 0; i < words.size(); i++) {
            String w = words.get(i);
            if (w.startsWith("--") && w.length() > 2) {
                String name = w.substring(2);
                String value;
                int eq = name.indexOf('=');
                if (eq >= 0) {
                    value = name.substring(eq + 1);
                    name = name.substring(0, eq);
                } else if (flags.contains(name)) {
                    value = "true";
                } else if (i + 1 < words.size()) {
                    value = words.get(++i);
                } else {
                    throw new UsageException("option --" + name + " needs a value");
                }
                a.options.computeIfAbsent(name, k -> new ArrayList<>()).add(value);
            } else {
                a.positionals.add(w);
            }
        }
        return a;
    }

    public boolean has(String name) {
        read.add(name);
        return options.containsKey(name);
    }

    public boolean flag(String name) {
        return has(name) && !"false".equalsIgnoreCase(last(name));
    }

    /** The option's value, or null when absent; refuses an option given twice. */
    public String value(String name) {
        read.add(name);
        List<String> v = options.get(name);
        if (v == null) {
            return null;
        }
        if (v.size() > 1) {
            throw new UsageException("option --" + name + " given " + v.size() + " times; give it once");
        }
        return v.get(0);
    }

    /** Every value of a repeatable option, in the order given. */
    public List<String> values(String name) {
        read.add(name);
        return Collections.unmodifiableList(options.getOrDefault(name, List.of()));
    }

    /**
     * A number typed by the tech. Accepts a decimal point or a decimal comma; refuses anything
     * else with a message naming the option.
     */
    public Double number(String name) {
        String v = value(name);
        if (v == null) {
            return null;
        }
        return parseNumber("--" + name, v);
    }

    private static final java.util.regex.Pattern DECIMAL =
            java.util.regex.Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

    /** Parses a plain decimal number (no hex, no NaN or Infinity), decimal comma allowed. */
    static double parseNumber(String field, String text) {
        String t = text.trim().replace(',', '.');
        if (!DECIMAL.matcher(t).matches()) {
            throw new UsageException(field + " value '" + text + "' is not a number");
        }
        return Double.parseDouble(t);
    }

    public List<String> positionals() {
        return Collections.unmodifiableList(positionals);
    }

    /** Fails on any option the command never looked at. Call after reading all options. */
    public void rejectUnknown() {
        for (String name : options.keySet()) {
            if (!read.contains(name)) {
                throw new UsageException("unknown option --" + name);
            }
        }
    }

    private String last(String name) {
        List<String> v = options.get(name);
        return v.get(v.size() - 1);
    }
}
