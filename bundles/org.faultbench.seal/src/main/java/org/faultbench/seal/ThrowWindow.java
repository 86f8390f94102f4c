package org.faultbench.seal;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.column.ResolvedColumn;

/**
 * The stretch [s - T, s] of the footwall column that has slipped past a fault point (see {@link FaultPointContext}),
 * and the geometry clay-based criteria derive from it.
 *
 * @param column the footwall column
 * @param top s - T
 * @param base s, the footwall position of the point
 */
public record ThrowWindow(ResolvedColumn column, double top, double base) {

    public ThrowWindow {
        if (column == null) {
            throw new IllegalArgumentException("throw window: column is missing");
        }
        if (!(top <= base)) {
            throw new IllegalArgumentException("throw window: top " + top + " must not lie below base " + base);
        }
    }

    public static ThrowWindow of(FaultPointContext ctx) {
        return new ThrowWindow(ctx.footwallColumn(), ctx.hangingWallPosition(), ctx.footwallPosition());
    }

    /** The throw T. */
    public double length() {
        return base - top;
    }

    public boolean insideColumn() {
        return top >= 0 && base <= column.thickness();
    }

    /**
     * @throws IllegalArgumentException when part of the window lies outside the column, where the slipped rock is
     *         unknown
     */
    public void requireInsideColumn(String criterionName) {
        if (!insideColumn()) {
            throw new IllegalArgumentException(criterionName + ": the throw window [" + top + ", " + base
                    + "] m leaves the footwall column [0, " + column.thickness()
                    + "] m; extend the stratigraphy with overburden or underburden units");
        }
    }

    /** Thickness of unit {@code unitIndex} that has slipped past the point, m. */
    public double overlap(int unitIndex) {
        return Math.max(0, Math.min(base, column.base(unitIndex)) - Math.max(top, column.top(unitIndex)));
    }

    /** Indices of the units with a part inside the window, shallowest first. */
    public List<Integer> unitsInside() {
        List<Integer> inside = new ArrayList<>();
        for (int i = 0; i < column.size(); i++) {
            if (overlap(i) > 0) {
                inside.add(i);
            }
        }
        return inside;
    }

    /** Shale source beds of smear: the units of lithology class SEAL inside the window, shallowest first. */
    public List<Integer> shaleBedsInside() {
        return unitsInside().stream().filter(i -> column.unit(i).lithology() == LithologyClass.SEAL).toList();
    }

    /**
     * Distance along the fault (vertical) from the point to the nearer cut-off of unit {@code unitIndex}, a unit
     * inside the window: its
     * footwall cut-off spans [top, base] of the unit, its hanging-wall cut-off the same span shifted down by the
     * throw. Zero when the point faces the unit itself.
     */
    public double distanceFromCutOff(int unitIndex) {
        double fromFootwallCutOff = Math.max(0, base - column.base(unitIndex));
        double fromHangingWallCutOff = Math.max(0, column.top(unitIndex) + length() - base);
        return Math.min(fromFootwallCutOff, fromHangingWallCutOff);
    }
}
