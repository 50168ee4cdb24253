package app.latentledger;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * What a tech must never read on a screen or in a report: the part-load model's symbols and the
 * simulation program's object names, file references, the command line's syntax, the log's field
 * keys, a computer's "not a number" or a signed infinity, labels that were misread in use, and a
 * negative amount of water. Screens and paper name a source as "Methods guide §n" and keep the
 * model's name and parameters to the Methods guide and the command line's technical output.
 */
public final class TradeWords {
    private TradeWords() {
    }

    private static final List<Pattern> FORBIDDEN = List.of(
            // the part-load model's symbols and the program it is published in
            Pattern.compile("t_wet"), Pattern.compile("(?i)\\bgamma\\b"), Pattern.compile("\\btau "),
            Pattern.compile("N_max"), Pattern.compile("Coil:Cooling"), Pattern.compile("Henderson"),
            Pattern.compile("EnergyPlus"),
            // a file reference instead of the Methods guide's section
            Pattern.compile("\\.md §"), Pattern.compile("\\.md\\b"),
            // command-line syntax: "--map", "--nominal-tons"
            Pattern.compile("--[A-Za-z]"),
            // the log's field keys and a computer's numbers
            Pattern.compile("_db\\b"), Pattern.compile("_rh\\b"), Pattern.compile("NaN"), Pattern.compile("-∞"),
            // labels a tech misread in use
            Pattern.compile("(?i)latent per airflow"), Pattern.compile("(?i)per nominal size"),
            Pattern.compile("(?i)latent fraction, model"),
            // "about -96 pints": a negative amount of water is said in words
            Pattern.compile("-\\d[\\d,.]* (pints|L)\\b"));

    /** Each forbidden piece found in {@code text}, with where it was and the words around it. */
    public static List<String> problems(String where, String text) {
        List<String> out = new ArrayList<>();
        if (text == null) {
            return out;
        }
        for (Pattern p : FORBIDDEN) {
            Matcher m = p.matcher(text);
            while (m.find()) {
                int from = Math.max(0, m.start() - 40);
                int to = Math.min(text.length(), m.end() + 40);
                out.add(where + ": '" + m.group() + "' in \"" + text.substring(from, to).replace('\n', ' ') + "\"");
            }
        }
        return out;
    }
}
