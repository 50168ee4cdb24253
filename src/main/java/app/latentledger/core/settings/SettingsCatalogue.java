package app.latentledger.core.settings;

import app.latentledger.core.coil.Tolerances;
import app.latentledger.core.findings.Threshold;
import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.psychro.InputLimits;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Every setting a tech can change, with its default, accepted range and source: the one list the
 * store, the {@code settings} command, the settings screen and docs/methods.md §6 follow.
 *
 * <p>Ranges (see docs/methods.md §6). Instrument tolerances: 0 (a perfect instrument) up to a
 * value no field instrument worth computing with exceeds (common practice, no source). Finding
 * thresholds: ±50 % around the catalogue default, cut at the physical limit of the quantity (an RH
 * at 100 %, a fraction at 100 %), except where a band around the default makes no sense: the
 * indoor dew-point limit (an absolute temperature: 50–65 °F) and the sensible heat ratio
 * (0.50–1.00, SHR cannot exceed 1). A threshold added to {@link Thresholds} later gets the ±50 %
 * rule without a change here.
 */
public final class SettingsCatalogue {
    public static final String UNITS = "units";
    public static final String DEFAULT_ELEVATION = "defaultElevation";
    public static final String TOL_DRY_BULB = "tolDryBulb";
    public static final String TOL_RH = "tolRh";
    public static final String TOL_WET_BULB = "tolWetBulb";
    public static final String TOL_DEW_POINT = "tolDewPoint";
    public static final String TOL_COIL = "tolCoil";
    public static final String TOL_AIRFLOW = "tolAirflow";
    public static final String TOL_CONDENSATE = "tolCondensate";
    /** The same key as the threshold it sets, {@link Thresholds#INDOOR_RH_TARGET}. */
    public static final String INDOOR_RH_TARGET = Thresholds.INDOOR_RH_TARGET.key();
    public static final String THEME = "theme";
    public static final String PAPER = "paper";

    private static final String TOLERANCE_SOURCE = "typical field kit, Methods guide §9.1 (common practice, no source)";

    private static final List<ChoiceSetting> CHOICES = List.of(
            new ChoiceSetting(UNITS, "units", SettingGroup.UNITS_AND_SITE, List.of("ip", "si"), "ip",
                    "inch-pound, what most US field instruments read (common practice, no source)"),
            new ChoiceSetting(THEME, "theme", SettingGroup.DISPLAY_AND_PAPER, List.of("light", "dark", "outdoor"),
                    "light", "light: reads best in daylight; outdoor: black on white with heavier lines for direct sun;"
                    + " dark: attics and night (common practice, no source)"),
            new ChoiceSetting(PAPER, "paper size", SettingGroup.DISPLAY_AND_PAPER, List.of("letter", "a4"), "letter",
                    "US Letter (ANSI/ASME Y14.1); A4 is ISO 216"));

    private static final Map<String, NumberSetting> NUMBERS = numbers();

    private SettingsCatalogue() {
    }

    private static Map<String, NumberSetting> numbers() {
        List<NumberSetting> all = new ArrayList<>();
        all.add(new NumberSetting(DEFAULT_ELEVATION, "default site elevation", SettingGroup.UNITS_AND_SITE,
                Quantity.ELEVATION, 0.0, InputLimits.MIN_ELEVATION_M, InputLimits.MAX_ELEVATION_M,
                "sea level; used when a reading gives no elevation or pressure (range: the app's elevation limits)"));
        all.add(tolerance(TOL_DRY_BULB, "dry-bulb probe tolerance", Quantity.TEMPERATURE_DIFFERENCE,
                Tolerances.DRY_BULB_K, fahrenheitDifference(5)));
        all.add(tolerance(TOL_RH, "RH probe tolerance", Quantity.RELATIVE_HUMIDITY,
                Tolerances.RELATIVE_HUMIDITY_PCT, 10.0));
        all.add(tolerance(TOL_WET_BULB, "wet-bulb tolerance", Quantity.TEMPERATURE_DIFFERENCE,
                Tolerances.WET_BULB_K, fahrenheitDifference(5)));
        all.add(tolerance(TOL_DEW_POINT, "dew-point meter tolerance", Quantity.TEMPERATURE_DIFFERENCE,
                Tolerances.DEW_POINT_K, fahrenheitDifference(10)));
        all.add(tolerance(TOL_COIL, "coil temperature probe tolerance", Quantity.TEMPERATURE_DIFFERENCE,
                Tolerances.COIL_K, fahrenheitDifference(10)));
        all.add(new NumberSetting(TOL_AIRFLOW, "airflow tolerance", SettingGroup.INSTRUMENTS,
                Quantity.FRACTION_PERCENT, Tolerances.AIRFLOW_FRACTION, 0.0, 0.5,
                "±10 % of reading: California Title 24 Part 6, RA3.7.2.2 (2013)"));
        all.add(tolerance(TOL_CONDENSATE, "condensate volume tolerance", Quantity.FRACTION_PERCENT,
                Tolerances.CONDENSATE_FRACTION, 0.5));
        all.add(new NumberSetting(INDOOR_RH_TARGET, "indoor RH target", SettingGroup.INDOOR_TARGET,
                Quantity.RELATIVE_HUMIDITY, Thresholds.INDOOR_RH_TARGET.defaultSi(), 30.0, 70.0,
                Thresholds.INDOOR_RH_TARGET.source()));
        for (Threshold t : Thresholds.all()) {
            if (!t.key().equals(INDOOR_RH_TARGET)) {
                double[] range = thresholdRange(t);
                all.add(new NumberSetting(t.key(), t.label(), SettingGroup.FINDING_THRESHOLDS, t.quantity(),
                        t.defaultSi(), range[0], range[1], t.source()));
            }
        }
        Map<String, NumberSetting> byKey = new LinkedHashMap<>();
        for (NumberSetting s : all) {
            if (byKey.put(s.key(), s) != null || CHOICES.stream().anyMatch(c -> c.key().equals(s.key()))) {
                throw new IllegalStateException("setting key " + s.key() + " used twice");
            }
        }
        return byKey;
    }

