package org.faultbench.digitize.gridding;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.core.grid.RegularGrid;
import org.faultbench.digitize.io.WellTop;

/**
 * Misfits of a gridded horizon at known depths (digitised points, well tops), the standard quality check before a
 * horizon is used (common practice). The surface is read with {@link SurfaceSampler}, never across a fault.
 *
 * @param residuals one per checked point, in the order given
 */
public record ResidualReport(List<Residual> residuals) {

    public ResidualReport {
        if (residuals == null) {
            throw new IllegalArgumentException("residual list missing");
        }
        residuals = List.copyOf(residuals);
    }

    /** Residuals of {@code surface} at {@code points}. */
    public static ResidualReport of(RegularGrid surface, FaultBarriers barriers, List<LabelledPoint> points) {
        if (points == null) {
            throw new IllegalArgumentException("checked points missing");
        }
        SurfaceSampler sampler = new SurfaceSampler(surface, barriers);
        List<Residual> residuals = new ArrayList<>();
        for (LabelledPoint p : points) {
            residuals.add(new Residual(p, sampler.valueAt(p.x(), p.y())));
        }
        return new ResidualReport(residuals);
    }

    /** Residuals at well tops, labelled "well / surface"; TVDSS is compared with the grid depth. */
    public static ResidualReport atWellTops(RegularGrid surface, FaultBarriers barriers, List<WellTop> tops) {
        if (tops == null) {
            throw new IllegalArgumentException("well tops missing");
        }
        List<LabelledPoint> points = new ArrayList<>();
        for (WellTop top : tops) {
            points.add(new LabelledPoint(top.well() + " / " + top.surface(), top.x(), top.y(), top.tvdss()));
        }
        return of(surface, barriers, points);
    }

    /** Number of points where the surface has a value. */
    public int valueCount() {
        return (int) residuals.stream().filter(Residual::hasValue).count();
    }

    /** Root mean square of the residuals that have a value, metres; NaN when none has. */
    public double rms() {
        double sum = 0;
        int n = 0;
        for (Residual r : residuals) {
            if (r.hasValue()) {
                sum += r.residual() * r.residual();
                n++;
            }
        }
        return n == 0 ? Double.NaN : Math.sqrt(sum / n);
    }

    /** Largest absolute residual, metres; NaN when no point has a value. */
    public double maxAbs() {
        return residuals.stream().filter(Residual::hasValue).mapToDouble(r -> Math.abs(r.residual())).max()
                .orElse(Double.NaN);
    }
}
