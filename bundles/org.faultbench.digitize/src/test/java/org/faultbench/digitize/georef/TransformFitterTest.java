package org.faultbench.digitize.georef;

import static org.faultbench.digitize.georef.SyntheticControlPoints.CHECK_PIXELS;
import static org.faultbench.digitize.georef.SyntheticControlPoints.SPREAD_PIXELS;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.function.BiFunction;

import org.junit.jupiter.api.Test;

class TransformFitterTest {

    /** Requirement of this bundle: check points recovered to better than a hundredth of a pixel. */
    private static final double PIXEL_ACCURACY = 0.01;

    // Helmert 2-D similarity with image rows flipped: x = x0 + s(cos θ·col + sin θ·row),
    // y = y0 + s(sin θ·col − cos θ·row); Ghilani 2010, Adjustment Computations, 5th ed., ch. 18 "two-dimensional
    // conformal transformation" (from memory); the row flip because image rows run down: common practice
    private static final double SCALE = 2.5;
    private static final double ROTATION = Math.toRadians(12);
    private static final BiFunction<Double, Double, double[]> ROTATED_SCALED_SHIFTED = (col, row) -> new double[] {
            500000 + SCALE * (Math.cos(ROTATION) * col + Math.sin(ROTATION) * row),
            6000000 + SCALE * (Math.sin(ROTATION) * col - Math.cos(ROTATION) * row) };

    // affine with unequal scales and a shear: x = 2.0·col + 0.3·row + 500000, y = 0.1·col − 2.6·row + 6000000
    private static final WorldFile SHEARED = new WorldFile(2.0, 0.1, 0.3, -2.6, 500000, 6000000);

    private static List<ControlPoint> points(double[][] pixels, BiFunction<Double, Double, double[]> mapping) {
        return SyntheticControlPoints.of(pixels, mapping);
    }

    private static void assertRecoversCheckPixels(GeoTransform fitted, BiFunction<Double, Double, double[]> truth) {
        for (double[] pixel : CHECK_PIXELS) {
            double[] map = truth.apply(pixel[0], pixel[1]);
            assertArrayEquals(pixel, fitted.toPixel(map[0], map[1]), PIXEL_ACCURACY, "check pixel recovered");
        }
    }

    @Test
    void similarityRecoversScaleRotationAndShift() {
        FitReport report = TransformFitter.fit(TransformKind.SIMILARITY, points(SPREAD_PIXELS, ROTATED_SCALED_SHIFTED));
        SimilarityTransform fitted = (SimilarityTransform) report.transform();
        // the synthetic transform's own parameters (construction above)
        assertEquals(SCALE, fitted.scale(), 1e-12);
        assertEquals(ROTATION, fitted.rotation(), 1e-12);
        assertEquals(500000, fitted.shiftX(), 1e-6);
        assertEquals(6000000, fitted.shiftY(), 1e-6);
        assertRecoversCheckPixels(fitted, ROTATED_SCALED_SHIFTED);
        // exact data: RMS ~ 0 (rounding of 6-digit coordinates only)
        assertEquals(0, report.rms(), 1e-6);
    }

    @Test
    void similarityWorldFileReproducesToMap() {
        GeoTransform fitted = TransformFitter.fit(TransformKind.SIMILARITY,
                points(SPREAD_PIXELS, ROTATED_SCALED_SHIFTED)).transform();
        WorldFile file = fitted.asWorldFile().orElseThrow();
        for (double[] pixel : CHECK_PIXELS) {
            assertArrayEquals(fitted.toMap(pixel[0], pixel[1]), file.toMap(pixel[0], pixel[1]), 1e-6);
        }
    }

    @Test
    void twoPointsFixASimilarityExactly() {
        // hand calculation: (0, 0) → (100, 200) and (100, 0) → (100, 300): scale 1, rotation 90°, world file
        // A = 0, D = 1, B = 1, E = 0, C = 100, F = 200
        List<ControlPoint> two = List.of(ControlPoint.of("A", 0, 0, 100, 200), ControlPoint.of("B", 100, 0, 100, 300));
        SimilarityTransform fitted = (SimilarityTransform) TransformFitter.fit(TransformKind.SIMILARITY, two).transform();
        assertEquals(1, fitted.scale(), 1e-12);
        assertEquals(Math.PI / 2, fitted.rotation(), 1e-12);
        WorldFile file = fitted.asWorldFile().orElseThrow();
        assertArrayEquals(new double[] { 0, 1, 1, 0, 100, 200 },
                new double[] { file.a(), file.d(), file.b(), file.e(), file.c(), file.f() }, 1e-12);
    }

