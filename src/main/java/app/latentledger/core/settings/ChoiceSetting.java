package app.latentledger.core.settings;

import java.util.List;
import java.util.Locale;

/**
 * A setting chosen from a few words (units, theme, paper).
 *
 * @param key          stable key, as stored and typed
 * @param label        what it means
 * @param group        where it is shown
 * @param choices      the accepted words, lower case
 * @param defaultValue the default word
 * @param source       why the default is what it is
 */
public record ChoiceSetting(String key, String label, SettingGroup group, List<String> choices, String defaultValue,
                           String source) {
    public ChoiceSetting {
        choices = List.copyOf(choices);
        if (!choices.contains(defaultValue)) {
            throw new IllegalArgumentException(key + ": default " + defaultValue + " not among " + choices);
        }
    }

    /** The accepted word for {@code text} (any case), or a refusal naming the setting, value and choices. */
    public String parse(String text) {
        String t = text == null ? "" : text.trim().toLowerCase(Locale.ROOT);
        if (!choices.contains(t)) {
            throw new IllegalArgumentException(label + " '" + text + "' refused: accepted " + String.join(", ", choices));
        }
        return t;
    }
}
