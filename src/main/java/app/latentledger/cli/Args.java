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
    /** Set by {@code --decimal-comma}: numbers in option values use a comma as the decimal mark. */
    private boolean decimalComma;

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
        view.decimalComma = decimalComma;
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
            if (w.startsWith("-") && !w.startsWith("--") && w.length() > 1 && !looksNumeric(w)) {
                // a single dash is a typo that would otherwise be taken as a stray word and ignored
                throw new UsageException("'" + w + "' is not an option: options start with two dashes;"
                        + " did you mean -" + w + "?");
            }
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
                if (name.equals(DECIMAL_COMMA)) {
                    a.decimalComma = parseFlag(name, value);
                    a.read.add(name);
                    continue;
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

    /** A flag: present, or given as {@code --name=true} / {@code --name=false}; any other value is refused. */
    public boolean flag(String name) {
        return has(name) && parseFlag(name, last(name));
    }

    private static boolean parseFlag(String name, String value) {
        if ("true".equalsIgnoreCase(value)) {
            return true;
        }
        if ("false".equalsIgnoreCase(value)) {
            return false;
        }
        throw new UsageException("option --" + name + " takes no value (or =true / =false), not '" + value + "'");
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

    /** The flag that makes a comma the decimal mark in option values. */
    static final String DECIMAL_COMMA = "decimal-comma";

    /**
     * A number typed by the tech, by the command line's one number rule (README, "Numbers on the
     * command line"): ASCII digits with an optional sign, one
     * decimal point and an exponent. A comma is refused with a hint, because "1,500" may mean one
     * and a half or fifteen hundred; with {@code --decimal-comma} the comma is the decimal mark
     * and a point is refused instead. No thousands separators either way.
     */
    public Double number(String name) {
        String v = value(name);
        if (v == null) {
            return null;
        }
        return parseNumber("--" + name, v, decimalComma);
    }

    /** Parses a plain decimal number with a decimal point (no comma, hex, NaN or Infinity). */
    static double parseNumber(String field, String text) {
        return parseNumber(field, text, false);
    }

    static double parseNumber(String field, String text, boolean decimalComma) {
        String t = text.trim();
        if (decimalComma) {
            if (t.indexOf('.') >= 0) {
                throw new UsageException(field + " value '" + text + "' has a point, but --decimal-comma makes the"
                        + " comma the decimal mark: write it as " + t.replace('.', ',') + " (no thousands separators)");
            }
            t = t.replace(',', '.');
        } else if (t.indexOf(',') >= 0) {
            throw new UsageException(field + " value '" + text + "' has a comma: write a decimal with a point ("
                    + t.replace(',', '.') + ") and no thousands separators (" + t.replace(",", "")
                    + "), or add --decimal-comma to type decimals with a comma");
        }
        if (!app.latentledger.core.units.TypedNumber.isPlainDecimal(t)) {
            throw new UsageException(field + " value '" + text + "' is not a number");
        }
        return Double.parseDouble(t);
    }

    private static boolean looksNumeric(String w) {
        return w.length() > 1 && (Character.isDigit(w.charAt(1)) || w.charAt(1) == '.');
    }

    /** Refuses stray words, for a command that takes none: a typo must not pass silently. */
    public void noPositionals() {
        if (!positionals.isEmpty()) {
            throw new UsageException("unexpected word '" + positionals.get(0) + "': this command takes only"
                    + " --options");
        }
    }

    public List<String> positionals() {
        return Collections.unmodifiableList(positionals);
    }

    /**
     * Fails on any option the command never looked at, naming the closest option it does read.
     * Call after reading all options.
     */
    public void rejectUnknown() {
        for (String name : options.keySet()) {
            if (!read.contains(name)) {
                String near = closest(name, read);
                throw new UsageException("unknown option --" + name + (near == null ? "" : "; did you mean --" + near + "?"));
            }
        }
    }

    /** The known name nearest to {@code typed} by edit distance, or null when none is close. */
    static String closest(String typed, Set<String> known) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String k : known) {
            int d = distance(typed, k);
            if (d < bestDistance) {
                best = k;
                bestDistance = d;
            }
        }
        return best != null && bestDistance <= Math.max(2, typed.length() / 3) ? best : null;
    }

    private static int distance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                cur[j] = Math.min(Math.min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + cost);
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }

    private String last(String name) {
        List<String> v = options.get(name);
        return v.get(v.size() - 1);
    }
}
