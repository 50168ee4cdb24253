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
 * @param kept           what it was analysed with at import (null for a log kept before they were stored)
 */
public record ImportedLog(String id, String visitId, String sourceFileName, String columnMapping,
                          OffsetDateTime importedAt, LogSamples samples, KeptConditions kept) {
    /**
     * The airflows and clock a log was imported with, kept with it so its figures never change
     * silently afterwards.
     *
     * @param airflowM3PerS    airflow during runs, m³/s, NaN when none was known
     * @param airflowFrom      where it came from ("reading set Before", "given at import", "")
     * @param fanAirflowM3PerS airflow with the blower alone, m³/s, NaN when the same as during runs
     * @param timeZone         zone id or fixed offset ("America/New_York", "-04:00") the clock times
     *                         are shown in, "" for an elapsed-seconds log or a clock without a zone
     */
    public record KeptConditions(double airflowM3PerS, String airflowFrom, double fanAirflowM3PerS, String timeZone) {
        public KeptConditions {
            airflowFrom = Check.optionalText("log airflow source", airflowFrom, 200);
            timeZone = Check.optionalText("log time zone", timeZone, 64);
            if (!Double.isNaN(airflowM3PerS) && !(airflowM3PerS > 0)) {
                throw new InvalidRecordException("log airflow", airflowM3PerS + " m³/s is not a positive airflow");
            }
            if (!Double.isNaN(fanAirflowM3PerS) && !(fanAirflowM3PerS > 0)) {
                throw new InvalidRecordException("log fan-only airflow", fanAirflowM3PerS
                        + " m³/s is not a positive airflow");
            }
        }
    }

    /** A log without stored conditions (kept before they were stored, or read from an older bundle). */
    public ImportedLog(String id, String visitId, String sourceFileName, String columnMapping,
                       OffsetDateTime importedAt, LogSamples samples) {
        this(id, visitId, sourceFileName, columnMapping, importedAt, samples, null);
    }

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
