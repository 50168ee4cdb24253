package app.latentledger.report;

/**
 * One line of the open data export: a reading, a computed result, a finding, a piece of evidence
 * or a next check. The CSV has one of these per line; the JSON groups the same rows.
 *
 * @param visitId     the visit
 * @param source      "visit" | "reading-set" | "log"
 * @param sourceId    the reading set's or log's id (the visit's id for visit rows)
 * @param sourceLabel the reading set's label or the log's file name
 * @param record      "info" | "reading" | "result" | "finding" | "technical" | "evidence" | "next-check"
 * @param key         stable machine key (a measurand key, a finding code, a reading field)
 * @param label       what a tech calls it (for a finding: its severity)
 * @param value       value in display units, full precision; NaN when not a number or not existing
 * @param unit        unit of value and plusMinus ("" for none)
 * @param plusMinus   tolerance (readings) or expanded uncertainty (results, evidence), NaN when none
 * @param plusMinusKind "tolerance" | "U(k=2)" | ""
 * @param findingCode the finding an evidence or next-check row belongs to, else ""
 * @param text        words: a finding message, a technical line, a kind, a note
 */
public record DataRow(String visitId, String source, String sourceId, String sourceLabel, String record, String key,
                      String label, double value, String unit, double plusMinus, String plusMinusKind,
                      String findingCode, String text) {
    public static final String TOLERANCE = "tolerance";
    public static final String EXPANDED = "U(k=2)";

    /** CSV column names, in order. */
    public static final String[] COLUMNS = {"visit_id", "source", "source_id", "source_label", "record", "key", "label",
        "value", "unit", "plus_minus", "plus_minus_kind", "finding_code", "text"};
}
