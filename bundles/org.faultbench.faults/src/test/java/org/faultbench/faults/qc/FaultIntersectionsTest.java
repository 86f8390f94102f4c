package org.faultbench.faults.qc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.faultbench.faults.Fault;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

class FaultIntersectionsTest {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private static Fault northSouth(String id, double x) {
        return new Fault(id, "Fault " + id, GEOMETRY.createLineString(new Coordinate[] {
            new Coordinate(x, -500), new Coordinate(x, 500)}), 60, 90, true);
    }

    @Test
    void crossingTracesAreFoundInOrderAlongStrike() {
        Fault fault = TestFaults.eastWest("f1", 0, 0, 2000);
        List<FaultIntersection> meetings = FaultIntersections.along(fault,
                List.of(northSouth("f3", 1500), northSouth("f2", 400), northSouth("f4", 2500), fault));
        // hand construction: f2 crosses at x = 400, f3 at x = 1500; f4 lies beyond the trace end; f1 is itself
        assertEquals(2, meetings.size(), meetings.toString());
        assertEquals("f2", meetings.get(0).otherFaultId());
        assertEquals(400, meetings.get(0).u(), 1e-9);
        assertEquals("f3", meetings.get(1).otherFaultId());
        assertEquals(1500, meetings.get(1).u(), 1e-9);
    }

    @Test
    void nearestFaultWithinADistanceIsFound() {
        List<Fault> others = List.of(northSouth("f2", 2080), northSouth("f3", 2030));
        assertEquals("f3", FaultIntersections.nearestWithin(new Coordinate(2000, 0), others, 100).orElseThrow().id());
        assertTrue(FaultIntersections.nearestWithin(new Coordinate(2000, 0), others, 20).isEmpty());
    }
}
