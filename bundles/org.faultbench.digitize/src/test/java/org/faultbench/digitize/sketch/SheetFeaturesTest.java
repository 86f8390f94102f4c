package org.faultbench.digitize.sketch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.faultbench.digitize.gridding.FootwallSide;
import org.faultbench.digitize.io.WellTop;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Polygon;

/** Validation and derived values of the feature records. */
class SheetFeaturesTest {
    private static final FeatureId ID = new FeatureId(1);

    @Test
    void anOpenOutlineIsClosedOnItsFirstPoint() {
        FaultPolygonFeature polygon = new FaultPolygonFeature(ID, "F1", "Top A", Sheets.line(0, 0, 30, 0, 30, 40));
        Polygon zone = polygon.heaveZone();
        // hand calculation: gap from (30, 40) to (0, 0) is 50 m (3-4-5 triangle); area 30 * 40 / 2 = 600 m2
        assertEquals(50, polygon.closingGap(), 1e-12);
        assertEquals(600, zone.getArea(), 1e-9);
        assertTrue(zone.isValid());
    }

    @Test
    void tooFewCornersAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new FaultPolygonFeature(ID, "F1", "Top A", Sheets.line(0, 0, 30, 0, 0, 0)));
        assertTrue(e.getMessage().contains("at least 3 corners, was 2"), e.getMessage());
    }

    @Test
    void theFootwallIsOppositeTheHangingWall() {
        FaultTraceFeature trace = new FaultTraceFeature(ID, "F1", Sheets.line(0, 0, 0, 1), TraceSide.RIGHT);
        assertEquals(FootwallSide.LEFT, trace.footwallSide());
        assertEquals(TraceSide.LEFT, TraceSide.RIGHT.opposite());
    }

    @Test
    void fieldsAreCheckedWithTheirNames() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new ContourFeature(ID, "Top A", Double.NaN, Sheets.line(0, 0, 1, 1)));
        assertTrue(e.getMessage().contains("contour depth") && e.getMessage().contains("NaN"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> new ContourFeature(ID, " ", 1500, Sheets.line(0, 0, 1, 1)));
        assertTrue(e.getMessage().contains("horizon name is empty"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> new CutOffFeature(ID, "F1", "Top A", Wall.FOOTWALL, SheetGeometry.FACTORY.createLineString()));
        assertTrue(e.getMessage().contains("footwall cut-off of F1 on Top A needs a line of at least 2 points, was 0 point(s)"),
                e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new FeatureId(0));
        assertTrue(e.getMessage().contains("feature id") && e.getMessage().contains("0"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> new MarkerFeature(ID, MarkerKind.SPILL, Double.NaN, 0, "Top A", ""));
        assertTrue(e.getMessage().contains("spill point marker"), e.getMessage());
    }

    @Test
    void wellTopsMustBelongToTheWell() {
        WellTop top = new WellTop("W-2", "Top A", 10, 20, 1500, Double.NaN);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new WellFeature(ID, "W-1", 10, 20, List.of(top)));
        assertTrue(e.getMessage().contains("belongs to well 'W-2'"), e.getMessage());
        WellFeature well = new WellFeature(ID, "W-2", 10, 20, List.of(top,
                new WellTop("W-2", "Top B", 11, 21, 1600, Double.NaN)));
        assertEquals(List.of(top), well.topsOn("Top A"));
    }

    @Test
    void featureGeometryIsCopied() {
        var line = Sheets.line(0, 0, 1, 1);
        ContourFeature contour = new ContourFeature(ID, "Top A", 1500, line);
        line.getCoordinateN(0).x = 99;
        line.geometryChanged();
        assertEquals(0, contour.line().getCoordinateN(0).x, 0, "editing the caller's line leaves the feature alone");
    }
}
