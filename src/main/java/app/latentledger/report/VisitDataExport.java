package app.latentledger.report;

import app.latentledger.core.findings.Cautions;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.Ledger;
import com.google.gson.GsonBuilder;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Open export of one visit's data as CSV or JSON (docs/data-export.md): the same rows either way,
 * worked out by {@link VisitEvidence} like the PDF report, so a number in the report can be found
 * in the export.
 */
public final class VisitDataExport {
    /** Export file formats. */
    public enum Format {
        CSV, JSON;

        public static Format parse(String text) {
            for (Format f : values()) {
                if (f.name().equalsIgnoreCase(text.trim())) {
                    return f;
                }
            }
            throw new IllegalArgumentException("'" + text + "' is not an export format; use csv or json");
        }

        public String key() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /** Identifies the JSON layout; bumped when a field changes meaning. */
    public static final String JSON_FORMAT = "latent-ledger-visit-data";
    public static final int JSON_VERSION = 1;

    private VisitDataExport() {
    }

    /** The rows of a visit. */
    public static List<DataRow> rows(Ledger ledger, String visitId, UnitSystem units) {
        return VisitDataRows.of(VisitEvidence.load(ledger, visitId, units), units);
    }

    /**
     * Writes the visit's data to {@code output} (complete or not at all).
     *
     * @throws ReportRefusedException for an unknown visit or an output path that cannot be written
     */
    public static Path write(Ledger ledger, String visitId, Format format, UnitSystem units, Path output) {
        List<DataRow> rows = rows(ledger, visitId, units);
        String text = format == Format.CSV ? csv(rows) : json(rows, units);
        return VisitReport.SafeFile.write(output, out -> write(text, out));
    }

    private static void write(String text, OutputStream out) throws IOException {
        Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
        w.write(text);
        w.flush();
    }

    /** RFC 4180 CSV with a header row; numbers with a decimal point, empty when there is none. */
    public static String csv(List<DataRow> rows) {
        StringWriter w = new StringWriter();
        try (CSVPrinter p = new CSVPrinter(w, CSVFormat.RFC4180.builder().setHeader(DataRow.COLUMNS).get())) {
            for (DataRow r : rows) {
                p.printRecord(cell(r.visitId()), cell(r.source()), cell(r.sourceId()), cell(r.sourceLabel()),
                        cell(r.record()), cell(r.key()), cell(r.label()), number(r.value()), cell(r.unit()),
                        number(r.plusMinus()), cell(r.plusMinusKind()), cell(r.findingCode()), cell(r.text()));
            }
        } catch (IOException e) {
            throw new IllegalStateException("writing to a string cannot fail", e);
        }
        return w.toString();
    }

    /**
     * A text cell a spreadsheet will not run: one starting with {@code = + - @}, a tab or a carriage
     * return is written with a leading apostrophe, which spreadsheets show as text (OWASP, "CSV
     * Injection"). Number cells are written by {@link #number} and never changed.
     */
    static String cell(String text) {
        if (text == null || text.isEmpty()) {
            return text;
        }
        char c = text.charAt(0);
        return c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r' ? "'" + text : text;
    }

    private static String number(double v) {
        return Double.isFinite(v) ? Double.toString(v) : "";
    }

    /**
     * The same rows grouped: the visit's facts, then each reading set and log with its readings,
     * results and findings (each finding with its evidence and next checks). Nulls for no number.
     */
    public static String json(List<DataRow> rows, UnitSystem units) {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("format", JSON_FORMAT);
        root.put("version", JSON_VERSION);
        root.put("units", units.key());
        root.put("visitId", rows.isEmpty() ? null : rows.get(0).visitId());
        Map<String, Object> visit = new LinkedHashMap<>();
        Map<String, Map<String, Object>> sources = new LinkedHashMap<>();
        for (DataRow r : rows) {
            if (r.source().equals("visit")) {
                visit.put(r.key(), r.unit().isEmpty() ? r.text() : quantity(r));
                continue;
            }
            Map<String, Object> s = sources.computeIfAbsent(r.sourceId(), id -> source(r));
            switch (r.record()) {
                case "info" -> info(s).put(r.key(), r.text());
                case "reading" -> list(s, "readings").add(reading(r));
                case "result" -> list(s, "results").add(result(r));
                case "finding" -> list(s, "findings").add(finding(r));
                case "technical" -> lastFinding(s).put("technical", r.text());
                case "evidence" -> list(lastFinding(s), "evidence").add(result(r));
                case "next-check" -> list(lastFinding(s), "nextChecks").add(r.text());
                default -> throw new IllegalStateException("unknown record " + r.record());
            }
        }
        root.put("visit", visit);
        List<Object> sets = new ArrayList<>();
        List<Object> logs = new ArrayList<>();
        for (Map<String, Object> s : sources.values()) {
            (s.get("source").equals("log") ? logs : sets).add(s);
        }
        root.put("readingSets", sets);
        root.put("logs", logs);
        root.put("safety", Cautions.SAFETY_LINE);
        return new GsonBuilder().setPrettyPrinting().serializeNulls().disableHtmlEscaping().create().toJson(root) + "\n";
    }

    private static Map<String, Object> source(DataRow r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("source", r.source());
        m.put("id", r.sourceId());
        m.put("label", r.sourceLabel());
        m.put("info", new LinkedHashMap<String, Object>());
        m.put("readings", new ArrayList<>());
        m.put("results", new ArrayList<>());
        m.put("findings", new ArrayList<>());
        return m;
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> info(Map<String, Object> s) {
        return (Map<String, Object>) s.get("info");
    }

    @SuppressWarnings("unchecked")
    private static List<Object> list(Map<String, Object> m, String key) {
        return (List<Object>) m.computeIfAbsent(key, k -> new ArrayList<>());
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> lastFinding(Map<String, Object> s) {
        List<Object> f = list(s, "findings");
        return (Map<String, Object>) f.get(f.size() - 1);
    }

    private static Map<String, Object> quantity(DataRow r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("value", finite(r.value()));
        m.put("unit", r.unit());
        return m;
    }

    private static Map<String, Object> reading(DataRow r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("key", r.key());
        m.put("label", r.label());
        m.put("value", finite(r.value()));
        m.put("unit", r.unit());
        m.put("tolerance", finite(r.plusMinus()));
        m.put("kind", r.text());
        return m;
    }

    private static Map<String, Object> result(DataRow r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("key", r.key());
        m.put("label", r.label());
        m.put("value", finite(r.value()));
        m.put("unit", r.unit());
        m.put("uncertainty", finite(r.plusMinus()));
        if (!r.text().isEmpty()) {
            m.put("text", r.text());
        }
        return m;
    }

    private static Map<String, Object> finding(DataRow r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("code", r.key());
        m.put("severity", r.label());
        m.put("message", r.text());
        m.put("technical", "");
        m.put("evidence", new ArrayList<>());
        m.put("nextChecks", new ArrayList<>());
        return m;
    }

    private static Double finite(double v) {
        return Double.isFinite(v) ? v : null;
    }
}
