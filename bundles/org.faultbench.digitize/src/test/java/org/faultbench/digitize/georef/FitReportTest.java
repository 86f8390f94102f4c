package org.faultbench.digitize.georef;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;

class FitReportTest {

    private static final GeoTransform ANY = new SimilarityTransform(1, 0, 0, 0);

    private static PointResidual residual(String id, double dx, double dy) {
        return new PointResidual(ControlPoint.of(id, 0, 0, 0, 0), dx, dy, dx, -dy, OptionalDouble.empty());
    }

    /** One point 5 map units off (3-4-5), nine exact. */
    private static FitReport onePointOff() {
        List<PointResidual> residuals = new ArrayList<>();
        residuals.add(residual("Q1", 3, 4));
        for (int i = 2; i <= 10; i++) {
            residuals.add(residual("Q" + i, 0, 0));
        }
        return new FitReport(ANY, residuals);
    }

    @Test
    void rmsIsRootOfMeanSquaredResidualLength() {
        // RMS = √(Σ(dx² + dy²) / N) = √(25 / 10): common practice (GIS georeferencing documentation); hand calculation
        assertEquals(Math.sqrt(2.5), onePointOff().rms(), 1e-12);
        assertEquals(Math.sqrt(2.5), onePointOff().rmsPixels(), 1e-12);
    }

    @Test
    void worstPointIsTheLargestResidualWithoutLeaveOneOut() {
        assertEquals("Q1", onePointOff().worstPoint().point().id());
    }

    @Test
    void pointMoreThanThreeTimesTheRmsIsFlaggedWhenAboveTheTolerance() {
        // 5 > 3·√2.5 = 4.74 (3 × RMS rule: common practice)
        List<String> warnings = onePointOff().warnings(1.0);
        assertTrue(warnings.stream().anyMatch(w -> w.startsWith("RMS error 1.581")), warnings.toString());
        assertTrue(warnings.stream().anyMatch(w -> w.startsWith("control point 'Q1'")), warnings.toString());
        // a 6-unit tolerance: the RMS is acceptable and a 5-unit residual is not worth a warning
        assertEquals(List.of(), onePointOff().warnings(6.0));
    }

    @Test
    void exactFitWithTheMinimumNumberOfPointsIsPointedOut() {
        FitReport exact = new FitReport(ANY, List.of(residual("A", 0, 0), residual("B", 0, 0)));
        List<String> warnings = exact.warnings(1.0);
        assertEquals(1, warnings.size(), warnings.toString());
        assertTrue(warnings.get(0).startsWith("2 control points is the minimum for a similarity (Helmert) transform"),
                warnings.get(0));
    }

    @Test
    void leaveOneOutResidualDecidesTheWorstPointWhenPresent() {
        ControlPoint p = ControlPoint.of("L", 0, 0, 0, 0);
        FitReport report = new FitReport(ANY, List.of(
                new PointResidual(p, 2, 0, 0, 0, OptionalDouble.of(2.5)),
                new PointResidual(ControlPoint.of("M", 1, 1, 1, 1), 1, 0, 0, 0, OptionalDouble.of(9)),
                new PointResidual(ControlPoint.of("N", 2, 2, 2, 2), 1, 0, 0, 0, OptionalDouble.of(1.5))));
        assertTrue(report.hasLeaveOneOut());
        assertEquals("M", report.worstPoint().point().id());
    }

    @Test
    void badToleranceIsRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> onePointOff().warnings(-1));
        assertTrue(e.getMessage().contains("RMS tolerance") && e.getMessage().contains("-1"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> onePointOff().warnings(Double.NaN));
    }

    @Test
    void emptyReportIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> new FitReport(ANY, List.of()));
    }
}
