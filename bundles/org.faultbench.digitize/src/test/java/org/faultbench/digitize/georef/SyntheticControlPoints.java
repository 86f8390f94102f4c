package org.faultbench.digitize.georef;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.BiFunction;

/** Control points made from a known pixel-to-map mapping, for tests that must recover that mapping. */
final class SyntheticControlPoints {

    static final double SCAN_WIDTH = 4000;
    static final double SCAN_HEIGHT = 3000;

    /** Pixel positions spread over a 4000 × 3000 scan, no three on one line, no six on one conic. */
    static final double[][] SPREAD_PIXELS = {
            { 120, 80 }, { 3890, 140 }, { 3950, 2910 }, { 60, 2870 }, { 2010, 1480 },
            { 1020, 2460 }, { 2980, 690 }, { 530, 930 }, { 3370, 2050 }, { 1640, 260 } };

    /** Pixels not used as control points, where the fitted transform is checked. */
    static final double[][] CHECK_PIXELS = { { 0, 0 }, { 3999, 2999 }, { 2500.5, 1200.25 }, { 777, 2222 } };

    private SyntheticControlPoints() {
    }

    /** Points P1, P2, ... at the given pixels, their map positions given by the mapping. */
    static List<ControlPoint> of(double[][] pixels, BiFunction<Double, Double, double[]> pixelToMap) {
        List<ControlPoint> points = new ArrayList<>();
        for (int i = 0; i < pixels.length; i++) {
            double[] map = pixelToMap.apply(pixels[i][0], pixels[i][1]);
            points.add(ControlPoint.of("P" + (i + 1), pixels[i][0], pixels[i][1], map[0], map[1]));
        }
        return points;
    }

    /** The first n points of {@link #SPREAD_PIXELS}. */
    static double[][] spread(int n) {
        return Arrays.copyOf(SPREAD_PIXELS, n);
    }

    /**
     * The homography taking the corners of the width × height scan, clockwise from the upper left, to the given map
     * quadrilateral: Heckbert's closed-form square-to-quadrilateral mapping (Heckbert 1989, Fundamentals of Texture
     * Mapping and Image Warping, MSc thesis, UC Berkeley, section 2.2.3; from memory), with u = col/width and
     * v = row/height. Independent of the DLT under test.
     */
    static ProjectiveTransform rectangleToQuad(double width, double height, double[][] quad) {
        double x0 = quad[0][0], y0 = quad[0][1], x1 = quad[1][0], y1 = quad[1][1];
        double x2 = quad[2][0], y2 = quad[2][1], x3 = quad[3][0], y3 = quad[3][1];
        double sx = x0 - x1 + x2 - x3;
        double sy = y0 - y1 + y2 - y3;
        double dx1 = x1 - x2, dx2 = x3 - x2, dy1 = y1 - y2, dy2 = y3 - y2;
        double den = dx1 * dy2 - dx2 * dy1;
        double g = (sx * dy2 - dx2 * sy) / den;
        double h = (dx1 * sy - sx * dy1) / den;
        double a = x1 - x0 + g * x1, b = x3 - x0 + h * x3, d = y1 - y0 + g * y1, e = y3 - y0 + h * y3;
        return new ProjectiveTransform(a / width, b / height, x0, d / width, e / height, y0, g / width, h / height);
    }
}
