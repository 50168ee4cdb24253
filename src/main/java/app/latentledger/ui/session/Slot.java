package app.latentledger.ui.session;

import app.latentledger.core.coil.Tolerances;
import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.List;

/**
 * One box the tech fills on the readings screen. Each knows what it measures, how it is shown and
 * the tolerance it starts with. Where a box offers a choice (which humidity reading, which coil
 * temperature, where the airflow was taken) the choice is a lower-case record key.
 */
public enum Slot {
    RETURN_DRY_BULB("return-dry-bulb", "Return", "Dry bulb", Group.RETURN, K.F05),
    RETURN_HUMIDITY("return-humidity", "Return", "Humidity", Group.RETURN, K.F05),
    SUPPLY_DRY_BULB("supply-dry-bulb", "Supply", "Dry bulb", Group.SUPPLY, K.F05),
    SUPPLY_HUMIDITY("supply-humidity", "Supply", "Humidity", Group.SUPPLY, K.F05),
    OUTDOOR_DRY_BULB("outdoor-dry-bulb", "Outdoor", "Dry bulb", Group.OUTDOOR, K.F05),
    OUTDOOR_HUMIDITY("outdoor-humidity", "Outdoor", "Humidity", Group.OUTDOOR, K.F05),
    COIL_TEMPERATURE("coil-temperature", "Coil", "Coil temperature", Group.COIL, K.F10),
    AIRFLOW("airflow", "Airflow", "Airflow", Group.AIRFLOW, Tolerances.AIRFLOW_FRACTION),
    NOMINAL_TONS("nominal-tons", "System", "Nominal size", Group.AIRFLOW, 0),
    CONDENSATE_VOLUME("condensate-volume", "Condensate", "Water caught", Group.CONDENSATE, 20e-6),
    CONDENSATE_MINUTES("condensate-minutes", "Condensate", "Collection time", Group.CONDENSATE, 5),
    /**
     * The supply probe's dew point minus the return probe's, both read in the same air, K (a signed
     * difference, no tolerance of its own): the check takes it off the supply reading.
     */
    SUPPLY_DEW_POINT_OFFSET("supply-dew-point-offset", "Supply", "Probe offset", Group.PROBES, 0);

    /** Where a box sits on the screen. */
    public enum Group { RETURN, SUPPLY, OUTDOOR, COIL, AIRFLOW, CONDENSATE, PROBES }

    /** Default tolerances: the one table, {@link Tolerances}. */
    private static final class K {
        static final double F05 = Tolerances.DRY_BULB_K;
        static final double F10 = Tolerances.COIL_K;
    }

    private final String key;
    private final String where;
    private final String label;
    private final Group group;
    private final double defaultToleranceSi;

    Slot(String key, String where, String label, Group group, double defaultToleranceSi) {
        this.key = key;
        this.where = where;
        this.label = label;
        this.group = group;
        this.defaultToleranceSi = defaultToleranceSi;
    }

    /** Stable key: node ids, the draft file. */
    public String key() {
        return key;
    }

    /** "Return", "Supply", … */
    public String where() {
        return where;
    }

    public String label() {
        return label;
    }

    public Group group() {
        return group;
    }

    public boolean isHumidity() {
        return this == RETURN_HUMIDITY || this == SUPPLY_HUMIDITY || this == OUTDOOR_HUMIDITY;
    }

    /** The dry bulb a humidity box pairs with, or null. */
    public Slot dryBulb() {
        return switch (this) {
            case RETURN_HUMIDITY -> RETURN_DRY_BULB;
            case SUPPLY_HUMIDITY -> SUPPLY_DRY_BULB;
            case OUTDOOR_HUMIDITY -> OUTDOOR_DRY_BULB;
            default -> null;
        };
    }

    /** The choices this box offers (record keys), empty when none. */
    public List<String> choices() {
        if (isHumidity()) {
            return List.of("wet-bulb", "rh", "dew-point");
        }
        return switch (this) {
            case COIL_TEMPERATURE -> List.of("coil-surface", "evaporator-saturation");
            case AIRFLOW -> List.of("entering", "leaving");
            default -> List.of();
        };
    }

    /** The choice a fresh box starts with, or null. */
    public String defaultChoice() {
        List<String> c = choices();
        return c.isEmpty() ? null : c.get(0);
    }

    /** How the value is typed and shown, given the box's choice. */
    public Quantity quantity(String choice) {
        if (isHumidity()) {
            return "rh".equals(choice) ? Quantity.RELATIVE_HUMIDITY : Quantity.TEMPERATURE;
        }
        return switch (this) {
            case AIRFLOW -> Quantity.AIRFLOW;
            case NOMINAL_TONS -> Quantity.POWER_LARGE;
            case CONDENSATE_VOLUME -> Quantity.WATER_VOLUME;
            case CONDENSATE_MINUTES -> Quantity.DURATION_MINUTES;
            case SUPPLY_DEW_POINT_OFFSET -> Quantity.TEMPERATURE_DIFFERENCE;
            default -> Quantity.TEMPERATURE;
        };
    }

    /**
     * How the tolerance is typed and shown: temperatures as differences, airflow in percent of
     * reading (how flow instruments state it), the rest in the value's own unit.
     */
    public Quantity toleranceQuantity(String choice) {
        Quantity q = quantity(choice);
        if (q == Quantity.TEMPERATURE) {
            return Quantity.TEMPERATURE_DIFFERENCE;
        }
        return this == AIRFLOW ? Quantity.FRACTION_PERCENT : q;
    }

