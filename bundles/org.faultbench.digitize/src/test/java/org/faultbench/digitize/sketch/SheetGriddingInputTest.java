package org.faultbench.digitize.sketch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.digitize.gridding.GriddingInput;
import org.faultbench.digitize.gridding.TinGridder;
import org.faultbench.digitize.io.WellTop;
import org.faultbench.digitize.io.XyzPoint;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;

/**
 * A digitized sheet feeding the gridders. Linear interpolation in triangles reproduces a plane exactly (linear
 * precision of barycentric coordinates; e.g. de Berg et al. 2008, Computational Geometry, 3rd ed., ch. 9; from
 * memory), so a plane digitized as straight contours must grid back to itself.
 */
class SheetGriddingInputTest {
    /** 21 x 21 nodes every 50 m over [0, 1000]^2. */
    private static final GridGeometry GRID = new GridGeometry(21, 21, 0, 0, 50, 50);

    /** The invented plane z = 1500 + 0.08 x - 0.05 y; 1450 m to 1580 m over the grid. */
    private static double plane(double x, double y) {
        return 1500 + 0.08 * x - 0.05 * y;
    }

    /**
     * Contours of the plane every 10 m, straight lines clipped to the box [-100, 1100]^2 around the grid: 1440 m to
     * 1590 m cross it (plane at the box corners: 1437, 1497, 1533, 1593 m), so their hull covers every node.
     */
    private static MapSheet planeSheet() {
        MapSheet sheet = new MapSheet();
        Geometry box = SheetGeometry.FACTORY.toGeometry(new Envelope(-100, 1100, -100, 1100));
        ContourValueStepper stepper = new ContourValueStepper(10);
        for (double z = 1400; z <= 1640; z = stepper.next(z, StepDirection.DEEPER)) {
            // on the contour: y = (0.08 x + 1500 - z) / 0.05
            LineString line = Sheets.line(-2000, (0.08 * -2000 + 1500 - z) / 0.05, 3000,
                    (0.08 * 3000 + 1500 - z) / 0.05);
            Geometry clipped = line.intersection(box);
            if (!clipped.isEmpty()) {
                sheet.add(new ContourFeature(sheet.nextId(), Sheets.HORIZON, z, (LineString) clipped));
            }
        }
        return sheet;
    }

    @Test
    void aPlaneDigitizedAsContoursGridsBackToThePlane() {
        MapSheet sheet = planeSheet();
        sheet.add(new WellFeature(sheet.nextId(), "W-1", 400, 600,
                List.of(new WellTop("W-1", Sheets.HORIZON, 400, 600, plane(400, 600), Double.NaN))));
        GriddingInput input = SheetGriddingInput.forHorizon(sheet, Sheets.HORIZON, GRID);
        assertEquals(16, input.contours().size(), "contours 1440 to 1590 m every 10 m");
        assertEquals(List.of(new XyzPoint(400, 600, 1502)), input.points(), "hand calculation: 1500 + 32 - 30");
        RegularGrid surface = new TinGridder().grid(input).surface();
        for (int j = 0; j < GRID.ny(); j++) {
            for (int i = 0; i < GRID.nx(); i++) {
                // TIN linear precision (class comment): exact for a plane up to round-off
                assertEquals(plane(GRID.x(i), GRID.y(j)), surface.value(i, j), 1e-6, "node " + i + ", " + j);
            }
        }
    }

    @Test
    void barriersAndDataAreTakenForTheHorizon() {
        MapSheet sheet = planeSheet();
        Sheets.trace(sheet, TraceSide.RIGHT, 500, -100, 500, 1100);
        Sheets.polygon(sheet, 500, -100, 520, -100, 520, 1100, 500, 1100);
        sheet.add(new FaultPolygonFeature(sheet.nextId(), "F1", "Top B", Sheets.line(0, 0, 10, 0, 10, 10)));
        sheet.add(new ContourFeature(sheet.nextId(), "Top B", 1700, Sheets.line(0, 0, 100, 0)));
        GriddingInput input = SheetGriddingInput.forHorizon(sheet, Sheets.HORIZON, GRID);
        assertEquals(16, input.contours().size(), "Top B contour left out");
        assertEquals(1, input.barriers().traces().size());
        assertEquals(1, input.barriers().polygons().size(), "Top B polygon left out");
        assertTrue(input.barriers().isInFaultPolygon(510, 500));
        assertEquals(GRID, input.target());
    }

    @Test
    void aHorizonWithoutDataIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SheetGriddingInput.forHorizon(planeSheet(), "Top C", GRID));
        assertTrue(e.getMessage().contains("'Top C' has no contours and no well tops"), e.getMessage());
    }
}
