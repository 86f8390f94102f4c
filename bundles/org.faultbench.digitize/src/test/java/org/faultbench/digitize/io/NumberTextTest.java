package org.faultbench.digitize.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class NumberTextTest {

    @Test
    void decimalNotationsAreNumbers() {
        assertEquals(-12.5, NumberText.parse(" -12.5 ").getAsDouble());
        assertEquals(0.5, NumberText.parse(".5").getAsDouble());
        assertEquals(7.0, NumberText.parse("7.").getAsDouble());
        assertEquals(1.0e30, NumberText.parse("1.0E+30").getAsDouble());
        assertEquals(1.0e30, NumberText.parse("0.1e31").getAsDouble());
    }

    @Test
    void whatOtherProgramsWouldNotWriteIsNotANumber() {
        for (String token : new String[] { "", "abc", "NaN", "Infinity", "1d", "0x1p3", "1,5", "1e999", "--1" }) {
            assertFalse(NumberText.isNumber(token), token);
        }
        assertTrue(NumberText.isNumber("+3"));
    }

    @Test
    void plainTextReadsBackExactlyWithoutExponent() {
        assertEquals("500000", NumberText.plain(500000.0));
        assertEquals("10000000", NumberText.plain(1.0e7));
        assertEquals("1025.5", NumberText.plain(1025.5));
        assertEquals("0", NumberText.plain(0.0));
        double awkward = 0.1 + 0.2;
        assertEquals(awkward, Double.parseDouble(NumberText.plain(awkward)));
    }

    @Test
    void fixedRoundsToTheDecimalsAndUsesAPoint() {
        assertEquals("2450.250", NumberText.fixed(2450.25, 3));
        assertEquals("-0.13", NumberText.fixed(-0.125001, 2));
    }
}
