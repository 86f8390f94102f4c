package org.faultbench.digitize.georef;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class Polynomial2TransformTest {

    /** A scan whose paper stretched unevenly: 2.5 m per pixel plus small second-order terms. */
    static final QuadraticPolynomial STRETCHED_X = new QuadraticPolynomial(500000, 2.5, 0.02, 2e-5, -1e-5, 5e-6);
    static final QuadraticPolynomial STRETCHED_Y = new QuadraticPolynomial(6000000, 0.03, -2.5, -4e-6, 8e-6, -1.5e-5);

    @Test
    void valueAndSlopesOfAQuadratic() {
        // hand calculation at (100, 200): 500000 + 250 + 4 + 0.2 − 0.2 + 0.2 = 500254.2;
        // ∂/∂col = 2.5 + 2·2e-5·100 − 1e-5·200 = 2.502; ∂/∂row = 0.02 − 1e-5·100 + 2·5e-6·200 = 0.021
        assertEquals(500254.2, STRETCHED_X.valueAt(100, 200), 1e-9);
        assertEquals(2.502, STRETCHED_X.slopeAlongCol(100, 200), 1e-12);
        assertEquals(0.021, STRETCHED_X.slopeAlongRow(100, 200), 1e-12);
    }

    @Test
    void newtonInverseReturnsThePixel() {
        // start from the linear part alone, as a rough affine estimate would be
        Polynomial2Transform t = new Polynomial2Transform(STRETCHED_X, STRETCHED_Y,
                new WorldFile(2.5, 0.03, 0.02, -2.5, 500000, 6000000));
        for (double[] pixel : SyntheticControlPoints.CHECK_PIXELS) {
            double[] map = t.toMap(pixel[0], pixel[1]);
            // round trip to well under the 0.01 px asked of georeferencing here
            assertArrayEquals(pixel, t.toPixel(map[0], map[1]), 1e-6);
        }
    }

    @Test
    void mapPointWithoutAPixelIsRefused() {
        // x = col² never reaches x = −5, so no pixel exists: hand calculation
        Polynomial2Transform folded = new Polynomial2Transform(new QuadraticPolynomial(0, 0, 0, 1, 0, 0),
                new QuadraticPolynomial(0, 0, 1, 0, 0, 0), new WorldFile(1, 0, 0, 1, 0, 0));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> folded.toPixel(-5, 3));
        assertTrue(e.getMessage().contains("(-5.0, 3.0)"), e.getMessage());
    }

    @Test
    void coefficientsMustBeSix() {
        assertThrows(IllegalArgumentException.class, () -> QuadraticPolynomial.of(new double[] { 1, 2, 3 }));
        assertEquals(new QuadraticPolynomial(1, 2, 3, 4, 5, 6), QuadraticPolynomial.of(new double[] { 1, 2, 3, 4, 5, 6 }));
    }
}
