package app.latentledger.cli;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.measure.FieldLimits;
import app.latentledger.core.units.UnitSystem;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The columns of a batch file (docs/batch.md). A reading column is named exactly as the
 * {@code coil} option it fills, without the dashes, so a row is read by the same option reader
 * ({@link CoilOptions}) with the same units, defaults and refusals as {@code coil} and
 * {@code readings add}; the record columns (site, system, label, …) are the batch's own.
 */
final class BatchColumns {
    /** Record columns: who and where, not readings. */
    static final String SITE = "site";
    static final String ADDRESS = "address";
    static final String SYSTEM = "system";
    static final String LABEL = "label";
    static final String TECHNICIAN = "technician";
    static final String NOTES = "notes";
    static final String TAKEN_AT = "taken-at";

    /** Every accepted column with what it holds, in the template's order. */
    static final Map<String, String> ALL = new LinkedHashMap<>();

    static {
        ALL.put(SITE, "site name (required; rows with the same site and address share one site)");
        ALL.put(ADDRESS, "street address (optional)");
        ALL.put(SYSTEM, "system label at the site, e.g. Upstairs (required)");
        ALL.put("nominal-tons", "nameplate size in tons (this or nominal-kw required)");
        ALL.put("nominal-kw", "nameplate size in kW");
        ALL.put("units", "ip or si: the units of this row's numbers (default: --units, else the settings)");
        ALL.put("elevation", "site elevation, ft (ip) or m (si); or give pressure");
        ALL.put("pressure", "measured station pressure, psia (ip) or kPa (si)");
        ALL.put("return-db", "return (coil-entering) dry bulb, °F or °C (required)");
        ALL.put("return-wb", "return wet bulb — give one of return-wb, return-rh, return-dew-point");
        ALL.put("return-rh", "return relative humidity, %");
        ALL.put("return-dew-point", "return dew point");
        ALL.put("supply-db", "supply (coil-leaving) dry bulb (required)");
        ALL.put("supply-wb", "supply wet bulb — give one of supply-wb, supply-rh, supply-dew-point");
        ALL.put("supply-rh", "supply relative humidity, %");
        ALL.put("supply-dew-point", "supply dew point");
        ALL.put("airflow", "airflow through the coil, cfm (ip) or L/s (si) (required)");
        ALL.put("airflow-at", "return (default) or supply: where the airflow was measured");
        ALL.put("airflow-basis", "actual (default) or standard");
        ALL.put("coil-temp", "coil temperature (optional)");
        ALL.put("coil-temp-kind", "coil-surface (default) or evaporator-saturation");
        ALL.put("condensate", "condensate caught, mL (optional; needs condensate-minutes)");
        ALL.put("condensate-floz", "condensate caught, US fl oz (instead of condensate)");
        ALL.put("condensate-minutes", "minutes the condensate was caught over");
        ALL.put("outdoor-db", "outdoor dry bulb, when outdoor air is mixed in ahead of the coil");
        ALL.put("outdoor-wb", "outdoor wet bulb — with outdoor air give one of outdoor-wb, outdoor-rh, outdoor-dew-point");
        ALL.put("outdoor-rh", "outdoor relative humidity, %");
        ALL.put("outdoor-dew-point", "outdoor dew point");
        ALL.put("outdoor-fraction", "outdoor air's share of the coil airflow by volume, %");
        ALL.put("same-probe", "true when one instrument read return and supply");
        ALL.put("supply-dew-point-offset", "supply probe's dew point minus the return probe's in the same air");
        ALL.put("tol-db", "± dry-bulb tolerance (default: the settings)");
        ALL.put("tol-wb", "± wet-bulb tolerance");
        ALL.put("tol-rh", "± RH tolerance, %");
        ALL.put("tol-dew-point", "± dew-point tolerance");
        ALL.put("tol-coil", "± coil-temperature tolerance");
        ALL.put("tol-airflow-pct", "± airflow tolerance, % of the reading");
        ALL.put("tol-condensate-pct", "± condensate volume tolerance, %");
        ALL.put("tol-outdoor-fraction", "± outdoor-air share, %-points");
        ALL.put(LABEL, "before, after or other (optional)");
        ALL.put(TECHNICIAN, "who took the readings (default: --technician)");
        ALL.put(NOTES, "free text (optional)");
        ALL.put(TAKEN_AT, "ISO-8601 date-time with offset, e.g. 2026-07-16T10:05:00-04:00 (default: now)");
    }

    /** The columns the template prints, in order: the common ones, not every tolerance. */
    static final List<String> TEMPLATE = List.of(SITE, ADDRESS, SYSTEM, "nominal-tons", "units", "elevation",
            "return-db", "return-wb", "return-rh", "return-dew-point", "supply-db", "supply-wb", "supply-rh",
            "supply-dew-point", "airflow", "airflow-at", "airflow-basis", "coil-temp", "coil-temp-kind",
            "condensate", "condensate-minutes", "outdoor-db", "outdoor-wb", "outdoor-rh", "outdoor-dew-point",
            "outdoor-fraction", LABEL, TECHNICIAN, NOTES);

