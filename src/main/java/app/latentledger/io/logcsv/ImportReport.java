package app.latentledger.io.logcsv;

import java.util.List;
import java.util.Map;

/**
 * What the import kept, dropped and noticed.
 *
 * @param delimiter          the column separator found (',', ';' or tab)
 * @param decimalComma       numbers read with a decimal comma
 * @param timeField          "time" (ISO-8601) or "seconds" (elapsed)
 * @param timesHaveOffset    ISO times carried a UTC offset
 * @param columns            header as written → field it was read as
 * @param ignoredHeaders     headers not read (not a known field and not mapped)
 * @param rowsRead           data rows in the file
 * @param rowsKept           rows in the series
 * @param rejectedCount      rows kept out for bad content
 * @param rejected           the first {@link LogCsvImporter#MAX_MESSAGES} of them as "line:column: message"
 * @param outOfOrder         rows whose time was earlier than a row before them (the series is sorted)
 * @param duplicates         rows dropped because another row had the same time
 * @param medianIntervalS    usual sample interval, s
 * @param gaps               intervals longer than 3 × the usual one
 * @param longestGapS        longest such interval, s (0 when none)
 * @param irregularIntervals intervals off the usual one by more than 10 % but not gaps
 * @param temperatureUnit    the unit the temperature columns were read in
 * @param unitFromHeader     true when a header stated it, false when it is the settings' unit
 * @param dateOrder          how slashed dates were read, null for ISO-8601 times or elapsed seconds
 * @param timeZone           zone the clock times without a UTC offset were read in, "" when the file
 *                           had offsets, no clock, or no zone was given
 */
public record ImportReport(char delimiter, boolean decimalComma, String timeField, boolean timesHaveOffset,
                           Map<String, String> columns, List<String> ignoredHeaders, int rowsRead, int rowsKept,
                           int rejectedCount, List<String> rejected, int outOfOrder, int duplicates,
                           double medianIntervalS, int gaps, double longestGapS, int irregularIntervals,
                           app.latentledger.core.units.UnitSystem temperatureUnit, boolean unitFromHeader,
                           DateOrder dateOrder, String timeZone) {
    public ImportReport {
        columns = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(columns));
        ignoredHeaders = List.copyOf(ignoredHeaders);
        rejected = List.copyOf(rejected);
        timeZone = timeZone == null ? "" : timeZone;
    }

    /** "°C, as the headers state" or "°F, the settings' unit" (for the tech to see which was used). */
    public String temperatureUnitText() {
        return app.latentledger.core.units.Quantity.TEMPERATURE.symbol(temperatureUnit)
                + (unitFromHeader ? ", as the headers state" : ", the settings' unit");
    }
}
