package org.faultbench.digitize.io;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Path;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;

/**
 * Reads a ZMAP+ ASCII grid into a {@link RegularGrid} in metres.
 * <p>
 * Layout (informal ZMAP+ description on GDAL's "ZMap -- ZMap Plus Grid" driver page): {@code !} comment lines, then
 * between two lines starting with {@code @} the header lines {@code name, GRID, nodes_per_line} (may follow the
 * opening {@code @} directly) / {@code field_width, null_value, null_text, decimal_places, start_column} /
 * {@code nrows, ncols, xmin, xmax, ymin, ymax} / {@code 0.0, 0.0, 0.0}. Then the data, column by column from left to
 * right, each column starting at its northern node (ymax) and running down (decreasing y), at most nodes_per_line
 * values per line.
 * <p>
 * Values are read as blank-separated decimal numbers taken literally, so field width, decimal places and start
 * column are not needed; a new column need not start on a new line. The null marker (null_value, or null_text when
 * null_value is blank) becomes NaN. How xmin ... ymax relate to the nodes is the {@link ZmapNodeConvention} chosen
 * on import.
 * <p>
 * Units: bounds are converted from {@link FileUnits#xy()} and values from {@link FileUnits#z()} to metres; values
 * keep their sign.
 */
public final class ZmapGridReader {
    private final FileUnits units;
    private final ZmapNodeConvention convention;

    /** A reader taking the header bounds as node positions ({@link ZmapNodeConvention#PIXEL_IS_POINT}). */
    public ZmapGridReader(FileUnits units) {
        this(units, ZmapNodeConvention.PIXEL_IS_POINT);
    }

    public ZmapGridReader(FileUnits units, ZmapNodeConvention convention) {
        if (units == null || convention == null) {
            throw new IllegalArgumentException("file units or ZMAP node convention missing");
        }
        this.units = units;
        this.convention = convention;
    }

    public RegularGrid read(Path file) throws IOException {
        return read(TextFile.read(file));
    }

    /** Reads from {@code in}; {@code sourceName} names the source in error messages. */
    public RegularGrid read(Reader in, String sourceName) throws IOException {
        return read(TextFile.read(in, sourceName));
    }

    private RegularGrid read(TextFile file) throws FormatException {
        ZmapHeader header = ZmapHeader.parse(file);
        double[] values = readValues(file, header);
        return new RegularGrid(geometry(header), values);
    }

    private GridGeometry geometry(ZmapHeader h) {
        double dx = convention.spacing(h.xmin(), h.xmax(), h.ncols());
        double dy = convention.spacing(h.ymin(), h.ymax(), h.nrows());
        return new GridGeometry(h.ncols(), h.nrows(),
                units.xy().toMetres(convention.firstNode(h.xmin(), dx)),
                units.xy().toMetres(convention.firstNode(h.ymin(), dy)),
                units.xy().toMetres(dx), units.xy().toMetres(dy));
    }

    private double[] readValues(TextFile file, ZmapHeader header) throws FormatException {
        int nrows = header.nrows();
        int ncols = header.ncols();
        double[] values = new double[nrows * ncols];
        DataTokens tokens = new DataTokens(file, header.dataLine());
        for (int k = 0; k < values.length; k++) {
            if (!tokens.advance()) {
                throw file.error(file.lineCount(), 0, "the file ends after " + k + " of nrows x ncols = " + nrows
                        + " x " + ncols + " = " + values.length + " values (column " + (k / nrows + 1)
                        + " is incomplete)");
            }
            requireLineLength(file, tokens, header.nodesPerLine());
            double value = header.value(tokens);
            int i = k / nrows;
            int j = nrows - 1 - k % nrows;
            values[j * ncols + i] = Double.isNaN(value) ? value : units.z().toMetres(value);
        }
        if (tokens.advance()) {
            throw file.error(tokens.line(), tokens.field(), "more values than nrows x ncols = " + nrows + " x "
                    + ncols + " = " + values.length + "; the header does not match the data");
        }
        return values;
    }

    private static void requireLineLength(TextFile file, DataTokens tokens, int nodesPerLine)
            throws FormatException {
        if (tokens.field() == 1 && tokens.fieldsOnLine() > nodesPerLine) {
            throw file.error(tokens.line(), nodesPerLine + 1, "this line holds " + tokens.fieldsOnLine()
                    + " values, but the header allows " + nodesPerLine + " per line");
        }
    }
}
