package app.latentledger.io.logcsv;

import app.latentledger.core.units.UnitSystem;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.IntRange;

import java.io.ByteArrayInputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertTrue;

/** Whatever the bytes, the importer returns a log or refuses with {@link LogRefusedException}; nothing else escapes. */
class LogCsvImporterFuzzTest {
    private static final String GOOD = "time,return_db,return_rh,supply_db,supply_rh,compressor,fan\n"
            + "2026-07-14T13:00:00-04:00,77.0,55,57.2,90,1,1\n"
            + "2026-07-14T13:00:10-04:00,77.0,55.5,57.2,90,1,1\n"
            + "2026-07-14T13:00:20-04:00,77.1,55.5,57.9,88,0,1\n"
            + "2026-07-14T13:00:30-04:00,77.1,55.4,60.2,80,0,0\n";

    private static void mustNotThrow(String text) {
        try {
            LogImport r = new LogCsvImporter(UnitSystem.IP, Map.of(), null).read(new java.io.StringReader(text), text.length());
            assertTrue(r.report().rowsKept() >= 2);
            assertTrue(r.report().rejected().size() <= LogCsvImporter.MAX_MESSAGES);
            for (String m : r.report().rejected()) {
                assertTrue(m.length() < 400, "message stays short: " + m.length());
            }
        } catch (LogRefusedException expected) {
            assertTrue(!expected.getMessage().isEmpty());
        } catch (Exception e) {
            throw new AssertionError("importer threw " + e, e);
        }
    }

    @Property(tries = 300)
    void randomBytes(@ForAll("bytes") byte[] data) throws Exception {
        String text = new String(data, StandardCharsets.UTF_8);
        mustNotThrow(text);
        // and as decoded from a stream, like a file
        try {
            new LogCsvImporter(UnitSystem.SI, Map.of(), null).read(new InputStreamReader(new ByteArrayInputStream(data),
                    StandardCharsets.UTF_8), data.length);
        } catch (LogRefusedException expected) {
            // fine
        }
    }

    @Provide
    Arbitrary<byte[]> bytes() {
        return Arbitraries.bytes().array(byte[].class).ofMaxSize(4000);
    }

    @Property(tries = 300)
    void truncatedAndMangledGoodFile(@ForAll @IntRange(min = 0, max = 400) int cut,
                                     @ForAll @IntRange(min = 0, max = 400) int at,
                                     @ForAll("junk") String junk) {
        String t = GOOD.substring(0, Math.min(cut, GOOD.length()));
        int p = Math.min(at, t.length());
        mustNotThrow(t.substring(0, p) + junk + t.substring(p));
    }

    @Provide
    Arbitrary<String> junk() {
        return Arbitraries.oneOf(Arbitraries.strings().withChars(",;\t\"\r\n-:.eE+0123456789 TZaé\uFEFF").ofMaxLength(30),
                Arbitraries.strings().all().ofMaxLength(20));
    }

    @Property(tries = 20)
    void hugeFields(@ForAll @IntRange(min = 10_000, max = 300_000) int length, @ForAll @IntRange(min = 0, max = 6) int column) {
        String[] lines = GOOD.split("\n");
        String[] cells = lines[2].split(",");
        cells[column] = "9".repeat(length);
        lines[2] = String.join(",", cells);
        mustNotThrow(String.join("\n", lines) + "\n");
        mustNotThrow("x".repeat(length) + "\n" + GOOD); // a huge header line
    }

    /** The importer's fast number path gives exactly what Double.parseDouble gives (the JDK as the reference). */
    @Property(tries = 2000)
    void numbersAgreeWithTheJdk(@ForAll @IntRange(min = -2_000_000, max = 2_000_000) int whole,
                                @ForAll @IntRange(min = 0, max = 6) int decimals) {
        String text = java.math.BigDecimal.valueOf(whole).movePointLeft(decimals).toPlainString();
        org.junit.jupiter.api.Assertions.assertEquals(Double.parseDouble(text), DecimalText.parse(text, false), 0.0, text);
        org.junit.jupiter.api.Assertions.assertEquals(Double.parseDouble(text),
                DecimalText.parse(text.replace('.', ','), true), 0.0, text);
    }

    @net.jqwik.api.Example
    void numberShapes() {
        String[] ok = {"1e3", "-2.5E-2", "+7", ".5", "5.", "000012.500", "12345678901234567890", "1.7976931348623157e308"};
        for (String s : ok) {
            org.junit.jupiter.api.Assertions.assertEquals(Double.parseDouble(s), DecimalText.parse(s, false), 0.0, s);
        }
        String[] bad = {"", "-", ".", "e5", "1e", "1e+", "1.2.3", "0x10", "NaN", "Infinity", "1,5", "12a", "--1", "1e5.5"};
        for (String s : bad) {
            org.junit.jupiter.api.Assertions.assertTrue(Double.isNaN(DecimalText.parse(s, false)), s);
        }
    }
}
