package org.faultbench.digitize.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.io.StringReader;
import java.util.List;

import org.junit.jupiter.api.Test;

/** Quoting rules of RFC 4180 (Shafranovich 2005), section 2, rules 5 to 7. */
class CsvLineTest {

    private static List<String> fields(String line) throws IOException {
        return CsvLine.fields(TextFile.read(new StringReader(line), "tops.csv"), 1);
    }

    @Test
    void quotedFieldsMayHoldCommasAndDoubledQuotes() throws IOException {
        // RFC 4180 rule 6: fields with commas are enclosed in double quotes; rule 7: "" stands for one quote
        assertEquals(List.of("Well A, deviated", "Top \"B\" Sand", "12.5"),
                fields("\"Well A, deviated\",\"Top \"\"B\"\" Sand\",12.5"));
    }

    @Test
    void unquotedFieldsAreTrimmedAndEmptyFieldsKept() throws IOException {
        assertEquals(List.of("W-1", "", "3", ""), fields(" W-1 ,, 3,"));
        assertEquals(List.of("a", "b"), fields("a,  \"b\"  "));
    }

    @Test
    void unclosedQuoteAndTextAfterAQuoteAreRefused() {
        FormatException open = assertThrows(FormatException.class, () -> fields("W-1,\"Top Sand,3"));
        assertEquals(2, open.field());
        FormatException after = assertThrows(FormatException.class, () -> fields("\"W\"-1,Top"));
        assertEquals(1, after.field());
    }
}
