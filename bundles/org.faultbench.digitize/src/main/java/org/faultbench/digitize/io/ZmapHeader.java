package org.faultbench.digitize.io;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

/**
 * The part of a ZMAP+ grid header the reader needs, values in the file's units; the layout is described on
 * {@link ZmapGridReader}. Each of the four header lines must hold its number of comma-separated fields.
 *
 * @param nodesPerLine most values on one data line
 * @param nullValue numeric null marker, NaN if none
 * @param nullText textual null marker, empty if none
 * @param nrows number of rows (nodes along y)
 * @param ncols number of columns (nodes along x)
 * @param dataLine line on which the values start (1-based)
 */
record ZmapHeader(int nodesPerLine, double nullValue, String nullText, int nrows, int ncols, double xmin,
        double xmax, double ymin, double ymax, int dataLine) {

    private static final int[] FIELD_COUNTS = { 3, 5, 6, 3 };

    /** One header line split at its commas, fields trimmed. */
    private record HeaderLine(int line, List<String> fields) {
        String field(int number) {
            return fields.get(number - 1);
        }
    }

    /** The current value of {@code tokens}, NaN where it is this header's null marker. */
    double value(DataTokens tokens) throws FormatException {
        if (tokens.text().equals(nullText)) {
            return Double.NaN;
        }
        double value = tokens.number();
        return value == nullValue ? Double.NaN : value;
    }

    static ZmapHeader parse(TextFile file) throws FormatException {
        List<HeaderLine> lines = headerLines(file);
        HeaderLine first = lines.get(0);
        if (!first.field(2).equalsIgnoreCase("GRID")) {
            throw file.error(first.line(), 2, "only GRID files hold grids, found '" + first.field(2) + "'");
        }
        int nodesPerLine = file.count(first.field(3), first.line(), 3, "nodes per line", 1);
        HeaderLine second = lines.get(1);
        String nullText = second.field(3);
        double nullValue = nullValue(file, second);
        HeaderLine third = lines.get(2);
        int nrows = file.count(third.field(1), third.line(), 1, "nrows", 2);
        int ncols = file.count(third.field(2), third.line(), 2, "ncols", 2);
        if ((long) nrows * ncols > Integer.MAX_VALUE) {
            throw file.error(third.line(), 2, "a grid of " + ncols + " x " + nrows + " nodes is too large");
        }
        file.requireRoomFor((long) nrows * ncols, lines.get(3).line() + 2, third.line(), 2,
                "nrows x ncols = " + nrows + " x " + ncols);
        double[] bounds = bounds(file, third);
        return new ZmapHeader(nodesPerLine, nullValue, nullText, nrows, ncols, bounds[0], bounds[1], bounds[2],
                bounds[3], lines.get(3).line() + 2);
    }

    private static double nullValue(TextFile file, HeaderLine second) throws FormatException {
        if (second.field(2).isEmpty()) {
            if (second.field(3).isEmpty()) {
                throw file.error(second.line(), 2, "no null marker: null value (field 2) and null text (field 3) "
                        + "are both empty");
            }
            OptionalDouble fromText = NumberText.parse(second.field(3));
            return fromText.isPresent() ? fromText.getAsDouble() : Double.NaN;
        }
        return file.number(second.field(2), second.line(), 2, "the null value");
    }

    /** {xmin, xmax, ymin, ymax}, checked to be increasing. */
    private static double[] bounds(TextFile file, HeaderLine third) throws FormatException {
        String[] names = { "xmin", "xmax", "ymin", "ymax" };
        double[] bounds = new double[4];
        for (int k = 0; k < 4; k++) {
            bounds[k] = file.number(third.field(k + 3), third.line(), k + 3, names[k]);
        }
        for (int k = 1; k < 4; k += 2) {
            if (!(bounds[k] > bounds[k - 1])) {
                throw file.error(third.line(), k + 3, names[k] + " must be greater than " + names[k - 1] + ", found "
                        + NumberText.plain(bounds[k]) + " <= " + NumberText.plain(bounds[k - 1]));
            }
        }
        return bounds;
    }

    /** The four header lines between the '@' lines, checked for their field counts; the closing '@' must follow. */
    private static List<HeaderLine> headerLines(TextFile file) throws FormatException {
        int line = openingLine(file);
        List<HeaderLine> lines = new ArrayList<>();
        String rest = file.line(line).trim().substring(1);
        if (!rest.isBlank()) {
            lines.add(split(file, line, rest, 0));
        }
        while (lines.size() < FIELD_COUNTS.length) {
            line++;
            if (line > file.lineCount() || file.line(line).trim().startsWith("@")) {
                throw file.error(Math.min(line, file.lineCount()), 0, "the header has " + lines.size()
                        + " lines, expected 4 between the '@' lines");
            }
            lines.add(split(file, line, file.line(line), lines.size()));
        }
        int closing = line + 1;
        if (closing > file.lineCount() || !file.line(closing).trim().startsWith("@")) {
            throw file.error(Math.min(closing, file.lineCount()), 0,
                    "expected a line starting with '@' to close the 4-line header");
        }
        return lines;
    }

    /** The line of the opening '@', after any '!' comment lines and blank lines. */
    private static int openingLine(TextFile file) throws FormatException {
        for (int line = 1; line <= file.lineCount(); line++) {
            String text = file.line(line).trim();
            if (text.startsWith("@")) {
                return line;
            }
            if (!text.isEmpty() && !text.startsWith("!")) {
                throw file.error(line, 0, "expected '!' comment lines, then a header starting with '@', found '"
                        + text + "'");
            }
        }
        throw file.error(file.lineCount(), 0, "no header: a ZMAP+ grid has a header starting with '@'");
    }

    private static HeaderLine split(TextFile file, int line, String text, int index) throws FormatException {
        List<String> fields = new ArrayList<>();
        for (String field : text.split(",", -1)) {
            fields.add(field.trim());
        }
        int expected = FIELD_COUNTS[index];
        if (fields.size() != expected) {
            throw file.error(line, 0, String.format(Locale.ROOT,
                    "header line %d holds %d comma-separated fields, found %d", index + 1, expected, fields.size()));
        }
        return new HeaderLine(line, fields);
    }
}
