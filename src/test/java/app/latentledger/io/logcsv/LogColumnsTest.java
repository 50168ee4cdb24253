package app.latentledger.io.logcsv;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/**
 * The header row read on its own for the app's column picker: the columns it says are known by name
 * are exactly those the importer reads without a header map, so the picker never asks about a column
 * the importer already reads, nor leaves out one it cannot.
 */
class LogColumnsTest {
    @TempDir
    Path dir;

    @Test
    void readsOnlyTheFirstLineSplitAndCleanedAsTheImporterDoes() throws Exception {
        Path f = dir.resolve("other.csv");
        // byte-order mark, quotes, semicolons and a decimal comma in the rows, as another logger writes
        Files.writeString(f, "\uFEFF\"Date/Time\";RA Temp [°C];return_db [°C];Supply_DB;;RA RH [%]\n"
                + "2026-07-16 00:00:00;23,6;23,6;13,0;;54\n", StandardCharsets.UTF_8);
        LogColumns c = LogColumns.read(f);
        assertEquals(List.of(new LogColumns.Column("Date/Time", null), new LogColumns.Column("RA Temp [°C]", null),
                new LogColumns.Column("return_db [°C]", "return_db"), new LogColumns.Column("Supply_DB", "supply_db"),
                new LogColumns.Column("RA RH [%]", null)), c.columns());
        assertEquals(List.of("Date/Time", "RA Temp [°C]", "RA RH [%]"),
                c.unknown().stream().map(LogColumns.Column::header).toList());
    }

    @Test
    void theColumnsKnownByNameAreTheOnesTheImporterReadsWithoutAMap() throws Exception {
        String[] headers = {"time", "SECONDS_x", "return_db (degF)", "supply_db °C", "coil_temp [F]", "outdoor_db degC",
            "return_rh", "fan", "Compressor", "Y1", "RA Temp", "supply_wb_", "battery [V]"};
        HeaderLayout layout = HeaderLayout.read(headers, Map.of());
        Map<String, String> known = new LinkedHashMap<>();
        for (LogColumns.Column c : LogColumns.of(String.join(",", headers)).columns()) {
            if (c.known()) {
                known.put(c.header(), c.field());
            }
        }
        assertEquals(layout.columns, known);
    }

    @Test
    void anEmptyFileHasNoHeaderRow() throws Exception {
        Path f = dir.resolve("empty.csv");
        Files.writeString(f, "\n\n");
        assertThrows(LogRefusedException.class, () -> LogColumns.read(f));
    }

    @Test
    void theCommandLinesMapIsSplitAtTheLastEqualsSign() {
        assertEquals(Map.of("A=B", "time", "RA", "return_db"), HeaderMap.parse(List.of("A=B=time", "RA=return_db")));
    }
}
