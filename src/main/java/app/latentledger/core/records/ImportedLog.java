package app.latentledger.core.records;

import java.time.OffsetDateTime;
import java.time.temporal.ChronoUnit;

/**
 * A data-logger file brought into a visit. The samples are stored beside it; this is what the tech
 * sees in a list.
 *
 * @param id             stable id
 * @param visitId        the visit the logger was left on
 * @param sourceFileName the file's name as imported (no folders)
 * @param columnMapping  how the file's headers were read, e.g. "Temp1=return_db; RH1=return_rh"
 * @param importedAt     when it was imported
 * @param samples        the data
 */
public record ImportedLog(String id, String visitId, String sourceFileName, String columnMapping,
                          OffsetDateTime importedAt, LogSamples samples) {
    public ImportedLog {
        id = Check.id("log id", id);
        visitId = Check.id("log visit", visitId);
        sourceFileName = Check.text("log source file name", sourceFileName, 255);
        if (sourceFileName.contains("/") || sourceFileName.contains("\\")) {
            throw new InvalidRecordException("log source file name", "'" + sourceFileName + "' holds a folder; give the file name only");
        }
        columnMapping = Check.optionalText("log column mapping", columnMapping, 10_000);
        importedAt = Check.present("log imported-at", importedAt).truncatedTo(ChronoUnit.SECONDS);
        Check.present("log samples", samples);
    }
}
