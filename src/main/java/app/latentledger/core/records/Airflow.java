package app.latentledger.core.records;

import app.latentledger.core.measure.AirflowPoint;

/**
 * Volumetric airflow through the coil.
 *
 * @param volume m³/s with tolerance in m³/s
 * @param point  where it was measured
 * @param method how it was obtained, e.g. "flow grid in filter slot", "return flow hood", "blower table"
 */
public record Airflow(Measurement volume, AirflowPoint point, String method) {
    public Airflow {
        Check.present("airflow", volume);
        Check.present("airflow point", point);
        method = Check.optionalText("airflow method", method, 200);
    }
}
