package org.faultbench.digitize.gridding;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The Gauss&ndash;Seidel sweep, which relaxes two rows at once and cuts the grid into strips, against a plain sweep
 * written from its definition (each node in turn, newest values of its neighbours; Saad 2003, Iterative Methods for
 * Sparse Linear Systems, 2nd ed., section 4.1; from memory) in the same strip order.
 */
class GridMatrixTest {
    private static final int STRIP_ROWS = 16;

    @ParameterizedTest
    @ValueSource(booleans = { true, false })
    void sweepIsTheSweepOfItsDefinition(boolean forward) {
        int nx = 23;
        int ny = 37;
        int n = nx * ny;
        Random random = new Random(3);
        boolean[] unknown = new boolean[n];
        boolean[] shared = new boolean[n];
        for (int k = 0; k < n; k++) {
            int i = k % nx;
            int j = k / nx;
            unknown[k] = random.nextDouble() > 0.05;
            shared[k] = i >= 2 && j >= 2 && i < nx - 2 && j < ny - 2 && random.nextDouble() > 0.3;
        }
        double[] thirteenPoint = new double[GridMatrix.WINDOW];
        double[][] stored = new double[n][GridMatrix.WINDOW];
        for (int k = 0; k < n; k++) {
            fullWindow(random, k % nx, k / nx, nx, ny, stored[k]);
        }
        thirteenPoint[GridMatrix.CENTRE] = 20;
        double[] fivePoint = { -8, 1, -8, 1, 2 };
        for (int d = -1; d <= 1; d += 2) {
            thirteenPoint[slot(d, 0)] = fivePoint[0];
            thirteenPoint[slot(2 * d, 0)] = fivePoint[1];
            thirteenPoint[slot(0, d)] = fivePoint[2];
            thirteenPoint[slot(0, 2 * d)] = fivePoint[3];
            thirteenPoint[slot(d, -1)] = fivePoint[4];
            thirteenPoint[slot(d, 1)] = fivePoint[4];
        }
        GridMatrix a = new GridMatrix(nx, ny, unknown, shared, thirteenPoint,
                (k, window) -> System.arraycopy(stored[k], 0, window, 0, GridMatrix.WINDOW));
        double[] b = new double[n];
        double[] x = new double[n];
        for (int k = 0; k < n; k++) {
            b[k] = a.unknown(k) ? 100 * random.nextDouble() : 0;
            x[k] = a.unknown(k) ? random.nextDouble() : 0;
        }
        double[] expected = x.clone();

        for (int sweep = 0; sweep < 3; sweep++) {
            a.gaussSeidel(x, b, forward);
            referenceSweep(a, expected, b, forward);
        }

        for (int k = 0; k < n; k++) {
            assertEquals(expected[k], x[k], 1e-12 * Math.max(1, Math.abs(expected[k])), "node " + k);
        }
    }

    /** Weights on the whole 5 x 5 window inside the grid, centre weight above the sum of the others. */
    private static void fullWindow(Random random, int i, int j, int nx, int ny, double[] window) {
        double sum = 0;
        for (int dj = -2; dj <= 2; dj++) {
            for (int di = -2; di <= 2; di++) {
                boolean inside = i + di >= 0 && i + di < nx && j + dj >= 0 && j + dj < ny;
                if ((di != 0 || dj != 0) && inside) {
                    window[slot(di, dj)] = random.nextDouble() - 0.5;
                    sum += Math.abs(window[slot(di, dj)]);
                }
            }
        }
        window[GridMatrix.CENTRE] = 1.5 * sum + 0.1;
    }

    private static int slot(int di, int dj) {
        return (dj + 2) * GridMatrix.SPAN + di + 2;
    }

    /** Even strips, then odd ones (reversed when backward), each node in grid order (or its reverse). */
    private static void referenceSweep(GridMatrix a, double[] x, double[] b, boolean forward) {
        int nx = a.nx();
        int strips = (a.ny() + STRIP_ROWS - 1) / STRIP_ROWS;
        int[] columns = new int[GridMatrix.WINDOW];
        double[] weights = new double[GridMatrix.WINDOW];
        for (int phase = 0; phase < 2; phase++) {
            int parity = forward ? phase : 1 - phase;
            for (int strip = parity; strip < strips; strip += 2) {
                int from = strip * STRIP_ROWS * nx;
                int to = Math.min(a.ny(), (strip + 1) * STRIP_ROWS) * nx;
                for (int m = 0; m < to - from; m++) {
                    int k = forward ? from + m : to - 1 - m;
                    int entries = a.row(k, columns, weights);
                    if (entries == 0) {
                        continue;
                    }
                    double sum = b[k];
                    for (int e = 1; e < entries; e++) {
                        sum -= weights[e] * x[columns[e]];
                    }
                    x[k] = sum / weights[0];
                }
            }
        }
    }
}
