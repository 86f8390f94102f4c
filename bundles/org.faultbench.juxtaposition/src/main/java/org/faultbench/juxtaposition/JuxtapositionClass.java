package org.faultbench.juxtaposition;

/**
 * What faces what across the fault at one point (Allan 1989). "Seal" here means any non-reservoir rock, including
 * the overburden above and the underburden below the modelled column.
 */
public enum JuxtapositionClass {
    /** Reservoir against reservoir, the same unit (self-juxtaposed) or another (cross-juxtaposed): a potential leak. */
    RESERVOIR_RESERVOIR,
    /** Reservoir against non-reservoir: sealed by juxtaposition. */
    RESERVOIR_SEAL,
    /** Non-reservoir on both sides. */
    SEAL_SEAL;

    public static JuxtapositionClass of(boolean footwallReservoir, boolean hangingWallReservoir) {
        if (footwallReservoir && hangingWallReservoir) {
            return RESERVOIR_RESERVOIR;
        }
        return footwallReservoir || hangingWallReservoir ? RESERVOIR_SEAL : SEAL_SEAL;
    }
}
