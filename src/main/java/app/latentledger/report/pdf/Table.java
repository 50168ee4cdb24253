package app.latentledger.report.pdf;

import app.latentledger.chart.draw.Stroke;
import app.latentledger.chart.draw.TextStyle;

import java.util.ArrayList;
import java.util.List;

/**
 * A table: a header row, striped body rows with wrapped cells, group rows across the width. The
 * header repeats at the top of a new page. Columns have relative widths; the first column is left
 * aligned, the others as given.
 */
public final class Table {
    private final double[] weights;
    private final boolean[] rightAligned;
    private final String[] header;
    private final List<String[]> rows = new ArrayList<>();
    private final List<Boolean> groups = new ArrayList<>();

    /**
     * @param header       column titles
     * @param weights      relative column widths
     * @param rightAligned per column, whether the text sits right (numbers)
     */
    public Table(String[] header, double[] weights, boolean[] rightAligned) {
        if (header.length != weights.length || header.length != rightAligned.length) {
            throw new IllegalArgumentException("header, weights and alignment must have one entry per column");
        }
        this.header = header.clone();
        this.weights = weights.clone();
        this.rightAligned = rightAligned.clone();
    }

    public Table row(String... cells) {
        if (cells.length != header.length) {
            throw new IllegalArgumentException(cells.length + " cells for " + header.length + " columns");
        }
        rows.add(cells.clone());
        groups.add(false);
        return this;
    }

    /** A row spanning the table, in bold: starts a group of rows. */
    public Table group(String title) {
        rows.add(new String[] {title});
        groups.add(true);
        return this;
    }

    public int size() {
        return rows.size();
    }

    /** Sets the table at the cursor, full width. */
    public void draw(Typeset t) {
        PageFlow flow = t.flow();
        double total = 0;
        for (double w : weights) {
            total += w;
        }
        double[] widths = new double[weights.length];
        for (int i = 0; i < widths.length; i++) {
            widths[i] = flow.width() * weights[i] / total;
        }
        TextStyle body = Ink.BODY.sized(8.8);
        TextStyle head = Ink.LABEL.emphasised();
        drawRow(t, header, widths, head, false, false, true);
        boolean stripe = false;
        for (int r = 0; r < rows.size(); r++) {
            boolean group = groups.get(r);
            double h = rowHeight(t, rows.get(r), widths, group ? body.emphasised() : body, group);
            if (flow.remaining() < h) {
                flow.newPage();
                drawRow(t, header, widths, head, false, false, true);
            }
            drawRow(t, rows.get(r), widths, group ? body.emphasised() : body, group, stripe && !group, false);
            stripe = !group && !stripe;
            if (group) {
                stripe = false;
            }
        }
        flow.advance(6);
    }

    private static final double PAD_X = 4;
    private static final double PAD_Y = 3;

    private double rowHeight(Typeset t, String[] cells, double[] widths, TextStyle style, boolean group) {
        int lines = 1;
        if (group) {
            lines = t.wrap(cells[0], sum(widths) - 2 * PAD_X, style).size();
        } else {
            for (int c = 0; c < cells.length; c++) {
                lines = Math.max(lines, t.wrap(cells[c], widths[c] - 2 * PAD_X, style).size());
            }
        }
        return lines * Typeset.leading(style) + 2 * PAD_Y;
    }

    private void drawRow(Typeset t, String[] cells, double[] widths, TextStyle style, boolean group, boolean stripe,
                         boolean isHeader) {
        PageFlow flow = t.flow();
        double h = rowHeight(t, cells, widths, style, group);
        flow.need(h);
        PdfPainter p = flow.painter();
        double top = flow.y();
        if (stripe) {
            p.rect(flow.left(), top, flow.width(), h, Ink.STRIPE, null);
        }
        if (group) {
            p.rect(flow.left(), top, flow.width(), h, Ink.PANEL, null);
        }
        double lead = Typeset.leading(style);
        if (group) {
            List<String> lines = t.wrap(cells[0], sum(widths) - 2 * PAD_X, style);
            for (int i = 0; i < lines.size(); i++) {
                p.text(flow.left() + PAD_X, top + PAD_Y + style.size() + i * lead, lines.get(i), style);
            }
        } else {
            double x = flow.left();
            for (int c = 0; c < cells.length; c++) {
                List<String> lines = t.wrap(cells[c], widths[c] - 2 * PAD_X, style);
                for (int i = 0; i < lines.size(); i++) {
                    double baseline = top + PAD_Y + style.size() + i * lead;
                    if (rightAligned[c]) {
                        p.text(x + widths[c] - PAD_X, baseline, lines.get(i),
                                style.align(TextStyle.HAlign.RIGHT, TextStyle.VAlign.BASELINE));
                    } else {
                        p.text(x + PAD_X, baseline, lines.get(i), style);
                    }
                }
                x += widths[c];
            }
        }
        if (isHeader) {
            p.line(flow.left(), top + h, flow.left() + flow.width(), top + h, Stroke.solid(Ink.ACCENT, 0.7));
        }
        flow.advance(h);
    }

    private static double sum(double[] a) {
        double s = 0;
        for (double v : a) {
            s += v;
        }
        return s;
    }
}
