package app.latentledger.sync.wire;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

class WireHashTest {
    private static JsonObject json(String text) {
        return JsonParser.parseString(text).getAsJsonObject();
    }

    /**
     * The expected digest was computed outside Java, with coreutils on the canonical text written
     * by hand from the rules (keys sorted, whole numbers as digits, 1.0E-5 as Double.toString
     * writes it, no HTML escaping, UTF-8):
     * {@code printf '%s' '{"a":[2,null,"x"],"b":1.5,"c":{"y":1.0E-5,"z":true},"d":"<é> \"q\""}' | sha256sum}.
     */
    @Test
    void aTinyObjectHashesToTheDigestComputedBySha256sum() {
        JsonObject body = json("{ \"d\": \"<é> \\\"q\\\"\", \"c\": {\"z\": true, \"y\": 0.00001},\n"
                + "  \"b\": 1.50, \"a\": [2.0, null, \"x\"] }");
        assertEquals("{\"a\":[2,null,\"x\"],\"b\":1.5,\"c\":{\"y\":1.0E-5,\"z\":true},\"d\":\"<é> \\\"q\\\"\"}",
                WireHash.canonical(body));
        assertEquals("fee112c51555507a9feb39a8b96936377fa41a52a50ac33c2374ddce7933a2cb", WireHash.of(body));
    }

    /** {@code printf '%s' '{}' | sha256sum}, also from coreutils. */
    @Test
    void aDeletionCarriesTheHashOfTheEmptyObject() {
        assertEquals("44136fa355b3678a1146ad16f7e8649e94fb4fc21fe77e8310c060f61caaff8a", WireHash.DELETED);
    }

    @Test
    void theHashIgnoresKeyOrderAndWhitespaceAtEveryDepth() {
        String a = "{\"id\":\"s1\",\"elevationM\":10,\"nested\":{\"p\":1,\"q\":[{\"m\":1,\"n\":2}]}}";
        String b = "{\n  \"nested\" : { \"q\" : [ { \"n\" : 2 , \"m\" : 1.0 } ], \"p\" : 1e0 },\n\t\"elevationM\": 10.0, \"id\": \"s1\"\n}";
        assertEquals(WireHash.of(json(a)), WireHash.of(json(b)));
    }

    @Test
    void anyChangeOfContentChangesTheHash() {
        String base = WireHash.of(json("{\"a\":1,\"b\":[1,2]}"));
        assertNotEquals(base, WireHash.of(json("{\"a\":1.0000000001,\"b\":[1,2]}")));
        assertNotEquals(base, WireHash.of(json("{\"a\":1,\"b\":[2,1]}")), "list order is content");
        assertNotEquals(base, WireHash.of(json("{\"a\":\"1\",\"b\":[1,2]}")), "a string is not a number");
        assertNotEquals(base, WireHash.of(json("{\"a\":1,\"b\":[1,2],\"c\":null}")), "a null member is content");
    }

    @Test
    void numbersFollowTheContractRule() {
        assertEquals("24", WireHash.number(24.0));
        assertEquals("0", WireHash.number(-0.0));
        assertEquals("-3", WireHash.number(-3.0));
        assertEquals("24.444444444444443", WireHash.number(24.444444444444443));
        assertEquals("1000000000000000000000", WireHash.number(1e21), "whole, so plain digits, never 1.0E21");
        assertEquals("8.5E-4", WireHash.number(850e-6));
        assertThrows(WireException.class, () -> WireHash.number(Double.NaN));
    }
}
