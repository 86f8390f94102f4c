package org.faultbench.core;

/**
 * Broad lithology class of a stratigraphic unit. Seal criteria declare which classes they are valid for:
 * clay-based rules (SGR, SSF, CSP) apply to clastic sequences only.
 */
public enum LithologyClass {
    /** Porous, permeable clastic rock that can hold hydrocarbons (sandstone). */
    RESERVOIR,
    /** Fine-grained clastic seal (shale, mudstone, siltstone). */
    SEAL,
    /** Limestone, dolomite, chalk: clay-based fault-seal rules do not apply. */
    CARBONATE,
    /** Salt, anhydrite. */
    EVAPORITE,
    /** Anything else (volcanic, crystalline, coal ...). */
    OTHER;

    /** Whether a unit of this class is clastic, the domain of clay-based seal criteria. */
    public boolean isClastic() {
        return this == RESERVOIR || this == SEAL;
    }
}
