package app.latentledger.report;

/**
 * The data export's one rule for text cells, for the batch results file: a cell a spreadsheet
 * would run as a formula is written as text ({@link VisitDataExport#cell}).
 */
public final class BatchCells {
    private BatchCells() {
    }

    public static String text(String cell) {
        return VisitDataExport.cell(cell);
    }
}
