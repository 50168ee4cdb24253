package app.latentledger.io.logcsv;


import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * A log file's header row, read on its own before an import, so a screen can ask what each column
 * the importer does not know by name holds. Only the first line is read, as the importer reads it (the
 * same length limit); the header is split and cleaned as the importer splits and cleans it.
 *
 * @param columns every named column, in file order
 */
public record LogColumns(List<Column> columns) {
    /**
     * One column of the header row.
     *
     * @param header the header as written (quotes and byte-order mark removed)
     * @param field  the field the importer reads it as by its name alone ("time", "seconds",
     *               "return_db", …), or null when it needs a header map entry to be read
     */
    public record Column(String header, String field) {
        public boolean known() {
            return field != null;
        }
    }

    public LogColumns {
        columns = List.copyOf(columns);
    }

    /** The columns the importer does not know by name, in file order. */
    public List<Column> unknown() {
        return columns.stream().filter(c -> !c.known()).toList();
    }

    /**
     * Reads the first line of {@code file} (UTF-8, undecodable bytes replaced).
     *
     * @throws LogRefusedException when the file has no first line or it is too long to be a header
     */
    public static LogColumns read(Path file) throws IOException, LogRefusedException {
        try (Reader r = new InputStreamReader(Files.newInputStream(file), StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPLACE).onUnmappableCharacter(CodingErrorAction.REPLACE))) {
            return of(LogCsvImporter.firstLine(new RowSplitter(r, ',')));
        }
    }

    /** The columns of one header line. */
    static LogColumns of(String headerLine) throws IOException, LogRefusedException {
        if (headerLine == null || headerLine.isBlank()) {
            throw new LogRefusedException("the file is empty: a log needs a header row and sample rows");
        }
        List<Column> out = new ArrayList<>();
        RowSplitter row = new RowSplitter(new StringReader(headerLine), LogCsvImporter.sniffDelimiter(headerLine));
        if (row.next()) {
            for (String name : LogCsvImporter.names(row)) {
                if (!name.isEmpty()) {
                    out.add(new Column(name, HeaderLayout.fieldByName(name)));
                }
            }
        }
        return new LogColumns(out);
    }
}
