package org.faultbench.digitize.georef;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ProjectiveTransformTest {

    /** A map photographed at an angle: the far (upper) edge of the image covers a wider strip of the map. */
    static final double[][] MAP_QUAD = {
            { 498900, 6008150 }, { 511200, 6007900 }, { 510100, 6000050 }, { 500050, 5999900 } };

    private final ProjectiveTransform scan = SyntheticControlPoints.rectangleToQuad(4000, 3000, MAP_QUAD);

    @Test
    void cornersOfTheScanLandOnTheMapQuadrilateral() {
        // Heckbert 1989, section 2.2.3 square-to-quadrilateral mapping (from memory): corners map exactly
        assertArrayEquals(MAP_QUAD[0], scan.toMap(0, 0), 1e-6);
        assertArrayEquals(MAP_QUAD[1], scan.toMap(4000, 0), 1e-6);
        assertArrayEquals(MAP_QUAD[2], scan.toMap(4000, 3000), 1e-6);
        assertArrayEquals(MAP_QUAD[3], scan.toMap(0, 3000), 1e-6);
    }

    @Test
    void toPixelInvertsToMap() {
        // the inverse of a homography is the adjugate of its matrix: Hartley & Zisserman 2003, ch. 2 (from memory)
        for (double[] pixel : SyntheticControlPoints.CHECK_PIXELS) {
            double[] map = scan.toMap(pixel[0], pixel[1]);
            assertArrayEquals(pixel, scan.toPixel(map[0], map[1]), 1e-6);
        }
    }

    @Test
    void pixelOnTheVanishingLineHasNoMapPosition() {
        // g·col + h·row + 1 = 0 at col = −1 / g: hand calculation
        ProjectiveTransform t = new ProjectiveTransform(1, 0, 0, 0, 1, 0, 0.001, 0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> t.toMap(-1000, 5));
        assertTrue(e.getMessage().contains("vanishing line"), e.getMessage());
    }

    @Test
    void singularMatrixIsRejected() {
        // rows (1, 2, 0), (2, 4, 0), (0, 0, 1) are dependent: hand calculation
        assertThrows(IllegalArgumentException.class, () -> new ProjectiveTransform(1, 2, 0, 2, 4, 0, 0, 0));
    }
}
