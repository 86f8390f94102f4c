package org.faultbench.digitize.io;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads formation tops from a CSV file, one top per row.
 * <p>
 * Layout (common practice; there is no formal standard): a header row naming the columns, in any order and any
 * letter case: {@code Well}, {@code Surface} (or {@code Horizon}), {@code X}, {@code Y}, {@code TVDSS} (or {@code Z}
 * or {@code Depth}), optionally {@code MD}; other columns are ignored. Fields are comma-separated and may be quoted
 * ({@code "Well A, deviated"}). Every row has as many fields as the header; blank lines are skipped; an empty MD field
 * gives NaN.
 * <p>
 * Units and sign: x, y are converted from {@link FileUnits#xy()}, TVDSS and MD from {@link FileUnits#z()} to metres;
 * TVDSS is made positive downward according to the declared {@link DepthSign}. MD is never flipped.
 */
public final class WellTopsCsvReader {
    private final FileUnits units;
    private final DepthSign depthSign;

    public WellTopsCsvReader(FileUnits units, DepthSign depthSign) {
        if (units == null || depthSign == null) {
            throw new IllegalArgumentException("file units or depth sign missing");
        }
        this.units = units;
        this.depthSign = depthSign;
    }

    public List<WellTop> read(Path file) throws IOException {
        return read(TextFile.read(file));
    }

    /** Reads from {@code in}; {@code sourceName} names the source in error messages. */
    public List<WellTop> read(Reader in, String sourceName) throws IOException {
        return read(TextFile.read(in, sourceName));
    }

    private List<WellTop> read(TextFile file) throws FormatException {
        int headerLine = nextContentLine(file, 1);
        if (headerLine > file.lineCount()) {
            throw file.error(0, 0, "the file is empty; expected a header row naming Well, Surface, X, Y and TVDSS");
        }
        List<String> header = CsvLine.fields(file, headerLine);
        WellTopColumns columns = WellTopColumns.find(file, headerLine, header);
        List<WellTop> tops = new ArrayList<>();
        for (int line = nextContentLine(file, headerLine + 1); line <= file.lineCount();
                line = nextContentLine(file, line + 1)) {
            tops.add(top(new Row(file, line, header, headerLine), columns));
        }
        return List.copyOf(tops);
    }

    private static int nextContentLine(TextFile file, int from) {
        int line = from;
        while (line <= file.lineCount() && file.line(line).isBlank()) {
            line++;
        }
        return line;
    }

    private WellTop top(Row row, WellTopColumns c) throws FormatException {
        String well = row.name(c.well());
        String surface = row.name(c.surface());
        double x = units.xy().toMetres(row.number(c.x()));
        double y = units.xy().toMetres(row.number(c.y()));
        double tvdss = depthSign.toDepth(units.z().toMetres(row.number(c.tvdss())));
        double md = c.md() < 0 || row.isEmpty(c.md()) ? Double.NaN : units.z().toMetres(row.number(c.md()));
        return new WellTop(well, surface, x, y, tvdss, md);
    }

    /** The fields of one data row, read with reference to the header for field counts and error messages. */
    private static final class Row {
        private final TextFile file;
        private final int line;
        private final List<String> header;
        private final List<String> fields;

        Row(TextFile file, int line, List<String> header, int headerLine) throws FormatException {
            this.file = file;
            this.line = line;
            this.header = header;
            this.fields = CsvLine.fields(file, line);
            if (fields.size() != header.size()) {
                throw file.error(line, 0, "expected " + header.size() + " fields as in the header (line "
                        + headerLine + "), found " + fields.size());
            }
        }

        boolean isEmpty(int column) {
            return fields.get(column).isBlank();
        }

        String name(int column) throws FormatException {
            if (isEmpty(column)) {
                throw file.error(line, column + 1, "the " + header.get(column) + " field is empty");
            }
            return fields.get(column).trim();
        }

        double number(int column) throws FormatException {
            return file.number(fields.get(column), line, column + 1, header.get(column));
        }
    }
}
