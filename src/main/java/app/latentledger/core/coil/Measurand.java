package app.latentledger.core.coil;

import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

/** The results of a coil check that carry an uncertainty, in the order the model returns them. */
public enum Measurand {
    ENTERING_DEW_POINT("enteringDewPoint", "entering dew point", Quantity.TEMPERATURE),
    LEAVING_DEW_POINT("leavingDewPoint", "leaving dew point", Quantity.TEMPERATURE),
    ENTERING_RELATIVE_HUMIDITY("enteringRelativeHumidity", "entering relative humidity", Quantity.RELATIVE_HUMIDITY),
    /** The indoor air: the return reading (the entering air itself when no outdoor air is mixed in). */
    RETURN_DEW_POINT("returnDewPoint", "return (indoor) dew point", Quantity.TEMPERATURE),
    RETURN_RELATIVE_HUMIDITY("returnRelativeHumidity", "return (indoor) relative humidity", Quantity.RELATIVE_HUMIDITY),
    /** Outdoor dew point; does not exist without an outdoor reading. */
    OUTDOOR_DEW_POINT("outdoorDewPoint", "outdoor dew point", Quantity.TEMPERATURE),
    HUMIDITY_RATIO_DROP("humidityRatioDrop", "humidity-ratio drop across the coil", Quantity.HUMIDITY_RATIO_FINE),
    TEMPERATURE_DROP("temperatureDrop", "dry-bulb drop across the coil", Quantity.TEMPERATURE_DIFFERENCE),
    SENSIBLE("sensible", "sensible capacity", Quantity.POWER),
    LATENT("latent", "latent capacity", Quantity.POWER),
    TOTAL("total", "total capacity", Quantity.POWER),
    SHR("shr", "sensible heat ratio", Quantity.DIMENSIONLESS),
    MOISTURE_REMOVAL("moistureRemoval", "moisture removal", Quantity.WATER_RATE),
    /** Latent capacity over the airflow: "latent capacity per cfm" (per L/s in SI). */
    LATENT_PER_AIRFLOW("latentPerAirflow", "latent capacity per unit of airflow", Quantity.POWER_PER_AIRFLOW),
    APPARATUS_DEW_POINT("apparatusDewPoint", "apparatus dew point", Quantity.TEMPERATURE),
    BYPASS_FACTOR("bypassFactor", "bypass factor", Quantity.DIMENSIONLESS),
    COIL_TEMPERATURE("coilTemperature", "coil temperature", Quantity.TEMPERATURE),
    DEW_POINT_MARGIN("dewPointMargin", "entering dew point minus coil temperature", Quantity.TEMPERATURE_DIFFERENCE),
    /** Airflow over the measured total: shown for reference only; findings judge airflow per nominal ton. */
    AIRFLOW_PER_CAPACITY("airflowPerMeasuredTon", "airflow per unit of measured total capacity (not the nameplate)",
            Quantity.AIRFLOW_PER_CAPACITY),
    /** Airflow as given over the nameplate capacity; does not exist without a nameplate. */
    AIRFLOW_PER_NOMINAL_CAPACITY("airflowPerTon", "airflow per unit of nominal (nameplate) capacity",
            Quantity.AIRFLOW_PER_CAPACITY),
    CONDENSATE_RATE("condensateRate", "condensate caught per hour", Quantity.WATER_RATE),
    CONDENSATE_MINUS_AIRSIDE("condensateMinusAirside", "condensate minus air-side moisture removal", Quantity.WATER_RATE),
    /** Latent capacity from the water caught: condensate rate × h_fg at the leaving dry bulb. */
    LATENT_FROM_CONDENSATE("latentFromCondensate", "latent capacity from the condensate caught", Quantity.POWER),
    /** Sensible ÷ (sensible + latent from the condensate caught). */
    SHR_FROM_CONDENSATE("shrFromCondensate", "sensible heat ratio with latent from the condensate caught",
            Quantity.DIMENSIONLESS),
    LEAVING_RELATIVE_HUMIDITY("leavingRelativeHumidity", "leaving (supply) relative humidity", Quantity.RELATIVE_HUMIDITY);

    /**
     * The name a tech reads in a table whose unit stands in its own column, in the words of the
     * trade and the units shown: "latent capacity per cfm", "airflow per ton (nominal)" or, in SI,
     * "airflow per kW (nominal)". The Results screen, Compare, the report and the command line take
     * these names from here so the same figure is called the same everywhere; any other measurand
     * reads as {@link #label()}.
     */
    public String label(UnitSystem units) {
        boolean ip = units == UnitSystem.IP;
        return switch (this) {
            case LATENT_PER_AIRFLOW -> "latent capacity per " + (ip ? "cfm" : "L/s");
            case AIRFLOW_PER_NOMINAL_CAPACITY -> "airflow per " + (ip ? "ton" : "kW") + " (nominal)";
            case AIRFLOW_PER_CAPACITY -> "airflow per " + (ip ? "ton" : "kW") + " of measured capacity";
            case HUMIDITY_RATIO_DROP -> "humidity ratio drop";
            case MOISTURE_REMOVAL -> "water removed";
            default -> label;
        };
    }

    /** {@link #label(UnitSystem)} with a capital first letter, for a row of a table. */
    public String title(UnitSystem units) {
        String l = label(units);
        return Character.toUpperCase(l.charAt(0)) + l.substring(1);
    }

    private final String key;
    private final String label;
    private final Quantity quantity;

    Measurand(String key, String label, Quantity quantity) {
        this.key = key;
        this.label = label;
        this.quantity = quantity;
    }

    public String key() {
        return key;
    }

    public String label() {
        return label;
    }

    /** How the value is shown. */
    public Quantity quantity() {
        return quantity;
    }

    /** How its uncertainty is shown: a temperature's uncertainty is a temperature difference. */
    public Quantity uncertaintyQuantity() {
        return quantity == Quantity.TEMPERATURE ? Quantity.TEMPERATURE_DIFFERENCE : quantity;
    }
}
