package org.faultbench.digitize.io;

import java.util.ArrayList;
import java.util.List;

/**
 * Splits one line of comma-separated values as spreadsheets write them (RFC 4180): a field in double quotes may
 * hold commas ({@code "Well A, deviated"}) and doubled quotes ({@code ""}) stand for one quote. Unquoted fields are
 * trimmed; blanks around a quoted field are ignored. A record may not continue on the next line.
 */
final class CsvLine {
    private static final char QUOTE = '"';
    private static final char COMMA = ',';

    private CsvLine() {
    }

    static List<String> fields(TextFile file, int line) throws FormatException {
        String text = file.line(line);
        List<String> fields = new ArrayList<>();
        int pos = 0;
        while (true) {
            int start = skipBlanks(text, pos);
            if (start < text.length() && text.charAt(start) == QUOTE) {
                pos = skipBlanks(text, readQuoted(file, line, text, start + 1, fields));
                if (pos < text.length() && text.charAt(pos) != COMMA) {
                    throw file.error(line, fields.size(), "text after the closing quote; put the whole field in "
                            + "quotes or remove the quotes");
                }
            } else {
                int comma = text.indexOf(COMMA, pos);
                int end = comma < 0 ? text.length() : comma;
                fields.add(text.substring(pos, end).trim());
                pos = end;
            }
            if (pos >= text.length()) {
                return fields;
            }
            pos++;
        }
    }

    private static int skipBlanks(String text, int pos) {
        int k = pos;
        while (k < text.length() && Character.isWhitespace(text.charAt(k))) {
            k++;
        }
        return k;
    }

    /** Adds the quoted field starting after the opening quote at {@code from}; returns the index after its end. */
    private static int readQuoted(TextFile file, int line, String text, int from, List<String> fields)
            throws FormatException {
        StringBuilder field = new StringBuilder();
        int k = from;
        while (k < text.length()) {
            char c = text.charAt(k);
            if (c == QUOTE && k + 1 < text.length() && text.charAt(k + 1) == QUOTE) {
                field.append(QUOTE);
                k += 2;
            } else if (c == QUOTE) {
                fields.add(field.toString());
                return k + 1;
            } else {
                field.append(c);
                k++;
            }
        }
        throw file.error(line, fields.size() + 1, "a quoted field is not closed; add the closing '\"'");
    }
}
