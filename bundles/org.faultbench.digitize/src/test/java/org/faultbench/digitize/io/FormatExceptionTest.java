package org.faultbench.digitize.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import java.io.IOException;

import org.junit.jupiter.api.Test;

class FormatExceptionTest {

    @Test
    void messageNamesFileLineAndField() {
        FormatException e = new FormatException("sample.asc", 7, 3,
                "expected a number for the grid value, found 'abc'");
        assertEquals("sample.asc, line 7, field 3: expected a number for the grid value, found 'abc'", e.getMessage());
        assertEquals("sample.asc", e.fileName());
        assertEquals(7, e.line());
        assertEquals(3, e.field());
        assertEquals("expected a number for the grid value, found 'abc'", e.problem());
        assertInstanceOf(IOException.class, e);
    }

    @Test
    void wholeLineAndWholeFileProblemsLeaveOutTheMissingParts() {
        assertEquals("tops.csv, line 4: expected 6 fields", new FormatException("tops.csv", 4, 0,
                "expected 6 fields").getMessage());
        assertEquals("tops.csv: the file is empty", new FormatException("tops.csv", 0, 0, "the file is empty")
                .getMessage());
    }
}
