package org.faultbench.digitize.gridding;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.concurrent.ForkJoinPool;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * The multigrid-preconditioned GMRES solver must reach the surface that successive over-relaxation converges to, on
 * the same equations ({@link CurvatureLevel}): the reference here is over-relaxation run until no node changes by
 * more than 1e-11 m in a sweep, far beyond the default tolerance.
 */
class CurvatureSolverTest {
    /** The gridder's default: finest-grid RMS residual 1/1000 of 0.1 mm. */
    private static final double RMS_TOLERANCE = MinimumCurvatureGridder.FINE_RMS_FRACTION
            * MinimumCurvatureSettings.DEFAULT.tolerance();
    /** Stated agreement with the tightly converged reference: 0.1 mm, the default tolerance. */
    private static final double AGREEMENT = 1e-4;

    private static double[] flatStart(CurvatureLevel level) {
        double[] start = new double[level.geometry().size()];
        Arrays.fill(start, 1250);
        return start;
    }

    @ParameterizedTest
    @ValueSource(doubles = { 0, 0.4 })
    void agreesWithTightlyConvergedOverRelaxation(double tension) {
        CurvatureLevel level = FaultedPatch.equations(tension);
        CurvatureLevel.Solution reference = level.solve(flatStart(level), 1e-11, 2_000_000, 1.4);
        assertTrue(reference.converged(), "reference sweeps " + reference.iterations());

        CurvatureLevel.Solution solution = CurvatureSolver.solve(level, flatStart(level), RMS_TOLERANCE, 500);

        assertTrue(solution.converged());
        double largest = 0;
        int nulls = 0;
        for (int k = 0; k < reference.values().length; k++) {
            double expected = reference.values()[k];
            assertEquals(Double.isNaN(expected), Double.isNaN(solution.values()[k]), "null node " + k);
            if (Double.isNaN(expected)) {
                nulls++;
            } else {
                largest = Math.max(largest, Math.abs(solution.values()[k] - expected));
            }
        }
        assertTrue(largest < AGREEMENT, "largest difference " + largest + " m");
        assertTrue(nulls > 0, "the fault polygon leaves null nodes");
    }

    @Test
    void resultDoesNotDependOnTheThreadCount() throws Exception {
        CurvatureLevel level = FaultedPatch.equations(0);
        assertArrayEquals(solveWithThreads(level, 1), solveWithThreads(level, 3));
    }

    /** Parallel streams started inside a fork-join pool run on that pool. */
    private static double[] solveWithThreads(CurvatureLevel level, int threads) throws Exception {
        ForkJoinPool pool = new ForkJoinPool(threads);
        try {
            return pool.submit(() -> CurvatureSolver.solve(level, flatStart(level), RMS_TOLERANCE, 500).values())
                    .get();
        } finally {
            pool.shutdown();
        }
    }
}
