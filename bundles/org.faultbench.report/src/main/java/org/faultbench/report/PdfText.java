package org.faultbench.report;

import java.io.IOException;

/**
 * Keeps text within what the standard 14 fonts can show (WinAnsi): common symbols are spelled out, anything else
 * unknown becomes '?', so a stray character never stops a report.
 */
final class PdfText {
    private PdfText() {
    }

    static String safe(String text) {
        StringBuilder out = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
            case '\u2264':
                out.append("<=");
                break;
            case '\u2265':
                out.append(">=");
                break;
            case '\u2212':
                out.append('-');
                break;
            case '\u00b3':
            case '\u00b2':
            case '\u00b0':
            case '\u2013':
            case '\u2014':
            case '\u00b7':
                out.append(c);
                break;
            case '\n':
            case '\t':
                out.append(' ');
                break;
            default:
                out.append(encodable(c) ? c : '?');
            }
        }
        return out.toString();
    }

    private static boolean encodable(char c) {
        if (c >= 0x20 && c < 0x7f) {
            return true;
        }
        try {
            PdfLayout.REGULAR.encode(String.valueOf(c));
            return true;
        } catch (IOException | IllegalArgumentException e) {
            return false;
        }
    }
}
