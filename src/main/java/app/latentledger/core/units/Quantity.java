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
    DENSITY("kg/m³", 1, 0, "lb/ft³", Conversions.M3_PER_FT3 / Conversions.KG_PER_LB, 0);

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
