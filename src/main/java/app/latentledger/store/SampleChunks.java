package app.latentledger.store;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;

/**
 * How log samples sit in {@code log_chunk} blobs: times as 8-byte little-endian longs (ms), values
 * channel after channel as 8-byte little-endian IEEE-754 doubles. Little-endian and fixed width so
 * the bytes read the same on any machine and any later version.
 */
final class SampleChunks {
    /** Samples per chunk: 8192 × 7 columns × 8 bytes ≈ 460 kB per row, 74 rows for a week at 1 Hz. */
    static final int CHUNK = 8192;

    private SampleChunks() {
    }

    static byte[] times(long[] times, int from, int count) {
        ByteBuffer b = ByteBuffer.allocate(count * Long.BYTES).order(ByteOrder.LITTLE_ENDIAN);
        b.asLongBuffer().put(times, from, count);
        return b.array();
    }

    static byte[] values(double[][] channels, int from, int count) {
        ByteBuffer b = ByteBuffer.allocate(channels.length * count * Double.BYTES).order(ByteOrder.LITTLE_ENDIAN);
        var d = b.asDoubleBuffer();
        for (double[] channel : channels) {
            d.put(channel, from, count);
        }
        return b.array();
    }

    static void readTimes(byte[] blob, long[] into, int from, int count) {
        if (blob.length != count * Long.BYTES) {
            throw new StoreException("log chunk at sample " + from + ": time blob is " + blob.length
                    + " bytes, expected " + count * Long.BYTES);
        }
        ByteBuffer.wrap(blob).order(ByteOrder.LITTLE_ENDIAN).asLongBuffer().get(into, from, count);
    }

    static void readValues(byte[] blob, double[][] into, int from, int count) {
        if (blob.length != into.length * count * Double.BYTES) {
            throw new StoreException("log chunk at sample " + from + ": value blob is " + blob.length
                    + " bytes, expected " + into.length * count * Double.BYTES);
        }
        var d = ByteBuffer.wrap(blob).order(ByteOrder.LITTLE_ENDIAN).asDoubleBuffer();
        for (double[] channel : into) {
            d.get(channel, from, count);
        }
    }
}
