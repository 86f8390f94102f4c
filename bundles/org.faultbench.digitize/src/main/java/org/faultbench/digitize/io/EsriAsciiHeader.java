package org.faultbench.digitize.io;

import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * The keyword header of an ESRI ASCII grid, with the origin already moved to the centre of the lower-left cell.
 * Values are in the file's units.
 *
 * @param ncols number of columns (nodes along x)
 * @param nrows number of rows (nodes along y)
 * @param xCentre x of the centre of the lower-left cell
 * @param yCentre y of the centre of the lower-left cell
 * @param dx cell width
 * @param dy cell height
 * @param nodata value that marks a null cell
 * @param dataLine line on which the cell values start (1-based)
 */
record EsriAsciiHeader(int ncols, int nrows, double xCentre, double yCentre, double dx, double dy, double nodata,
        int dataLine) {

    /** NODATA value assumed when the header has none (ESRI help, "Esri ASCII raster format"). */
    static final double DEFAULT_NODATA = -9999;

    private static final Set<String> KEYS = Set.of("ncols", "nrows", "xllcorner", "xllcenter", "yllcorner",
            "yllcenter", "cellsize", "dx", "dy", "nodata_value");
    private static final String KEY_LIST = "ncols, nrows, xllcorner or xllcenter, yllcorner or yllcenter, "
            + "cellsize (or dx and dy), NODATA_value";

    /** One header line: the value text and where it stands. */
    private record Entry(String value, int line) {
    }

    /** Reads the header lines up to the first line that starts with a number. */
    static EsriAsciiHeader parse(TextFile file) throws FormatException {
        Map<String, Entry> entries = new HashMap<>();
        int line = 1;
        while (line <= file.lineCount() && !startsWithNumber(file.line(line))) {
            addEntry(file, line, entries);
            line++;
        }
        return new Resolver(file, entries, Math.min(line, file.lineCount())).header(line);
    }

    private static boolean startsWithNumber(String text) {
        String trimmed = text.trim();
        return !trimmed.isEmpty() && "0123456789+-.".indexOf(trimmed.charAt(0)) >= 0;
    }

    private static void addEntry(TextFile file, int line, Map<String, Entry> entries) throws FormatException {
        String text = file.line(line).trim();
        if (text.isEmpty()) {
            return;
        }
        String[] fields = text.split("\\s+");
        if (fields.length != 2) {
            throw file.error(line, 0, "a header line holds a key and one value, found '" + text + "'");
        }
        String key = fields[0].toLowerCase(Locale.ROOT);
        if (!KEYS.contains(key)) {
            throw file.error(line, 1, "unknown header key '" + fields[0] + "'; expected " + KEY_LIST);
        }
        if (entries.putIfAbsent(key, new Entry(fields[1], line)) != null) {
            throw file.error(line, 1, "header key '" + fields[0] + "' appears twice");
        }
    }

    /** Turns the collected key-value pairs into a header, checking that they fit together. */
    private record Resolver(TextFile file, Map<String, Entry> entries, int headerEnd) {

        EsriAsciiHeader header(int dataLine) throws FormatException {
            int ncols = count("ncols");
            int nrows = count("nrows");
            if ((long) ncols * nrows > Integer.MAX_VALUE) {
                throw file.error(entries.get("nrows").line(), 2,
                        "a grid of " + ncols + " x " + nrows + " cells is too large");
            }
            file.requireRoomFor((long) ncols * nrows, dataLine, entries.get("nrows").line(), 2,
                    "ncols x nrows = " + ncols + " x " + nrows);
            double[] spacing = spacing();
            boolean corner = originIsCorner();
            double x = number(corner ? "xllcorner" : "xllcenter") + (corner ? spacing[0] / 2 : 0);
            double y = number(corner ? "yllcorner" : "yllcenter") + (corner ? spacing[1] / 2 : 0);
            double nodata = entries.containsKey("nodata_value") ? number("nodata_value") : DEFAULT_NODATA;
            return new EsriAsciiHeader(ncols, nrows, x, y, spacing[0], spacing[1], nodata, dataLine);
        }

        private int count(String key) throws FormatException {
            Entry entry = required(key);
            return file.count(entry.value(), entry.line(), 2, key, 2);
        }

        private double number(String key) throws FormatException {
            Entry entry = required(key);
            return file.number(entry.value(), entry.line(), 2, key);
        }

        private Entry required(String key) throws FormatException {
            Entry entry = entries.get(key);
            if (entry == null) {
                throw file.error(headerEnd, 0, "the header ends without '" + key + "'; expected " + KEY_LIST);
            }
            return entry;
        }

        /** {dx, dy} from cellsize, or from dx and dy (GDAL's extension for rectangular cells). */
        private double[] spacing() throws FormatException {
            boolean square = entries.containsKey("cellsize");
            if (square && (entries.containsKey("dx") || entries.containsKey("dy"))) {
                Entry extra = entries.getOrDefault("dx", entries.get("dy"));
                throw file.error(extra.line(), 1, "give either cellsize or dx and dy, not both");
            }
            if (square) {
                double size = positive("cellsize");
                return new double[] { size, size };
            }
            if (!entries.containsKey("dx") && !entries.containsKey("dy")) {
                required("cellsize");
            }
            return new double[] { positive("dx"), positive("dy") };
        }

        private double positive(String key) throws FormatException {
            double value = number(key);
            if (!(value > 0)) {
                throw file.error(entries.get(key).line(), 2, key + " must be greater than 0, found " + value);
            }
            return value;
        }

        /**
         * Whether the origin is the lower-left corner (xllcorner, yllcorner) rather than the lower-left cell centre
         * (xllcenter, yllcenter); ESRI requires x and y of the same kind.
         */
        private boolean originIsCorner() throws FormatException {
            boolean corner = entries.containsKey("xllcorner");
            if (corner && entries.containsKey("xllcenter")) {
                throw file.error(entries.get("xllcenter").line(), 1, "give either xllcorner or xllcenter, not both");
            }
            if (!corner && !entries.containsKey("xllcenter")) {
                throw file.error(headerEnd, 0, "the header ends without 'xllcorner' (or 'xllcenter'); expected "
                        + KEY_LIST);
            }
            String xKey = corner ? "xllcorner" : "xllcenter";
            String yKey = corner ? "yllcorner" : "yllcenter";
            String otherYKey = corner ? "yllcenter" : "yllcorner";
            if (entries.containsKey(otherYKey)) {
                throw file.error(entries.get(otherYKey).line(), 1,
                        "'" + otherYKey + "' does not match '" + xKey + "': use " + yKey + " with " + xKey);
            }
            return corner;
        }
    }
}
