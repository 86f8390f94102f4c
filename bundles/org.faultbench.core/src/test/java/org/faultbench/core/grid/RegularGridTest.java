package org.faultbench.core.grid;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class RegularGridTest {
    private static final double NULL = Double.NaN;
    private final GridGeometry g = new GridGeometry(3, 2, 100, 200, 10, 20);

    @Test
    void valuesAreStoredRowMajorAndCopied() {
        double[] values = {1, 2, 3, 4, 5, 6};
        RegularGrid grid = new RegularGrid(g, values);
        values[0] = 99;
        assertEquals(1, grid.value(0, 0));
        assertEquals(6, grid.value(2, 1));
        assertEquals(4, grid.value(3));
        assertEquals(120, grid.x(2), 1e-12);
        assertEquals(220, grid.y(1), 1e-12);
        assertEquals(200, grid.cellArea(), 1e-12);
        grid.values()[1] = 99;
        assertEquals(2, grid.value(1, 0));
    }

    @Test
    void bilinearInterpolationReproducesAPlaneAndTheTwistTerm() {
        // Bilinear interpolation is exact for a + b x + c y + d x y (Press et al., Numerical Recipes 3rd ed. 2007,
        // sec. 3.6, from memory); hand calculation
        RegularGrid grid = RegularGrid.sample(g, (x, y) -> 1000 + 0.5 * x - 0.25 * y + 0.001 * x * y);
        double x = 113.7;
        double y = 209.1;
        assertEquals(1000 + 0.5 * x - 0.25 * y + 0.001 * x * y, grid.interpolate(x, y), 1e-9);
        assertEquals(grid.value(2, 1), grid.interpolate(120, 220), 1e-9);
        assertEquals(grid.value(0, 0), grid.interpolate(100, 200), 1e-9);
    }

    @Test
    void interpolationIsNullOutsideTheNodesOrNextToANullNode() {
        RegularGrid grid = new RegularGrid(g, new double[] {1, 2, NULL, 4, 5, 6});
        assertTrue(Double.isNaN(grid.interpolate(99.9, 210)), "west of the first node column");
        assertTrue(Double.isNaN(grid.interpolate(110, 220.1)), "north of the last node row");
        assertTrue(Double.isNaN(grid.interpolate(Double.NaN, 210)));
        assertTrue(Double.isNaN(grid.interpolate(115, 205)), "cell touching the null node (2, 0)");
        assertEquals((1 + 2 + 4 + 5) / 4.0, grid.interpolate(105, 210), 1e-12, "cell centre = mean of 4 nodes");
    }

    @Test
    void mapLeavesNullNodesNull() {
        RegularGrid grid = new RegularGrid(g, new double[] {1, 2, NULL, 4, 5, 6});
        RegularGrid mapped = grid.map(v -> 0);
        assertArrayEquals(new double[] {0, 0, NULL, 0, 0, 0}, mapped.values());
    }

    @Test
    void plusAddsNodeByNodeAndPropagatesNulls() {
        RegularGrid top = new RegularGrid(g, new double[] {1000, 1010, NULL, 1030, 1040, 1050});
        RegularGrid thickness = new RegularGrid(g, new double[] {50, 50, 50, NULL, 40, 30});
        assertArrayEquals(new double[] {1050, 1060, NULL, NULL, 1080, 1080}, top.plus(thickness).values());
    }

    @Test
    void mismatchedGridsAreRejected() {
        RegularGrid top = RegularGrid.sample(g, (x, y) -> 1000);
        RegularGrid other = RegularGrid.sample(new GridGeometry(3, 2, 100, 200, 10, 25), (x, y) -> 50);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> top.plus(other));
        assertTrue(e.getMessage().contains("other nodes"), e.getMessage());
    }

    @Test
    void wrongValueCountOrInfiniteValuesAreRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new RegularGrid(g, new double[5]));
        assertTrue(e.getMessage().contains("needs 6 values, was 5"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> new RegularGrid(g, new double[] {1, 2, 3, 4, Double.POSITIVE_INFINITY, 6}));
        assertTrue(e.getMessage().contains("node (1, 1)") && e.getMessage().contains("Infinity"), e.getMessage());
    }
}
