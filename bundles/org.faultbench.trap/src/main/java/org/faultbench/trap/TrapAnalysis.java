package org.faultbench.trap;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.faultbench.core.fluid.Buoyancy;

/**
 * Combines the three limits on a hydrocarbon column into the controlling free-water level: the spill point, the
 * leak point on the bounding faults and the top seal's capacity. The shallowest wins (common practice; the leak
 * logic follows Bretan, Yielding &amp; Jones 2003, AAPG Bull. 87). On an exact tie the order is spill, leak, top seal.
 * Takes plain records, so Monte Carlo can feed it sampled inputs.
 */
public final class TrapAnalysis {
    private final Buoyancy buoyancy;
    private final LeakPointFinder leakFinder;

    /** @param buoyancy water and hydrocarbon densities and gravity */
    public TrapAnalysis(Buoyancy buoyancy) {
        this.leakFinder = new LeakPointFinder(buoyancy);
        this.buoyancy = buoyancy;
    }

    /**
     * @param crest crest of the compartment
     * @param spill computed or user spill point of the same compartment
     * @param leakCandidates fault points that could leak (empty list for none)
     * @param topSealCapacityPa capillary threshold pressure of the top seal, Pa; empty when not limiting
     * @throws IllegalArgumentException when nothing limits the column (barrier-limited, no leak candidates and no
     *         top-seal capacity)
     */
    public TrapResult analyse(Crest crest, SpillPoint spill, List<LeakCandidate> leakCandidates,
            OptionalDouble topSealCapacityPa) {
        if (crest == null || spill == null || topSealCapacityPa == null) {
            throw new IllegalArgumentException("crest, spill point or top-seal capacity (may be empty) missing");
        }
        Optional<LeakPoint> leak = leakFinder.find(leakCandidates);
        double leakDepth = leak.map(LeakPoint::freeWaterLevel).orElse(Double.POSITIVE_INFINITY);
        double topSealDepth = topSealCapacityPa.isPresent()
                ? crest.z() + topSealColumn(topSealCapacityPa.getAsDouble())
                : Double.POSITIVE_INFINITY;
        Mechanism mechanism = Mechanism.SPILL;
        double controlling = spill.depth();
        if (leakDepth < controlling) {
            mechanism = Mechanism.LEAK;
            controlling = leakDepth;
        }
        if (topSealDepth < controlling) {
            mechanism = Mechanism.TOP_SEAL;
            controlling = topSealDepth;
        }
        if (controlling == Double.POSITIVE_INFINITY) {
            throw new IllegalArgumentException("nothing limits the column: barriers close the structure, and there"
                    + " are no leak candidates and no top-seal capacity; give leak candidates or a top-seal capacity");
        }
        return new TrapResult(crest, spill, leak, topSealDepth, controlling, mechanism);
    }

    private double topSealColumn(double capacityPa) {
        if (!(capacityPa >= 0) || Double.isInfinite(capacityPa)) {
            throw new IllegalArgumentException("top-seal capacity must be a finite number >= 0 Pa, was " + capacityPa);
        }
        return buoyancy.columnHeight(capacityPa);
    }
}
