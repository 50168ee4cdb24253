package app.latentledger.ui.session;

import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.records.Visit;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.Ledger;

import java.util.Map;

/**
 * Everything a log import and analysis needs besides the file.
 *
 * @param ledger        where the log is kept with its visit
 * @param visit         the visit the logger was left on
 * @param pressurePa    site pressure the analysis uses, Pa
 * @param airflowM3PerS air handler airflow for the masses, m³/s, NaN when not known
 * @param units         units of the file's temperature columns and of the figures shown
 * @param thresholds    finding thresholds of the settings
 * @param headerMap     the logger's header → generic field name, empty for the generic layout
 */
public record LogRequest(Ledger ledger, Visit visit, double pressurePa, double airflowM3PerS, UnitSystem units,
                         ThresholdSettings thresholds, Map<String, String> headerMap) {
    public LogRequest {
        headerMap = Map.copyOf(headerMap);
    }
}
