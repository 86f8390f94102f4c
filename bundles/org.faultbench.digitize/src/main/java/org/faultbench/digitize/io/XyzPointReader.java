package org.faultbench.digitize.io;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * Reads scattered points from an XYZ text file.
 * <p>
 * Layout (common practice): one point per line, {@code x y z [attributes...]}, fields separated by blanks or, when
 * the line holds a comma, by commas. Blank lines and lines starting with {@code #} are skipped; the first remaining
 * line is a header and skipped when none of its first three fields is a number. Attributes are ignored. Rows whose z
 * is one of the null markers are skipped and counted.
 * <p>
 * Units: x and y are converted from {@link FileUnits#xy()}, z from {@link FileUnits#z()} to metres; z keeps its sign.
 */
public final class XyzPointReader {
    /** Null markers of z assumed unless others are given: -999.25 and 1e30, both customary. */
    public static final Set<Double> DEFAULT_NULL_VALUES = Set.of(-999.25, 1.0e30);

    private final FileUnits units;
    private final Set<Double> nullValues;

    /** A reader with the {@link #DEFAULT_NULL_VALUES}. */
    public XyzPointReader(FileUnits units) {
        this(units, DEFAULT_NULL_VALUES);
    }

    /** @param nullValues z values, in file units, that mark a row without a value; may be empty */
    public XyzPointReader(FileUnits units, Set<Double> nullValues) {
        if (units == null || nullValues == null) {
            throw new IllegalArgumentException("file units or null values missing");
        }
        this.units = units;
        this.nullValues = Set.copyOf(nullValues);
    }

    public XyzPoints read(Path file) throws IOException {
        return read(TextFile.read(file));
    }

    /** Reads from {@code in}; {@code sourceName} names the source in error messages. */
    public XyzPoints read(Reader in, String sourceName) throws IOException {
        return read(TextFile.read(in, sourceName));
    }

    private XyzPoints read(TextFile file) throws FormatException {
        List<XyzPoint> points = new ArrayList<>();
        int nullRows = 0;
        boolean firstRow = true;
        for (int line = 1; line <= file.lineCount(); line++) {
            String text = file.line(line).trim();
            if (text.isEmpty() || text.startsWith("#")) {
                continue;
            }
            String[] fields = fields(text);
            if (firstRow && isHeader(fields)) {
                firstRow = false;
                continue;
            }
            firstRow = false;
            double[] xyz = xyz(file, line, fields);
            if (nullValues.contains(xyz[2])) {
                nullRows++;
            } else {
                points.add(new XyzPoint(units.xy().toMetres(xyz[0]), units.xy().toMetres(xyz[1]),
                        units.z().toMetres(xyz[2])));
            }
        }
        return new XyzPoints(points, nullRows);
    }

    private static String[] fields(String text) {
        if (!text.contains(",")) {
            return text.split("\\s+");
        }
        String[] fields = text.split(",", -1);
        for (int k = 0; k < fields.length; k++) {
            fields[k] = fields[k].trim();
        }
        return fields;
    }

    private static boolean isHeader(String[] fields) {
        for (int k = 0; k < Math.min(3, fields.length); k++) {
            if (NumberText.isNumber(fields[k])) {
                return false;
            }
        }
        return true;
    }

    /** x, y, z of a data row, in file units. */
    private static double[] xyz(TextFile file, int line, String[] fields) throws FormatException {
        if (fields.length < 3) {
            throw file.error(line, 0, "expected at least 3 fields (x, y, z), found " + fields.length);
        }
        String[] names = { "x", "y", "z" };
        double[] xyz = new double[3];
        for (int k = 0; k < 3; k++) {
            xyz[k] = file.number(fields[k], line, k + 1, names[k]);
        }
        return xyz;
    }
}
