package org.faultbench.digitize.gridding;

import java.util.Arrays;
import java.util.List;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.GridMask;
import org.faultbench.digitize.io.XyzPoint;

/**
 * The data point that constrains each grid node, kept with its offset from the node so that the surface can honour
 * it at its true position (Briggs 1974, Geophysics 39, 39&ndash;48: off-node data through a Taylor expansion at the
 * nearest node).
 * <p>
 * Each point goes to its nearest node, provided that node is active and not across a fault from the point; points
 * beyond half a cell outside the grid, or whose nearest node is across a fault, constrain nothing on this grid (they
 * still appear in the residual report). When several points share a node, the one nearest to it wins.
 */
final class NodeData {
    private final double[] z;
    private final double[] xi;
    private final double[] eta;
    private final boolean[] present;

    NodeData(NodeLinks links, List<XyzPoint> points, FaultBarriers barriers) {
        GridGeometry g = links.geometry();
        int n = g.size();
        z = new double[n];
        xi = new double[n];
        eta = new double[n];
        present = new boolean[n];
        double[] distance = new double[n];
        Arrays.fill(distance, Double.POSITIVE_INFINITY);
        GridMask near = barriers.nearNodes(g);
        for (XyzPoint p : points) {
            double tx = (p.x() - g.x0()) / g.dx();
            double ty = (p.y() - g.y0()) / g.dy();
            long i = Math.round(tx);
            long j = Math.round(ty);
            if (i < 0 || i >= g.nx() || j < 0 || j >= g.ny()) {
                continue;
            }
            int k = g.index((int) i, (int) j);
            double d = Math.hypot((tx - i) * g.dx(), (ty - j) * g.dy());
            if (d < distance[k] && links.active(k)
                    && !(near.contains(k) && barriers.blocks(p.x(), p.y(), g.x((int) i), g.y((int) j)))) {
                distance[k] = d;
                z[k] = p.z();
                xi[k] = tx - i;
                eta[k] = ty - j;
                present[k] = true;
            }
        }
    }

    /** Whether a data point constrains node {@code k}. */
    boolean has(int k) {
        return present[k];
    }

    /** Flags of the constrained nodes. */
    boolean[] flags() {
        return present.clone();
    }

    /** Depth of the point at node {@code k}, metres. */
    double z(int k) {
        return z[k];
    }

    /** x offset of the point from node {@code k}, in node spacings, within [-0.5, 0.5]. */
    double xi(int k) {
        return xi[k];
    }

    /** y offset of the point from node {@code k}, in node spacings, within [-0.5, 0.5]. */
    double eta(int k) {
        return eta[k];
    }

    /** Mean depth of the constraining points, metres; NaN when none. */
    double meanZ() {
        double sum = 0;
        int count = 0;
        for (int k = 0; k < z.length; k++) {
            if (present[k]) {
                sum += z[k];
                count++;
            }
        }
        return count == 0 ? Double.NaN : sum / count;
    }
}
