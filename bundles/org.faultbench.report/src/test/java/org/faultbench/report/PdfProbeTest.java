package org.faultbench.report;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;

class PdfProbeTest {
    @Test
    void writesAPdfHeader() throws Exception {
        byte[] pdf = PdfProbe.emptyPage();
        // ISO 32000-1:2008, 7.5.2: a PDF file begins with "%PDF-"
        assertTrue(new String(pdf, 0, 5, StandardCharsets.US_ASCII).equals("%PDF-"));
    }
}
