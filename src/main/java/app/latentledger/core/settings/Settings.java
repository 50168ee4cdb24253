package app.latentledger.core.settings;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.HashMap;
import java.util.Map;
import java.util.Objects;

/**
 * A tech's settings. Every value is checked against {@link SettingsCatalogue}; a refusal names the
 * setting, the value and the accepted range ({@link InvalidInputException}, shown in the tech's
 * units by whoever catches it).
 *
 * @param units              units the tech reads and types
 * @param defaultElevationM  site elevation used when a reading gives none, m
 * @param tolerances         default instrument tolerances for readings that give none
 * @param indoorRhTargetPct  indoor RH target, % (the {@link Thresholds#INDOOR_RH_TARGET} threshold)
 * @param thresholdOverrides every other finding threshold the tech changed (keys of {@link Thresholds};
 *                           the indoor RH target is not among them, it has its own field)
 * @param theme              light or dark screens
 * @param paper              paper for printed reports
 */
public record Settings(UnitSystem units, double defaultElevationM, InstrumentTolerances tolerances,
                       double indoorRhTargetPct, ThresholdSettings thresholdOverrides, DisplayTheme theme,
                       PaperSize paper) {
    /** Inch-pound, sea level, the catalogue's tolerances and thresholds, light theme, US Letter. */
    public static final Settings DEFAULTS = new Settings(UnitSystem.IP, 0.0, InstrumentTolerances.DEFAULTS,
            Thresholds.INDOOR_RH_TARGET.defaultSi(), ThresholdSettings.DEFAULTS, DisplayTheme.LIGHT, PaperSize.LETTER);

    public Settings {
        Objects.requireNonNull(units, "units");
        Objects.requireNonNull(tolerances, "tolerances");
        Objects.requireNonNull(thresholdOverrides, "thresholdOverrides");
        Objects.requireNonNull(theme, "theme");
        Objects.requireNonNull(paper, "paper");
        check(SettingsCatalogue.DEFAULT_ELEVATION, defaultElevationM);
        check(SettingsCatalogue.TOL_DRY_BULB, tolerances.dryBulbK());
        check(SettingsCatalogue.TOL_RH, tolerances.relativeHumidityPct());
        check(SettingsCatalogue.TOL_WET_BULB, tolerances.wetBulbK());
        check(SettingsCatalogue.TOL_DEW_POINT, tolerances.dewPointK());
        check(SettingsCatalogue.TOL_COIL, tolerances.coilK());
        check(SettingsCatalogue.TOL_AIRFLOW, tolerances.airflowFraction());
        check(SettingsCatalogue.TOL_CONDENSATE, tolerances.condensateFraction());
        check(SettingsCatalogue.INDOOR_RH_TARGET, indoorRhTargetPct);
        for (Map.Entry<String, Double> e : thresholdOverrides.overridesSi().entrySet()) {
            if (!SettingsCatalogue.isThreshold(e.getKey())) {
                throw new IllegalArgumentException(SettingsCatalogue.INDOOR_RH_TARGET.equals(e.getKey())
                        ? "the indoor RH target is its own setting, not a threshold override"
                        : "unknown threshold '" + e.getKey() + "'");
            }
            check(e.getKey(), e.getValue());
        }
        ThresholdSettings t = thresholdOverrides;
        below(t, Thresholds.COIL_LOW_AIRFLOW_PER_TON.key(), Thresholds.COIL_HIGH_AIRFLOW_PER_TON.key());
        below(t, Thresholds.SPLIT_OFF.key(), Thresholds.SPLIT_ON.key());
    }

    private static void check(String key, double valueSi) {
        SettingsCatalogue.number(key).orElseThrow().check(valueSi);
    }

    /**
     * A low limit must stay below its high partner (the low-airflow threshold below the high one,
     * the compressor-off split below the on split), or a reading could be both too low and too high.
     * When only the low one was changed it is the one refused; otherwise the high one, with the low
     * one's value as its lower bound.
     */
    private static void below(ThresholdSettings t, String lowKey, String highKey) {
        NumberSetting low = SettingsCatalogue.number(lowKey).orElseThrow();
        NumberSetting high = SettingsCatalogue.number(highKey).orElseThrow();
        double lowSi = t.overridesSi().getOrDefault(lowKey, low.defaultSi());
        double highSi = t.overridesSi().getOrDefault(highKey, high.defaultSi());
        if (!(lowSi < highSi)) {
            boolean lowChanged = t.overridesSi().containsKey(lowKey) && !t.overridesSi().containsKey(highKey);
            NumberSetting culprit = lowChanged ? low : high;
            double value = lowChanged ? lowSi : highSi;
            throw new InvalidInputException(culprit.label(), culprit.quantity(), value,
                    lowChanged ? low.minSi() : lowSi, lowChanged ? highSi : high.maxSi(),
                    lowChanged ? "must stay below the " + high.label() : "must stay above the " + low.label());
        }
    }

    /** The thresholds the analyses use: the overrides plus the indoor RH target. */
    public ThresholdSettings thresholds() {
        Map<String, Double> all = new HashMap<>(thresholdOverrides.overridesSi());
        all.put(SettingsCatalogue.INDOOR_RH_TARGET, indoorRhTargetPct);
        return new ThresholdSettings(all);
    }

    /** The value of a numeric setting, SI. */
    public double numberSi(String key) {
        switch (key) {
            case SettingsCatalogue.DEFAULT_ELEVATION: return defaultElevationM;
            case SettingsCatalogue.TOL_DRY_BULB: return tolerances.dryBulbK();
            case SettingsCatalogue.TOL_RH: return tolerances.relativeHumidityPct();
            case SettingsCatalogue.TOL_WET_BULB: return tolerances.wetBulbK();
            case SettingsCatalogue.TOL_DEW_POINT: return tolerances.dewPointK();
            case SettingsCatalogue.TOL_COIL: return tolerances.coilK();
            case SettingsCatalogue.TOL_AIRFLOW: return tolerances.airflowFraction();
            case SettingsCatalogue.TOL_CONDENSATE: return tolerances.condensateFraction();
            default: break;
        }
        if (key.equals(SettingsCatalogue.INDOOR_RH_TARGET)) {
            return indoorRhTargetPct;
        }
        NumberSetting s = SettingsCatalogue.number(key).orElseThrow(() -> SettingsCatalogue.unknownKey(key));
        return thresholdOverrides.overridesSi().getOrDefault(key, s.defaultSi());
    }

    /**
     * These settings with one number changed (SI), refused with the setting's range when out of it.
     * A threshold set back to its default is no longer an override.
     */
    public Settings withNumber(String key, double valueSi) {
        NumberSetting s = SettingsCatalogue.number(key).orElseThrow(() -> SettingsCatalogue.unknownKey(key));
        s.check(valueSi);
        InstrumentTolerances t = tolerances;
        switch (key) {
            case SettingsCatalogue.DEFAULT_ELEVATION:
                return new Settings(units, valueSi, t, indoorRhTargetPct, thresholdOverrides, theme, paper);
            case SettingsCatalogue.TOL_DRY_BULB:
                t = new InstrumentTolerances(valueSi, t.relativeHumidityPct(), t.wetBulbK(), t.dewPointK(), t.coilK(),
                        t.airflowFraction(), t.condensateFraction());
                break;
            case SettingsCatalogue.TOL_RH:
                t = new InstrumentTolerances(t.dryBulbK(), valueSi, t.wetBulbK(), t.dewPointK(), t.coilK(),
                        t.airflowFraction(), t.condensateFraction());
                break;
            case SettingsCatalogue.TOL_WET_BULB:
                t = new InstrumentTolerances(t.dryBulbK(), t.relativeHumidityPct(), valueSi, t.dewPointK(), t.coilK(),
                        t.airflowFraction(), t.condensateFraction());
                break;
            case SettingsCatalogue.TOL_DEW_POINT:
                t = new InstrumentTolerances(t.dryBulbK(), t.relativeHumidityPct(), t.wetBulbK(), valueSi, t.coilK(),
                        t.airflowFraction(), t.condensateFraction());
                break;
            case SettingsCatalogue.TOL_COIL:
                t = new InstrumentTolerances(t.dryBulbK(), t.relativeHumidityPct(), t.wetBulbK(), t.dewPointK(), valueSi,
                        t.airflowFraction(), t.condensateFraction());
                break;
            case SettingsCatalogue.TOL_AIRFLOW:
                t = new InstrumentTolerances(t.dryBulbK(), t.relativeHumidityPct(), t.wetBulbK(), t.dewPointK(),
                        t.coilK(), valueSi, t.condensateFraction());
                break;
            case SettingsCatalogue.TOL_CONDENSATE:
                t = new InstrumentTolerances(t.dryBulbK(), t.relativeHumidityPct(), t.wetBulbK(), t.dewPointK(),
                        t.coilK(), t.airflowFraction(), valueSi);
                break;
            default:
                if (key.equals(SettingsCatalogue.INDOOR_RH_TARGET)) {
                    return new Settings(units, defaultElevationM, t, valueSi, thresholdOverrides, theme, paper);
                }
                Map<String, Double> o = new HashMap<>(thresholdOverrides.overridesSi());
                if (valueSi == s.defaultSi()) {
                    o.remove(key);
                } else {
                    o.put(key, valueSi);
                }
                return new Settings(units, defaultElevationM, t, indoorRhTargetPct, new ThresholdSettings(o), theme,
                        paper);
        }
        return new Settings(units, defaultElevationM, t, indoorRhTargetPct, thresholdOverrides, theme, paper);
    }

    /** The word of a choice setting ("ip", "dark", "a4"). */
    public String choice(String key) {
        switch (key) {
            case SettingsCatalogue.UNITS: return units.key();
            case SettingsCatalogue.THEME: return theme.key();
            case SettingsCatalogue.PAPER: return paper.key();
            default: throw SettingsCatalogue.unknownKey(key);
        }
    }

    /** These settings with one word setting changed; refuses a word not among its choices. */
    public Settings withChoice(String key, String text) {
        ChoiceSetting c = SettingsCatalogue.choice(key).orElseThrow(() -> SettingsCatalogue.unknownKey(key));
        String w = c.parse(text);
        switch (key) {
            case SettingsCatalogue.UNITS:
                return new Settings(UnitSystem.parse(w), defaultElevationM, tolerances, indoorRhTargetPct,
                        thresholdOverrides, theme, paper);
            case SettingsCatalogue.THEME:
                return new Settings(units, defaultElevationM, tolerances, indoorRhTargetPct, thresholdOverrides,
                        DisplayTheme.parseOrNull(w), paper);
            default:
                return new Settings(units, defaultElevationM, tolerances, indoorRhTargetPct, thresholdOverrides, theme,
                        PaperSize.parseOrNull(w));
        }
    }

    /** True when the setting has its default value. */
    public boolean isDefault(String key) {
        return SettingsCatalogue.choice(key).map(c -> c.defaultValue().equals(choice(key)))
                .orElseGet(() -> numberSi(key) == SettingsCatalogue.number(key).orElseThrow().defaultSi());
    }

    /** These settings with one setting back at its default. */
    public Settings reset(String key) {
        if (SettingsCatalogue.choice(key).isPresent()) {
            return withChoice(key, SettingsCatalogue.choice(key).get().defaultValue());
        }
        NumberSetting s = SettingsCatalogue.number(key).orElseThrow(() -> SettingsCatalogue.unknownKey(key));
        return withNumber(key, s.defaultSi());
    }

    /**
     * A value typed in the tech's units, converted to SI and set: the one way screens and commands
     * change a number, so both refuse the same values with the same message.
     */
    public Settings withTyped(String key, double shown, UnitSystem typedIn) {
        NumberSetting s = SettingsCatalogue.number(key).orElseThrow(() -> SettingsCatalogue.unknownKey(key));
        Quantity q = s.quantity();
        return withNumber(key, q.fromDisplay(typedIn, shown));
    }
}