    @Test
    void affineRecoversItsSixParameters() {
        FitReport report = TransformFitter.fit(TransformKind.AFFINE, points(SPREAD_PIXELS, SHEARED::toMap));
        WorldFile fitted = report.transform().asWorldFile().orElseThrow();
        // the synthetic world file's own parameters (construction above)
        assertArrayEquals(new double[] { 2.0, 0.1, 0.3, -2.6 },
                new double[] { fitted.a(), fitted.d(), fitted.b(), fitted.e() }, 1e-12);
        assertEquals(500000, fitted.c(), 1e-6);
        assertEquals(6000000, fitted.f(), 1e-6);
        assertRecoversCheckPixels(report.transform(), SHEARED::toMap);
        assertEquals(0, report.rms(), 1e-6);
    }

    @Test
    void secondOrderPolynomialRecoversItsTwelveCoefficients() {
        QuadraticPolynomial x = Polynomial2TransformTest.STRETCHED_X;
        QuadraticPolynomial y = Polynomial2TransformTest.STRETCHED_Y;
        BiFunction<Double, Double, double[]> stretched = (col, row) -> new double[] { x.valueAt(col, row),
                y.valueAt(col, row) };
        FitReport report = TransformFitter.fit(TransformKind.POLYNOMIAL_2, points(SPREAD_PIXELS, stretched));
        Polynomial2Transform fitted = (Polynomial2Transform) report.transform();
        // the synthetic polynomials' own coefficients (construction in Polynomial2TransformTest)
        assertCoefficients(x, fitted.x());
        assertCoefficients(y, fitted.y());
        assertRecoversCheckPixels(fitted, stretched);
        assertEquals(0, report.rms(), 1e-6);
        assertTrue(fitted.asWorldFile().isEmpty(), "a world file cannot hold a polynomial transform");
    }

    private static void assertCoefficients(QuadraticPolynomial expected, QuadraticPolynomial actual) {
        assertEquals(expected.constant(), actual.constant(), 1e-6, "constant");
        assertEquals(expected.col(), actual.col(), 1e-9, "col");
        assertEquals(expected.row(), actual.row(), 1e-9, "row");
        assertEquals(expected.colSquared(), actual.colSquared(), 1e-13, "col²");
        assertEquals(expected.colRow(), actual.colRow(), 1e-13, "col·row");
        assertEquals(expected.rowSquared(), actual.rowSquared(), 1e-13, "row²");
    }

    @Test
    void projectiveRecoversAPerspectiveDistortedScan() {
        ProjectiveTransform truth = SyntheticControlPoints.rectangleToQuad(4000, 3000, ProjectiveTransformTest.MAP_QUAD);
        FitReport report = TransformFitter.fit(TransformKind.PROJECTIVE, points(SPREAD_PIXELS, truth::toMap));
        ProjectiveTransform fitted = (ProjectiveTransform) report.transform();
        // Heckbert 1989 square-to-quadrilateral closed form (see SyntheticControlPoints), relative agreement
        double[] expected = { truth.a(), truth.b(), truth.c(), truth.d(), truth.e(), truth.f(), truth.g(), truth.h() };
        double[] actual = { fitted.a(), fitted.b(), fitted.c(), fitted.d(), fitted.e(), fitted.f(), fitted.g(), fitted.h() };
        for (int i = 0; i < expected.length; i++) {
            assertEquals(expected[i], actual[i], 1e-8 * Math.abs(expected[i]), "parameter " + "abcdefgh".charAt(i));
        }
        assertRecoversCheckPixels(fitted, truth::toMap);
        assertEquals(0, report.rms(), 1e-6);
        assertTrue(fitted.asWorldFile().isEmpty(), "a world file cannot hold a projective transform");
    }

