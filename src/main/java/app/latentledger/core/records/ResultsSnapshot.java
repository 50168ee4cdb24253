package app.latentledger.core.records;

import java.time.OffsetDateTime;
import java.time.temporal.ChronoUnit;

/**
 * Results and findings exactly as the app showed them on the day, kept as the JSON the app
 * printed. Formulas and thresholds change between versions; a report made from a snapshot does
 * not, and the app version says which code made it.
 *
 * @param id          stable id
 * @param subject     what it was computed from
 * @param subjectId   the reading set's or log's id
 * @param appVersion  version of the app that computed it
 * @param computedAt  when
 * @param json        the results and findings, a JSON object as text
 */
public record ResultsSnapshot(String id, SnapshotSubject subject, String subjectId, String appVersion,
                              OffsetDateTime computedAt, String json) {
    public ResultsSnapshot {
        id = Check.id("snapshot id", id);
        Check.present("snapshot subject", subject);
        subjectId = Check.id("snapshot " + subject.key(), subjectId);
        appVersion = Check.text("snapshot app version", appVersion, 50);
        computedAt = Check.present("snapshot computed-at", computedAt).truncatedTo(ChronoUnit.SECONDS);
        json = Check.text("snapshot results", json, 5_000_000);
        if (!json.startsWith("{") || !json.endsWith("}")) {
            throw new InvalidRecordException("snapshot results", "must be a JSON object");
        }
    }
}
