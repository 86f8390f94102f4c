package org.faultbench.digitize.sketch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/** Each topology problem with a case that has it, located, and a near miss that has not. */
class TopologyCheckerTest {
    private static final double EXACT = 1e-9;
    private static final TopologyChecker CHECKER = new TopologyChecker(1);

    private final MapSheet sheet = new MapSheet();

    private TopologyProblem onlyProblem(ProblemKind kind, double x, double y) {
        List<TopologyProblem> problems = CHECKER.check(sheet);
        assertEquals(1, problems.size(), problems.toString());
        TopologyProblem problem = problems.get(0);
        assertEquals(kind, problem.kind(), problem.message());
        assertEquals(x, problem.x(), EXACT, problem.message());
        assertEquals(y, problem.y(), EXACT, problem.message());
        return problem;
    }

    private void noProblems() {
        assertEquals(List.of(), CHECKER.check(sheet));
    }

    @Test
    void contoursOfDifferentDepthThatCrossAreReported() {
        ContourFeature a = Sheets.contour(sheet, 1500, 0, 0, 100, 100);
        ContourFeature b = Sheets.contour(sheet, 1510, 0, 100, 100, 0);
        // contours of different value never cross (Tearpock & Bischke 2003, Applied Subsurface Geological Mapping,
        // 2nd ed., ch. 4 contouring rules; from memory); hand calculation: y = x meets y = 100 - x at (50, 50)
        TopologyProblem problem = onlyProblem(ProblemKind.CONTOURS_CROSS, 50, 50);
        assertEquals(List.of(a.id(), b.id()), problem.featureIds());
        assertEquals(Severity.ERROR, problem.severity());
        assertTrue(problem.message().contains("1500 m") && problem.message().contains("1510 m")
                && problem.message().contains("(50.0, 50.0)"), problem.message());
    }

    @Test
    void contoursOfDifferentDepthThatTouchAreReported() {
        Sheets.contour(sheet, 1500, 0, 0, 100, 100);
        Sheets.contour(sheet, 1510, 50, 50, 100, 0);
        // hand calculation: the 1510 m contour starts on the 1500 m contour at (50, 50)
        onlyProblem(ProblemKind.CONTOURS_CROSS, 50, 50);
    }

    @Test
    void parallelContoursAndOtherHorizonsAreNotReported() {
        Sheets.contour(sheet, 1500, 0, 0, 100, 100);
        Sheets.contour(sheet, 1510, 0, 10, 90, 100);
        sheet.add(new ContourFeature(sheet.nextId(), "Top B", 1700, Sheets.line(0, 100, 100, 0)));
        noProblems();
    }

    @Test
    void aContourCrossingItselfIsReported() {
        ContourFeature loop = Sheets.contour(sheet, 1500, 0, 0, 100, 100, 100, 0, 0, 100);
        // hand calculation: segments (0,0)-(100,100) and (100,0)-(0,100) meet at (50, 50)
        TopologyProblem problem = onlyProblem(ProblemKind.CONTOUR_CROSSES_ITSELF, 50, 50);
        assertEquals(List.of(loop.id()), problem.featureIds());
    }

    @Test
    void aVertexRepeatedAtABendIsNotACrossing() {
        // a traced contour through a grid node repeats it; JTS 1.20 IsSimpleOp alone calls this line non-simple
        Sheets.contour(sheet, 1500, 0, 0, 100, 10, 100, 10, 100, 10, 200, 0);
        noProblems();
    }

    @Test
    void aClosedContourAroundACrestIsNotACrossing() {
        Sheets.contour(sheet, 1500, 0, 0, 100, 0, 100, 100, 0, 100, 0, 0);
        noProblems();
    }

    @Test
    void anOpenFaultPolygonIsReportedAtItsLastPoint() {
        Sheets.polygon(sheet, 0, 0, 100, 0, 100, 50, 0, 50, 0, 10);
        // hand calculation: last point (0, 10) is 10 m from the first (0, 0), beyond the 1 m tolerance
        TopologyProblem problem = onlyProblem(ProblemKind.FAULT_POLYGON_OPEN, 0, 10);
        assertTrue(problem.message().contains("10 m from its first point"), problem.message());
    }

    @Test
    void aFaultPolygonClosedWithinTheToleranceIsAccepted() {
        Sheets.polygon(sheet, 0, 0, 100, 0, 100, 50, 0, 50, 0, 0.5);
        noProblems();
    }

