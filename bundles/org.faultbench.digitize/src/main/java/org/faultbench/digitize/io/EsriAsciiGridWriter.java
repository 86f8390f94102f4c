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
 * Writes a {@link RegularGrid} as an ESRI ASCII grid (.asc), the layout {@link EsriAsciiGridReader} reads: each node
 * is the centre of one ESRI cell, so the header gives {@code xllcorner = x0 - dx/2}, {@code yllcorner = y0 - dy/2};
 * rows are written northern row first, one row per line; null nodes are written as the NODATA value. Square cells
 * are written with {@code cellsize}, rectangular ones with GDAL's {@code dx} and {@code dy} keys.
 * <p>
 * Header numbers are written exactly (shortest decimal form); values are rounded to the chosen number of decimals.
 * Lengths are converted from metres to the declared {@link FileUnits}.
 */
public final class EsriAsciiGridWriter {
    /** The NODATA value ESRI assumes when a header has none. */
    public static final double DEFAULT_NODATA = EsriAsciiHeader.DEFAULT_NODATA;
    private static final int MAX_DECIMALS = 12;

    private final FileUnits units;
    private final int decimals;
    private final double nodata;

    /** A writer with the NODATA value -9999. */
    public EsriAsciiGridWriter(FileUnits units, int decimals) {
        this(units, decimals, DEFAULT_NODATA);
    }

    /**
     * @param units units to write lengths in
     * @param decimals digits after the decimal point for grid values, 0 to 12
     * @param nodata value written for null nodes; no real value may round to it
     */
    public EsriAsciiGridWriter(FileUnits units, int decimals, double nodata) {
        if (units == null) {
            throw new IllegalArgumentException("file units missing");
        }
        if (decimals < 0 || decimals > MAX_DECIMALS) {
            throw new IllegalArgumentException("decimals must be 0 to " + MAX_DECIMALS + ", was " + decimals);
        }
        if (!Double.isFinite(nodata)) {
            throw new IllegalArgumentException("NODATA value must be a finite number, was " + nodata);
        }
        this.units = units;
        this.decimals = decimals;
        this.nodata = nodata;
    }

    /**
     * Writes the whole file at once, so that a refused grid leaves no half-written file behind.
     *
     * @throws IllegalArgumentException when a grid value would be written as the NODATA value
     */
    public void write(RegularGrid grid, Path file) throws IOException {
        Files.writeString(file, text(grid), StandardCharsets.UTF_8);
    }

    /**
     * @throws IllegalArgumentException when a grid value would be written as the NODATA value
     */
    public void write(RegularGrid grid, Writer out) throws IOException {
        out.write(text(grid));
        out.flush();
    }

    private String text(RegularGrid grid) {
        if (grid == null) {
            throw new IllegalArgumentException("grid to write is missing");
        }
        return header(grid.geometry()) + rows(grid);
    }

    private String header(GridGeometry g) {
        double dx = units.xy().fromMetres(g.dx());
        double dy = units.xy().fromMetres(g.dy());
        StringBuilder text = new StringBuilder();
        line(text, "ncols", Integer.toString(g.nx()));
        line(text, "nrows", Integer.toString(g.ny()));
        line(text, "xllcorner", NumberText.plain(units.xy().fromMetres(g.x0()) - dx / 2));
        line(text, "yllcorner", NumberText.plain(units.xy().fromMetres(g.y0()) - dy / 2));
        if (g.dx() == g.dy()) {
            line(text, "cellsize", NumberText.plain(dx));
        } else {
            line(text, "dx", NumberText.plain(dx));
            line(text, "dy", NumberText.plain(dy));
        }
        line(text, "NODATA_value", NumberText.plain(nodata));
        return text.toString();
    }

    private static void line(StringBuilder text, String key, String value) {
        text.append(String.format(Locale.ROOT, "%-14s%s", key, value)).append('\n');
    }

    private String rows(RegularGrid grid) {
        String nodataText = NumberText.plain(nodata);
        StringBuilder text = new StringBuilder();
        for (int j = grid.ny() - 1; j >= 0; j--) {
            for (int i = 0; i < grid.nx(); i++) {
                text.append(i == 0 ? "" : " ").append(valueText(grid, i, j, nodataText));
            }
            text.append('\n');
        }
        return text.toString();
    }

    private String valueText(RegularGrid grid, int i, int j, String nodataText) {
        double value = grid.value(i, j);
        if (Double.isNaN(value)) {
            return nodataText;
        }
        String text = NumberText.fixed(units.z().fromMetres(value), decimals);
        if (Double.parseDouble(text) == nodata) {
            throw new IllegalArgumentException("grid value " + value + " at node (" + i + ", " + j
                    + ") would be written as the NODATA value " + nodataText + "; choose another NODATA value");
        }
        return text;
    }
}
