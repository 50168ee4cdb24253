package app.latentledger.server;

import org.bouncycastle.crypto.generators.Argon2BytesGenerator;
import org.bouncycastle.crypto.params.Argon2Parameters;
import org.junit.jupiter.api.Test;

import java.util.Arrays;
import java.util.HashSet;
import java.util.HexFormat;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SecretsTest {
    /** RFC 9106 section 5.3, the Argon2id test vector: the library and version the server hashes with. */
    @Test
    void theArgon2idLibraryGivesRfc9106sTestVector() {
        byte[] password = new byte[32];
        Arrays.fill(password, (byte) 1);
        byte[] salt = new byte[16];
        Arrays.fill(salt, (byte) 2);
        byte[] secret = new byte[8];
        Arrays.fill(secret, (byte) 3);
        byte[] ad = new byte[12];
        Arrays.fill(ad, (byte) 4);
        Argon2BytesGenerator g = new Argon2BytesGenerator();
        g.init(new Argon2Parameters.Builder(Argon2Parameters.ARGON2_id).withVersion(Argon2Parameters.ARGON2_VERSION_13)
                .withSalt(salt).withSecret(secret).withAdditional(ad).withMemoryAsKB(32).withIterations(3)
                .withParallelism(4).build());
        byte[] tag = new byte[32];
        g.generateBytes(password, tag);
        assertEquals("0d640df58d78766c08c037a34a8b53c9d01ef0452d75b65eb52520e96b01e659", HexFormat.of().formatHex(tag));
    }

    @Test
    void aHashMatchesItsSecretOnlyAndIsSaltedEachTime() {
        String h1 = Secrets.hash("correct horse battery staple");
        String h2 = Secrets.hash("correct horse battery staple");
        assertTrue(h1.startsWith("$argon2id$v=19$m=19456,t=2,p=1$"), h1);
        assertNotEquals(h1, h2, "a fresh salt each time");
        assertTrue(Secrets.matches("correct horse battery staple", h1));
        assertTrue(Secrets.matches("correct horse battery staple", h2));
        assertFalse(Secrets.matches("correct horse battery stapler", h1));
        String token = Secrets.randomSecret();
        String th = Secrets.hashToken(token);
        assertTrue(th.startsWith("$argon2id$v=19$m=1024,t=1,p=1$"), th);
        assertTrue(Secrets.matches(token, th));
        assertFalse(Secrets.matches(token + "x", th));
        assertFalse(Secrets.matches(token, "$argon2id$v=19$m=99999999,t=1,p=1$AAAA$AAAA"), "absurd settings refused");
        assertFalse(Secrets.matches(token, "plain text"));
    }

    @Test
    void enrolCodesAreTwelveBase32CharactersAndReadBackAsTyped() {
        Set<String> seen = new HashSet<>();
        for (int i = 0; i < 1000; i++) {
            String code = Secrets.enrolCode();
            assertTrue(code.matches("[0-9A-HJKMNP-TV-Z]{4}-[0-9A-HJKMNP-TV-Z]{4}-[0-9A-HJKMNP-TV-Z]{4}"), code);
            assertEquals(code, Secrets.normaliseCode(code.toLowerCase(java.util.Locale.ROOT).replace("-", " ")));
            seen.add(code);
        }
        assertEquals(1000, seen.size(), "60 random bits: no repeat in a thousand");
        assertEquals("0111-ABCD-EFGH", Secrets.normaliseCode("oIl1-abcd-efgh"), "O read as 0, I and L as 1");
        assertNull(Secrets.normaliseCode("ABCD-EFGH-JKM"));
        assertNull(Secrets.normaliseCode("ABCD-EFGH-JKMU"), "U is not in the alphabet");
        assertEquals(43, Secrets.randomSecret().length(), "32 bytes in URL-safe base 64");
    }
}
