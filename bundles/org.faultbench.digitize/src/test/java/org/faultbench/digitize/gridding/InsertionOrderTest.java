package org.faultbench.digitize.gridding;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.triangulate.quadedge.Vertex;

/** The biased randomised insertion order (Amenta, Choi &amp; Rote 2003) used for the TIN. */
class InsertionOrderTest {
    private static final Envelope UNIT = new Envelope(0, 1, 0, 1);
    private static final long QUADRANT = 1L << 30;

    @Test
    void hilbertCurveVisitsTheQuadrantsLowerLeftUpperLeftUpperRightLowerRight() {
        // first level of the Hilbert curve in the usual orientation (xy2d of the common iterative algorithm,
        // e.g. Warren 2013, Hacker's Delight, 2nd ed., sec. 16-2; from memory): quadrants in order LL, UL, UR, LR
        assertEquals(0, InsertionOrder.hilbertIndex(UNIT, 0.1, 0.1) / QUADRANT);
        assertEquals(1, InsertionOrder.hilbertIndex(UNIT, 0.1, 0.9) / QUADRANT);
        assertEquals(2, InsertionOrder.hilbertIndex(UNIT, 0.9, 0.9) / QUADRANT);
        assertEquals(3, InsertionOrder.hilbertIndex(UNIT, 0.9, 0.1) / QUADRANT);
        assertEquals(0, InsertionOrder.hilbertIndex(UNIT, 0, 0));
    }

    @Test
    void neighbouringCellsAlongTheCurveAreNeighboursInTheMap() {
        // the defining property of the curve: consecutive indices are edge-adjacent cells (Hilbert 1891)
        int side = 64;
        long[] cellIndex = new long[side * side];
        for (int i = 0; i < side; i++) {
            for (int j = 0; j < side; j++) {
                cellIndex[j * side + i] = InsertionOrder.hilbertIndex(UNIT, (i + 0.5) / side, (j + 0.5) / side);
            }
        }
        Integer[] byIndex = new Integer[side * side];
        for (int k = 0; k < byIndex.length; k++) {
            byIndex[k] = k;
        }
        Arrays.sort(byIndex, (a, b) -> Long.compare(cellIndex[a], cellIndex[b]));
        for (int k = 1; k < byIndex.length; k++) {
            int a = byIndex[k - 1];
            int b = byIndex[k];
            int step = Math.abs(a % side - b % side) + Math.abs(a / side - b / side);
            assertEquals(1, step, "cells " + a + " and " + b);
        }
    }

    @Test
    void orderIsAReproduciblePermutation() {
        List<Vertex> vertices = new ArrayList<>();
        for (int k = 0; k < 1000; k++) {
            vertices.add(new Vertex(k % 37, k / 37.0));
        }
        List<Vertex> first = InsertionOrder.brio(vertices, 7);
        List<Vertex> again = InsertionOrder.brio(vertices, 7);
        assertEquals(first, again);
        assertEquals(new HashSet<>(vertices), new HashSet<>(first));
        assertEquals(vertices.size(), first.size());
        assertNotEquals(vertices, first);
        assertTrue(first.subList(0, 64).stream().anyMatch(v -> v.getY() > 13), "first round is spread over the map");
    }
}
