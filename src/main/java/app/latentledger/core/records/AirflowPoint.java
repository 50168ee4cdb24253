package app.latentledger.core.records;

/**
 * Where the airflow was measured, which decides the specific volume that turns it into a mass flow
 * of dry air.
 */
public enum AirflowPoint {
    /** Return or coil-entering air (flow hood on the return, flow grid in the filter slot). */
    ENTERING,
    /** Supply or coil-leaving air (supply-side traverse). */
    LEAVING;

    public String key() {
        return Check.key(this);
    }

    public static AirflowPoint parse(String field, String key) {
        return Check.choice(field, AirflowPoint.class, key);
    }
}
