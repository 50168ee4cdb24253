package app.latentledger.ui.house;

import app.latentledger.core.units.Quantity;

import java.util.List;

/**
 * A box on the House screen: one house fact (kept with the site) or one visit reading (kept with the
 * visit), the quantity its number is typed in, and the choices of its kind where it has some.
 */
public enum HouseField {
    FLOOR_AREA("floor-area", "Floor area", Group.HOUSE, Quantity.AREA, List.of()),
    CEILING_HEIGHT("ceiling-height", "Ceiling height", Group.HOUSE, Quantity.LENGTH, List.of()),
    STORIES("stories", "Stories", Group.HOUSE, Quantity.DIMENSIONLESS, List.of()),
    BEDROOMS("bedrooms", "Bedrooms", Group.HOUSE, Quantity.DIMENSIONLESS, List.of()),
    OCCUPANTS("occupants", "Occupants", Group.HOUSE, Quantity.DIMENSIONLESS, List.of()),
    /** The blower-door result, as flow at 50 Pa or as air changes at 50 Pa. */
    BLOWER_DOOR("blower-door", "Blower door", Group.HOUSE, Quantity.AIRFLOW, List.of("cfm50", "ach50")),
    SHELTER_CLASS("shelter-class", "Shelter class", Group.HOUSE, Quantity.DIMENSIONLESS, List.of()),
    WIND("wind", "Wind", Group.HOUSE, Quantity.WIND_SPEED, List.of()),
    /** The ventilation airflow; its choices are the ventilation types ("none" needs no number). */
    VENTILATION("ventilation", "Ventilation", Group.HOUSE, Quantity.AIRFLOW,
            List.of("none", "exhaust", "supply", "balanced", "erv")),
    ERV_EFFECTIVENESS("erv-effectiveness", "ERV latent eff.", Group.HOUSE, Quantity.FRACTION_PERCENT, List.of()),
    OUTDOOR_DB("outdoor-db", "Outdoor dry bulb", Group.READINGS, Quantity.TEMPERATURE, List.of()),
    OUTDOOR_HUMIDITY("outdoor-humidity", "Outdoor humidity", Group.READINGS, Quantity.TEMPERATURE, Kinds.ALL),
    GRILLE_DB("grille-db", "Return grille dry bulb", Group.READINGS, Quantity.TEMPERATURE, List.of()),
    GRILLE_HUMIDITY("grille-humidity", "Return grille humidity", Group.READINGS, Quantity.TEMPERATURE, Kinds.ALL),
    PLENUM_DB("plenum-db", "Return plenum dry bulb", Group.READINGS, Quantity.TEMPERATURE, List.of()),
    PLENUM_HUMIDITY("plenum-humidity", "Return plenum humidity", Group.READINGS, Quantity.TEMPERATURE, Kinds.ALL),
    SPACE_DB("space-db", "Attic/crawl dry bulb", Group.READINGS, Quantity.TEMPERATURE, List.of()),
    SPACE_HUMIDITY("space-humidity", "Attic/crawl humidity", Group.READINGS, Quantity.TEMPERATURE, Kinds.ALL),
    RUNTIME("runtime", "Runtime fraction", Group.READINGS, Quantity.FRACTION_PERCENT, List.of());

    /** Where a box's value is kept. */
    public enum Group {
        /** With the site: the house's facts. */
        HOUSE,
        /** With the visit: the day's weather, the return-leak readings, the runtime. */
        READINGS
    }

    /**
     * The humidity kinds a humidity box takes, in the order shown: dew point first, as the leak check
     * reads humidity ratios from dew points best (a holder: enum constants are made first).
     */
    static final class Kinds {
        static final List<String> ALL = List.of("dew-point", "rh", "wet-bulb");

        private Kinds() {
        }
    }

    private final String key;
    private final String title;
    private final Group group;
    private final Quantity quantity;
    private final List<String> choices;

    HouseField(String key, String title, Group group, Quantity quantity, List<String> choices) {
        this.key = key;
        this.title = title;
        this.group = group;
        this.quantity = quantity;
        this.choices = choices;
    }

    /** Node ids. */
    public String key() {
        return key;
    }

    public String title() {
        return title;
    }

    public Group group() {
        return group;
    }

    /** The quantity its number is typed in (a humidity box's depends on its kind: see the model). */
    public Quantity quantity() {
        return quantity;
    }

    public List<String> choices() {
        return choices;
    }

    /** True for a whole-number box (stories, bedrooms, occupants, shelter class). */
    public boolean whole() {
        return this == STORIES || this == BEDROOMS || this == OCCUPANTS || this == SHELTER_CLASS;
    }

    /** The air reading a dry-bulb or humidity box belongs to ("outdoor", "grille", …), or null. */
    public String air() {
        return switch (this) {
            case OUTDOOR_DB, OUTDOOR_HUMIDITY -> "outdoor";
            case GRILLE_DB, GRILLE_HUMIDITY -> "grille";
            case PLENUM_DB, PLENUM_HUMIDITY -> "plenum";
            case SPACE_DB, SPACE_HUMIDITY -> "space";
            default -> null;
        };
    }

    /** True for the humidity half of an air reading. */
    public boolean humidity() {
        return air() != null && !choices.isEmpty();
    }

    /** The word on a choice button. */
    public static String choiceLabel(String choice) {
        return switch (choice) {
            case "rh" -> "RH";
            case "dew-point" -> "Dew point";
            case "wet-bulb" -> "Wet bulb";
            case "cfm50" -> "CFM50";
            case "ach50" -> "ACH50";
            case "none" -> "None";
            case "exhaust" -> "Exhaust";
            case "supply" -> "Supply";
            case "balanced" -> "Balanced";
            case "erv" -> "ERV";
            default -> choice;
        };
    }
}
