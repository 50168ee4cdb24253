package app.latentledger.bundle;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.LogSamples;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.records.VisitPaperwork;
import app.latentledger.core.visit.RecordRules;
import com.google.gson.JsonElement;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

/**
 * The bundle's record objects one at a time, for other ways records travel (the office sync): the
 * same field names, shapes and checks as {@code site.json}, {@code systems.json}, {@code visits.json},
 * {@code logs.json}, {@code instruments.json}, {@code paperwork.json}, a row of {@code readings.csv}
 * and the bytes of {@code logs/<id>.csv} (docs/bundle-format.md). Reading refuses with a
 * {@link BundleException} naming the field, or with the record's own
 * {@link IllegalArgumentException} naming field, value and range.
 */
public final class BundleObjects {
    private BundleObjects() {
    }

    /** An instrument object: the instrument and the reading sets it took ({@code usedOn}). */
    public record InstrumentObject(Instrument instrument, List<String> usedOn) {
        public InstrumentObject {
            usedOn = List.copyOf(usedOn);
        }
    }

    public static JsonObject site(Site s) {
        return RecordsJson.site(s);
    }

    public static Site site(JsonObject o) throws BundleException {
        return RecordsJson.site(new JsonFields(o, "site"));
    }

    public static JsonObject system(HvacSystem s) {
        return RecordsJson.system(s);
    }

    public static HvacSystem system(JsonObject o) throws BundleException {
        return RecordsJson.system(new JsonFields(o, "system"));
    }

    public static JsonObject visit(Visit v) {
        return RecordsJson.visit(v);
    }

    public static Visit visit(JsonObject o) throws BundleException {
        return RecordsJson.visit(new JsonFields(o, "visit"));
    }

    public static JsonObject instrument(Instrument i, List<String> usedOn) {
        return PaperworkJson.instrument(i, usedOn);
    }

    public static InstrumentObject instrument(JsonObject o) throws BundleException {
        JsonFields f = new JsonFields(o, "instrument");
        return new InstrumentObject(PaperworkJson.instrument(f), o.has("usedOn") ? f.texts("usedOn") : List.of());
    }

    public static JsonObject paperwork(VisitPaperwork w) {
        return PaperworkJson.paperwork(w);
    }

    public static VisitPaperwork paperwork(JsonObject o) throws BundleException {
        return PaperworkJson.paperwork(new JsonFields(o, "paperwork"));
    }

    /** A site's house facts as {@code house.json} writes them (with the site's id). */
    public static JsonObject houseFacts(app.latentledger.core.house.HouseFacts f, String siteId) {
        return HouseJson.facts(f, siteId);
    }

    /** The house facts in the {@code facts} member of {@code o}, or null when it is absent or null. */
    public static app.latentledger.core.house.HouseFacts houseFacts(JsonObject o) throws BundleException {
        return HouseJson.facts(new JsonFields(o, "house"));
    }

    /** One visit's house readings as an item of {@code house.json}'s {@code readings} list. */
    public static JsonObject houseReadings(String visitId, app.latentledger.core.house.HouseVisitReadings r) {
        return HouseJson.readings(new BundleContent.VisitHouse(visitId, r));
    }

    public static app.latentledger.core.house.HouseVisitReadings houseReadings(JsonObject o) throws BundleException {
        return HouseJson.visitReadings(new JsonFields(o, "house readings")).readings();
    }

    /** The log object of {@code logs.json} (metadata; the samples are {@link #logSamples}). */
    public static JsonObject log(ImportedLog l) {
        return LogJson.write(l);
    }

    /** The exact bytes the bundle writes as {@code logs/<id>.csv}. */
    public static byte[] logSamples(LogSamples s) {
        return LogCsv.write(s).getBytes(StandardCharsets.UTF_8);
    }

