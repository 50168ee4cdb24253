package app.latentledger.cli;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.CoilVerdict;
import app.latentledger.core.coil.Estimate;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.report.BatchCells;
import app.latentledger.report.BatchSummary;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The batch's results: one JSON object per input row ({@code --json} and {@code --out FILE.json}),
 * one CSV line per input row ({@code --out FILE.csv}), and the summary object. Every figure is the
 * {@code coil --json} figure with its k = 2 uncertainty, in the results' units.
 */
final class BatchResults {
    private BatchResults() {
    }

    /**
     * What happened to one row after checking: where its report went and what was stored.
     *
     * @param visitId   the stored visit's id, or null when not stored
     * @param notStored why a checked row was not stored under {@code --store}, or null
     * @param report    the row's report file name, or null
     */
    record Row(BatchCheck.Outcome outcome, String visitId, String notStored, String report) {
    }

    static Map<String, Object> json(Row r, UnitSystem units) {
        BatchCheck.Outcome o = r.outcome();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("line", o.row().line());
        m.put("site", o.site());
        m.put("system", o.system());
        if (o.refused() != null) {
            m.put("refused", o.refused().json());
            return m;
        }
        CoilResult result = o.checked().result();
        m.put("verdict", result.verdict().key());
        m.put("findings", codes(result));
        m.put("visitId", r.visitId());
        if (r.notStored() != null) {
            m.put("notStored", r.notStored());
        }
        m.put("report", r.report());
        m.put("figures", CoilJson.of(result, units));
        return m;
    }

    static List<String> codes(CoilResult result) {
        List<String> codes = new ArrayList<>();
        for (Finding f : result.findings()) {
            codes.add(f.code().key());
        }
        return codes;
    }

    static Map<String, Object> summary(BatchSummary s, int stored, String reportsFolder, String summaryFile) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("source", s.source());
        m.put("units", s.units().key());
        m.put("rows", s.systems().size() + s.refused().size());
        m.put("checked", s.systems().size());
        m.put("refused", s.refused().size());
        Map<String, Object> counts = new LinkedHashMap<>();
        for (Map.Entry<CoilVerdict, Integer> e : s.counts().entrySet()) {
            counts.put(e.getKey().key(), e.getValue());
        }
        m.put("verdicts", counts);
        List<Object> attention = new ArrayList<>();
        for (BatchSummary.Entry e : s.attention()) {
            Map<String, Object> a = new LinkedHashMap<>();
            a.put("line", e.line());
            a.put("site", e.site());
            a.put("system", e.system());
            a.put("verdict", e.verdict().key());
            a.put("findings", codes(e.result()));
            attention.add(a);
        }
        m.put("attention", attention);
        Map<String, Object> plots = new LinkedHashMap<>();
        for (Measurand x : BatchSummary.PLOTTED) {
            BatchSummary.Histogram h = s.histogram(x);
            Map<String, Object> p = new LinkedHashMap<>();
            p.put("unit", h.unit());
            p.put("binFrom", h.from());
            p.put("binWidth", h.width());
            List<Integer> counts2 = new ArrayList<>();
            for (int c : h.counts()) {
                counts2.add(c);
            }
            p.put("counts", counts2);
            p.put("without", h.missing());
            plots.put(x.key(), p);
        }
        m.put("distributions", plots);
        m.put("stored", stored);
        m.put("reports", reportsFolder);
        m.put("summaryReport", summaryFile);
        return m;
    }

    /** The CSV header: the row, its verdict and findings, then each figure and its ± in the results' units. */
    static List<String> csvHeader(UnitSystem units) {
        List<String> h = new ArrayList<>(List.of("line", "site", "address", "system", "label", "verdict", "findings",
                "visit id", "report", "units"));
        for (Measurand m : Measurand.values()) {
            String unit = m.quantity().symbol(units);
            String u = m.uncertaintyQuantity().symbol(units);
            h.add(m.key() + (unit.isEmpty() ? "" : " (" + unit + ")"));
            h.add(m.key() + " ±" + (u.isEmpty() ? "" : " (" + u + ")"));
        }
        h.addAll(List.of("refused column", "refused field", "refused value", "accepted range", "refused because"));
        return h;
    }

    /** Writes the CSV results; text cells a spreadsheet would run are neutralised as the data export does. */
    static void csv(List<Row> rows, UnitSystem units, Writer w) throws IOException {
        CSVFormat format = CSVFormat.DEFAULT.builder().setRecordSeparator("\r\n").get();
        // not closed here: the caller owns the stream (the safe file closes it once complete)
        CSVPrinter p = new CSVPrinter(w, format);
        {
            p.printRecord(csvHeader(units));
            List<Object> cells = new ArrayList<>();
            for (Row r : rows) {
                cells.clear();
                BatchCheck.Outcome o = r.outcome();
                cells.add(o.row().line());
                cells.add(text(o.site()));
                cells.add(text(o.row().cell(BatchColumns.ADDRESS)));
                cells.add(text(o.system()));
                cells.add(text(o.row().cell(BatchColumns.LABEL)));
                if (o.checked() != null) {
                    CoilResult result = o.checked().result();
                    cells.add(result.verdict().key());
                    cells.add(String.join(" ", codes(result)));
                    cells.add(r.visitId() == null ? "" : r.visitId());
                    cells.add(r.report() == null ? "" : text(r.report()));
                    cells.add(units.key());
                    for (Measurand m : Measurand.values()) {
                        Estimate e = result.estimate(m);
                        cells.add(e.exists() ? number(m.quantity().toDisplay(units, e.valueSi())) : "");
                        cells.add(e.exists() ? number(m.uncertaintyQuantity().toDisplay(units, e.expandedSi())) : "");
                    }
                    cells.addAll(List.of("", "", "", "", ""));
                } else {
                    cells.addAll(List.of("refused", "", "", "", units.key()));
                    for (int i = 0; i < Measurand.values().length * 2; i++) {
                        cells.add("");
                    }
                    BatchRefusal x = o.refused();
                    cells.addAll(List.of(text(x.column()), text(x.field()), text(x.value()), text(x.range()),
                            text(x.message())));
                }
                p.printRecord(cells);
            }
        }
        p.flush();
    }

    private static String text(String s) {
        return BatchCells.text(s);
    }

    private static String number(double v) {
        return Double.isFinite(v) ? Double.toString(v) : "";
    }
}