    private static NumberSetting tolerance(String key, String label, Quantity q, double defaultSi, double maxSi) {
        return new NumberSetting(key, label, SettingGroup.INSTRUMENTS, q, defaultSi, 0.0, maxSi,
                TOLERANCE_SOURCE);
    }

    private static double fahrenheitDifference(double f) {
        return Quantity.TEMPERATURE_DIFFERENCE.fromDisplay(UnitSystem.IP, f);
    }

    /**
     * The accepted range of a threshold override, SI: ±50 % of the default, cut at the quantity's
     * physical limit; absolute temperatures and the SHR have their own bands (see class comment).
     */
    static double[] thresholdRange(Threshold t) {
        if (t == Thresholds.INDOOR_DEW_POINT_MAX) {
            return new double[] {Quantity.TEMPERATURE.fromDisplay(UnitSystem.IP, 50),
                    Quantity.TEMPERATURE.fromDisplay(UnitSystem.IP, 65)};
        }
        if (t == Thresholds.COIL_HIGH_SHR) {
            return new double[] {0.50, 1.00};
        }
        double d = t.defaultSi();
        double half = Math.abs(d) / 2;
        double min = d - half;
        double max = d + half;
        switch (t.quantity()) {
            case RELATIVE_HUMIDITY:
                max = Math.min(max, 100.0);
                break;
            case FRACTION_PERCENT:
                max = Math.min(max, 1.0);
                break;
            default:
                break;
        }
        return new double[] {min, max};
    }

    /** Every numeric setting, in screen order. */
    public static List<NumberSetting> numbers(SettingGroup group) {
        return NUMBERS.values().stream().filter(s -> s.group() == group).toList();
    }

    /** Every numeric setting, in screen order. */
    public static List<NumberSetting> allNumbers() {
        return List.copyOf(NUMBERS.values());
    }

    /** Every word setting (units, theme, paper). */
    public static List<ChoiceSetting> choices() {
        return CHOICES;
    }

    public static Optional<NumberSetting> number(String key) {
        return Optional.ofNullable(NUMBERS.get(key));
    }

    public static Optional<ChoiceSetting> choice(String key) {
        return CHOICES.stream().filter(c -> c.key().equals(key)).findFirst();
    }

    /** True for a finding threshold's key (stored as an override in {@link Settings#thresholdOverrides()}). */
    public static boolean isThreshold(String key) {
        NumberSetting s = NUMBERS.get(key);
        return s != null && s.group() == SettingGroup.FINDING_THRESHOLDS;
    }

    /** Every key, choices first then numbers, in screen order. */
    public static List<String> keys() {
        List<String> keys = new ArrayList<>();
        CHOICES.forEach(c -> keys.add(c.key()));
        keys.addAll(NUMBERS.keySet());
        return keys;
    }

    /** A refusal naming an unknown key and where to find the known ones. */
    public static IllegalArgumentException unknownKey(String key) {
        return new IllegalArgumentException("unknown setting '" + key + "'; the keys are listed by 'settings show'");
    }
}
