package app.latentledger.chart.psychro;

/**
 * One line of a chart family in chart coordinates.
 *
 * @param kind          which family
 * @param valueSi       the constant along the line in SI (RH %, wet bulb °C, enthalpy J/kg of the
 *                      chart's handbook edition, specific volume m³/kg; NaN for the saturation curve)
 * @param label         the value as printed on the chart, in the chart's units
 * @param dryBulbC      sample dry bulbs, °C, increasing
 * @param humidityRatio sample humidity ratios, kg/kg
 */
public record ChartCurve(Kind kind, double valueSi, String label, double[] dryBulbC, double[] humidityRatio) {

    /** The chart's line families. */
    public enum Kind { SATURATION, RELATIVE_HUMIDITY, WET_BULB, ENTHALPY, SPECIFIC_VOLUME }

    public int size() {
        return dryBulbC.length;
    }
}
