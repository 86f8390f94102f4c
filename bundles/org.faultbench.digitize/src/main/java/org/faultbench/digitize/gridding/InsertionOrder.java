package org.faultbench.digitize.gridding;

import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;
import java.util.Random;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.triangulate.quadedge.Vertex;

/**
 * A biased randomised insertion order for incremental Delaunay triangulation (BRIO; Amenta, Choi &amp; Rote 2003,
 * "Incremental constructions con BRIO", Proc. 19th ACM Symposium on Computational Geometry, 211&ndash;219): the
 * vertices are shuffled, split into rounds that double in size, and each round is sorted along a Hilbert curve.
 * <p>
 * Why: JTS inserts each vertex into a k-d tree and then walks the triangulation from the last vertex inserted. Sorted
 * or contour-ordered input makes the k-d tree a chain, and random input makes the walks cross the thin triangles
 * between contours; both are quadratic in practice. The random rounds keep the tree balanced and the Hilbert order
 * keeps each walk short. The seed is fixed, so the same input always gives the same triangulation.
 */
final class InsertionOrder {
    private static final int HILBERT_ORDER = 16;
    private static final int FIRST_ROUND = 64;

    private InsertionOrder() {
    }

    /** {@code vertices} reordered as described in the class comment. */
    static <V extends Vertex> List<V> brio(List<V> vertices, long seed) {
        List<V> shuffled = new ArrayList<>(vertices);
        Collections.shuffle(shuffled, new Random(seed));
        Envelope extent = new Envelope();
        for (V v : shuffled) {
            extent.expandToInclude(v.getX(), v.getY());
        }
        List<Keyed<V>> keyed = new ArrayList<>(shuffled.size());
        for (V v : shuffled) {
            keyed.add(new Keyed<>(hilbertIndex(extent, v.getX(), v.getY()), v));
        }
        Comparator<Keyed<V>> alongCurve = Comparator.comparingLong(Keyed::key);
        List<V> ordered = new ArrayList<>(shuffled.size());
        int start = 0;
        int end = Math.min(FIRST_ROUND, shuffled.size());
        while (start < shuffled.size()) {
            List<Keyed<V>> round = new ArrayList<>(keyed.subList(start, end));
            round.sort(alongCurve);
            for (Keyed<V> k : round) {
                ordered.add(k.vertex());
            }
            start = end;
            end = Math.min(shuffled.size(), 2 * end);
        }
        return ordered;
    }

    /** A vertex with its Hilbert index, computed once rather than in every comparison of the sort. */
    private record Keyed<V>(long key, V vertex) {
    }

    /** Position of (x, y) along a Hilbert curve of 2^16 &times; 2^16 cells over {@code extent}. */
    static long hilbertIndex(Envelope extent, double x, double y) {
        int side = 1 << HILBERT_ORDER;
        long cx = cell(x, extent.getMinX(), extent.getWidth(), side);
        long cy = cell(y, extent.getMinY(), extent.getHeight(), side);
        long index = 0;
        for (long s = side / 2; s > 0; s /= 2) {
            long rx = (cx & s) > 0 ? 1 : 0;
            long ry = (cy & s) > 0 ? 1 : 0;
            index += s * s * ((3 * rx) ^ ry);
            if (ry == 0) {
                if (rx == 1) {
                    cx = s - 1 - cx;
                    cy = s - 1 - cy;
                }
                long swap = cx;
                cx = cy;
                cy = swap;
            }
        }
        return index;
    }

    private static long cell(double value, double min, double width, int side) {
        if (width <= 0) {
            return 0;
        }
        return Math.min(side - 1, (long) ((value - min) / width * side));
    }
}
