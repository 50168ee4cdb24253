package app.latentledger.store;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * One table row in the recycle bin, column by column, exactly: SQLite's five storage classes
 * (NULL, INTEGER, REAL, TEXT, BLOB) each kept as they were, doubles bit for bit, so a restored row
 * is the row that was deleted.
 */
final class BinRows {
    private static final byte NULL = 0;
    private static final byte INTEGER = 1;
    private static final byte REAL = 2;
    private static final byte TEXT = 3;
    private static final byte BLOB = 4;
    /** Format of the encoding, first byte of every row, so a later change can still read old rows. */
    private static final byte VERSION = 1;

    private BinRows() {
    }

    static byte[] encode(Map<String, Object> row) {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (DataOutputStream out = new DataOutputStream(bytes)) {
            out.writeByte(VERSION);
            out.writeInt(row.size());
            for (Map.Entry<String, Object> e : row.entrySet()) {
                out.writeUTF(e.getKey());
                Object v = e.getValue();
                if (v == null) {
                    out.writeByte(NULL);
                } else if (v instanceof Integer || v instanceof Long) {
                    out.writeByte(INTEGER);
                    out.writeLong(((Number) v).longValue());
                } else if (v instanceof Double || v instanceof Float) {
                    out.writeByte(REAL);
                    out.writeLong(Double.doubleToRawLongBits(((Number) v).doubleValue()));
                } else if (v instanceof String s) {
                    out.writeByte(TEXT);
                    byte[] b = s.getBytes(java.nio.charset.StandardCharsets.UTF_8);
                    out.writeInt(b.length);
                    out.write(b);
                } else if (v instanceof byte[] b) {
                    out.writeByte(BLOB);
                    out.writeInt(b.length);
                    out.write(b);
                } else {
                    throw new IllegalArgumentException("column " + e.getKey() + " holds a " + v.getClass().getName());
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return bytes.toByteArray();
    }

    static Map<String, Object> decode(byte[] data) {
        Map<String, Object> row = new LinkedHashMap<>();
        try (DataInputStream in = new DataInputStream(new ByteArrayInputStream(data))) {
            byte version = in.readByte();
            if (version != VERSION) {
                throw new StoreException("recycle bin row written in format " + version + "; this build reads " + VERSION);
            }
            int n = in.readInt();
            for (int i = 0; i < n; i++) {
                String name = in.readUTF();
                byte type = in.readByte();
                Object v = switch (type) {
                    case NULL -> null;
                    case INTEGER -> in.readLong();
                    case REAL -> Double.longBitsToDouble(in.readLong());
                    case TEXT -> {
                        byte[] b = new byte[in.readInt()];
                        in.readFully(b);
                        yield new String(b, java.nio.charset.StandardCharsets.UTF_8);
                    }
                    case BLOB -> {
                        byte[] b = new byte[in.readInt()];
                        in.readFully(b);
                        yield b;
                    }
                    default -> throw new StoreException("recycle bin row: unknown value type " + type);
                };
                row.put(name, v);
            }
        } catch (IOException e) {
            throw new StoreException("recycle bin row cannot be read: " + e.getMessage(), e);
        }
        return row;
    }
}
