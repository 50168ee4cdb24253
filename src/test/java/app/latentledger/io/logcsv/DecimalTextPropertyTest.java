package app.latentledger.io.logcsv;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

import java.math.BigDecimal;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The importer's number reader gives bit for bit what {@link Double#parseDouble} gives (the JDK as
 * the outside reference) for every shape it accepts, read from inside a larger char buffer as the
 * row splitter hands cells over: any double's own text, plain decimals with many digits, signs and
 * exponents, and the same with a decimal comma.
 */
class DecimalTextPropertyTest {
    private static void same(String text) {
        char[] buf = (";" + text + ";").toCharArray();
        double expected = Double.parseDouble(text);
        assertEquals(Double.doubleToLongBits(expected), Double.doubleToLongBits(DecimalText.parse(buf, 1, 1 + text.length(), false)), text);
        assertEquals(Double.doubleToLongBits(expected), Double.doubleToLongBits(DecimalText.parse(text, false)), text);
        if (text.indexOf('.') >= 0) {
            String comma = text.replace('.', ',');
            char[] cb = (";" + comma + ";").toCharArray();
            assertEquals(Double.doubleToLongBits(expected),
                    Double.doubleToLongBits(DecimalText.parse(cb, 1, 1 + comma.length(), true)), comma);
        }
    }

    @Property(tries = 3000)
    void anyFiniteDoublesOwnText(@ForAll double x) {
        if (Double.isFinite(x)) {
            same(Double.toString(x));
            String plain = new BigDecimal(x).round(new java.math.MathContext(17)).toPlainString();
            if (plain.length() <= 40) { // the reader's longest cell
                same(plain);
            }
        }
    }

    @Property(tries = 5000)
    void decimalsWithManyDigitsSignsAndExponents(@ForAll("decimals") String text) {
        same(text);
    }

    @Provide
    Arbitrary<String> decimals() {
        Arbitrary<String> sign = Arbitraries.of("", "-", "+");
        Arbitrary<String> whole = Arbitraries.strings().numeric().ofMinLength(0).ofMaxLength(20);
        Arbitrary<String> fraction = Arbitraries.strings().numeric().ofMinLength(0).ofMaxLength(20);
        Arbitrary<String> exponent = Arbitraries.oneOf(Arbitraries.just(""),
                Arbitraries.integers().between(-330, 310).map(e -> "e" + e),
                Arbitraries.integers().between(0, 40).map(e -> "E+" + e));
        return Combinators.combine(sign, whole, fraction, Arbitraries.of(true, false), exponent)
                .as((s, w, f, dot, e) -> {
                    String digits = w.isEmpty() && f.isEmpty() ? "0" : w;
                    String body = dot || !f.isEmpty() ? digits + "." + f : digits;
                    if (body.equals(".")) {
                        body = "0.";
                    }
                    return s + body + e;
                })
                .filter(t -> t.length() <= 40);
    }
}
