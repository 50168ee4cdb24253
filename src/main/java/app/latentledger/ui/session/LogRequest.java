package app.latentledger.ui.session;

import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.records.Visit;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.io.logcsv.DateOrder;
import app.latentledger.store.Ledger;

import java.time.ZoneId;
import java.util.Map;

/**
 * Everything a log import and analysis needs besides the file. The pressure and the airflow used
 * come from the visit by the one rule of {@link app.latentledger.core.visit.LogConditions}; the
 * typed airflow is used only when no reading set has one.
 *
 * @param ledger           where the log is kept with its visit
 * @param visit            the visit the logger was left on
 * @param airflowM3PerS    airflow the tech typed, m³/s, NaN when none
 * @param fanAirflowM3PerS fan-only airflow the tech typed, m³/s, NaN when the same as during runs
 * @param units            units of the file's temperature columns (unless its headers say) and of the figures
 * @param thresholds       finding thresholds of the settings
 * @param headerMap        the logger's header → generic field name, empty for the generic layout
 * @param dateOrder        how dates that are not ISO-8601 are read
 * @param zone             zone of clock times without a UTC offset, null for the tablet's
 */
public record LogRequest(Ledger ledger, Visit visit, double airflowM3PerS, double fanAirflowM3PerS, UnitSystem units,
                         ThresholdSettings thresholds, Map<String, String> headerMap, DateOrder dateOrder,
                         ZoneId zone) {
    public LogRequest {
        headerMap = Map.copyOf(headerMap);
    }
}
