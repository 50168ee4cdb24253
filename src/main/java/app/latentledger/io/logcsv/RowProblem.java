package app.latentledger.io.logcsv;

/**
 * Why one row of a log file was kept out.
 *
 * @param line    physical line in the file (1 = the header)
 * @param column  1-based column, 0 when the whole row is at fault
 * @param field   the field read from that column ("time", "return_db", …), "" for the whole row
 * @param message what is wrong, with the value as written
 */
record RowProblem(long line, int column, String field, String message) {
    static RowProblem row(long line, String message) {
        return new RowProblem(line, 0, "", message);
    }

    /**
     * "line:column: field message", as the import report lists it, the field in words ("return
     * relative humidity", not "return_rh"): the app shows this list and never shows field names.
     */
    String text() {
        app.latentledger.core.cycles.Channel ch = app.latentledger.core.cycles.Channel.ofField(field);
        String words = ch != null ? ch.label() : field;
        return line + (column > 0 ? ":" + column : "") + ": " + (words.isEmpty() ? "" : words + " ") + message;
    }
}
