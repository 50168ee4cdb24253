package app.latentledger.ui.look;

import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.text.Font;
import javafx.scene.text.Text;

import java.util.ArrayList;
import java.util.List;

/**
 * A table of named rows: a name that wraps, then cells (numbers, units) that keep every digit.
 * Where the name's longest word and the cells do not fit side by side, each name goes on a line of
 * its own over its cells, so a name never breaks inside a word ("To/tal ca/pa/ci/ty").
 */
public class NamedRows extends GridPane {
    private record Entry(Node name, Node[] cells, boolean header) {
    }

    private final List<Entry> entries = new ArrayList<>();
    private final int cellColumns;
    private boolean stacked;

    public NamedRows(int cellColumns, double hgap, double vgap) {
        this.cellColumns = cellColumns;
        setHgap(hgap);
        setVgap(vgap);
        place();
    }

    /** A label that wraps between words only: never narrower than its longest word. */
    public static Label name(String text, String... styleClasses) {
        Label l = new Label(text) {
            @Override
            protected double computeMinWidth(double height) {
                return Math.ceil(widestWord(getText(), getFont())) + snappedLeftInset() + snappedRightInset();
            }
        };
        l.getStyleClass().addAll(styleClasses);
        l.setWrapText(true);
        l.setMinHeight(Region.USE_PREF_SIZE);
        return l;
    }

    /** Keeps a wrapping control at least as wide as its longest word, at whatever text size is in use. */
    public static void keepWords(javafx.scene.control.Labeled l) {
        l.minWidthProperty().bind(javafx.beans.binding.Bindings.createDoubleBinding(
                () -> Math.ceil(widestWord(l.getText(), l.getFont())) + l.snappedLeftInset() + l.snappedRightInset() + 1,
                l.textProperty(), l.fontProperty(), l.insetsProperty()));
    }

    /** The width of the text's longest word in the font, px. */
    public static double widestWord(String text, Font font) {
        double widest = 0;
        Text probe = new Text();
        probe.setFont(font);
        for (String word : words(text)) {
            probe.setText(word);
            widest = Math.max(widest, probe.getLayoutBounds().getWidth());
        }
        return widest;
    }

    /**
     * The pieces a line may not break inside, as JavaFX wraps text: between words and after a
     * hyphen ("return-", "minus-", "supply"), by the platform's line-break rules.
     */
    public static List<String> words(String text) {
        List<String> pieces = new ArrayList<>();
        if (text == null) {
            return pieces;
        }
        java.text.BreakIterator lines = java.text.BreakIterator.getLineInstance();
        lines.setText(text);
        int start = lines.first();
        for (int end = lines.next(); end != java.text.BreakIterator.DONE; start = end, end = lines.next()) {
            String piece = text.substring(start, end).strip();
            if (!piece.isEmpty()) {
                pieces.add(piece);
            }
        }
        return pieces;
    }

    public boolean stacked() {
        return stacked;
    }

    public void clearRows() {
        entries.clear();
        getChildren().clear();
    }

    /** A line across the whole table (a title, a note). */
    public void addWide(Node node) {
        entries.add(new Entry(node, new Node[0], false));
        getChildren().add(node);
        place();
    }

    /** The column heads; the names' head is dropped while names stand over their cells. */
    public void addHeader(Node nameHead, Node... cellHeads) {
        add(new Entry(nameHead, cellHeads, true));
    }

    public void addRow(Node name, Node... cells) {
        add(new Entry(name, cells, false));
    }

    private void add(Entry e) {
        entries.add(e);
        getChildren().add(e.name());
        getChildren().addAll(e.cells());
        place();
    }

    /** Width the names and cells need side by side: the longest name word plus every cell column. */
    private double sideBySideWidth() {
        double names = 0;
        double[] cells = new double[cellColumns];
        for (Entry e : entries) {
            if (e.cells().length == 0 && !e.header()) {
                continue;
            }
            names = Math.max(names, e.name().minWidth(-1));
            for (int i = 0; i < e.cells().length && i < cellColumns; i++) {
                cells[i] = Math.max(cells[i], e.cells()[i].prefWidth(-1));
            }
        }
        double need = names + snappedLeftInset() + snappedRightInset();
        for (double c : cells) {
            need += c + getHgap();
        }
        return need;
    }

    @Override
    protected void layoutChildren() {
        boolean narrow = getWidth() + 0.5 < sideBySideWidth();
        if (narrow != stacked) {
            stacked = narrow;
            place();
        }
        super.layoutChildren();
    }

    @Override
    protected double computeMinWidth(double height) {
        // stacked, the table needs only its widest line; side by side it would need far more
        double widest = 0;
        for (Entry e : entries) {
            widest = Math.max(widest, e.name().minWidth(-1));
            double cells = 0;
            for (Node c : e.cells()) {
                cells += c.minWidth(-1) + getHgap();
            }
            widest = Math.max(widest, cells - getHgap());
        }
        return widest + snappedLeftInset() + snappedRightInset();
    }

    private void place() {
        getColumnConstraints().clear();
        int span = cellColumns + 1;
        for (int i = 0; i < span; i++) {
            ColumnConstraints c = new ColumnConstraints();
            // side by side the names take the spare width; stacked, the last cell column does
            boolean grows = stacked ? i == cellColumns : i == 0;
            c.setHgrow(grows ? Priority.ALWAYS : Priority.NEVER);
            getColumnConstraints().add(c);
        }
        int r = 0;
        for (Entry e : entries) {
            if (e.cells().length == 0 && !e.header()) {
                GridPane.setConstraints(e.name(), 0, r++, span, 1);
                continue;
            }
            if (stacked) {
                boolean showName = !e.header();
                e.name().setVisible(showName);
                e.name().setManaged(showName);
                if (showName) {
                    GridPane.setConstraints(e.name(), 0, r++, span, 1);
                }
                for (int i = 0; i < e.cells().length; i++) {
                    GridPane.setConstraints(e.cells()[i], i, r);
                }
                r++;
            } else {
                e.name().setVisible(true);
                e.name().setManaged(true);
                GridPane.setConstraints(e.name(), 0, r);
                for (int i = 0; i < e.cells().length; i++) {
                    GridPane.setConstraints(e.cells()[i], i + 1, r);
                }
                r++;
            }
        }
    }
}