    /** The template's example row, invented (Saltreed), in the same order as {@link #TEMPLATE}. */
    static final List<String> EXAMPLE = List.of("Marsh Lane 14", "14 Marsh Lane, Saltreed", "Upstairs", "3", "ip",
            "20", "76.0", "", "55", "", "56.5", "", "", "52.0", "1150", "return", "actual", "47.5", "coil-surface",
            "", "", "", "", "", "", "", "before", "R. Okafor", "");

    /** Columns that are not coil options. */
    static final Set<String> RECORD = Set.of(SITE, ADDRESS, SYSTEM, LABEL, TECHNICIAN, NOTES, TAKEN_AT);

    /** Option columns taking true/false rather than a value. */
    static final Set<String> FLAGS = Set.of("same-probe");

    /** The one range each numeric column is checked against, for a refusal that has no range of its own. */
    private static final Map<String, FieldLimits.Limit> LIMITS = new LinkedHashMap<>();
    /** The accepted words of each choice column. */
    private static final Map<String, String> CHOICES = new LinkedHashMap<>();

    static {
        for (String w : List.of("return", "supply", "outdoor")) {
            LIMITS.put(w + "-db", FieldLimits.AIR_TEMPERATURE);
            LIMITS.put(w + "-wb", FieldLimits.AIR_TEMPERATURE);
            LIMITS.put(w + "-dew-point", FieldLimits.AIR_TEMPERATURE);
            LIMITS.put(w + "-rh", FieldLimits.RELATIVE_HUMIDITY);
        }
        LIMITS.put("airflow", FieldLimits.AIRFLOW);
        LIMITS.put("coil-temp", FieldLimits.COIL_TEMPERATURE);
        LIMITS.put("nominal-tons", FieldLimits.NOMINAL_CAPACITY);
        LIMITS.put("nominal-kw", FieldLimits.NOMINAL_CAPACITY);
        LIMITS.put("elevation", FieldLimits.ELEVATION);
        LIMITS.put("pressure", FieldLimits.PRESSURE);
        LIMITS.put("condensate", FieldLimits.CONDENSATE_VOLUME);
        LIMITS.put("condensate-floz", FieldLimits.CONDENSATE_VOLUME);
        LIMITS.put("condensate-minutes", FieldLimits.COLLECTION_TIME);
        LIMITS.put("outdoor-fraction", FieldLimits.OUTDOOR_FRACTION);
        LIMITS.put("supply-dew-point-offset", FieldLimits.SUPPLY_DEW_POINT_OFFSET);
        CHOICES.put("units", "ip | si");
        CHOICES.put("airflow-at", "return | mixed | supply");
        CHOICES.put("airflow-basis", "actual | standard");
        CHOICES.put("coil-temp-kind", "coil-surface | evaporator-saturation");
        CHOICES.put("same-probe", "true | false");
        CHOICES.put(LABEL, "before | after | other");
        CHOICES.put(TAKEN_AT, "ISO-8601 date-time with offset");
    }

    private BatchColumns() {
    }

    /** The header line and one example row, as {@code batch --template} prints them. */
    static String template() {
        return String.join(",", TEMPLATE) + "\n" + String.join(",", EXAMPLE.stream().map(BatchColumns::quoted).toList())
                + "\n";
    }

    private static String quoted(String cell) {
        return cell.contains(",") || cell.contains("\"") ? "\"" + cell.replace("\"", "\"\"") + "\"" : cell;
    }

    /**
     * What the column accepts, said in the row's units: a numeric column's FieldLimits range (by the
     * core's own wording, rounded inwards), a choice column's words, or "" for free text.
     */
    static String range(String column, UnitSystem units) {
        FieldLimits.Limit limit = LIMITS.get(column);
        if (limit != null) {
            return rangeOf(new InvalidInputException(limit.field(), limit.quantity(), Double.NaN, limit.minSi(),
                    limit.maxSi(), null), unitsOf(column, units));
        }
        return CHOICES.getOrDefault(column, "");
    }

    /**
     * The unit system a column's value is typed in: the row's, except the condensate catch, which
     * is mL in "condensate" and US fl oz in "condensate-floz" whatever the row's units.
     */
    static UnitSystem unitsOf(String column, UnitSystem units) {
        return switch (column) {
            case "condensate" -> UnitSystem.SI;
            case "condensate-floz" -> UnitSystem.IP;
            default -> units;
        };
    }

    /** The "accepted range …" part of the core's refusal, in the tech's units. */
    static String rangeOf(InvalidInputException e, UnitSystem units) {
        String m = e.message(units);
        int at = m.lastIndexOf("accepted range ");
        return at < 0 ? "" : m.substring(at + "accepted range ".length());
    }

    /** The column a header cell names (case and surrounding space ignored; '_' taken as '-'). */
    static String normalise(String header) {
        return header.strip().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
    }

    /** The markdown table of every column, for docs/batch.md (kept in step by a test). */
    static String markdown() {
        StringBuilder b = new StringBuilder("| column | holds |\n|---|---|\n");
        ALL.forEach((k, v) -> b.append("| `").append(k).append("` | ").append(v).append(" |\n"));
        return b.toString();
    }
}
