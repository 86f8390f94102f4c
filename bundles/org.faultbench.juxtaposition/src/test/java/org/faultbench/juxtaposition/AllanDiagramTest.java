package org.faultbench.juxtaposition;

import static org.faultbench.juxtaposition.TestFixtures.SAND_A;
import static org.faultbench.juxtaposition.TestFixtures.SAND_B;
import static org.faultbench.juxtaposition.TestFixtures.SHALE;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.faultbench.faults.FaultPlaneColumns;
import org.faultbench.faults.Wall;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;

class AllanDiagramTest {

    private static final double EPS = 1e-6;

    @Test
    void unitPolygonsSpanTheFaultBetweenTheirTopAndBaseCutOffs() {
        AllanDiagram diagram = AllanDiagram.of(TestFixtures.constantThrow(60), TestFixtures.sameColumnBothWalls());
        Geometry footwallSandA = diagram.unitOutline(Wall.FOOTWALL, SAND_A);
        // 50 m x 1000 m; FW sand A between 1000 and 1050 m, HW sand A 60 m deeper (hand calculation)
        assertEquals(50 * 1000, footwallSandA.getArea(), EPS);
        assertEquals(new Envelope(0, 1000, 1000, 1050), footwallSandA.getEnvelopeInternal());
        assertEquals(new Envelope(0, 1000, 1060, 1110),
                diagram.unitOutline(Wall.HANGING_WALL, SAND_A).getEnvelopeInternal());
        assertTrue(footwallSandA.isValid());
    }

    @Test
    void windowPolygonAgreesWithTheIntervalArithmeticForConstantThrow() {
        FaultPlaneColumns columns = TestFixtures.constantThrow(60);
        HungColumns walls = TestFixtures.sameColumnBothWalls();
        List<AllanWindow> windows = AllanDiagram.of(columns, walls).reservoirWindows();
        JuxtapositionResult result = new JuxtapositionAnalyzer().analyze(columns, walls);
        assertEquals(1, windows.size());
        AllanWindow window = windows.get(0);
        assertEquals(List.of(SAND_B, SAND_A), List.of(window.footwallUnit(), window.hangingWallUnit()));
        // 30 m x 1000 m (common-practice window formula), equal to the interval-arithmetic area
        assertEquals(30 * 1000, window.outline().getArea(), EPS);
        assertEquals(result.area(SAND_B, SAND_A), window.outline().getArea(), EPS);
        assertEquals(new Envelope(0, 1000, 1080, 1110), window.outline().getEnvelopeInternal());
    }

    @Test
    void taperedWindowsHaveTheShallowestTopOfTheIntervalResult() {
        FaultPlaneColumns taper = TestFixtures.linearTaper();
        HungColumns walls = TestFixtures.sameColumnBothWalls();
        AllanDiagram diagram = AllanDiagram.of(taper, walls);
        JuxtapositionResult result = new JuxtapositionAnalyzer().analyze(taper, walls);
        AllanWindow sandBOnSandA = diagram.reservoirWindows().stream()
                .filter(w -> w.footwallUnit() == SAND_B && w.hangingWallUnit() == SAND_A).findFirst().orElseThrow();
        assertEquals(1080, sandBOnSandA.outline().getEnvelopeInternal().getMinY(), EPS, "top of FW sand B");
        // sand A/A, sand B/B and sand B/A windows (hand calculation of the taper, see JuxtapositionAnalyzerTest)
        assertEquals(3, diagram.reservoirWindows().size());
        assertEquals(result.shallowestReservoirWindow().orElseThrow().top().z(),
                diagram.reservoirWindows().stream().mapToDouble(w -> w.outline().getEnvelopeInternal().getMinY())
                        .min().orElseThrow(), EPS);
    }

    @Test
    void columnsWithoutDataSplitPolygonsAndEmptyUnitsHaveNoOutline() {
        FaultPlaneColumns gap = TestFixtures.columns(1000, 60, Double.NaN, 60);
        HungColumns walls = new HungColumns(TestFixtures.column(50, 0, 50), TestFixtures.column(50, 0, 50), 0);
        AllanDiagram diagram = AllanDiagram.of(gap, walls);
        Geometry sandB = diagram.unitOutline(Wall.HANGING_WALL, SAND_B);
        assertEquals(2, sandB.getNumGeometries(), "one part either side of the gap column");
        assertEquals(2 * 50 * 100, sandB.getArea(), EPS);
        assertTrue(diagram.unitOutline(Wall.FOOTWALL, SHALE).isEmpty(), "zero-thickness shale");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> diagram.unitOutline(Wall.FOOTWALL, 3));
        assertEquals("footwall unit index must be in [0, 2], was 3", e.getMessage());
    }
}