    @Test
    void aSelfIntersectingFaultPolygonIsReported() {
        Sheets.polygon(sheet, 0, 0, 100, 100, 100, 0, 0, 100, 0, 0);
        // a polygon ring may not cross itself (OGC Simple Features 1.2.1, 06-103r4, 6.1.11; from memory);
        // hand calculation: the bow tie's edges cross at (50, 50)
        TopologyProblem problem = onlyProblem(ProblemKind.FAULT_POLYGON_INVALID, 50, 50);
        assertTrue(problem.message().contains("self-intersection"), problem.message());
    }

    @Test
    void aValidFaultPolygonIsAccepted() {
        Sheets.polygon(sheet, 0, 0, 100, 0, 100, 50, 0, 50, 0, 0);
        noProblems();
    }

    /**
     * Trace digitized northward along x = 0, hanging wall on its right (east). Side of a point: sign of the
     * orientation determinant (O'Rourke 1998, Computational Geometry in C, 2nd ed., sec. 1.3; from memory), e.g. for
     * A (0, 0), B (0, 100), P (10, 50): (B - A) x (P - A) = 0*50 - 100*10 = -1000 &lt; 0, clockwise, right.
     */
    @Test
    void aHangingWallCutOffOnTheFootwallSideIsReported() {
        FaultTraceFeature trace = Sheets.trace(sheet, TraceSide.RIGHT, 0, 0, 0, 100);
        CutOffFeature cutOff = Sheets.cutOff(sheet, Wall.HANGING_WALL, -10, 10, -12, 50, -10, 90);
        TopologyProblem problem = onlyProblem(ProblemKind.CUT_OFF_ON_WRONG_WALL, -10, 10);
        assertEquals(List.of(cutOff.id(), trace.id()), problem.featureIds());
        assertTrue(problem.message().contains("footwall side") && problem.message().contains("3 of 3"),
                problem.message());
    }

    @Test
    void cutOffsOnTheirOwnWallAreAccepted() {
        Sheets.trace(sheet, TraceSide.RIGHT, 0, 0, 0, 100);
        Sheets.cutOff(sheet, Wall.HANGING_WALL, 10, 10, 12, 50, 10, 90);
        Sheets.cutOff(sheet, Wall.FOOTWALL, -10, 10, -12, 50, -10, 90);
        noProblems();
    }

    @Test
    void aFootwallCutOffOnTheHangingWallSideIsReported() {
        Sheets.trace(sheet, TraceSide.LEFT, 0, 0, 0, 100);
        Sheets.cutOff(sheet, Wall.FOOTWALL, -10, 10, -12, 50, 5, 90);
        // hanging wall left (west): two of three points west, the first at (-10, 10)
        onlyProblem(ProblemKind.CUT_OFF_ON_WRONG_WALL, -10, 10);
    }

    @Test
    void aContourRunningThroughAFaultTraceIsAWarning() {
        FaultTraceFeature trace = Sheets.trace(sheet, TraceSide.RIGHT, 0, -100, 0, 100);
        ContourFeature contour = Sheets.contour(sheet, 1500, -50, 20, 50, 20);
        // contours end at the fault (common practice; Tearpock & Bischke 2003, fault-map chapters; from memory);
        // hand calculation: y = 20 meets x = 0 at (0, 20)
        TopologyProblem problem = onlyProblem(ProblemKind.CONTOUR_CROSSES_FAULT, 0, 20);
        assertEquals(Severity.WARNING, problem.severity());
        assertEquals(List.of(contour.id(), trace.id()), problem.featureIds());
    }

    @Test
    void aContourEndingOnTheFaultTraceIsAccepted() {
        Sheets.trace(sheet, TraceSide.RIGHT, 0, -100, 0, 100);
        Sheets.contour(sheet, 1500, -50, 20, 0, 20);
        noProblems();
    }

    @Test
    void aContourEnteringAFaultPolygonIsAWarning() {
        Sheets.polygon(sheet, 0, -100, 20, -100, 20, 100, 0, 100, 0, -100);
        Sheets.contour(sheet, 1500, -50, 30, 10, 30);
        // hand calculation: y = 30 enters the heave zone 0 <= x <= 20 at (0, 30)
        onlyProblem(ProblemKind.CONTOUR_CROSSES_FAULT, 0, 30);
    }

    @Test
    void contoursStoppingAtThePolygonOrOnAnotherHorizonAreAccepted() {
        Sheets.polygon(sheet, 0, -100, 20, -100, 20, 100, 0, 100, 0, -100);
        Sheets.contour(sheet, 1500, -50, 30, 0, 30);
        sheet.add(new ContourFeature(sheet.nextId(), "Top B", 1700, Sheets.line(-50, 40, 10, 40)));
        noProblems();
    }

    @Test
    void badToleranceIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new TopologyChecker(-1));
        assertTrue(e.getMessage().contains("closure tolerance") && e.getMessage().contains("-1.0"));
    }
}
