package org.faultbench.digitize.sketch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;

/**
 * Snapping to vertices, then segments. Nearest point on a segment: the foot of the perpendicular, parameter
 * t = (P - A)&middot;(B - A) / |B - A|&sup2; clamped to [0, 1] (common practice; hand calculations below).
 */
class SnapperTest {
    private static final double EXACT = 1e-9;

    private final MapSheet sheet = new MapSheet();
    private final ContourFeature level = Sheets.contour(sheet, 1500, 0, 0, 100, 0);
    private final ContourFeature diagonal = Sheets.contour(sheet, 1510, 200, 0, 300, 100);

    private SnapResult snap(Snapper snapper, double x, double y) {
        return snapper.snap(sheet.features(), x, y);
    }

    @Test
    void snapsToANearbyVertex() {
        SnapResult result = snap(new Snapper(5, 5), 2, 1);
        // hand calculation: vertex (0, 0) is sqrt(5) = 2.24 m away, within 5 m
        assertEquals(SnapKind.VERTEX, result.kind());
        assertEquals(0, result.x(), EXACT);
        assertEquals(0, result.y(), EXACT);
        assertEquals(Optional.of(level.id()), result.target());
    }

    @Test
    void vertexWinsOverACloserSegment() {
        SnapResult result = snap(new Snapper(5, 5), 4, 0.5);
        // segment point (4, 0) is 0.5 m away, vertex (0, 0) 4.03 m: vertex first (class comment)
        assertEquals(SnapKind.VERTEX, result.kind());
        assertEquals(0, result.x(), EXACT);
    }

    @Test
    void snapsToTheFootOfThePerpendicularOnASegment() {
        SnapResult result = snap(new Snapper(5, 20), 260, 20);
        // hand calculation: A (200, 0), B (300, 100), P (260, 20): t = (60*100 + 20*100) / 20000 = 0.4,
        // foot (240, 40), distance sqrt(20^2 + 20^2) = 28.3 m > 20 m: too far
        assertEquals(SnapKind.NONE, result.kind());
        result = snap(new Snapper(5, 30), 260, 20);
        assertEquals(SnapKind.SEGMENT, result.kind());
        assertEquals(240, result.x(), EXACT);
        assertEquals(40, result.y(), EXACT);
        assertEquals(Optional.of(diagonal.id()), result.target());
    }

    @Test
    void keepsThePointWhenNothingIsNear() {
        SnapResult result = snap(new Snapper(5, 5), 50, 8);
        // hand calculation: nearest segment point (50, 0) is 8 m away, nearest vertex 50.6 m
        assertEquals(SnapKind.NONE, result.kind());
        assertEquals(50, result.x(), EXACT);
        assertEquals(8, result.y(), EXACT);
        assertTrue(result.target().isEmpty());
    }

    @Test
    void snapsToMarkersAndHonoursZeroTolerances() {
        MarkerFeature crest = new MarkerFeature(sheet.nextId(), MarkerKind.CREST, 500, 500, Sheets.HORIZON, "");
        SnapResult result = new Snapper(3, 3).snap(List.of(crest), 502, 501);
        assertEquals(SnapKind.VERTEX, result.kind());
        assertEquals(500, result.x(), EXACT);
        assertEquals(SnapKind.SEGMENT, snap(new Snapper(0, 5), 2, 1).kind(), "vertex snapping off");
        assertEquals(SnapKind.NONE, snap(new Snapper(0, 0), 0, 0).kind(), "all snapping off");
    }

    @Test
    void badTolerancesAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new Snapper(-1, 5));
        assertTrue(e.getMessage().contains("vertex snapping tolerance") && e.getMessage().contains("-1.0"));
        e = assertThrows(IllegalArgumentException.class, () -> new Snapper(1, Double.NaN));
        assertTrue(e.getMessage().contains("segment snapping tolerance"), e.getMessage());
    }
}
