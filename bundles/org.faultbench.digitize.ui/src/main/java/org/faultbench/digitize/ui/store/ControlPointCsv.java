package org.faultbench.digitize.ui.store;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.faultbench.digitize.georef.ControlPoint;
import org.faultbench.digitize.io.FormatException;

/**
 * Control points as comma-separated text, the sidecar a scan carries ({@code <scan>.control-points.csv}): a header
 * {@code id,pixel_col,pixel_row,map_x,map_y} and an optional {@code enabled} column (true/false). Pixel (0, 0) is
 * the centre of the upper-left pixel, rows count down (world-file convention).
 */
public final class ControlPointCsv {
    static final String HEADER = "id,pixel_col,pixel_row,map_x,map_y,enabled";
    private static final String[] COLUMNS = { "id", "pixel_col", "pixel_row", "map_x", "map_y" };

    private ControlPointCsv() {
    }

    /** The sidecar of {@code scan}: depth-structure-scan.png → depth-structure-scan.control-points.csv. */
    public static Path sidecarOf(Path scan) {
        String name = scan.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return scan.resolveSibling((dot > 0 ? name.substring(0, dot) : name) + ".control-points.csv");
    }

    public static List<ControlPoint> read(Path file) throws IOException {
        String name = file.getFileName().toString();
        List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        if (lines.isEmpty()) {
            throw new FormatException(name, 0, 0, "empty file; expected the header " + HEADER);
        }
        String[] header = lines.get(0).strip().split(",", -1);
        for (int i = 0; i < COLUMNS.length; i++) {
            if (header.length <= i || !header[i].strip().equalsIgnoreCase(COLUMNS[i])) {
                throw new FormatException(name, 1, i + 1, "expected column '" + COLUMNS[i] + "' (header "
                        + HEADER + "), found '" + (header.length <= i ? "" : header[i].strip()) + "'");
            }
        }
        boolean hasEnabled = header.length > COLUMNS.length;
        List<ControlPoint> points = new ArrayList<>();
        for (int n = 1; n < lines.size(); n++) {
            String line = lines.get(n).strip();
            if (!line.isEmpty()) {
                points.add(point(name, n + 1, line.split(",", -1), hasEnabled));
            }
        }
        return points;
    }

    public static void write(List<ControlPoint> points, Path file) throws IOException {
        StringBuilder text = new StringBuilder(HEADER).append('\n');
        for (ControlPoint p : points) {
            text.append(String.format(Locale.ROOT, "%s,%s,%s,%s,%s,%s%n", p.id(), p.col(), p.row(), p.x(), p.y(),
                    p.enabled()));
        }
        Files.writeString(file, text, StandardCharsets.UTF_8);
    }

    private static ControlPoint point(String name, int line, String[] fields, boolean hasEnabled)
            throws FormatException {
        int expected = hasEnabled ? COLUMNS.length + 1 : COLUMNS.length;
        if (fields.length != expected) {
            throw new FormatException(name, line, 0, "expected " + expected + " fields, found " + fields.length);
        }
        double[] numbers = new double[4];
        for (int i = 0; i < 4; i++) {
            String text = fields[i + 1].strip();
            try {
                numbers[i] = Double.parseDouble(text);
            } catch (NumberFormatException notANumber) {
                throw new FormatException(name, line, i + 2, "expected a number for " + COLUMNS[i + 1] + ", found '"
                        + text + "'");
            }
        }
        boolean enabled = true;
        if (hasEnabled) {
            String flag = fields[COLUMNS.length].strip().toLowerCase(Locale.ROOT);
            if (!flag.equals("true") && !flag.equals("false")) {
                throw new FormatException(name, line, COLUMNS.length + 1, "expected true or false for enabled, found '"
                        + fields[COLUMNS.length].strip() + "'");
            }
            enabled = flag.equals("true");
        }
        try {
            return new ControlPoint(fields[0].strip(), numbers[0], numbers[1], numbers[2], numbers[3], enabled);
        } catch (IllegalArgumentException bad) {
            throw new FormatException(name, line, 0, bad.getMessage());
        }
    }
}
