package app.latentledger.bundle;

import app.latentledger.core.measure.AirflowBasis;
import app.latentledger.core.measure.AirflowPoint;
import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.measure.ProbeMatch;
import app.latentledger.core.records.Airflow;
import app.latentledger.core.records.CoilTemperature;
import app.latentledger.core.records.Condensate;
import app.latentledger.core.records.HumidityReading;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Timestamps;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.time.OffsetDateTime;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;

/**
 * {@code readings.csv}: one row per reading set, SI values, the unit in each column name, an
 * empty cell for "not measured". Numbers are written with Java's shortest exact form so they read
 * back to the same double.
 */
final class ReadingsCsv {
    static final String ENTRY = "readings.csv";
    static final List<String> HEADER = List.of(
            "id", "visit_id", "taken_at", "label", "instrument",
            "return_db_c", "return_db_tol_k", "return_hum_kind", "return_hum_value", "return_hum_tol",
            "supply_db_c", "supply_db_tol_k", "supply_hum_kind", "supply_hum_value", "supply_hum_tol",
            "outdoor_db_c", "outdoor_db_tol_k", "outdoor_hum_kind", "outdoor_hum_value", "outdoor_hum_tol",
            "coil_kind", "coil_c", "coil_tol_k",
            "airflow_m3_per_s", "airflow_tol_m3_per_s", "airflow_point", "airflow_method",
            "station_pressure_pa", "station_pressure_tol_pa",
            "condensate_m3", "condensate_tol_m3", "condensate_s", "condensate_tol_s", "notes");
    /** Written since schema V5; a bundle without them reads as actual airflow and independent probes. */
    static final List<String> OPTIONAL = List.of("airflow_basis", "same_probe", "supply_dew_point_offset_k");

    /** Columns that hold words, not numbers (every other column is an SI number or empty). */
    static final java.util.Set<String> TEXT_COLUMNS = java.util.Set.of("id", "visit_id", "taken_at", "label",
            "instrument", "return_hum_kind", "supply_hum_kind", "outdoor_hum_kind", "coil_kind", "airflow_point",
            "airflow_method", "notes", "airflow_basis");

    private ReadingsCsv() {
    }

    static String write(List<ReadingSet> readings) throws IOException {
        StringWriter w = new StringWriter();
        try (CSVPrinter p = new CSVPrinter(w, CSVFormat.RFC4180.builder().setHeader(java.util.stream.Stream.concat(HEADER.stream(), OPTIONAL.stream()).toArray(String[]::new)).get())) {
            for (ReadingSet r : readings) {
                List<String> row = new ArrayList<>();
                row.add(r.id());
                row.add(r.visitId());
                row.add(Timestamps.text(r.takenAt()));
                row.add(r.label());
                row.add(r.instrument());
                measurement(row, r.returnDryBulb());
                humidity(row, r.returnHumidity());
                measurement(row, r.supplyDryBulb());
                humidity(row, r.supplyHumidity());
                measurement(row, r.outdoorDryBulb());
                humidity(row, r.outdoorHumidity());
                CoilTemperature coil = r.coilTemperature();
                row.add(coil == null ? "" : coil.kind().key());
                measurement(row, coil == null ? null : coil.value());
                Airflow a = r.airflow();
                measurement(row, a == null ? null : a.volume());
                row.add(a == null ? "" : a.point().key());
                row.add(a == null ? "" : a.method());
                measurement(row, r.stationPressurePa());
                Condensate k = r.condensate();
                measurement(row, k == null ? null : k.volume());
                measurement(row, k == null ? null : k.seconds());
                row.add(r.notes());
                row.add(a == null ? AirflowBasis.ACTUAL.key() : a.basis().key());
                row.add(r.probes().sameInstrument() ? "1" : "0");
                row.add(Double.toString(r.probes().supplyDewPointOffsetK()));
                p.printRecord(row);
            }
        }
        return w.toString();
    }

    private static void measurement(List<String> row, Measurement m) {
        row.add(m == null ? "" : Double.toString(m.valueSi()));
        row.add(m == null ? "" : Double.toString(m.toleranceSi()));
    }

    private static void humidity(List<String> row, HumidityReading h) {
        row.add(h == null ? "" : h.kind().key());
        measurement(row, h == null ? null : h.value());
    }

