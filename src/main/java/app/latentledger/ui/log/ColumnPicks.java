package app.latentledger.ui.log;

import app.latentledger.io.logcsv.LogColumns;
import app.latentledger.io.logcsv.LogRefusedException;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The column picker of the log import: once a file is chosen its header row is read, and each
 * column the importer does not know by name gets a choice of what it holds, in words
 * ({@link LogField}). The picks become the header map the importer takes; before an import they are
 * checked in the same words (a time, a temperature, no field twice), so the screen never shows the
 * importer's field names or the command line's syntax.
 */
public final class ColumnPicks {
    /** One column the importer does not know by name, and what the tech says it holds. */
    public static final class Pick {
        private final String header;
        private final ObjectProperty<LogField> field = new SimpleObjectProperty<>(LogField.NOT_USED);

        Pick(String header) {
            this.header = header;
        }

        /** The column's header as the file writes it. */
        public String header() {
            return header;
        }

        /** What the column holds; "Not used" until picked. */
        public ObjectProperty<LogField> fieldProperty() {
            return field;
        }
    }

    private final ObservableList<Pick> picks = FXCollections.observableArrayList();
    private final ReadOnlyStringWrapper known = new ReadOnlyStringWrapper("");
    private List<LogColumns.Column> columns = List.of();

    /** The columns to pick for, in file order; empty before a readable file is chosen. */
    public ObservableList<Pick> picks() {
        return picks;
    }

    /** "Read by their names: 'time' as Date and time, …", "" when no column is known by name. */
    public ReadOnlyStringProperty knownProperty() {
        return known.getReadOnlyProperty();
    }

    /** Reads the header row of the file at {@code path}; anything not readable leaves no picks. */
    void read(String path) {
        columns = List.of();
        String p = path == null ? "" : path.strip();
        if (!p.isEmpty()) {
            try {
                Path file = Path.of(p);
                if (Files.isRegularFile(file)) {
                    columns = LogColumns.read(file).columns();
                }
            } catch (IOException | LogRefusedException | java.nio.file.InvalidPathException e) {
                columns = List.of(); // the import itself says what is wrong with the file
            }
        }
        List<Pick> out = new ArrayList<>();
        StringBuilder k = new StringBuilder();
        for (LogColumns.Column c : columns) {
            if (c.known()) {
                k.append(k.length() == 0 ? "Read by their names: " : ", ").append('\'').append(c.header())
                        .append("' as ").append(LogField.ofKey(c.field()).words());
            } else {
                out.add(new Pick(c.header()));
            }
        }
        known.set(k.length() == 0 ? "" : k.append('.').toString());
        picks.setAll(out);
    }

    /** The picks as the importer's header map: header → field, columns left "Not used" out. */
    Map<String, String> headerMap() {
        Map<String, String> m = new LinkedHashMap<>();
        for (Pick p : picks) {
            if (!p.field.get().equals(LogField.NOT_USED)) {
                m.put(p.header, p.field.get().key());
            }
        }
        return m;
    }

    /**
     * Why the columns as picked cannot be a log, in words, or null when they can (or when the header
     * could not be read: the importer then says why).
     */
    String problem() {
        if (columns.isEmpty()) {
            return null;
        }
        Map<LogField, String> taken = new LinkedHashMap<>();
        Map<String, LogField> picked = new LinkedHashMap<>();
        for (Pick p : picks) {
            picked.put(p.header, p.field.get());
        }
        String time = null;
        boolean temperature = false;
        for (LogColumns.Column c : columns) {
            LogField f = c.known() ? LogField.ofKey(c.field()) : picked.getOrDefault(c.header(), LogField.NOT_USED);
            if (f.equals(LogField.NOT_USED)) {
                continue;
            }
            String before = taken.putIfAbsent(f, c.header());
            if (before != null) {
                return "the columns '" + before + "' and '" + c.header() + "' are both " + f.words()
                        + ": set one of them to another field or to Not used.";
            }
            if (f.isTime()) {
                if (time != null) {
                    return "the columns '" + time + "' and '" + c.header() + "' both hold the time: keep one"
                            + " and set the other to Not used.";
                }
                time = c.header();
            }
            temperature |= f.isTemperature();
        }
        if (time == null) {
            return "no column holds the time: set the column with the date and time (or the seconds from the"
                    + " start) to " + LogField.TIME.words() + " or " + LogField.SECONDS.words() + ".";
        }
        if (!temperature) {
            return "no column holds a temperature: set at least one column to a temperature, such as "
                    + LogField.ofKey("return_db").words() + " or " + LogField.ofKey("supply_db").words() + ".";
        }
        return null;
    }
}
