package org.faultbench.digitize.io;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;

/**
 * Writes a {@link RegularGrid} as a ZMAP+ ASCII grid in the layout {@link ZmapGridReader} reads: a {@code !} comment,
 * the four-line header between {@code @} lines, then the values column by column from left to right, each column
 * from north to south starting on a new line, {@value #NODES_PER_LINE} values per line, right-aligned in a fixed
 * field width. Null nodes are written as {@value #NULL_TEXT}. The header bounds follow the chosen
 * {@link ZmapNodeConvention}; lengths are converted from metres to the declared {@link FileUnits}.
 */
public final class ZmapGridWriter {
    /** Values per data line: five is the common choice. */
    public static final int NODES_PER_LINE = 5;
    /** The null marker written, the customary 1e30. */
    public static final String NULL_TEXT = "1.0E+30";
    private static final double NULL_VALUE = 1.0e30;
    private static final int MAX_DECIMALS = 12;

    private final FileUnits units;
    private final ZmapNodeConvention convention;
    private final int decimals;

    /**
     * @param units units to write lengths in
     * @param convention how the header bounds relate to the nodes
     * @param decimals digits after the decimal point for grid values, 1 to 12 (readers such as GDAL's need at least 1)
     */
    public ZmapGridWriter(FileUnits units, ZmapNodeConvention convention, int decimals) {
        if (units == null || convention == null) {
            throw new IllegalArgumentException("file units or ZMAP node convention missing");
        }
        if (decimals < 1 || decimals > MAX_DECIMALS) {
            throw new IllegalArgumentException("decimals must be 1 to " + MAX_DECIMALS + ", was " + decimals);
        }
        this.units = units;
        this.convention = convention;
        this.decimals = decimals;
    }

    /**
     * Writes the whole file at once, so that a refused grid leaves no half-written file behind.
     *
     * @param gridName name written in the header; not blank, no commas
     */
    public void write(RegularGrid grid, String gridName, Path file) throws IOException {
        Files.writeString(file, text(grid, gridName), StandardCharsets.UTF_8);
    }

    /** @param gridName name written in the header; not blank, no commas */
    public void write(RegularGrid grid, String gridName, Writer out) throws IOException {
        out.write(text(grid, gridName));
        out.flush();
    }

    private String text(RegularGrid grid, String gridName) {
        if (grid == null) {
            throw new IllegalArgumentException("grid to write is missing");
        }
        if (gridName == null || gridName.isBlank() || gridName.chars().anyMatch(ZmapGridWriter::breaksHeader)) {
            throw new IllegalArgumentException("ZMAP grid name must be one line of text without commas, was '"
                    + gridName + "'");
        }
        String[] values = valueTexts(grid);
        int width = fieldWidth(values);
        return header(grid.geometry(), gridName.trim(), width) + data(grid, values, width);
    }

    private static boolean breaksHeader(int c) {
        return c == ',' || c == '\n' || c == '\r';
    }

    /** Value texts in file order: column by column, each from north to south. */
    private String[] valueTexts(RegularGrid grid) {
        String[] texts = new String[grid.nx() * grid.ny()];
        int k = 0;
        for (int i = 0; i < grid.nx(); i++) {
            for (int j = grid.ny() - 1; j >= 0; j--) {
                texts[k++] = valueText(grid, i, j);
            }
        }
        return texts;
    }

    private String valueText(RegularGrid grid, int i, int j) {
        double value = grid.value(i, j);
        if (Double.isNaN(value)) {
            return NULL_TEXT;
        }
        String text = NumberText.fixed(units.z().fromMetres(value), decimals);
        if (Double.parseDouble(text) == NULL_VALUE) {
            throw new IllegalArgumentException("grid value " + value + " at node (" + i + ", " + j
                    + ") would be written as the null marker " + NULL_TEXT);
        }
        return text;
    }

    /** Widest value plus one blank, so that values stay separated. */
    private static int fieldWidth(String[] values) {
        int widest = NULL_TEXT.length();
        for (String value : values) {
            widest = Math.max(widest, value.length());
        }
        return widest + 1;
    }

    private String header(GridGeometry g, String gridName, int width) {
        double dx = units.xy().fromMetres(g.dx());
        double dy = units.xy().fromMetres(g.dy());
        double x0 = units.xy().fromMetres(g.x0());
        double y0 = units.xy().fromMetres(g.y0());
        return "! Written by Faultbench; bounds follow the " + convention + " convention\n"
                + "@" + gridName + ", GRID, " + NODES_PER_LINE + "\n"
                + String.format(Locale.ROOT, "%10d,%20s,%10s,%10d,%10d\n", width, NULL_TEXT, "", decimals, 1)
                + String.format(Locale.ROOT, "%10d,%10d, ", g.ny(), g.nx())
                + String.join(", ",
                        NumberText.plain(convention.lowerBound(x0, dx)),
                        NumberText.plain(convention.upperBound(x0, dx, g.nx())),
                        NumberText.plain(convention.lowerBound(y0, dy)),
                        NumberText.plain(convention.upperBound(y0, dy, g.ny())))
                + "\n0.0, 0.0, 0.0\n@\n";
    }

    private static String data(RegularGrid grid, String[] values, int width) {
        StringBuilder text = new StringBuilder();
        int ny = grid.ny();
        for (int k = 0; k < values.length; k++) {
            text.append(" ".repeat(width - values[k].length())).append(values[k]);
            int rowInColumn = k % ny;
            if (rowInColumn == ny - 1 || rowInColumn % NODES_PER_LINE == NODES_PER_LINE - 1) {
                text.append('\n');
            }
        }
        return text.toString();
    }
}
