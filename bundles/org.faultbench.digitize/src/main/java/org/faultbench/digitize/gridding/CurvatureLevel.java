package org.faultbench.digitize.gridding;

import java.util.Arrays;

import org.faultbench.core.grid.GridGeometry;

/**
 * The minimum-curvature equations on one grid, as rows of a linear system ({@link #window}, {@link
 * #rightHandSide}) for {@link CurvatureSolver}, and their solution by successive over-relaxation ({@link #solve}),
 * kept as the reference the faster solver is checked against.
 * <p>
 * Curvature: the surface minimises the sum of squared second differences (z<sub>xx</sub>&sup2;,
 * 2&middot;z<sub>xy</sub>&sup2;, z<sub>yy</sub>&sup2;: the discrete total curvature of Briggs 1974, Geophysics 39,
 * 39&ndash;48), lengths in node spacings along x. A difference enters the sum only when all its nodes are linked
 * ({@link NodeLinks}), so no stencil reaches across a fault or past the grid edge. Away from both, the normal
 * equations are Briggs's 13-point biharmonic stencil (centre 20 for square cells); next to them fewer terms remain,
 * down to the one-dimensional curvature along the fault, which is the natural (zero-curvature) boundary condition.
 * <p>
 * Tension T: each equation is (1 &minus; T) times the curvature row plus T times minus the discrete Laplacian
 * (Smith &amp; Wessel 1990, Geophysics 55, 293&ndash;305; from memory), the Laplacian taken only along axes whose two
 * neighbours are linked, so that faults and edges keep the zero-curvature condition (no tension at the boundary).
 * Every term vanishes for a plane, so a plane is reproduced everywhere, with or without tension.
 * <p>
 * A node holding a data point obeys instead the Taylor expansion from the node to the point, with slopes from its
 * linked neighbours (off-node data after Briggs 1974; first order here, see {@link #datum}). Nodes that no data reach through open links, and nodes in
 * no difference at all, stay null.
 */
final class CurvatureLevel {
    private static final byte NULL_NODE = 0;
    private static final byte REGULAR = 1;
    private static final byte IRREGULAR = 2;
    private static final byte DATUM = 3;
    /** Stencil offsets span -2..2 in i and j: 25 slots, centre at 12. */
    private static final int SPAN = 5;
    private static final int CENTRE = 12;

    private final GridGeometry g;
    private final NodeLinks links;
    private final NodeData data;
    private final byte[] kind;
    private final int[][] rowOffsets;
    private final byte[][] rowSlots;
    private final double[][] rowWeights;
    private final double curvature;
    private final double ratio;
    private final double tension;
    /** Centre weight of each irregular node's normal-equation row before it was divided out. */
    private final double[] irregularCentre;

    /**
     * @param tension T in [0, 1)
     */
    CurvatureLevel(NodeLinks links, NodeData data, double tension) {
        this.g = links.geometry();
        this.links = links;
        this.data = data;
        this.tension = tension;
        this.curvature = 1 - tension;
        double spacingRatio = g.dx() / g.dy();
        this.ratio = spacingRatio * spacingRatio;
        int n = g.size();
        kind = new byte[n];
        irregularCentre = new double[n];
        rowOffsets = new int[n][];
        rowSlots = new byte[n][];
        rowWeights = new double[n][];
        boolean[] reached = links.reachableFrom(data.flags());
        for (int k = 0; k < n; k++) {
            classify(k, reached[k]);
        }
    }

    private void classify(int k, boolean reached) {
        int i = g.column(k);
        int j = g.row(k);
        if (!reached) {
            kind[k] = NULL_NODE;
        } else if (data.has(k)) {
            kind[k] = DATUM;
        } else if (isRegular(i, j)) {
            kind[k] = REGULAR;
        } else {
            double[] row = normalEquationRow(i, j);
            kind[k] = row[CENTRE] > 0 ? IRREGULAR : NULL_NODE;
            if (kind[k] == IRREGULAR) {
                irregularCentre[k] = row[CENTRE];
                compress(k, row);
            }
        }
    }