    /**
     * A log from its object and its samples' bytes, read and checked as a bundle's log is (header,
     * count, numbers, {@link app.latentledger.core.visit.RecordRules#log}).
     */
    public static ImportedLog log(JsonObject o, byte[] samplesCsv) throws BundleException {
        JsonFields f = new JsonFields(o, "log");
        LogJson.Meta meta = LogJson.meta(f, "log");
        String entry = LogCsv.entry(f.text("id"));
        LogSamples samples;
        try {
            samples = LogCsv.read(new StringReader(new String(samplesCsv, StandardCharsets.UTF_8)), entry,
                    meta.timeBase(), meta.names(), meta.units(), meta.sampleCount(),
                    new long[] {app.latentledger.core.records.RecordLimits.LOG_MAX_SAMPLES});
        } catch (IOException e) {
            throw new UncheckedIOException(e); // a string reader does not fail
        }
        ImportedLog.KeptConditions kept;
        try {
            // the conditions the log was analysed with where it was made, checked as a bundle's are
            kept = RecordRules.keptConditions(HouseJson.kept(f));
        } catch (IllegalArgumentException e) {
            throw new BundleException("log " + f.text("id") + " kept: " + e.getMessage(), e);
        }
        return new ImportedLog(f.text("id"), f.text("visitId"), f.text("sourceFileName"),
                f.optionalText("columnMapping"), f.time("importedAt"), samples, kept);
    }

    /** The metadata a log object declares about its samples, checked without them. */
    public record LogShape(String timeBase, List<String> channelNames, List<String> channelUnits, int sampleCount) {
    }

    public static LogShape logShape(JsonObject o) throws BundleException {
        LogJson.Meta m = LogJson.meta(new JsonFields(o, "log"), "log");
        return new LogShape(m.timeBase().key(), m.names(), m.units(), m.sampleCount());
    }

    /** Every column of {@code readings.csv} (the optional ones too), in order. */
    public static List<String> readingColumns() {
        return Stream.concat(ReadingsCsv.HEADER.stream(), ReadingsCsv.OPTIONAL.stream()).toList();
    }

    /** Whether a {@code readings.csv} column holds words (else an SI number or nothing). */
    public static boolean isTextColumn(String column) {
        return ReadingsCsv.TEXT_COLUMNS.contains(column);
    }

    /**
     * A reading set as one {@code readings.csv} row, keyed by column name: words as strings, numbers
     * as JSON numbers (SI), an empty cell as null. Made by the bundle's own writer, so every value
     * is the one a bundle holds.
     */
    public static JsonObject readingRow(ReadingSet r) {
        JsonObject o = new JsonObject();
        try (CSVParser parser = CSVParser.parse(new StringReader(ReadingsCsv.write(List.of(r))),
                CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get())) {
            CSVRecord row = parser.getRecords().get(0);
            for (String column : readingColumns()) {
                String cell = row.get(column);
                if (isTextColumn(column)) {
                    o.addProperty(column, cell);
                } else if (cell.isEmpty()) {
                    o.add(column, JsonNull.INSTANCE);
                } else {
                    o.addProperty(column, Double.parseDouble(cell));
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return o;
    }

    /**
     * A reading set from a row object, read by the bundle's own reader. A column that is absent
     * reads as empty; a word where a number belongs (or the reverse) is refused naming the column.
     */
    public static ReadingSet readingSet(JsonObject o) throws BundleException {
        List<String> columns = readingColumns();
        List<String> cells = new ArrayList<>();
        for (String column : columns) {
            JsonElement e = o.get(column);
            if (e == null || e.isJsonNull()) {
                cells.add("");
            } else if (!e.isJsonPrimitive()) {
                throw new BundleException("reading set: field \"" + column + "\" must be "
                        + (isTextColumn(column) ? "text" : "a number") + " or null");
            } else if (isTextColumn(column)) {
                JsonPrimitive p = e.getAsJsonPrimitive();
                if (!p.isString()) {
                    throw new BundleException("reading set: field \"" + column + "\" must be text");
                }
                cells.add(p.getAsString());
            } else {
                JsonPrimitive p = e.getAsJsonPrimitive();
                if (!p.isNumber()) {
                    throw new BundleException("reading set: field \"" + column + "\" must be a number");
                }
                cells.add(cell(p.getAsDouble(), column));
            }
        }
        StringWriter w = new StringWriter();
        try (CSVPrinter p = new CSVPrinter(w, CSVFormat.RFC4180.builder().setHeader(columns.toArray(String[]::new)).get())) {
            p.printRecord(cells);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        List<ReadingSet> read = ReadingsCsv.read(w.toString(), new ArrayList<>());
        return read.get(0);
    }

    /** A number as the CSV writer writes it; a whole number as plain digits, so a 0/1 flag reads as one. */
    private static String cell(double v, String column) throws BundleException {
        if (!Double.isFinite(v)) {
            throw new BundleException("reading set: field \"" + column + "\" " + v + " is not a finite number");
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return new BigDecimal(v).toPlainString();
        }
        return Double.toString(v);
    }
}
