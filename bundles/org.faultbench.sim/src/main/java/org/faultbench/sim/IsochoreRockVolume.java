package org.faultbench.sim;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.GridMask;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.strat.ColumnDraw;

/**
 * Gross rock volume of a unit whose top and base move with isochore thicknesses: node by node over the trapped part of
 * the reference top, each node with the unit's top and base hung from the reference horizon by the thicknesses at
 * that node, GRV = Σ A · max(0, min(contact, base) − top) (the node-centred sum of {@link AreaDepthTable}, which
 * cannot be used here because offset and thickness differ from node to node).
 */
final class IsochoreRockVolume {
    private final RegularGrid referenceTop;
    private final GridMask trapped;
    private final double shift;

    /**
     * @param referenceTop the reference top of the realisation (before {@code shift})
     * @param trapped nodes that count
     * @param shift common depth shift added to every node
     */
    IsochoreRockVolume(RegularGrid referenceTop, GridMask trapped, double shift) {
        this.referenceTop = referenceTop;
        this.trapped = trapped;
        this.shift = shift;
    }

    /**
     * Gross rock volume (m³) of {@code unit} above each of {@code contacts}, with the reference horizon the top of
     * {@code ref}: one pass over the nodes, each volume summed in node order as if computed alone.
     */
    double[] grossRockVolumes(ColumnDraw columns, int unit, int ref, double... contacts) {
        GridGeometry g = referenceTop.geometry();
        double[] sums = new double[contacts.length];
        for (int k = 0; k < g.size(); k++) {
            if (!trapped.contains(k) || referenceTop.isNull(k)) {
                continue;
            }
            double[] thickness = columns.thicknessesAt(g.x(g.column(k)), g.y(g.row(k)));
            double top = referenceTop.value(k) + shift + depthBelowReference(thickness, unit, ref);
            double base = top + thickness[unit];
            for (int c = 0; c < contacts.length; c++) {
                sums[c] += Math.max(0, Math.min(contacts[c], base) - top);
            }
        }
        double[] volumes = new double[contacts.length];
        for (int c = 0; c < contacts.length; c++) {
            volumes[c] = sums[c] * referenceTop.cellArea();
        }
        return volumes;
    }

    /** Depth of the top of {@code unit} below the top of {@code ref} (negative above it). */
    private static double depthBelowReference(double[] thickness, int unit, int ref) {
        double depth = 0;
        for (int i = ref; i < unit; i++) {
            depth += thickness[i];
        }
        for (int i = unit; i < ref; i++) {
            depth -= thickness[i];
        }
        return depth;
    }
}