    @Test
    void projectiveFitOfNoisyPointsBeatsAnAffineFit() {
        // least squares with noise: the projective model contains the truth, the affine does not (common practice)
        ProjectiveTransform truth = SyntheticControlPoints.rectangleToQuad(4000, 3000, ProjectiveTransformTest.MAP_QUAD);
        List<ControlPoint> noisy = withNoise(points(SPREAD_PIXELS, truth::toMap), 0.5, 11);
        double projectiveRms = TransformFitter.fit(TransformKind.PROJECTIVE, noisy).rms();
        double affineRms = TransformFitter.fit(TransformKind.AFFINE, noisy).rms();
        assertTrue(projectiveRms < 1.0 && affineRms > 10 * projectiveRms, projectiveRms + " vs " + affineRms);
    }

    @Test
    void projectiveFitMinimisesTheMapResidualsNotJustTheAlgebraicError() {
        // the DLT minimises an algebraic error; the refinement must reach a minimum of Σ(dx² + dy²), the quantity
        // the RMS reports (Hartley & Zisserman 2003, ch. 4, "Gold Standard" algorithm 4.3; from memory). Check:
        // nudging any parameter by 1e-7 of its value either way must not lower the RMS (small enough that a
        // non-zero gradient, as the DLT estimate alone leaves, shows as a decrease on one side).
        ProjectiveTransform truth = SyntheticControlPoints.rectangleToQuad(4000, 3000, ProjectiveTransformTest.MAP_QUAD);
        List<ControlPoint> noisy = withNoise(points(SPREAD_PIXELS, truth::toMap), 3.0, 5);
        FitReport report = TransformFitter.fit(TransformKind.PROJECTIVE, noisy);
        ProjectiveTransform fitted = (ProjectiveTransform) report.transform();
        double[] p = { fitted.a(), fitted.b(), fitted.c(), fitted.d(), fitted.e(), fitted.f(), fitted.g(), fitted.h() };
        for (int i = 0; i < p.length; i++) {
            for (double sign : new double[] { -1, 1 }) {
                double[] q = p.clone();
                q[i] += sign * 1e-7 * Math.abs(p[i]);
                ProjectiveTransform nudged = new ProjectiveTransform(q[0], q[1], q[2], q[3], q[4], q[5], q[6], q[7]);
                assertTrue(rms(nudged, noisy) >= report.rms() * (1 - 1e-12), "parameter " + "abcdefgh".charAt(i));
            }
        }
    }

    private static double rms(GeoTransform transform, List<ControlPoint> points) {
        return Math.sqrt(points.stream().mapToDouble(p -> {
            double[] map = transform.toMap(p.col(), p.row());
            return Math.pow(p.x() - map[0], 2) + Math.pow(p.y() - map[1], 2);
        }).average().orElseThrow());
    }

