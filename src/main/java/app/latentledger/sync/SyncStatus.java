package app.latentledger.sync;

import java.util.List;
import java.util.Optional;

/**
 * Where this tablet stands with the office: for {@code office status} and Settings → Office.
 *
 * @param account   the office, or empty when not enrolled
 * @param lastSync  the last sync's time, outcome and message, or empty before the first
 * @param waiting   records changed here that the office does not have yet (deletions included)
 * @param refusals  records the office refused, with why (they are among those waiting)
 */
public record SyncStatus(Optional<OfficeAccount> account, Optional<SyncState.LastSync> lastSync, int waiting,
                         List<SyncReport.Refused> refusals) {
    public SyncStatus {
        refusals = List.copyOf(refusals);
    }
}
