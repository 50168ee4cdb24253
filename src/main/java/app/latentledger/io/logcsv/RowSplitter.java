package app.latentledger.io.logcsv;

import java.io.IOException;
import java.io.Reader;

/**
 * Splits a log's text into rows and fields the way the importer's CSV format always has (commons-csv
 * {@code DEFAULT} with the file's separator, no quote character, empty lines skipped, fields
 * trimmed), but without making a String per field: the text is read in large blocks into one
 * char buffer and each field is a start and end index into it, valid until the next {@link #next}.
 *
 * <p>The rules, as in that format: a row ends at CR, LF or CRLF (each one line break); a line with
 * nothing on it is skipped; every separator starts a new field, so a trailing separator gives an
 * empty last field; quotes are ordinary characters (the importer removes quotes around a field
 * itself; a quote cannot hide a separator). A byte-order mark stays in the first field, where the
 * importer's header cleaning removes it. {@link #trimmedStart}/{@link #trimmedEnd} give a field
 * without leading and trailing characters ≤ U+0020, as {@link String#trim()} does.
 *
 * <p>{@link #line()} is the physical line a text editor shows the row on (1-based; skipped blank
 * lines counted), {@link #position()} the number of chars before the row.
 */
public final class RowSplitter {
    private static final int BLOCK = 1 << 16;

    private final Reader in;
    private char delimiter;
    private char[] buf = new char[BLOCK];
    private int pos;
    private int limit;
    private boolean eof;
    /** Chars read before buf[0]. */
    private long shifted;
    /** The previous row ended on a CR: a LF right after it belongs to the same line break. */
    private boolean afterCr;
    private long nextLine = 1;
    private long line;
    private long position;
    private int[] starts = new int[16];
    private int[] ends = new int[16];
    private int count;

    /**
     * @param in        the text; read in blocks of 64 Ki chars, so no extra buffering is needed
     * @param delimiter the field separator
     */
    public RowSplitter(Reader in, char delimiter) {
        this.in = in;
        this.delimiter = delimiter;
    }

    /** Sets the separator, e.g. after {@link #peekFirstLine} showed which one the file uses. */
    public void delimiter(char d) {
        this.delimiter = d;
    }

    /**
     * The first line with any character on it, without consuming it (leading empty lines are
     * skipped later by {@link #next} anyway), cut off after {@code maxChars + 1} chars so a caller can
     * refuse an overlong one; null when the text has no such line.
     */
    public String peekFirstLine(int maxChars) throws IOException {
        int p = pos;
        while (true) {
            if (p == limit) {
                int before = pos;
                if (!fill(pos)) {
                    return null;
                }
                p -= before - pos;
                continue;
            }
            char c = buf[p];
            if (c != '\n' && c != '\r') {
                break;
            }
            p++;
        }
        int start = p;
        while (true) {
            if (p - start > maxChars) {
                return new String(buf, start, p - start);
            }
            if (p == limit) {
                int before = pos;
                if (!fill(pos)) {
                    return new String(buf, start - (before - pos), p - start);
                }
                start -= before - pos;
                p -= before - pos;
                continue;
            }
            char c = buf[p];
            if (c == '\n' || c == '\r') {
                return new String(buf, start, p - start);
            }
            p++;
        }
    }

    /** Moves to the next row; false at the end of the text. */
    public boolean next() throws IOException {
        // skip the LF of a CRLF that ended the previous row, then empty lines
        while (true) {
            if (pos == limit && !fill(pos)) {
                return false;
            }
            char c = buf[pos];
            if (c == '\n') {
                pos++;
                if (!afterCr) {
                    nextLine++;
                }
                afterCr = false;
            } else if (c == '\r') {
                pos++;
                nextLine++;
                afterCr = true;
            } else {
                afterCr = false;
                break;
            }
        }
        line = nextLine;
        position = shifted + pos;
        count = 0;
        int rowStart = pos;
        int fieldStart = pos;
        final char d = delimiter;
        while (true) {
            char[] b = buf;
            int p = pos;
            int lim = limit;
            char c = 0;
            while (p < lim) {
                c = b[p];
                if (c == d || c == '\n' || c == '\r') {
                    break;
                }
                p++;
            }
            pos = p;
            if (p == lim) {
                long before = shifted;
                boolean more = fill(rowStart);
                int shift = (int) (shifted - before);
                fieldStart -= shift;
                rowStart -= shift;
                if (!more) {
                    add(fieldStart, pos);
                    return true;
                }
                continue;
            }
            add(fieldStart, p);
            pos = p + 1;
            if (c == d) {
                fieldStart = pos;
                continue;
            }
            nextLine++;
            afterCr = c == '\r';
            return true;
        }
    }

    private void add(int start, int end) {
        if (count == starts.length) {
            starts = java.util.Arrays.copyOf(starts, count * 2);
            ends = java.util.Arrays.copyOf(ends, count * 2);
        }
        starts[count] = start;
        ends[count] = end;
        count++;
    }

    /**
     * Moves buf[keep..limit) to the front (growing the buffer when that is all of it) and reads
     * more; shifts every stored index. False when nothing more could be read.
     */
    private boolean fill(int keep) throws IOException {
        if (eof) {
            return false;
        }
        if (keep > 0) {
            System.arraycopy(buf, keep, buf, 0, limit - keep);
            for (int i = 0; i < count; i++) {
                starts[i] -= keep;
                ends[i] -= keep;
            }
            limit -= keep;
            pos -= keep;
            shifted += keep;
        }
        if (limit == buf.length) {
            buf = java.util.Arrays.copyOf(buf, buf.length * 2);
        }
        while (true) {
            int n = in.read(buf, limit, buf.length - limit);
            if (n < 0) {
                eof = true;
                return false;
            }
            if (n > 0) {
                limit += n;
                return true;
            }
        }
    }

    /** Fields in the current row. */
    public int size() {
        return count;
    }

    /** The buffer the current row's fields index into. */
    public char[] chars() {
        return buf;
    }

    /** Start of field {@code i} as written (untrimmed). */
    public int start(int i) {
        return starts[i];
    }

    /** End (exclusive) of field {@code i} as written. */
    public int end(int i) {
        return ends[i];
    }

    /** Start of field {@code i} without leading chars ≤ U+0020. */
    public int trimmedStart(int i) {
        int s = starts[i];
        int e = ends[i];
        while (s < e && buf[s] <= ' ') {
            s++;
        }
        return s;
    }

    /** End of field {@code i} without trailing chars ≤ U+0020. */
    public int trimmedEnd(int i) {
        int s = trimmedStart(i);
        int e = ends[i];
        while (e > s && buf[e - 1] <= ' ') {
            e--;
        }
        return e;
    }

    /** Field {@code i} trimmed, as a String (for headers and messages, not for every sample). */
    public String text(int i) {
        int s = trimmedStart(i);
        return new String(buf, s, trimmedEnd(i) - s);
    }

    /** Physical line of the current row, 1-based. */
    public long line() {
        return line;
    }

    /** Chars before the current row. */
    public long position() {
        return position;
    }
}
