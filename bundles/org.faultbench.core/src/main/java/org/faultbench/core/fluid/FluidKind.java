package org.faultbench.core.fluid;

/** What a fluid is, so trap and volume logic can tell hydrocarbons, stored CO2 and formation water apart. */
public enum FluidKind {
    OIL,
    GAS,
    CO2,
    /** Formation water (brine): the wetting phase the buoyant fluid displaces. */
    WATER
}