    /**
     * @param wheres receives, for each reading set returned, where it is ("readings.csv line 3"),
     *               so a later check can name the line
     */
    static List<ReadingSet> read(String csv, List<String> wheres) throws BundleException {
        List<ReadingSet> out = new ArrayList<>();
        try (CSVParser parser = CSVParser.parse(new StringReader(csv),
                CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get())) {
            for (String column : HEADER) {
                if (!parser.getHeaderMap().containsKey(column)) {
                    throw new BundleException(ENTRY + ": column " + column + " missing");
                }
            }
            long lineBefore = parser.getCurrentLineNumber();
            for (CSVRecord row : parser) {
                // the line the row starts on (a quoted note may span several)
                String where = ENTRY + " line " + (lineBefore + 1);
                lineBefore = parser.getCurrentLineNumber();
                try {
                    out.add(row(row, where));
                    wheres.add(where);
                } catch (IllegalArgumentException e) {
                    throw new BundleException(where + ": " + e.getMessage(), e);
                }
            }
        } catch (IOException | IllegalStateException | java.io.UncheckedIOException e) {
            throw new BundleException(ENTRY + ": not readable CSV: " + e.getMessage(), e);
        }
        return out;
    }

    private static ReadingSet row(CSVRecord r, String where) throws BundleException {
        String coilKind = r.get("coil_kind");
        CoilTemperature coil = coilKind.isEmpty() ? null : new CoilTemperature(
                CoilTemperatureKind.parse("coil temperature kind", coilKind), measurement(r, "coil_c", "coil_tol_k", where));
        Measurement flow = measurement(r, "airflow_m3_per_s", "airflow_tol_m3_per_s", where);
        Airflow airflow = flow == null ? null
                : new Airflow(flow, AirflowPoint.parse("airflow point", r.get("airflow_point")), r.get("airflow_method"),
                optional(r, "airflow_basis").isEmpty() ? AirflowBasis.ACTUAL
                        : AirflowBasis.parse("airflow basis", optional(r, "airflow_basis")));
        String offset = optional(r, "supply_dew_point_offset_k");
        ProbeMatch probes = new ProbeMatch("1".equals(optional(r, "same_probe")),
                offset.isEmpty() ? 0 : number(offset, "supply_dew_point_offset_k", where));
        Measurement volume = measurement(r, "condensate_m3", "condensate_tol_m3", where);
        Measurement seconds = measurement(r, "condensate_s", "condensate_tol_s", where);
        Condensate condensate = volume == null && seconds == null ? null : new Condensate(volume, seconds);
        return new ReadingSet(r.get("id"), r.get("visit_id"), time(r.get("taken_at"), where), r.get("label"),
                r.get("instrument"),
                measurement(r, "return_db_c", "return_db_tol_k", where), humidity(r, "return", where),
                measurement(r, "supply_db_c", "supply_db_tol_k", where), humidity(r, "supply", where),
                measurement(r, "outdoor_db_c", "outdoor_db_tol_k", where), humidity(r, "outdoor", where),
                coil, airflow, measurement(r, "station_pressure_pa", "station_pressure_tol_pa", where),
                condensate, r.get("notes"), probes);
    }

    private static String optional(CSVRecord r, String column) {
        return r.isMapped(column) ? r.get(column) : "";
    }

    private static HumidityReading humidity(CSVRecord r, String prefix, String where) throws BundleException {
        String kind = r.get(prefix + "_hum_kind");
        if (kind.isEmpty()) {
            return null;
        }
        return new HumidityReading(HumidityKind.parse(prefix + " humidity kind", kind),
                measurement(r, prefix + "_hum_value", prefix + "_hum_tol", where));
    }

    private static Measurement measurement(CSVRecord r, String value, String tolerance, String where) throws BundleException {
        String v = r.get(value);
        String t = r.get(tolerance);
        if (v.isEmpty() && t.isEmpty()) {
            return null;
        }
        return new Measurement(number(v, value, where), t.isEmpty() ? 0 : number(t, tolerance, where));
    }

    private static double number(String text, String column, String where) throws BundleException {
        for (int k = 0; k < text.length(); k++) {
            char c = text.charAt(k);
            if (!(c >= '0' && c <= '9' || c == '.' || c == 'E' || c == 'e' || c == '-' || c == '+')) {
                throw new BundleException(where + ": " + column + " '" + text + "' is not a number");
            }
        }
        try {
            return Double.parseDouble(text);
        } catch (NumberFormatException e) {
            throw new BundleException(where + ": " + column + " '" + text + "' is not a number");
        }
    }

    private static OffsetDateTime time(String text, String where) throws BundleException {
        try {
            return OffsetDateTime.parse(text);
        } catch (DateTimeParseException e) {
            throw new BundleException(where + ": taken_at '" + text + "' is not an ISO-8601 date-time with offset");
        }
    }
}
