package app.latentledger.io.logcsv;

import app.latentledger.core.cycles.LogSeries;

/** A log read from a file: the series and what the import found on the way. */
public record LogImport(LogSeries series, ImportReport report) {
}
