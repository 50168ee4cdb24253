package app.latentledger.ui.entry;

import app.latentledger.ui.look.Ui;
import javafx.scene.control.Button;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.RowConstraints;

import java.util.List;

/**
 * The one key layout of every number pad in the app (readings and house): 7 8 9 ⌫ / 4 5 6 C /
 * 1 2 3 Enter / ± 0 . Enter, four equal columns, so a key is at the same place on every pad.
 */
public final class KeyGrid {
    private KeyGrid() {
    }

    /**
     * @param idPrefix put before each key's id ({@code key-7}, {@code key-enter}, …)
     * @param rows     the four rows' constraints, sized by the caller for its screen
     */
    public static GridPane of(KeypadViewModel pad, String idPrefix, Runnable enter, List<RowConstraints> rows) {
        GridPane g = new GridPane();
        g.setHgap(8);
        g.setVgap(8);
        for (int i = 0; i < 4; i++) {
            ColumnConstraints c = new ColumnConstraints();
            c.setPercentWidth(25);
            g.getColumnConstraints().add(c);
        }
        g.getRowConstraints().setAll(rows);
        int[][] digits = {{7, 8, 9}, {4, 5, 6}, {1, 2, 3}};
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                int d = digits[r][c];
                g.add(key(idPrefix + "key-" + d, String.valueOf(d), () -> pad.digit(d)), c, r);
            }
        }
        g.add(key(idPrefix + "key-back", "⌫", pad::backspace), 3, 0);
        g.add(key(idPrefix + "key-clear", "C", pad::clear), 3, 1);
        g.add(key(idPrefix + "key-sign", "±", pad::sign), 0, 3);
        g.add(key(idPrefix + "key-0", "0", () -> pad.digit(0)), 1, 3);
        g.add(key(idPrefix + "key-point", ".", pad::point), 2, 3);
        Button enterKey = key(idPrefix + "key-enter", "Enter", enter);
        enterKey.getStyleClass().add("enter");
        g.add(enterKey, 3, 2, 1, 2);
        return g;
    }

    private static Button key(String id, String text, Runnable action) {
        Button b = Ui.button(id, text, null, action);
        b.getStyleClass().add("key");
        b.setMaxWidth(Double.MAX_VALUE);
        b.setMaxHeight(Double.MAX_VALUE);
        b.setFocusTraversable(false);
        return b;
    }
}
