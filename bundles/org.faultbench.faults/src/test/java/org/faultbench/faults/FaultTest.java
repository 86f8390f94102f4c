package org.faultbench.faults;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;

class FaultTest {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();
    private static final double EPS = 1e-9;

    static LineString line(double... xy) {
        Coordinate[] points = new Coordinate[xy.length / 2];
        for (int i = 0; i < points.length; i++) {
            points[i] = new Coordinate(xy[2 * i], xy[2 * i + 1]);
        }
        return GEOMETRY.createLineString(points);
    }

    /** East 300 m, then north 400 m; dips south-east (135 degrees), so the hanging wall is right of the walk. */
    static Fault elbowFault() {
        return new Fault("f1", "Elbow", line(0, 0, 300, 0, 300, 400), 60, 135, true);
    }

    @Test
    void alongStrikeDistanceRunsAlongBothSegmentsOfTheTrace() {
        Fault fault = elbowFault();
        // hand calculation: segment lengths 300 m and 400 m
        assertEquals(700, fault.length(), EPS, "trace length 300 + 400 m");
        assertEquals(new Coordinate(150, 0), fault.positionAt(150), "u = 150 m lies on the first segment");
        assertEquals(new Coordinate(300, 0), fault.positionAt(300), "u = 300 m is the bend");
        assertEquals(new Coordinate(300, 200), fault.positionAt(500), "u = 500 m is 200 m up the second segment");
        assertEquals(new Coordinate(300, 400), fault.positionAt(700), "u = 700 m is the trace end");
    }

    @Test
    void mapPointsProjectToTheNearestTracePoint() {
        Fault fault = elbowFault();
        // hand calculation: (100, -20) is nearest to (100, 0); (350, 250) is nearest to (300, 250), 250 m past the bend
        assertEquals(100, fault.project(100, -20), EPS);
        assertEquals(550, fault.project(350, 250), EPS);
        // beyond the trace end the nearest point is the end itself
        assertEquals(700, fault.project(300, 450), EPS);
    }

    @Test
    void pointsOnTheDipSideLieOnTheHangingWall() {
        Fault fault = elbowFault();
        // dip azimuth 135 points to the right of the walk east-then-north (hand calculation)
        assertEquals(Optional.of(Wall.HANGING_WALL), fault.wallAt(150, -50), "south of the east-running segment");
        assertEquals(Optional.of(Wall.FOOTWALL), fault.wallAt(150, 50), "north of the east-running segment");
        assertEquals(Optional.of(Wall.HANGING_WALL), fault.wallAt(350, 200), "east of the north-running segment");
        assertEquals(Optional.of(Wall.FOOTWALL), fault.wallAt(250, 200), "west of the north-running segment");
        assertEquals(Optional.of(Wall.HANGING_WALL), fault.wallAt(310, -10), "outside the bend");
        assertEquals(Optional.of(Wall.FOOTWALL), fault.wallAt(290, 10), "inside the bend");
        assertEquals(Optional.empty(), fault.wallAt(150, 0), "on the trace");
    }

    @Test
    void sideTestHoldsBeyondTheTipOfAHairpinBend() {
        // east 100 m then back west-north-west: a left turn of about 174 degrees; dip east puts the hanging wall on
        // the right, which at the tip of the hairpin is the outside (hand construction)
        Fault fault = new Fault("f2", "Hairpin", line(0, 0, 100, 0, 0, 10), 70, 90, true);
        // (101, 0.5) is nearest to the bend and left of the first segment, yet outside the turn
        assertEquals(Optional.of(Wall.HANGING_WALL), fault.wallAt(101, 0.5));
        assertEquals(Optional.of(Wall.FOOTWALL), fault.wallAt(50, 2), "between the two limbs");
    }

    @Test
    void offsetPositionsStepPerpendicularOffTheTraceOntoTheRequestedWall() {
        // trace west to east, dipping south: hanging wall to the south (hand calculation)
        Fault fault = new Fault("f3", "Straight", line(0, 0, 1000, 0), 60, 180, true);
        Coordinate hangingWall = fault.positionAt(250, Wall.HANGING_WALL, 50);
        Coordinate footwall = fault.positionAt(250, Wall.FOOTWALL, 50);
        assertEquals(250, hangingWall.x, EPS);
        assertEquals(-50, hangingWall.y, EPS);
        assertEquals(250, footwall.x, EPS);
        assertEquals(50, footwall.y, EPS);
        assertEquals(Optional.of(Wall.HANGING_WALL), fault.wallAt(hangingWall.x, hangingWall.y));
        assertEquals(Optional.of(Wall.FOOTWALL), fault.wallAt(footwall.x, footwall.y));
    }

