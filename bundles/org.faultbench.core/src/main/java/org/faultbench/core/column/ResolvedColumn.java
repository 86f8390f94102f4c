package org.faultbench.core.column;

import java.util.List;

/**
 * An ordered stack of resolved units, shallowest first, hung from the top of its first unit.
 * Stratigraphic position s is measured downward from the top of the first unit in metres, so unit i spans
 * [top(i), base(i)) with top(0) = 0.
 */
public final class ResolvedColumn {
    private final List<UnitSlice> units;
    private final double[] tops;

    public ResolvedColumn(List<UnitSlice> units) {
        if (units == null || units.isEmpty()) {
            throw new IllegalArgumentException("a column needs at least one unit");
        }
        this.units = List.copyOf(units);
        this.tops = new double[units.size() + 1];
        for (int i = 0; i < units.size(); i++) {
            tops[i + 1] = tops[i] + units.get(i).thickness();
        }
    }

    public List<UnitSlice> units() {
        return units;
    }

    public int size() {
        return units.size();
    }

    public UnitSlice unit(int index) {
        return units.get(index);
    }

    /** Stratigraphic position of the top of unit {@code index}. */
    public double top(int index) {
        return tops[index];
    }

    /** Stratigraphic position of the base of unit {@code index}. */
    public double base(int index) {
        return tops[index + 1];
    }

    /** Total thickness of the column. */
    public double thickness() {
        return tops[units.size()];
    }

    /**
     * Index of the unit containing stratigraphic position {@code s}; -1 above the column (overburden),
     * {@code size()} below it (underburden).
     */
    public int unitAt(double s) {
        if (s < 0) {
            return -1;
        }
        for (int i = 0; i < units.size(); i++) {
            if (s < tops[i + 1]) {
                return i;
            }
        }
        return units.size();
    }
}
