package org.faultbench.digitize.ui.editing;

/**
 * Converts between map metres and the editor's drawing plane, which is the scan's level-0 pixel grid: drawing unit
 * (u, v) covers pixel column floor(u), row floor(v), so the centre of pixel (col, row) in the world-file convention
 * is (col + 0.5, row + 0.5). Map y counts up (north), drawing v counts down.
 */
public interface ScanProjection {

    /** Drawing position {u, v} of the map point (x, y). */
    double[] toDrawing(double x, double y);

    /** Map position {x, y} of the drawing position (u, v). */
    double[] toMap(double u, double v);

    /** Whether the map position comes from a fit to control points; otherwise map units are scan pixels. */
    boolean georeferenced();

    /**
     * Map metres per drawing unit near (u, v): the mean length of one pixel step along the columns and along the
     * rows, enough to turn a tolerance in screen pixels into one in metres.
     */
    default double metresPerUnit(double u, double v) {
        double[] here = toMap(u, v);
        double[] right = toMap(u + 1, v);
        double[] down = toMap(u, v + 1);
        return (Math.hypot(right[0] - here[0], right[1] - here[1])
                + Math.hypot(down[0] - here[0], down[1] - here[1])) / 2;
    }
}
