package app.latentledger.core.measure;

import app.latentledger.core.units.Conversions;

/**
 * What an airflow number means: a volume at the air's own state, or a volume at standard air
 * density.
 *
 * <p><b>Standard air</b> is 0.075 lb/ft³ (1.2014 kg/m³), the density of dry air near 70 °F and
 * 29.92 inHg (ASHRAE Handbook—Fundamentals, IP edition, "standard air"; the SI edition rounds it
 * to 1.2 kg/m³ at 20 °C, 101.325 kPa; California Title 24 Part 6 Reference Appendix RA3.3 asks for
 * system airflow in standard cfm at this density). A standard-cfm number is a mass flow in volume
 * units: ṁ = V̇_std × ρ_std.
 *
 * <p>This tool takes ρ_std as the density of the <b>moist</b> air that actually flows (the mass the
 * instrument's density correction stands for), so the dry-air mass flow is
 * ṁ_da = V̇_std ρ_std / (1 + W), W the humidity ratio where the flow was read. Taking it as dry-air
 * density instead (ṁ_da = V̇_std ρ_std) gives 1 + W more, 1.0–1.5 % in cooling weather; that spread
 * is the convention's own uncertainty and lies inside any airflow instrument's tolerance.
 */
public enum AirflowBasis {
    /** Volume at the air's own temperature, humidity and pressure (a vane anemometer, a traverse read as velocity). */
    ACTUAL("actual", "actual"),
    /** Volume at standard air density, 0.075 lb/ft³ (most flow hoods, flow grids and fan flowmeters by default). */
    STANDARD("standard", "standard");

    /** Standard air density, lb/ft³ (ASHRAE Handbook—Fundamentals, IP edition, "standard air"). */
    public static final double STANDARD_DENSITY_LB_PER_FT3 = 0.075;
    /** The same in SI, kg/m³: 0.075 lb/ft³ × 0.45359237 kg/lb ÷ 0.028316846592 m³/ft³ = 1.2014 kg/m³. */
    public static final double STANDARD_DENSITY_KG_PER_M3 =
            STANDARD_DENSITY_LB_PER_FT3 * Conversions.KG_PER_LB / Conversions.M3_PER_FT3;

    private final String key;
    private final String label;

    AirflowBasis(String key, String label) {
        this.key = key;
        this.label = label;
    }

    /** Stable key: stored records, {@code coil --airflow-basis}, JSON {@code airflowBasis}. */
    public String key() {
        return key;
    }

    /** "actual" | "standard", as in "1,200 standard cfm". */
    public String label() {
        return label;
    }

    /**
     * Dry-air mass flow, kg/s.
     *
     * @param airflowM3PerS     the airflow as read, m³/s
     * @param specificVolume    moist-air volume per kg of dry air where the flow was read, m³/kg
     *                          (ASHRAE HoF 2017 ch. 1, eq. 28); used for an actual reading
     * @param humidityRatio     kg/kg where the flow was read; used for a standard reading
     */
    public double dryAirMassFlowKgPerS(double airflowM3PerS, double specificVolume, double humidityRatio) {
        return this == ACTUAL ? airflowM3PerS / specificVolume
                : airflowM3PerS * STANDARD_DENSITY_KG_PER_M3 / (1 + humidityRatio);
    }

    public static AirflowBasis parse(String field, String key) {
        return Choices.parse(field, AirflowBasis.class, key, AirflowBasis::key);
    }
}
