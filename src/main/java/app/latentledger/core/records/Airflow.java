package app.latentledger.core.records;

import app.latentledger.core.measure.AirflowBasis;
import app.latentledger.core.measure.AirflowPoint;

/**
 * Volumetric airflow through the coil.
 *
 * @param volume m³/s with tolerance in m³/s
 * @param point  where it was measured
 * @param method how it was obtained, e.g. "flow grid in filter slot", "return flow hood", "blower table"
 * @param basis  whether the number is an actual volume or standard cfm (0.075 lb/ft³)
 */
public record Airflow(Measurement volume, AirflowPoint point, String method, AirflowBasis basis) {
    public Airflow {
        Check.present("airflow", volume);
        Check.present("airflow point", point);
        method = Check.optionalText("airflow method", method, 200);
        Check.present("airflow basis", basis);
    }

    /** An actual (volume) airflow, as every reading set before the basis was asked for. */
    public Airflow(Measurement volume, AirflowPoint point, String method) {
        this(volume, point, method, AirflowBasis.ACTUAL);
    }
}
