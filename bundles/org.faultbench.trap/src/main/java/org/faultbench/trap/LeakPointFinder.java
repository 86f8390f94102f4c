package org.faultbench.trap;

import java.util.List;
import java.util.Optional;

import org.faultbench.core.fluid.Buoyancy;

/**
 * Finds the leak point among fault points bounding a trap: the one with the shallowest supported free-water level
 * FWL = z + P_th / ((rho_w - rho_hc) g). This is not necessarily the shallowest point nor the one of lowest seal
 * capacity (Bretan, Yielding &amp; Jones 2003, AAPG Bull. 87, 397-413: leakage "is not confined to the crest").
 */
public final class LeakPointFinder {
    private final Buoyancy buoyancy;

    /** @param buoyancy water and hydrocarbon densities and gravity */
    public LeakPointFinder(Buoyancy buoyancy) {
        if (buoyancy == null) {
            throw new IllegalArgumentException("fluid densities (buoyancy) missing");
        }
        this.buoyancy = buoyancy;
    }

    /** The controlling candidate (the first on a tie); empty when there are no candidates. */
    public Optional<LeakPoint> find(List<LeakCandidate> candidates) {
        if (candidates == null) {
            throw new IllegalArgumentException("leak candidate list missing (give an empty list for none)");
        }
        LeakPoint best = null;
        for (LeakCandidate candidate : candidates) {
            if (candidate == null) {
                throw new IllegalArgumentException("a leak candidate is missing (null)");
            }
            double fwl = candidate.z() + buoyancy.columnHeight(candidate.thresholdPressurePa());
            if (best == null || fwl < best.freeWaterLevel()) {
                best = new LeakPoint(candidate, fwl);
            }
        }
        return Optional.ofNullable(best);
    }
}
