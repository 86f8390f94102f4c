package org.faultbench.faults;

/**
 * The fault plane cut into columns along strike, each holding the footwall and hanging-wall cut-off depths of the
 * reference horizon at its centre. Juxtaposition and seal attributes are evaluated per column, thousands of times
 * per Monte Carlo run, so the geometry sits in primitive arrays and is read per index without allocation.
 *
 * <p>A column whose cut-off depth is NaN on either wall has no data (e.g. a gap in a depth grid) and is skipped by
 * the analyses.
 */
public final class FaultPlaneColumns {

    private final String faultId;
    private final String referenceHorizon;
    private final double width;
    private final double[] u;
    private final double[] x;
    private final double[] y;
    private final double[] footwallDepth;
    private final double[] hangingWallDepth;

    /**
     * @param faultId id of the sampled fault
     * @param referenceHorizon horizon whose cut-offs hang the stratigraphic columns
     * @param width column width along strike (m), &gt; 0
     * @param u column-centre along-strike distances, finite and strictly increasing
     * @param x column-centre map x
     * @param y column-centre map y
     * @param footwallDepth footwall cut-off depth per column (positive down, m; NaN = no data)
     * @param hangingWallDepth hanging-wall cut-off depth per column (positive down, m; NaN = no data)
     */
    public FaultPlaneColumns(String faultId, String referenceHorizon, double width, double[] u, double[] x,
            double[] y, double[] footwallDepth, double[] hangingWallDepth) {
        if (faultId == null || faultId.isBlank()) {
            throw new IllegalArgumentException("fault-plane columns: fault id is empty");
        }
        if (referenceHorizon == null || referenceHorizon.isBlank()) {
            throw new IllegalArgumentException("fault-plane columns of fault '" + faultId
                    + "': reference horizon name is empty");
        }
        this.faultId = faultId;
        this.referenceHorizon = referenceHorizon;
        this.width = width;
        this.u = u.clone();
        this.x = x.clone();
        this.y = y.clone();
        this.footwallDepth = footwallDepth.clone();
        this.hangingWallDepth = hangingWallDepth.clone();
        checkGeometry();
    }

    private void checkGeometry() {
        if (!(width > 0) || Double.isInfinite(width)) {
            throw new IllegalArgumentException(describe() + ": column width must be a finite number > 0, was " + width);
        }
        int n = u.length;
        if (n == 0) {
            throw new IllegalArgumentException(describe() + ": needs at least one column");
        }
        if (x.length != n || y.length != n || footwallDepth.length != n || hangingWallDepth.length != n) {
            throw new IllegalArgumentException(describe() + ": arrays differ in length (u " + n + ", x " + x.length
                    + ", y " + y.length + ", footwall " + footwallDepth.length + ", hanging wall "
                    + hangingWallDepth.length + ")");
        }
        for (int k = 0; k < n; k++) {
            if (!Double.isFinite(u[k]) || !Double.isFinite(x[k]) || !Double.isFinite(y[k])) {
                throw new IllegalArgumentException(describe() + ": column " + k + " has a non-finite position (u "
                        + u[k] + ", x " + x[k] + ", y " + y[k] + ")");
            }
            if (k > 0 && !(u[k] > u[k - 1])) {
                throw new IllegalArgumentException(describe() + ": column centres must have increasing u, column " + k
                        + " has u = " + u[k] + " after " + u[k - 1]);
            }
            if (Double.isInfinite(footwallDepth[k]) || Double.isInfinite(hangingWallDepth[k])) {
                throw new IllegalArgumentException(describe() + ": column " + k + " has an infinite cut-off depth");
            }
        }
    }

    public String faultId() {
        return faultId;
    }

    public String referenceHorizon() {
        return referenceHorizon;
    }

    public int count() {
        return u.length;
    }

    /** Column width along strike (m). */
    public double width() {
        return width;
    }

    public double u(int column) {
        return u[column];
    }

    public double x(int column) {
        return x[column];
    }

    public double y(int column) {
        return y[column];
    }

    /** Footwall cut-off depth of the reference horizon (NaN = no data). */
    public double footwallDepth(int column) {
        return footwallDepth[column];
    }

    /** Hanging-wall cut-off depth of the reference horizon (NaN = no data). */
    public double hangingWallDepth(int column) {
        return hangingWallDepth[column];
    }

    /** Whether both cut-off depths are known at this column. */
    public boolean hasData(int column) {
        return !Double.isNaN(footwallDepth[column]) && !Double.isNaN(hangingWallDepth[column]);
    }

    /** Throw = hanging-wall minus footwall cut-off depth; positive for a normal fault, NaN without data. */
    public double throwAt(int column) {
        return hangingWallDepth[column] - footwallDepth[column];
    }

    /** Throw of every column, a fresh array (for throw-profile plots and QC). */
    public double[] throwProfile() {
        double[] profile = new double[u.length];
        for (int k = 0; k < profile.length; k++) {
            profile[k] = throwAt(k);
        }
        return profile;
    }

    private String describe() {
        return "fault-plane columns of fault '" + faultId + "'";
    }
}
