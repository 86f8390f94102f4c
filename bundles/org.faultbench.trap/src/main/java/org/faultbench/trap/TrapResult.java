package org.faultbench.trap;

import java.util.Optional;

/**
 * Outcome of a trap analysis: the free-water level that controls the column, what sets it and where. For
 * {@link Mechanism#SPILL} the place is {@code spill().x(), spill().y()}; for {@link Mechanism#LEAK} it is
 * {@code leak().get().candidate()} (fault id, u, z); the top seal acts over the whole crest.
 *
 * @param crest crest of the compartment
 * @param spill spill point (depth +Infinity when barrier-limited)
 * @param leak controlling fault leak point, empty without leak candidates
 * @param topSealDepth deepest free-water level the top seal holds, crest + P/((rho_w - rho_hc) g); +Infinity when no
 *        top-seal capacity was given
 * @param controllingDepth shallowest of spill, leak and top-seal depths: the free-water level, metres positive down
 * @param mechanism which of the three it is
 */
public record TrapResult(Crest crest, SpillPoint spill, Optional<LeakPoint> leak, double topSealDepth,
        double controllingDepth, Mechanism mechanism) {

    public TrapResult {
        if (crest == null || spill == null || leak == null || mechanism == null) {
            throw new IllegalArgumentException("trap result needs crest, spill, leak (may be empty) and mechanism");
        }
        if (!Double.isFinite(controllingDepth)) {
            throw new IllegalArgumentException("controlling depth must be finite, was " + controllingDepth);
        }
    }

    /** Hydrocarbon column height, controlling depth minus crest, never below 0, metres. */
    public double columnHeight() {
        return Math.max(0, controllingDepth - crest.z());
    }
}
