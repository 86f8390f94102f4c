package org.faultbench.digitize.gridding;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/** The barrier rules of {@link FaultBarriers} (hand-made geometry; rules as documented there). */
class FaultBarriersTest {
    private final FaultBarriers trace = FaultBarriers.of(List.of(SyntheticHorizons.line(100, 0, 100, 200)), List.of());
    private final FaultBarriers polygon = FaultBarriers.of(List.of(),
            List.of(SyntheticHorizons.rectangle(100, 0, 120, 200)));

    @Test
    void pathAcrossATraceIsBlocked() {
        assertTrue(trace.blocks(90, 100, 110, 100));
        assertFalse(trace.blocks(90, 100, 95, 150));
        assertFalse(trace.blocks(90, 250, 110, 250), "passes beyond the trace tip");
    }

    @Test
    void touchingATraceCountsAsBlocked() {
        assertTrue(trace.blocks(90, 100, 100, 100), "a point on the trace belongs to neither side");
    }

    @Test
    void pathThroughPolygonInteriorIsBlockedButOutlineIsNot() {
        assertTrue(polygon.blocks(90, 100, 130, 100));
        assertTrue(polygon.blocks(90, 100, 110, 100), "ends inside");
        assertFalse(polygon.blocks(90, 100, 100, 100), "ends on the outline: data digitised on it serve that side");
        assertTrue(polygon.isInFaultPolygon(110, 100));
        assertTrue(polygon.isInFaultPolygon(100, 100), "outline counts as inside: no surface there");
        assertFalse(polygon.isInFaultPolygon(99, 100));
    }

    @Test
    void noBarriersBlockNothing() {
        assertTrue(FaultBarriers.none().isEmpty());
        assertFalse(FaultBarriers.none().blocks(0, 0, 1000, 1000));
        assertEquals(2, trace.withTrace(SyntheticHorizons.line(0, 0, 10, 10)).traces().size());
    }

    @Test
    void missingOrEmptyGeometryIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> FaultBarriers.of(null, List.of()));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> FaultBarriers.of(List.of(SyntheticHorizons.FACTORY.createLineString()), List.of()));
        assertEquals("a fault trace is missing or empty", e.getMessage());
    }
}
