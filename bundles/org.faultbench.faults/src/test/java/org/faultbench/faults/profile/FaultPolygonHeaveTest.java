package org.faultbench.faults.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.faultbench.faults.Fault;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;

class FaultPolygonHeaveTest {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private static Polygon polygon(double... xy) {
        Coordinate[] ring = new Coordinate[xy.length / 2 + 1];
        for (int i = 0; i < xy.length / 2; i++) {
            ring[i] = new Coordinate(xy[2 * i], xy[2 * i + 1]);
        }
        ring[ring.length - 1] = ring[0];
        return GEOMETRY.createPolygon(ring);
    }

    @Test
    void heaveIsThePolygonWidthAcrossTheTrace() {
        // trace west to east along y = 0, dipping south; the polygon of the gap widens from 20 m at x = 0 to 60 m at
        // x = 1000 south of the trace (hand construction): width at x is 20 + 0.04 x
        Fault fault = new Fault("f1", "Gap", GEOMETRY.createLineString(new Coordinate[] {
            new Coordinate(0, 0), new Coordinate(1000, 0)}), 60, 180, true);
        FaultPolygonHeave heave = new FaultPolygonHeave(fault, polygon(0, 0, 1000, 0, 1000, -60, 0, -20));
        assertEquals(20, heave.heaveAt(0), 1e-9);
        assertEquals(40, heave.heaveAt(500), 1e-9);
        assertEquals(52, heave.heaveAt(800), 1e-9);
    }

    @Test
    void stationsWherethePolygonIsMissingHaveNoHeave() {
        Fault fault = new Fault("f1", "Gap", GEOMETRY.createLineString(new Coordinate[] {
            new Coordinate(0, 0), new Coordinate(1000, 0)}), 60, 180, true);
        FaultPolygonHeave heave = new FaultPolygonHeave(fault, polygon(0, 0, 400, 0, 400, -30, 0, -30));
        assertTrue(Double.isNaN(heave.heaveAt(700)), "polygon covers only x in [0, 400]");
    }
}
