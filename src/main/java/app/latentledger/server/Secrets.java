package app.latentledger.server;

import org.bouncycastle.crypto.generators.Argon2BytesGenerator;
import org.bouncycastle.crypto.params.Argon2Parameters;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.security.SecureRandom;
import java.util.Base64;
import java.util.HexFormat;

/**
 * Secrets of the server: device tokens, one-time enrol codes and office passwords. Only their
 * Argon2id hashes are stored (RFC 9106; parameters from the OWASP password storage cheat sheet's
 * minimum: 19 MiB, 2 passes, 1 lane), in the PHC string form
 * {@code $argon2id$v=19$m=19456,t=2,p=1$SALT$HASH} so the parameters can be raised later without
 * breaking stored hashes.
 */
public final class Secrets {
    private static final SecureRandom RANDOM = new SecureRandom();
    private static final int MEMORY_KIB = 19_456;
    private static final int PASSES = 2;
    private static final int LANES = 1;
    /** Crockford's base-32 alphabet: no I, L, O, U, so a code read aloud or typed is not misread. */
    private static final String CODE_ALPHABET = "0123456789ABCDEFGHJKMNPQRSTVWXYZ";

    private Secrets() {
    }

    /** Argon2id hash of a password or enrol code, with a fresh 16-byte salt, as a PHC string. */
    public static String hash(String secret) {
        return hash(secret, MEMORY_KIB, PASSES);
    }

    /**
     * Argon2id hash of a device token's secret. The secret is 256 random bits, which no amount of
     * guessing finds, so the hash need not be slow (its slowness protects guessable secrets); a light
     * setting (1 MiB, 1 pass) keeps the first request of each device on each instance cheap.
     */
    public static String hashToken(String secret) {
        return hash(secret, 1024, 1);
    }

    private static String hash(String secret, int memoryKib, int passes) {
        byte[] salt = new byte[16];
        RANDOM.nextBytes(salt);
        byte[] h = argon2(secret, salt, memoryKib, passes, LANES);
        Base64.Encoder b64 = Base64.getEncoder().withoutPadding();
        return "$argon2id$v=19$m=" + memoryKib + ",t=" + passes + ",p=" + LANES + "$" + b64.encodeToString(salt)
                + "$" + b64.encodeToString(h);
    }

    /** True when the secret matches the stored hash (constant-time comparison). */
    public static boolean matches(String secret, String stored) {
        if (secret == null || stored == null) {
            return false;
        }
        String[] parts = stored.split("\\$");
        // "", "argon2id", "v=19", "m=..,t=..,p=..", salt, hash
        if (parts.length != 6 || !parts[1].equals("argon2id")) {
            return false;
        }
        try {
            int m = 0;
            int t = 0;
            int p = 0;
            for (String kv : parts[3].split(",")) {
                int v = Integer.parseInt(kv.substring(2));
                switch (kv.charAt(0)) {
                    case 'm' -> m = v;
                    case 't' -> t = v;
                    case 'p' -> p = v;
                    default -> {
                        return false;
                    }
                }
            }
            byte[] salt = Base64.getDecoder().decode(parts[4]);
            byte[] expected = Base64.getDecoder().decode(parts[5]);
            if (m < 8 || m > 1 << 21 || t < 1 || t > 16 || p != 1) {
                return false; // not a setting this server writes: refuse rather than spend unbounded work
            }
            return MessageDigest.isEqual(expected, argon2(secret, salt, m, t, p));
        } catch (IllegalArgumentException | StringIndexOutOfBoundsException e) {
            return false;
        }
    }

    private static byte[] argon2(String secret, byte[] salt, int memoryKib, int passes, int lanes) {
        Argon2Parameters params = new Argon2Parameters.Builder(Argon2Parameters.ARGON2_id)
                .withVersion(Argon2Parameters.ARGON2_VERSION_13).withSalt(salt)
                .withMemoryAsKB(memoryKib).withIterations(passes).withParallelism(lanes).build();
        Argon2BytesGenerator g = new Argon2BytesGenerator();
        g.init(params);
        byte[] out = new byte[32];
        g.generateBytes(secret.getBytes(StandardCharsets.UTF_8), out);
        return out;
    }

    /** 32 random bytes, URL-safe base 64 (256 bits: never guessed). */
    public static String randomSecret() {
        byte[] b = new byte[32];
        RANDOM.nextBytes(b);
        return Base64.getUrlEncoder().withoutPadding().encodeToString(b);
    }

    /** A one-time enrol code {@code XXXX-XXXX-XXXX}: 12 base-32 characters, 60 bits. */
    public static String enrolCode() {
        StringBuilder b = new StringBuilder(14);
        for (int i = 0; i < 12; i++) {
            if (i > 0 && i % 4 == 0) {
                b.append('-');
            }
            b.append(CODE_ALPHABET.charAt(RANDOM.nextInt(CODE_ALPHABET.length())));
        }
        return b.toString();
    }

    /**
     * The code as the tech may have typed it (lower case, spaces, no dashes, O for 0, I or L for 1)
     * in its printed form, or null when it cannot be one.
     */
    public static String normaliseCode(String typed) {
        if (typed == null) {
            return null;
        }
        StringBuilder b = new StringBuilder();
        for (char c : typed.toUpperCase(java.util.Locale.ROOT).toCharArray()) {
            if (c == '-' || Character.isWhitespace(c)) {
                continue;
            }
            char d = c == 'O' ? '0' : (c == 'I' || c == 'L') ? '1' : c;
            if (CODE_ALPHABET.indexOf(d) < 0) {
                return null;
            }
            b.append(d);
        }
        if (b.length() != 12) {
            return null;
        }
        return b.substring(0, 4) + "-" + b.substring(4, 8) + "-" + b.substring(8);
    }

    /** SHA-256 in lower-case hex (the samples check; a cache key for verified tokens). */
    public static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }
}
