package app.latentledger.cli;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

import java.io.IOException;
import java.io.StringReader;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Reads a batch file: UTF-8 CSV (RFC 4180 quoting), a header line naming {@link BatchColumns},
 * then one row per system. Blank lines and lines starting with {@code #} are skipped. A file that
 * cannot be read at all (missing, not UTF-8, unknown or repeated column, a required column absent)
 * is refused as a whole; anything wrong inside a row is that row's refusal, found later.
 */
final class BatchCsv {
    /** Far beyond any subdivision or utility program; a bigger file is a mistake, not a batch. */
    static final long MAX_BYTES = 64L << 20;
    private static final List<String> REQUIRED = List.of(BatchColumns.SITE, BatchColumns.SYSTEM, "return-db",
            "supply-db", "airflow");

    /**
     * One row of the file.
     *
     * @param line  the line of the file it starts on (the header is line 1 when it is the first line)
     * @param cells cell text by column name, in header order
     * @param extra cells beyond the header's columns (a row with more cells than the header)
     */
    record Row(int line, Map<String, String> cells, int extra) {
        String cell(String column) {
            String v = cells.get(column);
            return v == null ? "" : v;
        }
    }

    private BatchCsv() {
    }

    static List<Row> read(Path file) {
        byte[] bytes;
        try {
            if (Files.isDirectory(file)) {
                throw new UsageException(file + " is a folder; give a CSV file");
            }
            if (Files.size(file) > MAX_BYTES) {
                throw new UsageException(file + " is larger than " + (MAX_BYTES >> 20) + " MiB; split it into"
                        + " smaller batches");
            }
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new UsageException("no such file: " + file);
        } catch (IOException e) {
            throw new UsageException("cannot read " + file + ": " + e.getMessage());
        }
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            throw new UsageException(file + " is not UTF-8 text; save it as CSV UTF-8");
        }
        return parse(file.getFileName().toString(), text);
    }

    static List<Row> parse(String name, String text) {
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        int[] lineStarts = lineStarts(text);
        CSVFormat format = CSVFormat.DEFAULT.builder().setCommentMarker('#').setIgnoreEmptyLines(true)
                .setIgnoreSurroundingSpaces(false).get();
        List<Row> rows = new ArrayList<>();
        try (CSVParser parser = CSVParser.parse(new StringReader(text), format)) {
            List<String> header = null;
            for (CSVRecord r : parser) {
                int line = line(lineStarts, r.getCharacterPosition());
                if (r.hasComment()) {
                    // the record's position is where its comment lines begin
                    line += r.getComment().split("\n", -1).length;
                }
                if (header == null) {
                    header = header(name, r, line);
                    continue;
                }
                if (r.size() == 1 && r.get(0).isBlank()) {
                    continue;
                }
                Map<String, String> cells = new LinkedHashMap<>();
                for (int i = 0; i < header.size(); i++) {
                    cells.put(header.get(i), i < r.size() ? r.get(i) : "");
                }
                rows.add(new Row(line, Collections.unmodifiableMap(cells), Math.max(0, r.size() - header.size())));
            }
            if (header == null) {
                throw new UsageException(name + " is empty: it needs a header line (see: batch --template)");
            }
        } catch (IOException | java.io.UncheckedIOException e) {
            throw new UsageException(name + " is not readable CSV: " + e.getMessage());
        }
        return rows;
    }

    private static List<String> header(String name, CSVRecord r, int line) {
        List<String> header = new ArrayList<>();
        Set<String> seen = new LinkedHashSet<>();
        for (String h : r) {
            String c = BatchColumns.normalise(h);
            if (!BatchColumns.ALL.containsKey(c)) {
                String near = Args.closest(c, BatchColumns.ALL.keySet());
                throw new UsageException(name + " line " + line + ": unknown column '" + h.strip() + "'"
                        + (near == null ? "" : "; did you mean " + near + "?") + " (see: batch --template, docs/batch.md)");
            }
            if (!seen.add(c)) {
                throw new UsageException(name + " line " + line + ": column " + c + " appears twice");
            }
            header.add(c);
        }
        for (String c : REQUIRED) {
            if (!seen.contains(c)) {
                throw new UsageException(name + " line " + line + ": the header has no " + c + " column; needed: "
                        + String.join(", ", REQUIRED) + " (see: batch --template)");
            }
        }
        return header;
    }

    private static int[] lineStarts(String text) {
        int[] starts = new int[16];
        int n = 0;
        starts[n++] = 0;
        for (int i = 0; i < text.length(); i++) {
            if (text.charAt(i) == '\n') {
                if (n == starts.length) {
                    starts = Arrays.copyOf(starts, n * 2);
                }
                starts[n++] = i + 1;
            }
        }
        return Arrays.copyOf(starts, n);
    }

    /** The 1-based line holding character {@code position}. */
    private static int line(int[] starts, long position) {
        int i = Arrays.binarySearch(starts, (int) position);
        return (i >= 0 ? i : -i - 2) + 1;
    }
}