    /** Whether every difference touching node (i, j) is available, so that the fixed 13-point stencil applies. */
    private boolean isRegular(int i, int j) {
        return links.rowTriple(i - 1, j) && links.rowTriple(i, j) && links.rowTriple(i + 1, j)
                && links.columnTriple(i, j - 1) && links.columnTriple(i, j) && links.columnTriple(i, j + 1)
                && links.cell(i - 1, j - 1) && links.cell(i, j - 1) && links.cell(i - 1, j) && links.cell(i, j);
    }

    /** Equation of node (i, j) as weights on its 5 x 5 neighbourhood: curvature normal equation plus tension. */
    private double[] normalEquationRow(int i, int j) {
        double[] row = new double[SPAN * SPAN];
        for (int c = -1; c <= 1; c++) {
            if (links.rowTriple(i + c, j)) {
                addProduct(row, curvature, new int[][] { { c - 1, 0 }, { c, 0 }, { c + 1, 0 } },
                        new int[] { 1, -2, 1 });
            }
            if (links.columnTriple(i, j + c)) {
                addProduct(row, curvature * ratio * ratio, new int[][] { { 0, c - 1 }, { 0, c }, { 0, c + 1 } },
                        new int[] { 1, -2, 1 });
            }
        }
        for (int ci = -1; ci <= 0; ci++) {
            for (int cj = -1; cj <= 0; cj++) {
                if (links.cell(i + ci, j + cj)) {
                    addProduct(row, 2 * curvature * ratio, new int[][] { { ci, cj }, { ci + 1, cj }, { ci, cj + 1 },
                        { ci + 1, cj + 1 } }, new int[] { 1, -1, -1, 1 });
                }
            }
        }
        if (links.rowTriple(i, j)) {
            addLaplacian(row, 1, 0, tension);
        }
        if (links.columnTriple(i, j)) {
            addLaplacian(row, 0, 1, tension * ratio);
        }
        return row;
    }

    /** Adds weight * d(term&sup2;)/dz / 2 for term = sum of signs[m] * z(offsets[m]); the node is at offset (0, 0). */
    private static void addProduct(double[] row, double weight, int[][] offsets, int[] signs) {
        int own = 0;
        for (int m = 0; m < offsets.length; m++) {
            if (offsets[m][0] == 0 && offsets[m][1] == 0) {
                own = signs[m];
            }
        }
        for (int m = 0; m < offsets.length; m++) {
            row[slot(offsets[m][0], offsets[m][1])] += weight * own * signs[m];
        }
    }

    /** Adds weight * (2 z - z(-d) - z(+d)): minus the centred second difference along (di, dj). */
    private static void addLaplacian(double[] row, int di, int dj, double weight) {
        row[CENTRE] += 2 * weight;
        row[slot(di, dj)] -= weight;
        row[slot(-di, -dj)] -= weight;
    }

    private static int slot(int di, int dj) {
        return (dj + 2) * SPAN + di + 2;
    }

    /** Keeps the non-zero neighbour weights of {@code row} divided by its centre weight, with their index offsets. */
    private void compress(int k, double[] row) {
        int count = 0;
        for (int s = 0; s < row.length; s++) {
            if (s != CENTRE && row[s] != 0) {
                count++;
            }
        }
        rowOffsets[k] = new int[count];
        rowSlots[k] = new byte[count];
        rowWeights[k] = new double[count];
        int m = 0;
        for (int s = 0; s < row.length; s++) {
            if (s != CENTRE && row[s] != 0) {
                rowOffsets[k][m] = (s / SPAN - 2) * g.nx() + (s % SPAN - 2);
                rowSlots[k][m] = (byte) s;
                rowWeights[k][m] = row[s] / row[CENTRE];
                m++;
            }
        }
    }

    GridGeometry geometry() {
        return g;
    }

    NodeLinks links() {
        return links;
    }

    /** Whether node {@code k} carries an equation and a value (is not null). */
    boolean isUnknown(int k) {
        return kind[k] != NULL_NODE;
    }

    /** Whether node {@code k} obeys the fixed 13-point stencil away from faults, edges and data. */
    boolean isRegular(int k) {
        return kind[k] == REGULAR;
    }

