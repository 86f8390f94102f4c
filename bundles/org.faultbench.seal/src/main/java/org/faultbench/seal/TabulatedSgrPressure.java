package org.faultbench.seal;

import java.util.List;

import org.apache.commons.math3.analysis.interpolation.LinearInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;

/**
 * A basin's own SGR to threshold-pressure calibration, entered as a table: linear interpolation between rows, and
 * outside the table the first or last pressure (clamped, never extrapolated). Burial depth is not used: a table holds
 * one calibration. Rows must rise in SGR and must not fall in pressure, as more clay never weakens the seal.
 */
public final class TabulatedSgrPressure implements SgrPressureModel {

    private final List<SgrPressurePoint> points;
    private final PolynomialSplineFunction interpolation;

    public TabulatedSgrPressure(List<SgrPressurePoint> points) {
        if (points == null || points.size() < 2) {
            throw new IllegalArgumentException("SGR table needs at least 2 rows, had "
                    + (points == null ? 0 : points.size()));
        }
        this.points = List.copyOf(points);
        for (int i = 1; i < this.points.size(); i++) {
            SgrPressurePoint previous = this.points.get(i - 1);
            SgrPressurePoint row = this.points.get(i);
            if (!(row.sgrPercent() > previous.sgrPercent())) {
                throw new IllegalArgumentException("SGR table row " + (i + 1) + ": SGR " + row.sgrPercent()
                        + " % must be above the previous row's " + previous.sgrPercent() + " %");
            }
            if (row.pressure() < previous.pressure()) {
                throw new IllegalArgumentException("SGR table row " + (i + 1) + ": pressure " + row.pressure()
                        + " Pa must not be below the previous row's " + previous.pressure() + " Pa");
            }
        }
        double[] sgr = this.points.stream().mapToDouble(SgrPressurePoint::sgrPercent).toArray();
        double[] pressure = this.points.stream().mapToDouble(SgrPressurePoint::pressure).toArray();
        this.interpolation = new LinearInterpolator().interpolate(sgr, pressure);
    }

    public List<SgrPressurePoint> points() {
        return points;
    }

    @Override
    public double thresholdPressure(double sgrPercent, double burialDepth) {
        SgrChecks.requirePercent(sgrPercent);
        double first = points.get(0).sgrPercent();
        double last = points.get(points.size() - 1).sgrPercent();
        return interpolation.value(Math.min(last, Math.max(first, sgrPercent)));
    }
}
