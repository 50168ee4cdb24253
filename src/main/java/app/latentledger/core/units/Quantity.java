package app.latentledger.core.units;

/**
 * Physical quantities that cross the edge of the core. Each is stored in one SI unit inside and
 * shown in one unit per {@link UnitSystem}; {@link #toDisplay} and {@link #fromDisplay} are the
 * only place those conversions happen. Factors come from {@link Conversions}.
 */
public enum Quantity {
    /** Air, coil or surface temperature; stored in °C. */
    TEMPERATURE("°C", 1, 0, "°F", 1.8, 32),
    /** Temperature difference; stored in K. */
    TEMPERATURE_DIFFERENCE("K", 1, 0, "°F", 1.8, 0),
    /** Absolute pressure; stored in Pa, shown as kPa or psia. */
    PRESSURE("kPa", 1e-3, 0, "psia", 1 / Conversions.PA_PER_PSI, 0),
    /** Site elevation above sea level; stored in m. */
    ELEVATION("m", 1, 0, "ft", 1 / Conversions.M_PER_FT, 0),
    /** Relative humidity; stored and shown in percent. */
    RELATIVE_HUMIDITY("%", 1, 0, "%", 1, 0),
    /** Humidity ratio, mass of water per mass of dry air: kg/kg is numerically lb/lb. */
    HUMIDITY_RATIO("kg/kg", 1, 0, "lb/lb", 1, 0),
    /** Humidity ratio in the trade's finer units: grams per kg or grains per lb of dry air. */
    HUMIDITY_RATIO_FINE("g/kg", 1000, 0, "gr/lb", Conversions.GRAINS_PER_LB, 0),
    /** Specific enthalpy per mass of dry air; stored in J/kg. */
    ENTHALPY("kJ/kg", 1e-3, 0, "Btu/lb", 1 / Conversions.J_PER_KG_PER_BTU_PER_LB, 0),
    /** Specific volume per mass of dry air; stored in m³/kg. */
    SPECIFIC_VOLUME("m³/kg", 1, 0, "ft³/lb", Conversions.KG_PER_LB / Conversions.M3_PER_FT3, 0),
    /** Density of moist air; stored in kg/m³. */
    DENSITY("kg/m³", 1, 0, "lb/ft³", Conversions.M3_PER_FT3 / Conversions.KG_PER_LB, 0),
    /** Volumetric airflow; stored in m³/s, shown as L/s or cfm. */
    AIRFLOW("L/s", 1000, 0, "cfm", 60 / Conversions.M3_PER_FT3, 0),
    /** Heat flow (capacity); stored in W, shown as W or Btu/h. */
    POWER("W", 1, 0, "Btu/h", 3600 / Conversions.J_PER_BTU, 0),
    /** Heat flow in large units; stored in W, shown as kW or tons of refrigeration. */
    POWER_LARGE("kW", 1e-3, 0, "tons", 3600 / Conversions.J_PER_BTU / Conversions.BTU_PER_H_PER_TON, 0),
    /** Water removed per unit time; stored in kg/s, shown as kg/h or lb/h. */
    WATER_RATE("kg/h", 3600, 0, "lb/h", 3600 / Conversions.KG_PER_LB, 0),
    /** Water removed per day as liquid volume; stored in kg/s, shown as L/day or US pints/day (water at 1 kg/L, 1.043 lb/pint). */
    WATER_RATE_DAILY("L/day", 86_400, 0, "pints/day", 86_400 / (Conversions.M3_PER_US_PINT * 1000), 0),
    /** Liquid water volume (condensate caught); stored in m³, shown as mL or US fl oz. */
    WATER_VOLUME("mL", 1e6, 0, "fl oz", 1 / Conversions.M3_PER_US_FL_OZ, 0),
    /** Water mass; stored in kg, shown as kg or lb. */
    WATER_MASS("kg", 1, 0, "lb", 1 / Conversions.KG_PER_LB, 0),
    /** Airflow per unit of capacity; stored in m³/s per W, shown as L/s per kW or cfm per ton. */
    AIRFLOW_PER_CAPACITY("L/s per kW", 1e6, 0, "cfm/ton",
            60 / Conversions.M3_PER_FT3 * Conversions.BTU_PER_H_PER_TON * Conversions.J_PER_BTU / 3600, 0),
    /** Heat flow per unit of airflow; stored in W per m³/s, shown as W per L/s or Btu/h per cfm. */
    POWER_PER_AIRFLOW("W per L/s", 1e-3, 0, "Btu/h per cfm",
            3600 / Conversions.J_PER_BTU * Conversions.M3_PER_FT3 / 60, 0),
    /** Elapsed time; stored in s, shown in minutes in both systems. */
    DURATION_MINUTES("min", 1 / 60.0, 0, "min", 1 / 60.0, 0),
    /** Elapsed time; stored and shown in seconds. */
    DURATION_SECONDS("s", 1, 0, "s", 1, 0),
    /** A pure number (SHR, bypass factor, fractions, counts per hour): no unit. */
    DIMENSIONLESS("", 1, 0, "", 1, 0),
    /** A fraction stored 0–1, shown in percent. */
    FRACTION_PERCENT("%", 100, 0, "%", 100, 0),

    // --- the house's moisture budget ---
    /** Water gained or removed per day by mass; stored in kg/s, shown as kg/day or lb/day. */
    WATER_MASS_DAILY("kg/day", 86_400, 0, "lb/day", 86_400 / Conversions.KG_PER_LB, 0),
    /** Floor area; stored in m², shown as m² or ft². */
    AREA("m²", 1, 0, "ft²", 1 / (Conversions.M_PER_FT * Conversions.M_PER_FT), 0),
    /** Building volume; stored in m³, shown as m³ or ft³. */
    VOLUME("m³", 1, 0, "ft³", 1 / Conversions.M3_PER_FT3, 0),
    /** Length (ceiling height); stored in m, shown as m or ft. */
    LENGTH("m", 1, 0, "ft", 1 / Conversions.M_PER_FT, 0),
    /** Wind speed; stored in m/s, shown as m/s or mph. */
    WIND_SPEED("m/s", 1, 0, "mph", 3600 / (Conversions.M_PER_FT * 5280), 0);

    private final String siSymbol;
    private final double siFactor;
    private final double siOffset;
    private final String ipSymbol;
    private final double ipFactor;
    private final double ipOffset;

    Quantity(String siSymbol, double siFactor, double siOffset,
             String ipSymbol, double ipFactor, double ipOffset) {
        this.siSymbol = siSymbol;
        this.siFactor = siFactor;
        this.siOffset = siOffset;
        this.ipSymbol = ipSymbol;
        this.ipFactor = ipFactor;
        this.ipOffset = ipOffset;
    }

    /** Converts a stored SI value to what the tech reads in {@code units}. */
    public double toDisplay(UnitSystem units, double storedSi) {
        return units == UnitSystem.IP ? storedSi * ipFactor + ipOffset : storedSi * siFactor + siOffset;
    }

    /** Converts what the tech typed in {@code units} to the stored SI value. */
    public double fromDisplay(UnitSystem units, double shown) {
        return units == UnitSystem.IP ? (shown - ipOffset) / ipFactor : (shown - siOffset) / siFactor;
    }

    /** Unit symbol shown in {@code units}, e.g. "°F" or "kPa". */
    public String symbol(UnitSystem units) {
        return units == UnitSystem.IP ? ipSymbol : siSymbol;
    }
}
