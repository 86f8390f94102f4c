package org.faultbench.report.chart;

import java.util.ArrayList;
import java.util.List;
import java.util.function.IntPredicate;

import org.faultbench.core.grid.RegularGrid;

/**
 * Contour segments of a grid by marching squares over the cells between node centres (no library we use offers
 * contouring). Saddle cells are split by the cell-centre mean. Cells for which {@code skip} is true (e.g. cells a
 * fault trace crosses, where the grid steps) get no segments, so faults are not drawn as bundles of contours.
 */
final class ContourSegments {
    private ContourSegments() {
    }

    /** Segments {x1, y1, x2, y2} in map coordinates at {@code level}. */
    static List<double[]> at(RegularGrid grid, double level, int[] cellRange, IntPredicate skip) {
        List<double[]> segments = new ArrayList<>();
        for (int j = cellRange[2]; j < cellRange[3]; j++) {
            for (int i = cellRange[0]; i < cellRange[1]; i++) {
                if (skip.test(j * grid.nx() + i)) {
                    continue;
                }
                double v00 = grid.value(i, j);
                double v10 = grid.value(i + 1, j);
                double v11 = grid.value(i + 1, j + 1);
                double v01 = grid.value(i, j + 1);
                if (Double.isNaN(v00) || Double.isNaN(v10) || Double.isNaN(v11) || Double.isNaN(v01)) {
                    continue;
                }
                cell(grid, i, j, new double[] { v00, v10, v11, v01 }, level, segments);
            }
        }
        return segments;
    }

    private static void cell(RegularGrid grid, int i, int j, double[] v, double level, List<double[]> out) {
        int code = 0;
        for (int k = 0; k < 4; k++) {
            if (v[k] > level) {
                code |= 1 << k;
            }
        }
        if (code == 0 || code == 15) {
            return;
        }
        // corners 0 (i, j), 1 (i+1, j), 2 (i+1, j+1), 3 (i, j+1); edge e joins corner e and corner e+1
        List<double[]> crossings = new ArrayList<>(4);
        for (int e = 0; e < 4; e++) {
            double a = v[e];
            double b = v[(e + 1) % 4];
            if ((a > level) != (b > level)) {
                double t = (level - a) / (b - a);
                double[] pa = corner(grid, i, j, e);
                double[] pb = corner(grid, i, j, (e + 1) % 4);
                crossings.add(new double[] { pa[0] + t * (pb[0] - pa[0]), pa[1] + t * (pb[1] - pa[1]), e });
            }
        }
        if (crossings.size() == 2) {
            out.add(segment(crossings.get(0), crossings.get(1)));
        } else if (crossings.size() == 4) {
            boolean centreAbove = (v[0] + v[1] + v[2] + v[3]) / 4 > level;
            boolean corner0Above = v[0] > level;
            if (centreAbove == corner0Above) {
                out.add(segment(crossings.get(0), crossings.get(1)));
                out.add(segment(crossings.get(2), crossings.get(3)));
            } else {
                out.add(segment(crossings.get(3), crossings.get(0)));
                out.add(segment(crossings.get(1), crossings.get(2)));
            }
        }
    }

    private static double[] corner(RegularGrid grid, int i, int j, int k) {
        int di = k == 1 || k == 2 ? 1 : 0;
        int dj = k >= 2 ? 1 : 0;
        return new double[] { grid.x(i + di), grid.y(j + dj) };
    }

    private static double[] segment(double[] a, double[] b) {
        return new double[] { a[0], a[1], b[0], b[1] };
    }
}
