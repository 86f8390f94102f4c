package org.faultbench.sim;

import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.special.Erf;

/**
 * A smooth random depth-error surface: independent normal values on a coarse lattice whose spacing is the correlation
 * length, interpolated bilinearly and rescaled so the standard deviation is the same everywhere. Depth errors of
 * nearby points are thus correlated instead of averaging out node by node (common practice; Røe et al. 2014,
 * Math. Geosci. 46, on correlated interpretation error), while the common shift of a horizon is sampled apart.
 */
public final class CorrelatedResidualField {
    private final double x0;
    private final double y0;
    private final double spacing;
    private final int nx;
    private final int ny;
    private final double[] lattice;
    private final double standardDeviation;

    private CorrelatedResidualField(double x0, double y0, double spacing, int nx, int ny, double[] lattice,
            double standardDeviation) {
        this.x0 = x0;
        this.y0 = y0;
        this.spacing = spacing;
        this.nx = nx;
        this.ny = ny;
        this.lattice = lattice;
        this.standardDeviation = standardDeviation;
    }

    /** Number of random draws a field over this extent consumes; fixed by the extent, so streams stay aligned. */
    public static int drawCount(double xMin, double xMax, double yMin, double yMax, double correlationLength) {
        return latticeSize(xMin, xMax, correlationLength) * latticeSize(yMin, yMax, correlationLength);
    }

    private static int latticeSize(double min, double max, double spacing) {
        return (int) Math.ceil((max - min) / spacing) + 2;
    }

    /**
     * Draws a field covering [xMin, xMax] × [yMin, yMax]. Consumes exactly {@link #drawCount} uniform draws.
     */
    public static CorrelatedResidualField sample(double xMin, double xMax, double yMin, double yMax,
            double correlationLength, double standardDeviation, RandomGenerator rng) {
        if (!(correlationLength > 0) || !(standardDeviation >= 0) || !(xMax >= xMin) || !(yMax >= yMin)) {
            throw new IllegalArgumentException("residual field needs a positive correlation length and a standard"
                    + " deviation >= 0, was " + correlationLength + " and " + standardDeviation);
        }
        int nx = latticeSize(xMin, xMax, correlationLength);
        int ny = latticeSize(yMin, yMax, correlationLength);
        double[] lattice = new double[nx * ny];
        for (int k = 0; k < lattice.length; k++) {
            double u = rng.nextDouble();
            lattice[k] = standardNormalQuantile(u > 0 ? u : 0x1.0p-53);
        }
        return new CorrelatedResidualField(xMin - correlationLength / 2, yMin - correlationLength / 2,
                correlationLength, nx, ny, lattice, standardDeviation);
    }

    private static double standardNormalQuantile(double p) {
        return Math.sqrt(2) * Erf.erfInv(2 * p - 1);
    }

    /** The depth error at (x, y) in metres; positive = deeper. */
    public double value(double x, double y) {
        if (standardDeviation == 0) {
            return 0;
        }
        double fx = clamp((x - x0) / spacing, nx - 1);
        double fy = clamp((y - y0) / spacing, ny - 1);
        int i = Math.min((int) fx, nx - 2);
        int j = Math.min((int) fy, ny - 2);
        double tx = fx - i;
        double ty = fy - j;
        double w00 = (1 - tx) * (1 - ty);
        double w10 = tx * (1 - ty);
        double w01 = (1 - tx) * ty;
        double w11 = tx * ty;
        double sum = w00 * lattice[j * nx + i] + w10 * lattice[j * nx + i + 1] + w01 * lattice[(j + 1) * nx + i]
                + w11 * lattice[(j + 1) * nx + i + 1];
        // a weighted sum of independent N(0,1) values has variance sum(w^2); divide it out for a stationary sd
        double norm = Math.sqrt(w00 * w00 + w10 * w10 + w01 * w01 + w11 * w11);
        return standardDeviation * sum / norm;
    }

    private static double clamp(double f, int max) {
        return Math.max(0, Math.min(max, f));
    }
}
