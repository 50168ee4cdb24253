package app.latentledger.core.measure;

/**
 * Where the airflow was measured. With an actual (volume) reading this decides the specific volume
 * that turns it into a dry-air mass flow (ASHRAE Handbook—Fundamentals 2017 ch. 1, eq. 28 for v): the
 * same cfm is about 4 % more mass in 55 °F supply air than in 75 °F return air.
 */
public enum AirflowPoint {
    /** Return or mixed air, upstream of the coil (a return flow hood, a flow grid in the filter slot). */
    ENTERING("entering", "return side"),
    /** Supply air, downstream of the coil (a supply traverse). */
    LEAVING("leaving", "supply side");

    private final String key;
    private final String label;

    AirflowPoint(String key, String label) {
        this.key = key;
        this.label = label;
    }

    /** Stable key: stored records, JSON ("entering" | "leaving"). */
    public String key() {
        return key;
    }

    public String label() {
        return label;
    }

    public static AirflowPoint parse(String field, String key) {
        return Choices.parse(field, AirflowPoint.class, key, AirflowPoint::key);
    }
}
