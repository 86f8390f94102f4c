package org.faultbench.digitize.georef;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class TransformKindTest {

    @Test
    void minimumControlPointCounts() {
        // Helmert 2-D similarity: 4 parameters, 2 points; common practice
        assertEquals(2, TransformKind.SIMILARITY.minimumPoints());
        // affine = first-order polynomial: 3 points; second-order polynomial: 6 points. GIS documentation of
        // polynomial transformations, e.g. ESRI help "Fundamentals of georeferencing a raster dataset" (from memory)
        assertEquals(3, TransformKind.AFFINE.minimumPoints());
        assertEquals(6, TransformKind.POLYNOMIAL_2.minimumPoints());
        // homography, 8 degrees of freedom, 4 point correspondences: Hartley & Zisserman 2003, Multiple View
        // Geometry, 2nd ed., ch. 4, section 4.1 (from memory)
        assertEquals(4, TransformKind.PROJECTIVE.minimumPoints());
    }

    @Test
    void parameterCounts() {
        // similarity 4, affine 6, 2nd-order polynomial 2 × 6, homography 9 − 1 (scale): common practice
        assertEquals(4, TransformKind.SIMILARITY.parameterCount());
        assertEquals(6, TransformKind.AFFINE.parameterCount());
        assertEquals(12, TransformKind.POLYNOMIAL_2.parameterCount());
        assertEquals(8, TransformKind.PROJECTIVE.parameterCount());
    }
}
