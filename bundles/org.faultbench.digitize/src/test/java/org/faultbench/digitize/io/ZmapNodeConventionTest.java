package org.faultbench.digitize.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Conventions as described on GDAL's "ZMap -- ZMap Plus Grid" driver page (ZMAP_PIXEL_IS_POINT option). */
class ZmapNodeConventionTest {

    @Test
    void pixelIsPointPutsNodesOnTheBounds() {
        ZmapNodeConvention c = ZmapNodeConvention.PIXEL_IS_POINT;
        // 11 nodes from 0 to 1000: 10 intervals of 100 (hand calculation)
        assertEquals(100, c.spacing(0, 1000, 11), 1e-12);
        assertEquals(0, c.firstNode(0, 100), 1e-12);
        assertEquals(1000, c.upperBound(0, 100, 11), 1e-12);
    }

    @Test
    void pixelIsAreaPutsNodesHalfACellInside() {
        ZmapNodeConvention c = ZmapNodeConvention.PIXEL_IS_AREA;
        // 10 cells from 0 to 1000: cells of 100, nodes at 50 ... 950 (hand calculation)
        assertEquals(100, c.spacing(0, 1000, 10), 1e-12);
        assertEquals(50, c.firstNode(0, 100), 1e-12);
        assertEquals(0, c.lowerBound(50, 100), 1e-12);
        assertEquals(1000, c.upperBound(50, 100, 10), 1e-12);
    }
}
