package org.faultbench.digitize.georef;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/**
 * The six-line world file (.tfw, .pgw, .jgw, .bpw) that georeferences a raster with an affine transform:
 * <pre>
 * x = A·col + B·row + C
 * y = D·col + E·row + F
 * </pre>
 * in the file's line order A, D, B, E, C, F, where (C, F) is the map position of the <em>centre</em> of the
 * upper-left pixel and (col, row) are pixel indices (0, 0 = upper-left pixel centre).
 */
public record WorldFile(double a, double d, double b, double e, double c, double f) {

    public WorldFile {
        double[] all = { a, d, b, e, c, f };
        for (int i = 0; i < all.length; i++) {
            if (!Double.isFinite(all[i])) {
                throw new IllegalArgumentException("world file parameter " + "ADBECF".charAt(i) + " is not a finite number");
            }
        }
        if (a * e - b * d == 0) {
            throw new IllegalArgumentException("world file transform is singular (A·E − B·D = 0)");
        }
    }

    /** Map coordinates {x, y} of the pixel centre (col, row). */
    public double[] toMap(double col, double row) {
        return new double[] { a * col + b * row + c, d * col + e * row + f };
    }

    /** Pixel position {col, row} of the map point (x, y): the inverse affine transform. */
    public double[] toPixel(double x, double y) {
        double det = a * e - b * d;
        double dx = x - c;
        double dy = y - f;
        return new double[] { (e * dx - b * dy) / det, (a * dy - d * dx) / det };
    }

    /** Reads a world file; a bad line is reported with the file name and line number. */
    public static WorldFile read(Path file) throws IOException {
        List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8).stream()
                .filter(l -> !l.isBlank()).toList();
        if (lines.size() != 6) {
            throw new IOException(file + ": a world file has 6 numeric lines, found " + lines.size());
        }
        double[] v = new double[6];
        for (int i = 0; i < 6; i++) {
            try {
                v[i] = Double.parseDouble(lines.get(i).trim());
            } catch (NumberFormatException ex) {
                throw new IOException(file + ": line " + (i + 1) + " (parameter " + "ADBECF".charAt(i)
                        + ") is not a number: '" + lines.get(i).trim() + "'", ex);
            }
        }
        try {
            return new WorldFile(v[0], v[1], v[2], v[3], v[4], v[5]);
        } catch (IllegalArgumentException ex) {
            throw new IOException(file + ": " + ex.getMessage(), ex);
        }
    }

    /** Writes the six lines with full double precision. */
    public void write(Path file) throws IOException {
        StringBuilder text = new StringBuilder();
        for (double value : new double[] { a, d, b, e, c, f }) {
            text.append(String.format(Locale.ROOT, "%.10f%n", value));
        }
        Files.writeString(file, text, StandardCharsets.UTF_8);
    }
}
