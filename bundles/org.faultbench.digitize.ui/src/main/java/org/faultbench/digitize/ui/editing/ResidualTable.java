package org.faultbench.digitize.ui.editing;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.faultbench.digitize.georef.ControlPoint;
import org.faultbench.digitize.georef.FitReport;
import org.faultbench.digitize.georef.PointResidual;

/**
 * The rows of the control-point table from the points and their fit: every point in list order, residuals for the
 * enabled ones, the worst point flagged (only when the fit has redundancy, since an exact fit has no worst point).
 */
public final class ResidualTable {

    private ResidualTable() {
    }

    public static List<ResidualRow> rows(List<ControlPoint> points, Optional<FitReport> fit) {
        List<ResidualRow> rows = new ArrayList<>();
        String worst = fit.filter(ResidualTable::redundant).map(report -> report.worstPoint().point().id())
                .orElse(null);
        for (ControlPoint point : points) {
            Optional<PointResidual> residual = fit.flatMap(report -> report.residuals().stream()
                    .filter(r -> r.point().id().equals(point.id())).findFirst());
            rows.add(residual.map(r -> new ResidualRow(point, OptionalDouble.of(r.dx()), OptionalDouble.of(r.dy()),
                    OptionalDouble.of(r.magnitude()), r.leaveOneOut(), point.id().equals(worst)))
                    .orElseGet(() -> new ResidualRow(point, OptionalDouble.empty(), OptionalDouble.empty(),
                            OptionalDouble.empty(), OptionalDouble.empty(), false)));
        }
        return rows;
    }

    private static boolean redundant(FitReport report) {
        return report.residuals().size() > report.transform().kind().minimumPoints();
    }
}