    @Test
    void fewerPointsThanTheMinimumAreRefusedSayingHowMany() {
        // minima 2 / 3 / 6 / 4: see TransformKindTest for the sources
        for (TransformKind kind : TransformKind.values()) {
            int minimum = kind.minimumPoints();
            List<ControlPoint> tooFew = points(SyntheticControlPoints.spread(minimum - 1), SHEARED::toMap);
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> TransformFitter.fit(kind, tooFew), kind.name());
            assertTrue(e.getMessage().contains("at least " + minimum) && e.getMessage().contains((minimum - 1) + " "),
                    e.getMessage());
        }
    }

    @Test
    void theMinimumNumberOfPointsFitsExactlyWithoutLeaveOneOut() {
        for (TransformKind kind : TransformKind.values()) {
            FitReport report = TransformFitter.fit(kind,
                    points(SyntheticControlPoints.spread(kind.minimumPoints()), ROTATED_SCALED_SHIFTED));
            assertEquals(0, report.rms(), 1e-6, kind.name());
            assertFalse(report.hasLeaveOneOut(), kind.name());
            assertTrue(report.warnings(1.0).get(0).contains("minimum"), report.warnings(1.0).toString());
        }
    }

    @Test
    void disabledPointsAreNotCounted() {
        List<ControlPoint> points = new ArrayList<>(points(SyntheticControlPoints.spread(3), SHEARED::toMap));
        points.add(ControlPoint.of("Off1", 1000, 1000, 1, 1).withEnabled(false));
        points.add(ControlPoint.of("Off2", 2000, 500, 2, 2).withEnabled(false));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> TransformFitter.fit(TransformKind.POLYNOMIAL_2, points));
        assertTrue(e.getMessage().contains("at least 6") && e.getMessage().contains("3 are enabled"), e.getMessage());
        // the disabled points are far off, yet the affine fit of the other three is exact
        FitReport affine = TransformFitter.fit(TransformKind.AFFINE, points);
        assertEquals(3, affine.residuals().size());
        assertEquals(0, affine.rms(), 1e-6);
    }

    @Test
    void collinearPointsAreRejected() {
        // common practice: an affine transform needs points spread in two directions
        List<ControlPoint> onALine = points(new double[][] { { 0, 0 }, { 1000, 500 }, { 2000, 1000 }, { 3000, 1500 } },
                SHEARED::toMap);
        for (TransformKind kind : List.of(TransformKind.AFFINE, TransformKind.PROJECTIVE)) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> TransformFitter.fit(kind, onALine));
            assertTrue(e.getMessage().contains("one line in the image"), e.getMessage());
        }
    }

    @Test
    void mapPositionsOnOneLineAreRejected() {
        List<ControlPoint> typedOnALine = List.of(ControlPoint.of("A", 0, 0, 100, 100),
                ControlPoint.of("B", 1000, 0, 200, 200), ControlPoint.of("C", 0, 1000, 300, 300));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> TransformFitter.fit(TransformKind.AFFINE, typedOnALine));
        assertTrue(e.getMessage().contains("one line on the map"), e.getMessage());
    }

    @Test
    void threeOfFourCollinearPointsCannotFixAProjectiveTransform() {
        // a homography from 4 points needs no 3 of them collinear, in either plane: Hartley & Zisserman 2003,
        // ch. 4, section 4.1 (from memory)
        ProjectiveTransform truth = SyntheticControlPoints.rectangleToQuad(4000, 3000, ProjectiveTransformTest.MAP_QUAD);
        List<ControlPoint> inTheImage = points(new double[][] { { 0, 0 }, { 1000, 1000 }, { 2000, 2000 }, { 0, 2000 } },
                truth::toMap);
        List<ControlPoint> onTheMap = List.of(ControlPoint.of("A", 0, 0, 0, 0), ControlPoint.of("B", 1000, 0, 1000, 0),
                ControlPoint.of("C", 1000, 1000, 2000, 0), ControlPoint.of("D", 0, 1000, 0, 1000));
        for (List<ControlPoint> points : List.of(inTheImage, onTheMap)) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> TransformFitter.fit(TransformKind.PROJECTIVE, points));
            assertTrue(e.getMessage().contains("three of them lie on one line"), e.getMessage());
        }
    }

    @Test
    void horizonThroughTheControlPointsIsRejected() {
        // x = 1000 / (col − 2000), y = 1000·row / (col − 2000): the vanishing line col = 2000 runs through the
        // centroid of these pixels, so the map would lie on both sides of the horizon (hand calculation)
        BiFunction<Double, Double, double[]> split = (col, row) -> new double[] { 1000 / (col - 2000),
                1000 * row / (col - 2000) };
        List<ControlPoint> points = points(new double[][] { { 1000, 500 }, { 3000, 500 }, { 3000, 2500 },
                { 1000, 2500 }, { 1500, 1200 }, { 2500, 1800 } }, split);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> TransformFitter.fit(TransformKind.PROJECTIVE, points));
        assertTrue(e.getMessage().contains("horizon"), e.getMessage());
    }

    @Test
    void pointsOnOneCircleCannotFixASecondOrderPolynomial() {
        // on a circle col² + row² is constant, so the six monomials are dependent: hand calculation
        double[][] circle = new double[8][];
        for (int i = 0; i < circle.length; i++) {
            double angle = i * Math.PI / 4;
            circle[i] = new double[] { 2000 + 1000 * Math.cos(angle), 1500 + 1000 * Math.sin(angle) };
        }
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> TransformFitter.fit(TransformKind.POLYNOMIAL_2, points(circle, SHEARED::toMap)));
        assertTrue(e.getMessage().contains("conic"), e.getMessage());
    }

    @Test
    void residualsRmsAndLeaveOneOutOfAHandWorkedSquare() {
        // Four corners of a 100-pixel square, map x = 1000 + col, y = 2000 − row, but corner D typed 4 m too far east.
        // Hand calculation: least squares leaves the interaction contrast (+1, −1, −1, +1)·δ/4 as residual
        // (observed − fitted), so the fitted affine is x = 999 + 1.02·col + 0.02·row, RMS = δ/4 = 1 m. Each point
        // has leverage 3/4, so its leave-one-out residual is r / (1 − h) = 4 m (PRESS residual, Allen 1974,
        // Technometrics 16; from memory). D's pixel residual: col of (1104, 1900) is 103 / 1.02, so dCol = −1 / 1.02.
        List<ControlPoint> square = List.of(ControlPoint.of("A", 0, 0, 1000, 2000),
                ControlPoint.of("B", 100, 0, 1100, 2000), ControlPoint.of("C", 0, 100, 1000, 1900),
                ControlPoint.of("D", 100, 100, 1104, 1900));
        FitReport report = TransformFitter.fit(TransformKind.AFFINE, square);
        double[] expectedDx = { 1, -1, -1, 1 };
        for (int i = 0; i < 4; i++) {
            PointResidual r = report.residuals().get(i);
            assertEquals(expectedDx[i], r.dx(), 1e-9, r.point().id());
            assertEquals(0, r.dy(), 1e-9, r.point().id());
            assertEquals(4, r.leaveOneOut().orElseThrow(), 1e-9, r.point().id());
        }
        assertEquals(1, report.rms(), 1e-9);
        assertEquals(-1 / 1.02, report.residuals().get(3).dCol(), 1e-9);
        WorldFile fitted = report.transform().asWorldFile().orElseThrow();
        assertArrayEquals(new double[] { 1.02, 0, 0.02, -1, 999, 2000 },
                new double[] { fitted.a(), fitted.d(), fitted.b(), fitted.e(), fitted.c(), fitted.f() }, 1e-9);
    }

    @Test
    void aTypingErrorInOnePointMakesItTheWorstPointAndIsFlagged() {
        // ten points digitized with ±0.3 m noise; P6's easting typed 90 m off (one wrong digit)
        List<ControlPoint> clean = withNoise(points(SPREAD_PIXELS, SHEARED::toMap), 0.3, 7);
        List<ControlPoint> typo = new ArrayList<>(clean);
        ControlPoint p6 = typo.get(5);
        typo.set(5, ControlPoint.of("P6", p6.col(), p6.row(), p6.x() + 90, p6.y()));

        FitReport report = TransformFitter.fit(TransformKind.AFFINE, typo);
        assertTrue(report.hasLeaveOneOut());
        assertEquals("P6", report.worstPoint().point().id());
        List<String> warnings = report.warnings(1.0);
        assertTrue(warnings.stream().anyMatch(w -> w.startsWith("RMS error")), warnings.toString());
        List<String> flagged = warnings.stream().filter(w -> w.startsWith("control point")).toList();
        assertEquals(1, flagged.size(), warnings.toString());
        assertTrue(flagged.get(0).contains("'P6'"), flagged.toString());

        // without the typo the same points give no warning at a 1 m tolerance
        assertEquals(List.of(), TransformFitter.fit(TransformKind.AFFINE, clean).warnings(1.0));
    }

    @Test
    void repeatedIdIsRejected() {
        List<ControlPoint> twice = List.of(ControlPoint.of("P1", 0, 0, 0, 0), ControlPoint.of("P1", 10, 0, 10, 0));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> TransformFitter.fit(TransformKind.SIMILARITY, twice));
        assertTrue(e.getMessage().contains("'P1'"), e.getMessage());
    }

    @Test
    void pointsAtOnePixelAreRejected() {
        List<ControlPoint> same = List.of(ControlPoint.of("A", 5, 5, 0, 0), ControlPoint.of("B", 5, 5, 10, 0));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> TransformFitter.fit(TransformKind.SIMILARITY, same));
        assertTrue(e.getMessage().contains("one pixel"), e.getMessage());
    }

    /** Adds uniform noise of ± amplitude map units, reproducibly. */
    private static List<ControlPoint> withNoise(List<ControlPoint> points, double amplitude, long seed) {
        Random random = new Random(seed);
        return points.stream().map(p -> ControlPoint.of(p.id(), p.col(), p.row(),
                p.x() + amplitude * (2 * random.nextDouble() - 1), p.y() + amplitude * (2 * random.nextDouble() - 1)))
                .toList();
    }
}
