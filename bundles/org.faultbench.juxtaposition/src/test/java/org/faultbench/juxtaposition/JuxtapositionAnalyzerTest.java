package org.faultbench.juxtaposition;

import static org.faultbench.juxtaposition.TestFixtures.OVERBURDEN;
import static org.faultbench.juxtaposition.TestFixtures.SAND_A;
import static org.faultbench.juxtaposition.TestFixtures.SAND_B;
import static org.faultbench.juxtaposition.TestFixtures.SHALE;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Fault;
import org.faultbench.faults.FaultPlaneColumns;
import org.faultbench.faults.FaultPlaneSampler;
import org.faultbench.faults.Wall;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

class JuxtapositionAnalyzerTest {

    private static final double EPS = 1e-6;

    private static JuxtapositionResult analyze(FaultPlaneColumns columns) {
        return new JuxtapositionAnalyzer().analyze(columns, TestFixtures.sameColumnBothWalls());
    }

    @Test
    void constantThrowWindowAreaIsWindowLengthTimesFaultLength() {
        JuxtapositionResult result = analyze(TestFixtures.constantThrow(60));
        // 30 m window (common-practice formula, Allan 1989 diagram) x 1000 m of fault
        assertEquals(30 * 1000, result.area(SAND_B, SAND_A), EPS);
        assertEquals(50 * 1000, result.area(SAND_A, OVERBURDEN), EPS, "sand A sealed against overburden");
        assertEquals(30 * 1000, result.area(JuxtapositionClass.RESERVOIR_RESERVOIR), EPS);
        List<JuxtapositionWindow> windows = result.reservoirWindows();
        assertEquals(1, windows.size());
        JuxtapositionWindow window = windows.get(0);
        assertEquals(SAND_B, window.footwallUnit());
        assertEquals(SAND_A, window.hangingWallUnit());
        assertFalse(window.selfJuxtaposed(), "sand B against sand A is cross-juxtaposed");
        assertEquals(0, window.firstColumn());
        assertEquals(9, window.lastColumn());
        // shallowest top: 1000 m + 80 m (top of FW sand B); every column ties, the smallest u wins
        assertEquals(new FaultPlanePoint(50, 1080, 0), window.top());
        assertEquals(windows, result.footwallUnitAgainstHangingWallReservoirs(SAND_B));
        assertEquals(windows, result.hangingWallUnitAgainstFootwallReservoirs(SAND_A));
        assertTrue(result.footwallUnitAgainstHangingWallReservoirs(SAND_A).isEmpty(), "sand A has no leak window");
        assertEquals(0, result.columnsWithoutData());
    }

    @Test
    void zeroThrowSelfJuxtaposesEveryUnitAlongTheWholeFault() {
        JuxtapositionResult result = analyze(TestFixtures.constantThrow(0));
        // unit thickness x 1000 m (common practice)
        assertEquals(50 * 1000, result.area(SAND_A, SAND_A), EPS);
        assertEquals(30 * 1000, result.area(SHALE, SHALE), EPS);
        assertEquals(50 * 1000, result.area(SAND_B, SAND_B), EPS);
        assertEquals(2, result.reservoirWindows().size());
        assertTrue(result.reservoirWindows().stream().allMatch(JuxtapositionWindow::selfJuxtaposed));
        assertEquals(1000, result.shallowestReservoirWindow().orElseThrow().top().z(), EPS, "top sand A");
    }

    @Test
    void throwLargerThanTheColumnOpensNoReservoirWindow() {
        JuxtapositionResult result = analyze(TestFixtures.constantThrow(150));
        assertTrue(result.reservoirWindows().isEmpty());
        assertTrue(result.shallowestReservoirWindow().isEmpty());
        assertEquals(0, result.area(JuxtapositionClass.RESERVOIR_RESERVOIR), EPS);
    }

