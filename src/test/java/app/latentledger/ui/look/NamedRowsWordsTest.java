package app.latentledger.ui.look;

import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** The pieces a wrapped line may not break inside: words, and the parts of a hyphenated word. */
class NamedRowsWordsTest {
    @Test
    void splitsBetweenWordsAndAfterHyphensOnly() {
        // Unicode line breaking (UAX #14) allows a break after a hyphen and at spaces, not between letters
        assertEquals(List.of("Return-", "minus-", "supply", "dry", "bulb"), NamedRows.words("Return-minus-supply dry bulb"));
        assertEquals(List.of("Total", "capacity"), NamedRows.words("Total  capacity\n"));
        assertEquals(List.of(), NamedRows.words(null));
    }
}
