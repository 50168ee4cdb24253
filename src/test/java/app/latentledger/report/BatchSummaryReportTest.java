package app.latentledger.report;

import app.latentledger.core.coil.AirReading;
import app.latentledger.core.coil.CoilCheck;
import app.latentledger.core.coil.CoilReadings;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.CoilVerdict;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.coil.Tolerances;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.measure.AirflowPoint;
import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.settings.PaperSize;
import app.latentledger.core.units.UnitSystem;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.junit.jupiter.api.Test;

import java.io.ByteArrayOutputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The batch summary PDF read back with PDFBox: the counts by verdict, the systems needing attention
 * (worst first, before the plots), the refused rows and the four distributions are on the paper.
 */
class BatchSummaryReportTest {
    private static final double RETURN_TOL_K = 0.2778;

    private static AirReading air(String where, double db, HumidityKind kind, double value) {
        return new AirReading(where, db, RETURN_TOL_K, kind, value, Tolerances.humidity(kind));
    }

    /**
     * The PsychroLib reference coils (src/test/resources/reference/coil/coil-cases.json: every one
     * removes water, W leaving well below W entering), and one coil that removes none: the supply
     * air keeps the return air's 13 °C dew point (cooled 24 → 16 °C) and the coil surface reads 17 °C, above it — no
     * surface colder than the dew point, so no condensation (definition of the dew point, ASHRAE
     * Handbook—Fundamentals ch. 1).
     */
    private static List<BatchSummary.Entry> entries() throws Exception {
        JsonObject root;
        try (var in = BatchSummaryReportTest.class.getResourceAsStream("/reference/coil/coil-cases.json")) {
            root = JsonParser.parseReader(new InputStreamReader(in, StandardCharsets.UTF_8)).getAsJsonObject();
        }
        List<BatchSummary.Entry> out = new ArrayList<>();
        int line = 2;
        for (JsonElement e : root.getAsJsonArray("cases")) {
            JsonObject c = e.getAsJsonObject();
            CoilReadings r = new CoilReadings(c.get("pressurePa").getAsDouble(), side("return", c, "entering"),
                    side("supply", c, "leaving"), c.get("airflowM3PerS").getAsDouble(), 0.1, AirflowPoint.ENTERING,
                    Double.NaN, 0, null, 10_550, null);
            out.add(new BatchSummary.Entry(line, "Reference " + (line - 1), "A", check(r), ""));
            line++;
        }
        CoilReadings none = new CoilReadings(101_325, air("return", 24, HumidityKind.DEW_POINT, 13),
                air("supply", 16, HumidityKind.DEW_POINT, 13), 0.5, 0.1, AirflowPoint.ENTERING, 17, Tolerances.COIL_K,
                CoilTemperatureKind.COIL_SURFACE, 10_550, null);
        out.add(new BatchSummary.Entry(line, "Samphire Row 11", "Upstairs", check(none), "00010-samphire.pdf"));
        return out;
    }

    private static AirReading side(String where, JsonObject c, String side) {
        String kind = c.get(side + "Kind").getAsString();
        HumidityKind k = kind.equals("rh") ? HumidityKind.RELATIVE_HUMIDITY
                : kind.equals("wb") ? HumidityKind.WET_BULB : HumidityKind.DEW_POINT;
        return air(where, c.get(side + "Db").getAsDouble(), k, c.get(side + "Value").getAsDouble());
    }

    private static CoilResult check(CoilReadings r) {
        return CoilCheck.run(r, ThresholdSettings.DEFAULTS, UnitSystem.SI);
    }