    @Test
    void verticalFaultKeepsItsAzimuthOnlyToNameTheHangingWall() {
        Fault fault = new Fault("f4", "Upright", line(0, 0, 1000, 0), 90, 0, true);
        assertTrue(fault.isVertical());
        assertEquals(Optional.of(Wall.HANGING_WALL), fault.wallAt(500, 10), "azimuth 0 names the north side");
        assertFalse(new Fault("f5", "Steep", line(0, 0, 1000, 0), 89.9, 0, true).isVertical());
    }

    @Test
    void dipAzimuthIsNormalisedToZeroTo360() {
        assertEquals(270, new Fault("f6", "West", line(0, 0, 0, 1000), 45, -90, false).dipAzimuthDegrees(), EPS);
        assertEquals(90, new Fault("f7", "East", line(0, 0, 0, 1000), 45, 450, false).dipAzimuthDegrees(), EPS);
    }

    @Test
    void repeatedTracePointsAreDropped() {
        Fault fault = new Fault("f8", "Doubled", line(0, 0, 0, 0, 500, 0, 500, 0), 60, 180, true);
        assertEquals(2, fault.trace().getNumPoints());
        assertEquals(500, fault.length(), EPS);
    }

    @Test
    void traceWithFewerThanTwoDistinctPointsIsRejectedNamingTheFault() {
        LineString single = GEOMETRY.createLineString(new Coordinate[] {new Coordinate(5, 5), new Coordinate(5, 5)});
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new Fault("f9", "Stub", single, 60, 180, true));
        assertEquals("fault 'Stub': trace needs at least two distinct points, has 1", e.getMessage());
        IllegalArgumentException missing = assertThrows(IllegalArgumentException.class,
                () -> new Fault("f9", "Stub", null, 60, 180, true));
        assertTrue(missing.getMessage().contains("'Stub'"), missing.getMessage());
    }

    @Test
    void dipOutsideZeroTo90IsRejected() {
        for (double dip : new double[] {0, -10, 90.5, 120, Double.NaN}) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> new Fault("f10", "Tilted", line(0, 0, 1000, 0), dip, 180, true));
            assertEquals("fault 'Tilted': dip must be in (0, 90] degrees, was " + dip, e.getMessage());
        }
    }

    @Test
    void dipAzimuthAlongTheTraceOrNotFiniteIsRejected() {
        IllegalArgumentException along = assertThrows(IllegalArgumentException.class,
                () -> new Fault("f11", "Parallel", line(0, 0, 1000, 0), 60, 95, true));
        assertTrue(along.getMessage().contains("runs along the trace"), along.getMessage());
        IllegalArgumentException nan = assertThrows(IllegalArgumentException.class,
                () -> new Fault("f11", "Parallel", line(0, 0, 1000, 0), 60, Double.NaN, true));
        assertTrue(nan.getMessage().contains("dip azimuth must be a finite number"), nan.getMessage());
        IllegalArgumentException loop = assertThrows(IllegalArgumentException.class,
                () -> new Fault("f12", "Loop", line(0, 0, 100, 0, 100, 100, 0, 0), 60, 180, true));
        assertTrue(loop.getMessage().contains("starts and ends at the same point"), loop.getMessage());
    }

    @Test
    void emptyIdentityAndNonFiniteTracePointsAreRejected() {
        assertThrows(IllegalArgumentException.class, () -> new Fault(" ", "Named", line(0, 0, 1, 0), 60, 180, true));
        assertThrows(IllegalArgumentException.class, () -> new Fault("f13", "", line(0, 0, 1, 0), 60, 180, true));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new Fault("f13", "Broken", line(0, 0, Double.NaN, 0), 60, 180, true));
        assertTrue(e.getMessage().contains("non-finite coordinate"), e.getMessage());
    }

    @Test
    void positionOutsideTheTraceIsRejected() {
        Fault fault = elbowFault();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> fault.positionAt(701));
        assertEquals("fault 'Elbow': along-strike distance u = 701.0 is outside the trace [0, 700.0]", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> fault.positionAt(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> fault.positionAt(100, Wall.FOOTWALL, -1));
    }
}
