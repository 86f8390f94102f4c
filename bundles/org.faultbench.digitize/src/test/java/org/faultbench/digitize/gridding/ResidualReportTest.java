package org.faultbench.digitize.gridding;

import static org.faultbench.digitize.gridding.SyntheticHorizons.GRID;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.faultbench.core.grid.RegularGrid;
import org.faultbench.digitize.io.XyzPoint;
import org.junit.jupiter.api.Test;

/** Residual = grid minus known depth; RMS = sqrt(mean of squares) (common practice); hand calculations. */
class ResidualReportTest {
    private static final double ROUND_OFF = 1e-9;

    @Test
    void residualsRmsAndMaximumAreComputed() {
        RegularGrid flat = RegularGrid.sample(GRID, (x, y) -> 1000);
        List<LabelledPoint> points = List.of(new LabelledPoint("a", 100, 100, 997),
                new LabelledPoint("b", 200, 200, 1004), new LabelledPoint("off grid", 5000, 5000, 1000));
        ResidualReport report = ResidualReport.of(flat, FaultBarriers.none(), points);
        assertEquals(3, report.residuals().get(0).residual(), ROUND_OFF);
        assertEquals(-4, report.residuals().get(1).residual(), ROUND_OFF);
        assertFalse(report.residuals().get(2).hasValue());
        assertEquals(2, report.valueCount());
        // sqrt((3^2 + 4^2) / 2) = sqrt(12.5) = 3.5355 m
        assertEquals(Math.sqrt(12.5), report.rms(), ROUND_OFF);
        assertEquals(4, report.maxAbs(), ROUND_OFF);
    }

    @Test
    void emptyReportHasNoRms() {
        ResidualReport none = new ResidualReport(List.of());
        assertTrue(Double.isNaN(none.rms()));
        assertTrue(Double.isNaN(none.maxAbs()));
    }

    @Test
    void digitizedPointsAreLabelled() {
        GriddingInput input = new GriddingInput(List.of(new XyzPoint(1, 2, 3)),
                List.of(new ContourLine(SyntheticHorizons.line(0, 0, 10, 0), 1500)), FaultBarriers.none(), GRID);
        List<LabelledPoint> labelled = input.digitizedPoints();
        assertEquals("point 1", labelled.get(0).label());
        assertEquals("contour 1 (1500.0 m), vertex 2", labelled.get(2).label());
        assertEquals(1500, labelled.get(2).z(), ROUND_OFF);
    }

    @Test
    void incompleteInputIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new GriddingInput(List.of(), List.of(), FaultBarriers.none(), GRID));
        assertEquals("nothing to grid: no control points and no contours", e.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> new ContourLine(SyntheticHorizons.line(0, 0, 1, 1), Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> new LabelledPoint(" ", 0, 0, 0));
    }
}
