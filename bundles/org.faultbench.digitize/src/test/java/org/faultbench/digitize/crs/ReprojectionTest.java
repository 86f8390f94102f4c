package org.faultbench.digitize.crs;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;

/**
 * Reprojection against published coordinate pairs. Geographic coordinates are x = longitude, y = latitude in decimal
 * degrees. Tolerances: 1 cm on projected coordinates printed to the centimetre, 1 mm where printed to the millimetre;
 * 1e-7 degree (about 1 cm on the ground) on latitudes and longitudes.
 */
class ReprojectionTest {
    private static final double MILLIMETRE = 0.001;
    private static final double CENTIMETRE = 0.01;
    /** US survey foot = 1200/3937 m exactly (EPSG unit 9003). */
    private static final double US_SURVEY_FOOT = 1200.0 / 3937.0;
    private static final double CENTIMETRE_IN_US_FEET = CENTIMETRE / US_SURVEY_FOOT;
    private static final double DEGREE_TOLERANCE = 1e-7;

    private static final CoordinateSystem WGS84 = CoordinateSystems.byEpsg(4326);
    private static final CoordinateSystem UTM_31N = CoordinateSystems.byEpsg(32631);
    private static final CoordinateSystem OSGB36 = CoordinateSystems.byEpsg(4277);
    private static final CoordinateSystem BRITISH_NATIONAL_GRID = CoordinateSystems.byEpsg(27700);

    private static double dms(double degrees, double minutes, double seconds) {
        return Math.copySign(Math.abs(degrees) + minutes / 60 + seconds / 3600, degrees);
    }

    @Test
    void transverseMercatorMatchesOrdnanceSurveyWorkedExample() {
        double[] en = new Reprojection(OSGB36, BRITISH_NATIONAL_GRID).apply(dms(1, 43, 4.5177), dms(52, 39, 27.2531));
        // Ordnance Survey, "A guide to coordinate systems in Great Britain", worked example of the Transverse
        // Mercator projection (annex C): 52°39'27.2531"N 1°43'04.5177"E -> E 651409.903 m, N 313177.270 m
        assertEquals(651409.903, en[0], MILLIMETRE, "easting, OS guide worked example");
        assertEquals(313177.270, en[1], MILLIMETRE, "northing, OS guide worked example");
    }

    @Test
    void inverseTransverseMercatorMatchesOrdnanceSurveyWorkedExample() {
        double[] lonLat = new Reprojection(BRITISH_NATIONAL_GRID, OSGB36).apply(651409.903, 313177.270);
        // Ordnance Survey, "A guide to coordinate systems in Great Britain", worked example (annex C), reverse
        assertEquals(dms(1, 43, 4.5177), lonLat[0], DEGREE_TOLERANCE, "longitude, OS guide worked example");
        assertEquals(dms(52, 39, 27.2531), lonLat[1], DEGREE_TOLERANCE, "latitude, OS guide worked example");
    }

    @Test
    void transverseMercatorMatchesEpsgGuidanceNoteExample() {
        double[] en = new Reprojection(OSGB36, BRITISH_NATIONAL_GRID).apply(dms(0, 30, 0), dms(50, 30, 0));
        // IOGP Publication 373-7-2 (EPSG Guidance Note 7-2), Transverse Mercator (method 9807) example:
        // 50°30'N 0°30'E -> E 577274.99 m, N 69740.50 m (printed to the centimetre)
        assertEquals(577274.99, en[0], CENTIMETRE, "easting, IOGP 373-7-2 TM example");
        assertEquals(69740.50, en[1], CENTIMETRE, "northing, IOGP 373-7-2 TM example");
    }

    @Test
    void lambertConicConformal2spMatchesEpsgGuidanceNoteExample() {
        CoordinateSystem nad27 = CoordinateSystems.byEpsg(4267);
        CoordinateSystem texasSouthCentral = CoordinateSystems.byEpsg(32040);
        double[] en = new Reprojection(nad27, texasSouthCentral).apply(-96, dms(28, 30, 0));
        // IOGP Publication 373-7-2 (EPSG Guidance Note 7-2), Lambert Conic Conformal 2SP (method 9802) example,
        // NAD27 / Texas South Central: 28°30'N 96°00'W -> E 2963503.91 US survey ft, N 254759.80 US survey ft
        assertEquals(2963503.91, en[0], CENTIMETRE_IN_US_FEET, "easting, IOGP 373-7-2 LCC 2SP example");
        assertEquals(254759.80, en[1], CENTIMETRE_IN_US_FEET, "northing, IOGP 373-7-2 LCC 2SP example");
    }

    @Test
    void pseudoMercatorMatchesEpsgGuidanceNoteExample() {
        CoordinateSystem pseudoMercator = CoordinateSystems.byEpsg(3857);
        double[] en = new Reprojection(WGS84, pseudoMercator).apply(dms(-100, 20, 0), dms(24, 22, 54.433));
        // IOGP Publication 373-7-2 (EPSG Guidance Note 7-2), Popular Visualisation Pseudo Mercator (method 1024)
        // example: 24°22'54.433"N 100°20'00"W -> E -11169055.58 m, N 2800000.00 m
        assertEquals(-11169055.58, en[0], CENTIMETRE, "easting, IOGP 373-7-2 Pseudo-Mercator example");
        assertEquals(2800000.00, en[1], CENTIMETRE, "northing, IOGP 373-7-2 Pseudo-Mercator example");
    }

    @Test
    void utmCentralMeridianOnEquatorIsTheFalseOrigin() {
        double[] en = new Reprojection(WGS84, UTM_31N).apply(3, 0);
        // UTM definition (e.g. Snyder 1987, USGS Prof. Paper 1395, p. 57-58): zone 31 central meridian 3°E,
        // false easting 500000 m, false northing 0 in the northern hemisphere; exact by definition
        assertEquals(500000, en[0], MILLIMETRE, "easting on the central meridian");
        assertEquals(0, en[1], MILLIMETRE, "northing on the equator");
    }

