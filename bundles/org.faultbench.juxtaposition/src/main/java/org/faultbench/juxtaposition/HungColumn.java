package org.faultbench.juxtaposition;

import java.util.stream.IntStream;

import org.faultbench.core.column.ResolvedColumn;

/**
 * One wall's stratigraphic column hung from the reference horizon (the top of unit {@code referenceUnit}): unit
 * boundaries are kept as depths below that horizon, so a cut-off depth alone places the whole column. Units -1
 * (overburden) and {@code size()} (underburden) stand for the rock above and below the column; both are
 * non-reservoir.
 */
public final class HungColumn {

    private final ResolvedColumn column;
    private final int referenceUnit;
    private final double[] boundaries;
    private final boolean[] reservoir;
    /** Indexes of the reservoir units, shallowest first. */
    private final int[] reservoirUnits;

    HungColumn(ResolvedColumn column, int referenceUnit, String wallName) {
        if (column == null) {
            throw new IllegalArgumentException("the " + wallName + " stratigraphic column is missing");
        }
        if (referenceUnit < 0 || referenceUnit >= column.size()) {
            throw new IllegalArgumentException("reference unit index must be in [0, " + (column.size() - 1)
                    + "] for the " + wallName + " column, was " + referenceUnit);
        }
        this.column = column;
        this.referenceUnit = referenceUnit;
        this.boundaries = new double[column.size() + 1];
        this.reservoir = new boolean[column.size() + 2];
        for (int i = 0; i <= column.size(); i++) {
            boundaries[i] = column.top(i) - column.top(referenceUnit);
        }
        for (int i = 0; i < column.size(); i++) {
            reservoir[i + 1] = column.unit(i).reservoir();
        }
        this.reservoirUnits = IntStream.range(0, column.size()).filter(i -> reservoir[i + 1]).toArray();
    }

    public ResolvedColumn column() {
        return column;
    }

    public int referenceUnit() {
        return referenceUnit;
    }

    /** Number of real units; valid unit indexes also include -1 (overburden) and size() (underburden). */
    public int size() {
        return column.size();
    }

    /** Depth of the top of {@code unit} (0..size(), size() = column base) below the reference horizon; may be &lt; 0. */
    public double topBelowReference(int unit) {
        return boundaries[unit];
    }

    /** Whether {@code unit} (-1..size()) is a reservoir; overburden and underburden never are. */
    public boolean isReservoir(int unit) {
        return reservoir[unit + 1];
    }

    /** Unit (-1..size()) at {@code depth} below the reference horizon; units span [top, base). */
    public int unitAt(double depth) {
        return column.unitAt(depth + column.top(referenceUnit));
    }

    /** Unit name, or "overburden" / "underburden" for -1 / size(). */
    public String unitName(int unit) {
        if (unit < 0) {
            return "overburden";
        }
        return unit >= column.size() ? "underburden" : column.unit(unit).name();
    }

    double boundary(int index) {
        return boundaries[index];
    }

    int reservoirCount() {
        return reservoirUnits.length;
    }

    /** The {@code n}-th reservoir unit from the top. */
    int reservoirUnit(int n) {
        return reservoirUnits[n];
    }
}
