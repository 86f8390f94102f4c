package org.faultbench.digitize.vector;

import java.io.IOException;
import java.io.Reader;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.faultbench.digitize.io.FileUnits;
import org.faultbench.digitize.io.FormatException;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKTReader;

/**
 * Reads line and polygon features written as OGC Well-Known Text (Simple Features, ISO 19125), one feature per line,
 * e.g. {@code LINESTRING (1000 2000, 1500 2600)} or {@code POLYGON Z ((...))}, parsed with JTS.
 * <p>
 * Attributes (common practice of GIS text exports): fields separated by tabs; when the first line's first field is
 * {@code WKT}, that line is a header naming the attributes of the following columns, read as text. Blank lines and
 * lines starting with '#' are skipped. x, y are converted from {@link FileUnits#xy()}, z from {@link FileUnits#z()}.
 * Errors name the line and, where the bad text can be found, its column; nothing is returned from a file that fails.
 */
public final class WktReader {
    static final String HEADER = "WKT";
    static final String SEPARATOR = "\t";

    private final FileUnits units;

    public WktReader(FileUnits units) {
        if (units == null) {
            throw new IllegalArgumentException("file units missing");
        }
        this.units = units;
    }

    public List<VectorFeature> read(Path file) throws IOException {
        Path name = file.getFileName();
        return read(Files.readAllLines(file, StandardCharsets.UTF_8), name == null ? file.toString() : name.toString());
    }

    /** Reads from {@code in}; {@code sourceName} names the source in error messages. */
    public List<VectorFeature> read(Reader in, String sourceName) throws IOException {
        StringWriter text = new StringWriter();
        in.transferTo(text);
        return read(text.toString().lines().toList(), sourceName);
    }

    private List<VectorFeature> read(List<String> lines, String fileName) throws FormatException {
        List<VectorFeature> features = new ArrayList<>();
        List<String> names = null;
        WKTReader parser = new WKTReader();
        for (int n = 1; n <= lines.size(); n++) {
            String text = lines.get(n - 1);
            if (text.isBlank() || text.strip().startsWith("#")) {
                continue;
            }
            String[] fields = text.split(SEPARATOR, -1);
            if (names == null && features.isEmpty() && fields[0].strip().equalsIgnoreCase(HEADER)) {
                names = List.of(fields).subList(1, fields.length).stream().map(String::strip).toList();
                for (int a = 0; a < names.size(); a++) {
                    if (names.get(a).isEmpty() || names.indexOf(names.get(a)) < a) {
                        throw new FormatException(fileName, n, a + 2, names.get(a).isEmpty()
                                ? "the attribute name is empty" : "attribute '" + names.get(a) + "' appears twice");
                    }
                }
                continue;
            }
            List<String> attributeNames = names == null ? List.of() : names;
            if (fields.length != attributeNames.size() + 1) {
                throw new FormatException(fileName, n, 0, "expected " + (attributeNames.size() + 1)
                        + " tab-separated fields (geometry and " + attributeNames.size() + " attributes), found "
                        + fields.length);
            }
            Geometry geometry = FeatureGeometry.converted(geometry(parser, fileName, n, fields[0]),
                    units.xy()::toMetres, units.z()::toMetres);
            Map<String, Object> properties = new LinkedHashMap<>();
            for (int a = 0; a < attributeNames.size(); a++) {
                properties.put(attributeNames.get(a), fields[a + 1]);
            }
            try {
                features.add(new VectorFeature(geometry, properties));
            } catch (IllegalArgumentException bad) {
                throw new FormatException(fileName, n, 1, bad.getMessage());
            }
        }
        return List.copyOf(features);
    }

    private static Geometry geometry(WKTReader parser, String fileName, int line, String field)
            throws FormatException {
        int end = closingParenthesis(field);
        String after = end < 0 ? "" : field.substring(end + 1);
        if (!after.isBlank()) {
            int column = end + 2 + after.length() - after.stripLeading().length();
            throw new FormatException(fileName, line, 1, "at column " + column + ", text after the end of the "
                    + "geometry: '" + after.strip() + "'");
        }
        Geometry geometry;
        try {
            geometry = parser.read(field);
        } catch (ParseException bad) {
            throw new FormatException(fileName, line, 1, withColumn(field, bad.getMessage()));
        } catch (IllegalArgumentException bad) {
            // JTS refuses well-formed text that is no valid geometry, e.g. a polygon ring that does not close
            throw new FormatException(fileName, line, 1, "not a valid geometry (" + bad.getMessage() + ")");
        }
        for (Coordinate c : geometry.getCoordinates()) {
            if (!Double.isFinite(c.x) || !Double.isFinite(c.y) || Double.isInfinite(c.getZ())) {
                throw new FormatException(fileName, line, 1, "coordinates must be finite numbers, found ("
                        + c.x + " " + c.y + (Double.isNaN(c.getZ()) ? "" : " " + c.getZ()) + ")");
            }
        }
        if (!FeatureGeometry.SUPPORTED.contains(geometry.getGeometryType())) {
            throw new FormatException(fileName, line, 1, FeatureGeometry.unsupported(geometry.getGeometryType()));
        }
        return geometry;
    }

    /** Index of the parenthesis that closes the first one, or -1 when they do not balance. */
    private static int closingParenthesis(String text) {
        int depth = 0;
        for (int k = 0; k < text.length(); k++) {
            char c = text.charAt(k);
            if (c == '(') {
                depth++;
            } else if (c == ')' && --depth == 0) {
                return k;
            }
        }
        return -1;
    }

    /**
     * JTS's message without its "(line 1)" and, when the offending word it quotes after a colon occurs in the text,
     * prefixed with that word's column.
     */
    private static String withColumn(String text, String message) {
        String problem = message.replaceAll("\\s*\\(line \\d+\\)$", "");
        int colon = problem.lastIndexOf(": ");
        if (colon >= 0) {
            String word = problem.substring(colon + 2).strip();
            int at = text.toUpperCase(Locale.ROOT).indexOf(word.toUpperCase(Locale.ROOT));
            if (!word.isEmpty() && at >= 0) {
                return "at column " + (at + 1) + ", not valid WKT (" + problem + ")";
            }
        }
        return "not valid WKT (" + problem + ")";
    }
}