    @Test
    void utmIsSymmetricAboutTheCentralMeridian() {
        Reprojection toUtm = new Reprojection(WGS84, UTM_31N);
        double[] east = toUtm.apply(4, 56);
        double[] west = toUtm.apply(2, 56);
        // Transverse Mercator is symmetric about its central meridian (Snyder 1987, USGS Prof. Paper 1395, ch. 8)
        assertEquals(500000 - east[0], west[0] - 500000, MILLIMETRE, "easting mirrored about 500000 m");
        assertEquals(east[1], west[1], MILLIMETRE, "same northing either side");
    }

    @Test
    void utmRoundTripReturnsTheInput() {
        Reprojection toUtm = new Reprojection(WGS84, UTM_31N);
        double[] en = toUtm.apply(2.345, 60.5);
        double[] lonLat = toUtm.inverse().apply(en[0], en[1]);
        // round trip forward then inverse: common practice for checking a projection
        assertArrayEquals(new double[] {2.345, 60.5}, lonLat, 1e-6);
    }

    @Test
    void gridRoundTripReturnsTheInput() {
        Reprojection toGeographic = new Reprojection(BRITISH_NATIONAL_GRID, OSGB36);
        double[] lonLat = toGeographic.apply(530000, 180000);
        double[] en = toGeographic.inverse().apply(lonLat[0], lonLat[1]);
        // round trip inverse then forward: common practice for checking a projection
        assertArrayEquals(new double[] {530000, 180000}, en, MILLIMETRE);
    }

    @Test
    void inverseSwapsTheSystems() {
        Reprojection inverse = new Reprojection(WGS84, UTM_31N).inverse();
        assertEquals(UTM_31N, inverse.from());
        assertEquals(WGS84, inverse.to());
    }

    @Test
    void coordinateKeepsItsDepthAndTheInputIsLeftAlone() {
        Coordinate onCentralMeridian = new Coordinate(3, 0, 1850);
        Coordinate moved = new Reprojection(WGS84, UTM_31N).apply(onCentralMeridian);
        assertEquals(500000, moved.getX(), MILLIMETRE);
        assertEquals(0, moved.getY(), MILLIMETRE);
        assertEquals(1850, moved.getZ(), 0, "depth is not reprojected");
        assertEquals(new Coordinate(3, 0, 1850), onCentralMeridian, "input changed");
    }

    @Test
    void lineVerticesAreMovedAndDepthsKept() {
        GeometryFactory factory = new GeometryFactory();
        LineString trace = factory.createLineString(new Coordinate[] {new Coordinate(2, 56, 1800),
                new Coordinate(3, 0, 1850)});
        Reprojection toUtm = new Reprojection(WGS84, UTM_31N);
        LineString moved = toUtm.apply(trace);
        assertNotSame(trace, moved);
        assertArrayEquals(toUtm.apply(2, 56), new double[] {moved.getCoordinateN(0).x, moved.getCoordinateN(0).y},
                MILLIMETRE, "same result as the point reprojection");
        assertEquals(500000, moved.getCoordinateN(1).x, MILLIMETRE);
        assertEquals(1800, moved.getCoordinateN(0).getZ(), 0, "depth is not reprojected");
        assertEquals(2, trace.getCoordinateN(0).x, 0, "input changed");
        assertEquals(500000, moved.getEnvelopeInternal().getMaxX(), MILLIMETRE, "envelope follows the vertices");
    }

    @Test
    void polygonStaysValidAndRoundTripRestoresItsArea() {
        GeometryFactory factory = new GeometryFactory();
        // a 10 km square in the British National Grid, sent to geographic coordinates and back
        Polygon square = factory.createPolygon(new Coordinate[] {new Coordinate(500000, 200000),
                new Coordinate(510000, 200000), new Coordinate(510000, 210000), new Coordinate(500000, 210000),
                new Coordinate(500000, 200000)});
        Reprojection toGeographic = new Reprojection(BRITISH_NATIONAL_GRID, OSGB36);
        Polygon geographic = toGeographic.apply(square);
        assertTrue(geographic.isValid());
        assertTrue(geographic.getEnvelopeInternal().getMaxY() < 53, "latitudes in degrees");
        Polygon back = toGeographic.inverse().apply(geographic);
        assertEquals(1e8, back.getArea(), 1, "square of 10 km restored");
    }

    @Test
    void latitudeBeyondThePoleIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new Reprojection(WGS84, UTM_31N).apply(3, 95));
        assertTrue(e.getMessage().contains("latitude y = 95.0"), e.getMessage());
    }

    @Test
    void pointTheProjectionCannotShowIsRefused() {
        // 90° from the central meridian a Transverse Mercator projection goes to infinity (Snyder 1987, ch. 8)
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new Reprojection(WGS84, UTM_31N).apply(93, 0));
        assertTrue(e.getMessage().contains("EPSG:32631"), e.getMessage());
    }

    @Test
    void nonFinitePointIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new Reprojection(WGS84, UTM_31N).apply(Double.NaN, 0));
        assertTrue(e.getMessage().contains("NaN"), e.getMessage());
    }

    @Test
    void missingSystemIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> new Reprojection(null, UTM_31N));
    }

    @Test
    void systemUnknownToTheEpsgDatasetIsRefusedByCode() {
        CoordinateSystem madeUp = new CoordinateSystem(999_998, "made up", "metre");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new Reprojection(madeUp, UTM_31N));
        assertTrue(e.getMessage().contains("999998"), e.getMessage());
    }
}
