package app.latentledger.core.coil;

/**
 * Where the volumetric airflow was measured. The dry-air mass flow is the volume flow divided by
 * the specific volume of the air at that point (ASHRAE HoF 2017 ch. 1, eq. 28 for v), so the same
 * cfm means a different mass flow in 75 °F return air than in 55 °F supply air (about 4 %).
 */
public enum AirflowLocation {
    /** Return or mixed air, upstream of the coil (a return flow hood, a flow grid in the filter slot). */
    ENTERING("entering"),
    /** Supply air, downstream of the coil (a supply traverse). */
    LEAVING("leaving");

    private final String key;

    AirflowLocation(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }
}
