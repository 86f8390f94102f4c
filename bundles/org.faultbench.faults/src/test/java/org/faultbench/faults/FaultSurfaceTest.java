package org.faultbench.faults;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

class FaultSurfaceTest {
    private static final GeometryFactory GF = new GeometryFactory();

    private static Fault northSouth(double dip) {
        return new Fault("F", "test", GF.createLineString(new Coordinate[] { new Coordinate(0, 0),
                new Coordinate(0, 1000) }), dip, 90, true);
    }

    @Test
    void deeperPointsMoveDownDipByDepthOverTanDip() {
        // 60 degree fault dipping east, trace at 1000 m: 200 m deeper lies 200 / tan 60 = 115.47 m east
        // (dip-slip geometry, common practice)
        FaultSurface surface = new FaultSurface(northSouth(60), 1000);
        Coordinate p = surface.point(500, 1200);
        assertEquals(200 / Math.tan(Math.toRadians(60)), p.x, 1e-9);
        assertEquals(115.47, p.x, 0.01);
        assertEquals(500, p.y, 1e-9);
        assertEquals(1200, p.getZ(), 0);
        // shallower than the trace the surface lies on the footwall side (west)
        assertEquals(-115.47, surface.point(500, 800).x, 0.01);
    }

    @Test
    void verticalFaultStaysOnItsTrace() {
        FaultSurface surface = new FaultSurface(northSouth(90), 1000);
        assertEquals(0, surface.point(250, 1800).x, 1e-9);
        assertEquals(0, surface.heaveOffset(1800), 0);
    }
}