    /** True when the box takes a tolerance at all (the nameplate size and the probe offset do not). */
    public boolean hasTolerance() {
        return this != NOMINAL_TONS && this != SUPPLY_DEW_POINT_OFFSET;
    }

    /** The tolerance a fresh value gets, SI (airflow: a fraction of reading). */
    public double defaultToleranceSi(String choice) {
        if (isHumidity() && choice != null) {
            return Tolerances.humidity(HumidityKind.parse("humidity kind", choice));
        }
        if (this == COIL_TEMPERATURE && choice != null) {
            return Tolerances.coil(CoilTemperatureKind.parse("coil temperature kind", choice), defaultToleranceSi);
        }
        return defaultToleranceSi;
    }

    /** What a choice is called on its button. */
    public static String choiceLabel(String choice) {
        return switch (choice) {
            case "wet-bulb" -> "Wet bulb";
            case "rh" -> "RH";
            case "dew-point" -> "Dew point";
            case "coil-surface" -> "Surface probe";
            case "evaporator-saturation" -> "Evaporator saturation (gauges)";
            case "entering" -> "Return side";
            case "leaving" -> "Supply side";
            default -> choice;
        };
    }

    /** The tile's own short title under its group heading, e.g. "Wet bulb". */
    public String shortTitle(String choice) {
        if (isHumidity()) {
            return choiceLabel(choice);
        }
        return switch (this) {
            case COIL_TEMPERATURE -> "evaporator-saturation".equals(choice) ? "Coil (gauges)" : "Coil (probe)";
            case AIRFLOW -> "entering".equals(choice) ? "Airflow (return side)" : "Airflow (supply side)";
            case CONDENSATE_MINUTES -> "Collection time";
            case SUPPLY_DEW_POINT_OFFSET -> "Supply probe offset (dew point)";
            default -> label;
        };
    }

    /**
     * A line under the pad saying what the box's reading means, or "" when it needs none: a coil
     * temperature is a surface probe or the refrigerant's saturation, never a suction-line reading.
     */
    public String hint(String choice) {
        if (this == SUPPLY_DEW_POINT_OFFSET) {
            return "With both probes in the same air: the supply probe's dew point minus the return probe's."
                    + " It is taken off the supply reading; 0 when they agree.";
        }
        if (this != COIL_TEMPERATURE) {
            return "";
        }
        return "evaporator-saturation".equals(choice)
                ? "From the suction pressure, by a certified technician. The coil surface runs warmer than this,"
                        + " so it can show a warm coil but not prove a cold one."
                : "A probe on the coil fins. Not a suction-line (vapour-line) temperature: that includes the"
                        + " superheat and makes the coil look warmer than it is.";
    }

    /** The box title with its choice, e.g. "Return wet bulb". */
    public String title(String choice) {
        if (isHumidity()) {
            return where + " " + choiceLabel(choice).toLowerCase(java.util.Locale.ROOT).replace("rh", "RH");
        }
        if (this == SUPPLY_DEW_POINT_OFFSET) {
            return "Supply probe dew-point offset";
        }
        return group == Group.RETURN || group == Group.SUPPLY || group == Group.OUTDOOR
                ? where + " " + label.toLowerCase(java.util.Locale.ROOT) : label;
    }

    /** The record's humidity kind for a choice. */
    static HumidityKind humidityKind(String choice) {
        return HumidityKind.parse("humidity kind", choice);
    }

    /**
     * The unit system a box is shown in: the tech's, except the condensate catch, which is read
     * off a graduated cylinder in mL whatever the other units are.
     */
    public UnitSystem unitsFor(UnitSystem units) {
        return this == CONDENSATE_VOLUME ? UnitSystem.SI : units;
    }

    /** The unit system a value of {@code q} is typed in: mL for a condensate volume, else the tech's. */
    public static UnitSystem unitsFor(Quantity q, UnitSystem units) {
        return q == CONDENSATE_VOLUME.quantity(null) ? CONDENSATE_VOLUME.unitsFor(units) : units;
    }

    /** The unit shown beside the pad, e.g. "°F". */
    public String symbol(UnitSystem units, String choice) {
        return quantity(choice).symbol(unitsFor(units));
    }

    /** The tolerance's unit, e.g. "°F" or "%". */
    public String toleranceSymbol(UnitSystem units, String choice) {
        return toleranceQuantity(choice).symbol(unitsFor(units));
    }

    /** SI value of what the tech typed in this box. */
    public double fromDisplay(UnitSystem units, String choice, double shown) {
        return quantity(choice).fromDisplay(unitsFor(units), shown);
    }

    public double toDisplay(UnitSystem units, String choice, double si) {
        return quantity(choice).toDisplay(unitsFor(units), si);
    }

    public double toleranceFromDisplay(UnitSystem units, String choice, double shown) {
        return toleranceQuantity(choice).fromDisplay(unitsFor(units), shown);
    }

    public double toleranceToDisplay(UnitSystem units, String choice, double si) {
        return toleranceQuantity(choice).toDisplay(unitsFor(units), si);
    }

    public static Slot ofKey(String key) {
        for (Slot s : values()) {
            if (s.key.equals(key)) {
                return s;
            }
        }
        throw new IllegalArgumentException("no reading box '" + key + "'");
    }
}
