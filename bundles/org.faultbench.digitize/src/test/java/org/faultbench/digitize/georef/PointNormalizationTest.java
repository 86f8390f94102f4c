package org.faultbench.digitize.georef;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class PointNormalizationTest {

    private final List<double[]> points = List.of(new double[] { 500000, 6000000 }, new double[] { 500300, 6000000 },
            new double[] { 500300, 6000400 }, new double[] { 500000, 6000400 });

    @Test
    void centroidGoesToTheOriginAndTheMeanDistanceBecomesRootTwo() {
        // Hartley & Zisserman 2003, Multiple View Geometry, 2nd ed., section 4.4.4 (from memory): translate the
        // centroid to the origin, scale so the average distance from it is √2.
        // Hand calculation: centroid (500150, 6000200); each corner is 250 from it, so the scale is √2 / 250.
        PointNormalization n = PointNormalization.of(points);
        assertEquals(500150, n.centreX(), 1e-9);
        assertEquals(6000200, n.centreY(), 1e-9);
        assertEquals(Math.sqrt(2) / 250, n.scale(), 1e-15);
        assertEquals(Math.sqrt(2), Math.hypot(n.normalX(500300), n.normalY(6000400)), 1e-12);
    }

    @Test
    void matrixAndInverseMatrixUndoEachOther() {
        PointNormalization n = PointNormalization.of(points);
        double[] back = n.inverseMatrix().multiply(n.matrix()).operate(new double[] { 500123, 6000321, 1 });
        assertArrayEquals(new double[] { 500123, 6000321, 1 }, back, 1e-6);
    }

    @Test
    void pullBackGivesTheSameLinearFunctionOfTheOriginalCoordinates() {
        // f(u, v) = 3u − 2v + 7 at the point (500123, 6000321), computed both ways: hand calculation
        PointNormalization n = PointNormalization.of(points);
        double[] raw = n.pullBack(3, -2, 7);
        double expected = 3 * n.normalX(500123) - 2 * n.normalY(6000321) + 7;
        assertEquals(expected, raw[0] * 500123 + raw[1] * 6000321 + raw[2], 1e-7);
    }

    @Test
    void pointsAtOnePlaceAreCoincident() {
        assertTrue(PointNormalization.of(List.of(new double[] { 5, 5 }, new double[] { 5, 5 })).coincident());
    }
}