    /**
     * The equation of node {@code k} written as &Sigma; w<sub>s</sub> z<sub>s</sub> = {@link #rightHandSide}, with the
     * weights on its 5 &times; 5 neighbourhood put into {@code window} (slot (dj + 2) &middot; 5 + di + 2, centre
     * weight 1, all slots overwritten). These are exactly the equations whose fixed point {@link #solve} iterates to.
     */
    void window(int k, double[] window) {
        Arrays.fill(window, 0);
        switch (kind[k]) {
            case REGULAR -> Stencil.of(curvature, ratio, tension).fill(window);
            case IRREGULAR -> {
                for (int m = 0; m < rowSlots[k].length; m++) {
                    window[rowSlots[k][m]] = rowWeights[k][m];
                }
            }
            case DATUM -> datumWindow(k, window);
            default -> {
                return;
            }
        }
        window[CENTRE] = 1;
    }

    /**
     * The factor that turns the equation of node {@code k} back into its normal-equation form: the centre weight of
     * the curvature row, so that curvature rows times their factor form a symmetric matrix (the Hessian of the
     * total curvature); data equations get the factor of a regular row, which weighs a data node like a regular one.
     */
    double equationScale(int k) {
        return kind[k] == IRREGULAR ? irregularCentre[k] : Stencil.centre(curvature, ratio, tension);
    }

    /** Right-hand side of the equation of node {@code k}: the data depth on a data node, else 0, metres. */
    double rightHandSide(int k) {
        return kind[k] == DATUM ? data.z(k) : 0;
    }

    /** z0 + &xi;z_x + &eta;z_y = z_p with the slopes of {@link #datum} written out as neighbour weights. */
    private void datumWindow(int k, double[] window) {
        int i = g.column(k);
        int j = g.row(k);
        slopeWeights(window, data.xi(k), 1, 0, links.east(i, j), links.east(i - 1, j), links.east(i + 1, j),
                links.east(i - 2, j));
        slopeWeights(window, data.eta(k), 0, 1, links.north(i, j), links.north(i, j - 1), links.north(i, j + 1),
                links.north(i, j - 2));
    }

    /** Adds {@code factor} times the slope of {@link #slope} along (di, dj) to {@code window}. */
    private static void slopeWeights(double[] window, double factor, int di, int dj, boolean plus, boolean minus,
            boolean plusPlus, boolean minusMinus) {
        if (plus && minus) {
            window[slot(di, dj)] += factor / 2;
            window[slot(-di, -dj)] -= factor / 2;
        } else if (plus && plusPlus) {
            window[slot(2 * di, 2 * dj)] += factor;
            window[slot(di, dj)] -= factor;
        } else if (minus && minusMinus) {
            window[slot(-di, -dj)] += factor;
            window[slot(-2 * di, -2 * dj)] -= factor;
        }
    }

    /** Outcome of {@link #solve}: node values (NaN = null), sweeps made and whether the tolerance was met. */
    record Solution(double[] values, int iterations, boolean converged) {
    }

    /**
     * Iterates from {@code start} (one value per node; NaN allowed only where the node stays null) until no node
     * changes by more than {@code tolerance} metres in a sweep, or for {@code maxIterations} sweeps.
     */
    Solution solve(double[] start, double tolerance, int maxIterations, double overRelaxation) {
        double[] z = start.clone();
        Stencil regular = Stencil.of(curvature, ratio, tension);
        for (int sweep = 1; sweep <= maxIterations; sweep++) {
            if (sweep(z, regular, overRelaxation) <= tolerance) {
                return new Solution(withNulls(z), sweep, true);
            }
        }
        return new Solution(withNulls(z), maxIterations, false);
    }

    private double sweep(double[] z, Stencil regular, double omega) {
        double largest = 0;
        int nx = g.nx();
        for (int k = 0; k < z.length; k++) {
            double target;
            switch (kind[k]) {
                case REGULAR -> target = regular.apply(z, k, nx);
                case IRREGULAR -> target = irregular(z, k);
                case DATUM -> target = datum(z, k);
                default -> {
                    continue;
                }
            }
            double change = kind[k] == DATUM ? target - z[k] : omega * (target - z[k]);
            z[k] += change;
            largest = Math.max(largest, Math.abs(change));
        }
        return largest;
    }

