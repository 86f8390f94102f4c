package org.faultbench.sim;

import org.faultbench.core.fluid.FluidKind;
import org.faultbench.core.uncertain.Bounds;
import org.faultbench.core.uncertain.UncertainValue;

/**
 * Reservoir-condition densities of the trapped fluid and of the formation water.
 *
 * @param kind what is trapped (oil, gas, CO2)
 * @param hydrocarbonDensity density of the trapped fluid, kg/m³
 * @param brineDensity density of the formation water, kg/m³
 */
public record FluidContrast(FluidKind kind, UncertainValue hydrocarbonDensity, UncertainValue brineDensity) {

    public FluidContrast {
        if (kind == null || hydrocarbonDensity == null || brineDensity == null) {
            throw new IllegalArgumentException("fluids: kind and both densities are required");
        }
        hydrocarbonDensity = hydrocarbonDensity.within(Bounds.NON_NEGATIVE, "trapped fluid density");
        brineDensity = brineDensity.within(Bounds.NON_NEGATIVE, "brine density");
    }
}