    @Test
    void linearTaperWindowLengthsMatchAHandCalculationPerColumn() {
        FaultPlaneColumns taper = TestFixtures.linearTaper();
        HungColumns walls = TestFixtures.sameColumnBothWalls();
        // FW sand B [80, 130] vs HW sand A [0, 50] under T = 95, 85, ..., 5:
        // max(0, min(130, 50 + T) - max(80, T)) = 35, 45, 45, 35, 25, 15, 5, 0, 0, 0 (common practice; by hand)
        double[] sandBOnSandA = {35, 45, 45, 35, 25, 15, 5, 0, 0, 0};
        // sand A against itself: 50 - T where T < 50 = 0, 0, 0, 0, 0, 5, 15, 25, 35, 45
        double[] sandAOnSandA = {0, 0, 0, 0, 0, 5, 15, 25, 35, 45};
        ColumnIntervals out = new ColumnIntervals();
        for (int k = 0; k < taper.count(); k++) {
            walls.juxtapose(taper.footwallDepth(k), taper.hangingWallDepth(k), out);
            assertEquals(sandBOnSandA[k], lengthOf(out, SAND_B, SAND_A), EPS, "column " + k);
            assertEquals(sandAOnSandA[k], lengthOf(out, SAND_A, SAND_A), EPS, "column " + k);
        }
        JuxtapositionResult result = new JuxtapositionAnalyzer().analyze(taper, walls);
        // (35 + 45 + 45 + 35 + 25 + 15 + 5) m x 100 m columns
        assertEquals(205 * 100, result.area(SAND_B, SAND_A), EPS);
        assertEquals(125 * 100, result.area(SAND_A, SAND_A), EPS);
        JuxtapositionWindow window = result.footwallUnitAgainstHangingWallReservoirs(SAND_B).stream()
                .filter(w -> w.hangingWallUnit() == SAND_A).findFirst().orElseThrow();
        assertEquals(0, window.firstColumn());
        assertEquals(6, window.lastColumn());
        // window top = 1000 + max(80, T): 1095, 1085, then 1080 from column 2 (u = 250) on
        assertEquals(new FaultPlanePoint(250, 1080, 2), window.top());
        // sand A self-juxtaposition reaches up to top sand A at 1000 + T: shallowest where T = 5, u = 950
        assertEquals(new FaultPlanePoint(950, 1005, 9), result.shallowestReservoirWindow().orElseThrow().top());
    }

    private static double lengthOf(ColumnIntervals out, int footwall, int hangingWall) {
        for (int n = 0; n < out.count(); n++) {
            if (out.footwallUnit(n) == footwall && out.hangingWallUnit(n) == hangingWall) {
                return out.length(n);
            }
        }
        return 0;
    }

    @Test
    void windowsSplitWhereThePairStopsMeetingOrDataAreMissing() {
        // throw 60 / 60 / 150 / 60: the sand B - sand A window closes in column 2 and reopens in column 3
        JuxtapositionResult split = analyze(TestFixtures.columns(1000, 60, 60, 150, 60));
        List<JuxtapositionWindow> windows = split.reservoirWindows();
        assertEquals(2, windows.size());
        assertEquals(List.of(0, 1), List.of(windows.get(0).firstColumn(), windows.get(0).lastColumn()));
        assertEquals(List.of(3, 3), List.of(windows.get(1).firstColumn(), windows.get(1).lastColumn()));
        assertEquals(30 * 100, windows.get(1).area(), EPS);

        JuxtapositionResult gap = analyze(TestFixtures.columns(1000, 60, Double.NaN, 60));
        assertEquals(1, gap.columnsWithoutData());
        assertEquals(2, gap.reservoirWindows().size());
        assertEquals(30 * 200, gap.area(SAND_B, SAND_A), EPS, "only the two columns with data count");
    }

    @Test
    void sampledFaultPlaneFeedsTheAnalysis() {
        // two-segment trace 300 m + 400 m; digitized cut-offs 1000 m (FW) and 1060 m (HW) along its whole length
        GeometryFactory geometry = new GeometryFactory();
        Fault fault = new Fault("f1", "Elbow", geometry.createLineString(new Coordinate[] {
            new Coordinate(0, 0), new Coordinate(300, 0), new Coordinate(300, 400)}), 60, 135, true);
        CutOffLine footwall = CutOffLine.fromMapPoints(fault, "top sand A", Wall.FOOTWALL,
                List.of(new Coordinate(0, 10, 1000), new Coordinate(290, 400, 1000)));
        CutOffLine hangingWall = CutOffLine.fromMapPoints(fault, "top sand A", Wall.HANGING_WALL,
                List.of(new Coordinate(0, -10, 1060), new Coordinate(310, 400, 1060)));
        FaultPlaneColumns columns = new FaultPlaneSampler(14).sample(fault, footwall, hangingWall);
        JuxtapositionResult result = analyze(columns);
        // 30 m window x 700 m trace (common practice; hand calculation)
        assertEquals(30 * 700, result.area(SAND_B, SAND_A), EPS);
        assertEquals("f1", result.faultId());
    }

    @Test
    void unitIndexesOutsideTheColumnAreRejected() {
        JuxtapositionResult result = analyze(TestFixtures.constantThrow(60));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> result.area(4, 0));
        assertEquals("footwall unit index must be in [-1, 3], was 4", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> result.hangingWallUnitAgainstFootwallReservoirs(-2));
    }
}