    @Test
    void theSummaryPdfCountsByVerdictAndListsTheSystemsNeedingAttentionFirst() throws Exception {
        List<BatchSummary.Entry> entries = entries();
        BatchSummary.Entry none = entries.get(entries.size() - 1);
        assertEquals(CoilVerdict.NOT_DEHUMIDIFYING, none.verdict(), "a coil above an unchanged dew point removes no water");
        List<BatchSummary.Refused> refused = List.of(new BatchSummary.Refused(5, "return-rh", "155", "0 to 100 %",
                "return-rh: return relative humidity 155 % refused: accepted range 0 to 100 %"));
        BatchSummary s = new BatchSummary("saltreed-phase-2.csv", UnitSystem.IP,
                OffsetDateTime.of(2026, 7, 16, 16, 0, 0, 0, ZoneOffset.ofHours(-4)), entries, refused);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        BatchSummaryReport.write(s, PaperSize.LETTER, out);

        String text;
        try (PDDocument doc = Loader.loadPDF(out.toByteArray())) {
            assertTrue(doc.getNumberOfPages() >= 2);
            assertEquals("Batch summary: saltreed-phase-2.csv", doc.getDocumentInformation().getTitle());
            text = ReportPdfs.text(doc);
        }
        Map<CoilVerdict, Integer> expected = new java.util.EnumMap<>(CoilVerdict.class);
        for (CoilVerdict v : CoilVerdict.values()) {
            expected.put(v, 0);
        }
        entries.forEach(e -> expected.merge(e.verdict(), 1, Integer::sum));
        assertEquals(entries.size(), expected.values().stream().mapToInt(Integer::intValue).sum());
        int counts = text.indexOf("Systems by verdict");
        assertTrue(counts >= 0, text);
        for (CoilVerdict v : CoilVerdict.values()) {
            assertTrue(text.substring(counts).contains(" " + v.key() + " " + expected.get(v) + " "),
                    v.key() + " " + expected.get(v) + " in: " + text);
        }
        assertTrue(text.contains("refused (not checked) 1"), text);

        int attention = text.indexOf("Systems needing attention");
        int plots = text.indexOf("How the systems spread");
        assertTrue(attention > counts && plots > attention, "attention list before the plots");
        int samphire = text.indexOf("Samphire Row 11", attention);
        assertTrue(samphire > attention && samphire < plots, "the coil removing no water is in the attention list");
        String list = text.substring(attention, plots);
        for (BatchSummary.Entry e : s.attention()) {
            assertTrue(list.contains(e.site()), e.site() + " in the attention list");
        }
        assertEquals("Samphire Row 11", s.attention().get(0).site(), "not dehumidifying comes first");
        for (Measurand m : BatchSummary.PLOTTED) {
            assertTrue(text.contains(BatchSummary.title(m, UnitSystem.IP)), BatchSummary.title(m, UnitSystem.IP));
        }
        assertTrue(text.contains("Rows refused (1)") && text.contains("155"), text);
        assertTrue(text.contains("Every system"));
    }

    @Test
    void eachHistogramCountsEverySystemOnceInNiceBins() throws Exception {
        List<BatchSummary.Entry> entries = entries();
        BatchSummary s = new BatchSummary("x.csv", UnitSystem.IP, OffsetDateTime.now(), entries, List.of());
        for (Measurand m : BatchSummary.PLOTTED) {
            BatchSummary.Histogram h = s.histogram(m);
            assertEquals(entries.size(), h.total() + h.missing(), m.key());
            double w = h.width();
            double decade = Math.pow(10, Math.floor(Math.log10(w)));
            double mantissa = w / decade;
            assertTrue(Math.abs(mantissa - 1) < 1e-9 || Math.abs(mantissa - 2) < 1e-9 || Math.abs(mantissa - 5) < 1e-9,
                    "bin width 1, 2 or 5 × 10ⁿ: " + w);
            int inBins = 0;
            for (BatchSummary.Entry e : entries) {
                double v = e.shown(m, UnitSystem.IP);
                if (Double.isFinite(v)) {
                    assertTrue(v >= h.from() - 1e-9 && v <= h.from() + h.counts().length * w + 1e-9, m.key() + " " + v);
                    inBins++;
                }
            }
            assertEquals(inBins, h.total(), m.key());
        }
    }
}