    private double irregular(double[] z, int k) {
        int[] offsets = rowOffsets[k];
        double[] weights = rowWeights[k];
        double sum = 0;
        for (int m = 0; m < offsets.length; m++) {
            sum += weights[m] * z[k + offsets[m]];
        }
        return -sum;
    }

    /**
     * Node value that makes the first-order Taylor expansion from the node reach the data point: z_p = z0 + &xi;z_x +
     * &eta;z_y. Slopes come from the central difference where both neighbours along an axis are linked, else from
     * the two linked nodes on one side, else are taken as zero. Slopes never use z0 itself, so the weights on the
     * neighbours add up to at most |&xi;| + |&eta;| &le; 1, which keeps the iteration stable where data fill most
     * nodes (second-order terms would break that bound).
     */
    private double datum(double[] z, int k) {
        int i = g.column(k);
        int j = g.row(k);
        int nx = g.nx();
        double slopeX = slope(z, k, 1, links.east(i, j), links.east(i - 1, j), links.east(i + 1, j),
                links.east(i - 2, j));
        double slopeY = slope(z, k, nx, links.north(i, j), links.north(i, j - 1), links.north(i, j + 1),
                links.north(i, j - 2));
        return data.z(k) - data.xi(k) * slopeX - data.eta(k) * slopeY;
    }

    /**
     * Slope per node spacing at node k along an axis whose next node is {@code k + step}: central when both
     * neighbours are linked, else one-sided from the next two nodes on the linked side, else zero.
     */
    private static double slope(double[] z, int k, int step, boolean plus, boolean minus, boolean plusPlus,
            boolean minusMinus) {
        if (plus && minus) {
            return (z[k + step] - z[k - step]) / 2;
        }
        if (plus && plusPlus) {
            return z[k + 2 * step] - z[k + step];
        }
        if (minus && minusMinus) {
            return z[k - step] - z[k - 2 * step];
        }
        return 0;
    }

    private double[] withNulls(double[] z) {
        double[] values = z.clone();
        for (int k = 0; k < values.length; k++) {
            if (kind[k] == NULL_NODE) {
                values[k] = Double.NaN;
            }
        }
        return values;
    }

    /** The fixed 13-point stencil away from faults and edges, weights divided by the centre weight. */
    private record Stencil(double x1, double x2, double y1, double y2, double diagonal) {

        static double centre(double curvature, double r, double tension) {
            return curvature * (6 + 6 * r * r + 8 * r) + tension * (2 + 2 * r);
        }

        static Stencil of(double curvature, double r, double tension) {
            double centre = centre(curvature, r, tension);
            return new Stencil((curvature * (-4 - 4 * r) - tension) / centre, curvature / centre,
                    (curvature * (-4 * r * r - 4 * r) - tension * r) / centre, curvature * r * r / centre,
                    curvature * 2 * r / centre);
        }

        /** Writes the weights into a 5 x 5 window (slot (dj + 2) * 5 + di + 2); the centre slot is left alone. */
        void fill(double[] window) {
            window[slot(-1, 0)] = x1;
            window[slot(1, 0)] = x1;
            window[slot(-2, 0)] = x2;
            window[slot(2, 0)] = x2;
            window[slot(0, -1)] = y1;
            window[slot(0, 1)] = y1;
            window[slot(0, -2)] = y2;
            window[slot(0, 2)] = y2;
            for (int dj = -1; dj <= 1; dj += 2) {
                for (int di = -1; di <= 1; di += 2) {
                    window[slot(di, dj)] = diagonal;
                }
            }
        }

        double apply(double[] z, int k, int nx) {
            return -(x1 * (z[k - 1] + z[k + 1]) + x2 * (z[k - 2] + z[k + 2]) + y1 * (z[k - nx] + z[k + nx])
                    + y2 * (z[k - 2 * nx] + z[k + 2 * nx])
                    + diagonal * (z[k - nx - 1] + z[k - nx + 1] + z[k + nx - 1] + z[k + nx + 1]));
        }
    }
}
