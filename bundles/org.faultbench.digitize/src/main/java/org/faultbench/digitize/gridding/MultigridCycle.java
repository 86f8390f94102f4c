package org.faultbench.digitize.gridding;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * One multigrid V-cycle for a {@link GridMatrix}, used as the preconditioner of {@link Gmres}: a linear map that
 * returns an approximate solution of A e = r.
 * <p>
 * Why: Gauss&ndash;Seidel removes the error of a node within a few sweeps only at wavelengths of a few nodes; the
 * rest is handed to the grid of every second node, where it is short again, through Galerkin coarse operators
 * ({@link GalerkinCoarsening}) and an interpolation that never crosses a fault ({@link Prolongation}). The cycle
 * smooths forward before and backward after the coarse correction, {@value #SWEEPS} sweeps each, and solves the
 * coarsest level (at most {@value #COARSEST_UNKNOWNS} unknowns) directly. Every step is linear and fixed, so the
 * cycle is one fixed preconditioner, as plain (not flexible) GMRES requires.
 */
final class MultigridCycle {
    private static final int SWEEPS = 3;
    private static final int COARSEST_UNKNOWNS = 100;

    private final List<GridMatrix> matrices = new ArrayList<>();
    private final List<Prolongation> prolongations = new ArrayList<>();
    private final CoarsestSolve coarsest;
    private final double[][] rightHandSides;
    private final double[][] corrections;
    private final double[][] residuals;

    MultigridCycle(GridMatrix fine, LevelLinks fineLinks) {
        GridMatrix a = fine;
        LevelLinks links = fineLinks;
        matrices.add(a);
        while (a.unknownCount() > COARSEST_UNKNOWNS && (a.nx() > 1 || a.ny() > 1)) {
            Prolongation p = new Prolongation(links);
            a = GalerkinCoarsening.coarse(a, p);
            links = links.coarsened(p.coarseNx(), p.coarseNy(), unknownNodes(a));
            prolongations.add(p);
            matrices.add(a);
        }
        coarsest = new CoarsestSolve(a);
        int levels = matrices.size();
        rightHandSides = new double[levels][];
        corrections = new double[levels][];
        residuals = new double[levels][];
        for (int l = 0; l < levels; l++) {
            int n = matrices.get(l).size();
            rightHandSides[l] = l == 0 ? null : new double[n];
            corrections[l] = l == 0 ? null : new double[n];
            residuals[l] = new double[n];
        }
    }

    private static boolean[] unknownNodes(GridMatrix a) {
        boolean[] unknown = new boolean[a.size()];
        for (int k = 0; k < unknown.length; k++) {
            unknown[k] = a.unknown(k);
        }
        return unknown;
    }

    /** e = M r: one V-cycle on A e = r from e = 0. */
    void apply(double[] r, double[] e) {
        cycle(0, r, e);
    }

    private void cycle(int level, double[] b, double[] x) {
        GridMatrix a = matrices.get(level);
        if (level == matrices.size() - 1) {
            coarsest.solve(b, x);
            return;
        }
        Arrays.fill(x, 0);
        for (int s = 0; s < SWEEPS; s++) {
            a.gaussSeidel(x, b, true);
        }
        double[] residual = residuals[level];
        Parallel.forRange(a.size(), (from, to) -> a.residual(x, b, residual, from, to));
        Prolongation p = prolongations.get(level);
        p.restrict(residual, rightHandSides[level + 1]);
        cycle(level + 1, rightHandSides[level + 1], corrections[level + 1]);
        double[] correction = corrections[level + 1];
        Parallel.forRange(a.size(), (from, to) -> p.interpolateAdd(correction, x, from, to));
        for (int s = 0; s < SWEEPS; s++) {
            a.gaussSeidel(x, b, false);
        }
    }
}
