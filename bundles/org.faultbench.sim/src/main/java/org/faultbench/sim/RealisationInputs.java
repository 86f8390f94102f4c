package org.faultbench.sim;

import java.util.List;

import org.faultbench.core.column.ReservoirProperties;
import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.seal.SampledValues;
import org.faultbench.strat.ColumnDraw;

/**
 * The sampled inputs of one realisation (or of a scripted case such as the base case of a tornado).
 *
 * @param depthShift common depth shift of the reference horizon, m
 * @param throwScale throw factor per bounding fault, in study order
 * @param brineDensity kg/m³
 * @param hydrocarbonDensity kg/m³
 * @param calibrationShift log10 shift of threshold pressures
 * @param userSpillDepth spill depth of the reference top entered by the user, NaN when computed
 * @param topSealCapacity Pa, NaN when not given
 * @param drainageDepth the drained block's well drainage depth, NaN without attic analysis
 * @param column the resolved stratigraphic column (with isochores, the representative one: see {@code columns})
 * @param reservoirProperties per unit, column order
 * @param residual the correlated depth residual, null when the study has none
 * @param columns the stratigraphy draws, resolving the column of each map position (isochores)
 * @param criterionValues values of the contributed sampled inputs that act on the seal criterion, by id
 */
public record RealisationInputs(double depthShift, double[] throwScale, double brineDensity, double hydrocarbonDensity,
        double calibrationShift, double userSpillDepth, double topSealCapacity, double drainageDepth,
        ResolvedColumn column, List<ReservoirProperties> reservoirProperties, CorrelatedResidualField residual,
        ColumnDraw columns, SampledValues criterionValues) {

    /** Depth error at (x, y): the common shift plus the residual there. */
    public double depthError(double x, double y) {
        return residual == null ? depthShift : depthShift + residual.value(x, y);
    }

    /** Density contrast brine − trapped fluid, kg/m³. */
    public double densityContrast() {
        return brineDensity - hydrocarbonDensity;
    }
}
