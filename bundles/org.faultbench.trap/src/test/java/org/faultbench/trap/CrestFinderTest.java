package org.faultbench.trap;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.GridMask;
import org.faultbench.core.grid.RegularGrid;
import org.junit.jupiter.api.Test;

class CrestFinderTest {
    private static final double NULL = Double.NaN;
    private final GridGeometry g = new GridGeometry(3, 2, 500, 700, 25, 25);
    private final RegularGrid top = new RegularGrid(g, new double[] {1010, NULL, 990, 1005, 1002, 1020});

    @Test
    void crestIsTheShallowestNonNullNodeOfTheCompartment() {
        Crest crest = CrestFinder.find(top, GridMask.all(g));
        assertEquals(new Crest(2, 0, 550, 700, 990), crest);
    }

    @Test
    void nodesOutsideTheCompartmentAreIgnored() {
        GridMask west = GridMask.of(g, new boolean[] {true, true, false, true, true, false});
        assertEquals(new Crest(1, 1, 525, 725, 1002), CrestFinder.find(top, west));
    }

    @Test
    void compartmentOfNullNodesIsRejected() {
        GridMask onlyNull = GridMask.of(g, new boolean[] {false, true, false, false, false, false});
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CrestFinder.find(top, onlyNull));
        assertTrue(e.getMessage().contains("no depth value"), e.getMessage());
    }

    @Test
    void crestWithNonNumberDepthIsRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new Crest(0, 0, 0, 0, Double.NaN));
        assertTrue(e.getMessage().contains("NaN"), e.getMessage());
    }
}
