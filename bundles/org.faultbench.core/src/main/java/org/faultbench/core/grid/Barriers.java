package org.faultbench.core.grid;

import java.util.Collection;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineString;

/**
 * Turns fault traces (map x, y in metres) into barrier nodes, so that a flood over a depth grid cannot cross a
 * sealing fault.
 * <p>
 * Rule ("supercover" rasterisation): a node becomes a barrier when the trace touches its cell, the closed dx by dy
 * square centred on the node, even at a single corner. The barrier nodes of a trace then join through shared cell
 * sides with no diagonal gap, so neither a 4- nor an 8-connected flood can step across it. The price is a barrier
 * one to two cells wide, which a finer grid narrows. Each segment is walked column by column, in time proportional
 * to the number of cells it crosses. Cell bounds are widened by {@value #TOUCH_TOLERANCE} cell so that a trace
 * running exactly through cell corners is rasterised the same whatever the rounding.
 */
public final class Barriers {
    static final double TOUCH_TOLERANCE = 1e-9;

    private Barriers() {
    }

    /** Barrier nodes of all {@code traces}; parts of a trace outside the grid are ignored. */
    public static GridMask rasterize(GridGeometry geometry, Collection<? extends LineString> traces) {
        if (geometry == null || traces == null) {
            throw new IllegalArgumentException("grid geometry or fault traces missing");
        }
        boolean[] barrier = new boolean[geometry.size()];
        for (LineString trace : traces) {
            if (trace == null) {
                throw new IllegalArgumentException("a fault trace is missing (null)");
            }
            Coordinate[] points = trace.getCoordinates();
            for (int k = 0; k + 1 < points.length; k++) {
                markSegment(geometry, points[k], points[k + 1], barrier);
            }
        }
        return GridMask.of(geometry, barrier);
    }

    /** Marks the cells the segment touches; coordinates are converted to cell units where cell i spans [i, i+1]. */
    private static void markSegment(GridGeometry g, Coordinate p, Coordinate q, boolean[] barrier) {
        requireNumbers(p);
        requireNumbers(q);
        double u1 = (p.x - g.x0()) / g.dx() + 0.5;
        double v1 = (p.y - g.y0()) / g.dy() + 0.5;
        double u2 = (q.x - g.x0()) / g.dx() + 0.5;
        double v2 = (q.y - g.y0()) / g.dy() + 0.5;
        double uMin = Math.min(u1, u2);
        double uMax = Math.max(u1, u2);
        int firstColumn = firstCell(uMin);
        int lastColumn = lastCell(uMax, g.nx());
        for (int i = firstColumn; i <= lastColumn; i++) {
            double a = Math.max(uMin, i - TOUCH_TOLERANCE);
            double b = Math.min(uMax, i + 1 + TOUCH_TOLERANCE);
            double va = u1 == u2 ? v1 : v1 + (a - u1) * (v2 - v1) / (u2 - u1);
            double vb = u1 == u2 ? v2 : v1 + (b - u1) * (v2 - v1) / (u2 - u1);
            int lastRow = lastCell(Math.max(va, vb), g.ny());
            for (int j = firstCell(Math.min(va, vb)); j <= lastRow; j++) {
                barrier[j * g.nx() + i] = true;
            }
        }
    }

    /** Lowest cell whose closed span [c, c+1] (widened by the tolerance) reaches {@code low}, at least 0. */
    private static int firstCell(double low) {
        return (int) Math.max(0, Math.ceil(low - 1 - TOUCH_TOLERANCE));
    }

    /** Highest cell whose closed span starts at or below {@code high} (widened by the tolerance), at most n - 1. */
    private static int lastCell(double high, int n) {
        return (int) Math.min(n - 1, Math.floor(high + TOUCH_TOLERANCE));
    }

    private static void requireNumbers(Coordinate c) {
        if (!Double.isFinite(c.x) || !Double.isFinite(c.y)) {
            throw new IllegalArgumentException("fault trace point must have finite x and y, was (" + c.x + ", " + c.y + ")");
        }
    }
}
