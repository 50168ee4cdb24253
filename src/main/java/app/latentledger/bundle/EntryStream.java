package app.latentledger.bundle;

import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * One zip entry as it is inflated: counts and hashes every byte read and stops with
 * {@link TooLarge} at the first byte past the size the manifest declared, so a zip bomb is cut off
 * after at most its declared size, whatever the zip's own headers claim.
 */
final class EntryStream extends FilterInputStream {
    /** More bytes than declared: the entry cannot match the manifest. */
    static final class TooLarge extends IOException {
        private static final long serialVersionUID = 1L;

        TooLarge(String message) {
            super(message);
        }
    }

    private final MessageDigest digest;
    private final long limit;
    private final String name;
    private long count;

    EntryStream(InputStream in, String name, long limit) {
        super(in);
        this.name = name;
        this.limit = limit;
        try {
            this.digest = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }

    @Override
    public int read() throws IOException {
        int b = super.read();
        if (b >= 0) {
            counted(1);
            digest.update((byte) b);
        }
        return b;
    }

    @Override
    public int read(byte[] b, int off, int len) throws IOException {
        // never ask for more than one byte past the limit: nothing beyond it is ever inflated
        long room = limit + 1 - count;
        int n = super.read(b, off, (int) Math.max(1, Math.min(len, room)));
        if (n > 0) {
            counted(n);
            digest.update(b, off, n);
        }
        return n;
    }

    private void counted(int n) throws TooLarge {
        count += n;
        if (count > limit) {
            throw new TooLarge("bundle entry " + name + " holds more than the " + limit
                    + " bytes the manifest declares: the bundle was changed or damaged after export");
        }
    }

    /** Reads what is left (up to the limit), so the hash covers the whole entry. */
    void drain() throws IOException {
        byte[] skip = new byte[8192];
        while (read(skip, 0, skip.length) >= 0) {
            // counting and hashing only
        }
    }

    long count() {
        return count;
    }

    String sha256() {
        return HexFormat.of().formatHex(digest.digest());
    }

    @Override
    public boolean markSupported() {
        return false;
    }
}
