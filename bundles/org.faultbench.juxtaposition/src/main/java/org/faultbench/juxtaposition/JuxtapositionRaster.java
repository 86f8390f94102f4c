package org.faultbench.juxtaposition;

import java.util.Arrays;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;

import org.faultbench.faults.FaultPlaneColumns;

/**
 * The unrolled fault plane as a grid of cells (one raster column per fault-plane column, rows of height dz from a
 * top depth), each holding the juxtaposition class, the facing units and the throw at its centre. Seal attributes
 * (shale gouge ratio, threshold pressure, leak probability ...) are painted later into named per-cell slots. Cells
 * are stored column by column in primitive arrays: cell index = column x rowCount + row.
 */
public final class JuxtapositionRaster {

    /** Class code of a cell whose fault-plane column has no cut-off data. */
    public static final byte NO_DATA = -1;
    /** Unit index of a cell without data. */
    public static final int NO_UNIT = Integer.MIN_VALUE;

    private static final JuxtapositionClass[] CLASSES = JuxtapositionClass.values();

    private final FaultPlaneColumns columns;
    private final double top;
    private final double dz;
    private final int rows;
    private final byte[] classCodes;
    private final int[] footwallUnits;
    private final int[] hangingWallUnits;
    private final double[] throwValues;
    private final Map<String, double[]> attributes = new LinkedHashMap<>();

    private JuxtapositionRaster(FaultPlaneColumns columns, double top, double dz, int rows) {
        this.columns = columns;
        this.top = top;
        this.dz = dz;
        this.rows = rows;
        int cells = columns.count() * rows;
        this.classCodes = new byte[cells];
        this.footwallUnits = new int[cells];
        this.hangingWallUnits = new int[cells];
        this.throwValues = new double[cells];
    }

    /**
     * Rasterises the juxtaposition of {@code walls} along {@code columns} between depths {@code top} and
     * {@code base} in rows of height {@code dz}; the last row may reach below {@code base}.
     */
    public static JuxtapositionRaster paint(FaultPlaneColumns columns, HungColumns walls, double top, double base,
            double dz) {
        if (!Double.isFinite(top) || !Double.isFinite(base) || !(base > top)) {
            throw new IllegalArgumentException("raster depth range must be finite with base > top, was top " + top
                    + ", base " + base);
        }
        if (!(dz > 0) || Double.isInfinite(dz)) {
            throw new IllegalArgumentException("raster row height dz must be a finite number > 0, was " + dz);
        }
        long rows = (long) Math.ceil((base - top) / dz);
        if (rows * columns.count() > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("raster of " + columns.count() + " x " + rows + " cells is too large;"
                    + " use a larger dz (was " + dz + ")");
        }
        JuxtapositionRaster raster = new JuxtapositionRaster(columns, top, dz, (int) rows);
        for (int k = 0; k < columns.count(); k++) {
            raster.paintColumn(k, walls);
        }
        return raster;
    }

    private void paintColumn(int column, HungColumns walls) {
        boolean known = columns.hasData(column);
        for (int row = 0; row < rows; row++) {
            int cell = cellIndex(column, row);
            if (!known) {
                classCodes[cell] = NO_DATA;
                footwallUnits[cell] = NO_UNIT;
                hangingWallUnits[cell] = NO_UNIT;
                throwValues[cell] = Double.NaN;
                continue;
            }
            double z = rowDepth(row);
            int footwall = walls.footwall().unitAt(z - columns.footwallDepth(column));
            int hangingWall = walls.hangingWall().unitAt(z - columns.hangingWallDepth(column));
            footwallUnits[cell] = footwall;
            hangingWallUnits[cell] = hangingWall;
            classCodes[cell] = (byte) JuxtapositionClass.of(walls.footwall().isReservoir(footwall),
                    walls.hangingWall().isReservoir(hangingWall)).ordinal();
            throwValues[cell] = columns.throwAt(column);
        }
    }

    public int columnCount() {
        return columns.count();
    }

    public int rowCount() {
        return rows;
    }

    /** Depth of the top of the first row. */
    public double top() {
        return top;
    }

    public double dz() {
        return dz;
    }

    /** Depth of the centre of {@code row}. */
    public double rowDepth(int row) {
        return top + (row + 0.5) * dz;
    }

    /** Along-strike distance of the centre of raster {@code column}. */
    public double columnU(int column) {
        return columns.u(column);
    }

    public int cellIndex(int column, int row) {
        if (column < 0 || column >= columns.count() || row < 0 || row >= rows) {
            throw new IndexOutOfBoundsException("cell (" + column + ", " + row + ") is outside the " + columns.count()
                    + " x " + rows + " raster");
        }
        return column * rows + row;
    }

    public boolean hasData(int column, int row) {
        return classCodes[cellIndex(column, row)] != NO_DATA;
    }

    /** Juxtaposition class of a cell; the cell must have data. */
    public JuxtapositionClass juxtapositionClass(int column, int row) {
        byte code = classCodes[cellIndex(column, row)];
        if (code == NO_DATA) {
            throw new IllegalArgumentException("cell (" + column + ", " + row + ") has no data: its fault-plane column"
                    + " lacks a cut-off depth");
        }
        return CLASSES[code];
    }

    /** Footwall unit index of a cell (-1 overburden, size() underburden, {@link #NO_UNIT} without data). */
    public int footwallUnit(int column, int row) {
        return footwallUnits[cellIndex(column, row)];
    }

    /** Hanging-wall unit index of a cell (-1 overburden, size() underburden, {@link #NO_UNIT} without data). */
    public int hangingWallUnit(int column, int row) {
        return hangingWallUnits[cellIndex(column, row)];
    }

    /** Throw of a cell (m; NaN without data). */
    public double throwAt(int column, int row) {
        return throwValues[cellIndex(column, row)];
    }

    /**
     * Adds a named per-cell attribute slot, filled with NaN, and returns it for painting (indexed by
     * {@link #cellIndex}).
     */
    public double[] addAttribute(String name) {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("raster attribute name is empty");
        }
        if (attributes.containsKey(name)) {
            throw new IllegalArgumentException("raster attribute '" + name + "' already exists");
        }
        double[] values = new double[classCodes.length];
        Arrays.fill(values, Double.NaN);
        attributes.put(name, values);
        return values;
    }

    /** The live array of an attribute slot added before. */
    public double[] attribute(String name) {
        double[] values = attributes.get(name);
        if (values == null) {
            throw new IllegalArgumentException("raster has no attribute '" + name + "'; it has " + attributes.keySet());
        }
        return values;
    }

    public Set<String> attributeNames() {
        return Collections.unmodifiableSet(attributes.keySet());
    }
}
