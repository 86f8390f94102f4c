package org.faultbench.juxtaposition.paint;

import org.faultbench.juxtaposition.JuxtapositionClass;

/**
 * What a painter knows about one cell of the unrolled fault plane (a cell of a
 * {@link org.faultbench.juxtaposition.JuxtapositionRaster} that has data).
 *
 * @param u along-strike distance of the cell centre, m
 * @param z depth of the cell centre, m TVDSS
 * @param footwallUnit unit index on the footwall (negative: overburden; ≥ unit count: underburden)
 * @param hangingWallUnit the same on the hanging wall
 * @param throwAt fault throw at the cell, m
 * @param sealAttribute the seal criterion's attribute at the cell (e.g. SGR in %), NaN where none was computed
 * @param leakProbability fraction of realisations leaking through the cell, 0 before a run
 * @param attributes the clay-based attributes and the threshold pressure at the cell, by key ({@link CellAttributes})
 */
public record FaultPlaneCell(double u, double z, JuxtapositionClass juxtaposition, int footwallUnit,
        int hangingWallUnit, double throwAt, double sealAttribute, double leakProbability, CellAttributes attributes) {

    public FaultPlaneCell {
        attributes = attributes == null ? CellAttributes.NONE : attributes;
    }

    /** A cell without further attributes. */
    public FaultPlaneCell(double u, double z, JuxtapositionClass juxtaposition, int footwallUnit, int hangingWallUnit,
            double throwAt, double sealAttribute, double leakProbability) {
        this(u, z, juxtaposition, footwallUnit, hangingWallUnit, throwAt, sealAttribute, leakProbability,
                CellAttributes.NONE);
    }
}
