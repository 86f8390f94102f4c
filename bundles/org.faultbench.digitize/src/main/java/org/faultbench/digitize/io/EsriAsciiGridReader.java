package org.faultbench.digitize.io;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Path;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;

/**
 * Reads an ESRI ASCII grid (.asc) into a {@link RegularGrid} in metres.
 * <p>
 * Layout: a header of key-value lines, keys in any order and any letter case: {@code ncols}, {@code nrows},
 * {@code xllcorner} and {@code yllcorner} (lower-left corner of the lower-left cell) or {@code xllcenter} and
 * {@code yllcenter} (centre of that cell), {@code cellsize} (or GDAL's {@code dx} and {@code dy} for rectangular
 * cells) and optionally {@code NODATA_value} (default -9999). Then nrows &times; ncols blank-separated values, row by
 * row starting with the northern (top) row; line breaks within the data carry no meaning.
 * <p>
 * Node position convention: each ESRI cell becomes one grid node at the cell centre, so node (0, 0) of the result is
 * the centre of the lower-left cell, (xllcorner + cellsize/2, yllcorner + cellsize/2), and the grid's row j = 0 is the
 * file's last (southern) row. NODATA cells become NaN (null nodes).
 * <p>
 * Units: x, y, cell sizes are converted from the declared {@link FileUnits#xy()} unit and values from
 * {@link FileUnits#z()} to metres; values keep their sign.
 */
public final class EsriAsciiGridReader {
    private final FileUnits units;

    public EsriAsciiGridReader(FileUnits units) {
        if (units == null) {
            throw new IllegalArgumentException("file units missing");
        }
        this.units = units;
    }

    public RegularGrid read(Path file) throws IOException {
        return read(TextFile.read(file));
    }

    /** Reads from {@code in}; {@code sourceName} names the source in error messages. */
    public RegularGrid read(Reader in, String sourceName) throws IOException {
        return read(TextFile.read(in, sourceName));
    }

    private RegularGrid read(TextFile file) throws FormatException {
        EsriAsciiHeader header = EsriAsciiHeader.parse(file);
        double[] values = readValues(file, header);
        GridGeometry geometry = new GridGeometry(header.ncols(), header.nrows(),
                units.xy().toMetres(header.xCentre()), units.xy().toMetres(header.yCentre()),
                units.xy().toMetres(header.dx()), units.xy().toMetres(header.dy()));
        return new RegularGrid(geometry, values);
    }

    private double[] readValues(TextFile file, EsriAsciiHeader header) throws FormatException {
        int ncols = header.ncols();
        int nrows = header.nrows();
        double[] values = new double[ncols * nrows];
        DataTokens tokens = new DataTokens(file, header.dataLine());
        for (int k = 0; k < values.length; k++) {
            if (!tokens.advance()) {
                throw file.error(file.lineCount(), 0, "the file ends after " + k + " values, but ncols x nrows = "
                        + ncols + " x " + nrows + " = " + values.length + " values are expected");
            }
            double value = tokens.number();
            int i = k % ncols;
            int j = nrows - 1 - k / ncols;
            values[j * ncols + i] = value == header.nodata() ? Double.NaN : units.z().toMetres(value);
        }
        if (tokens.advance()) {
            throw file.error(tokens.line(), tokens.field(), "more values than ncols x nrows = " + ncols + " x "
                    + nrows + " = " + values.length + "; the header does not match the data");
        }
        return values;
    }
}
