package org.faultbench.sim;

import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.faultbench.core.grid.RegularGrid;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.strat.Stratigraphy;
import org.locationtech.jts.geom.Polygon;

/**
 * Everything the simulator needs about one fault-bounded compartment: the mapped top of the reference unit, the
 * stratigraphy hung from it, the faults that bound the compartment, fluids, the seal criterion, depth uncertainty,
 * and the optional user spill depth, top-seal capacity and drained neighbour for the attic analysis.
 *
 * @param name study name for reports
 * @param stratigraphy units, shallowest first, with the reference unit whose top is mapped
 * @param referenceTop depth grid of the top of the reference unit, m TVDSS
 * @param compartment outline of the fault block in map coordinates; its shallowest node is the crest
 * @param faults faults bounding the compartment
 * @param fluids densities of the trapped fluid and the brine
 * @param seal seal criterion and its calibration
 * @param depthUncertainty depth error of the reference horizon
 * @param userSpillDepth a spill depth entered by the user instead of the computed one
 * @param topSealCapacity capillary capacity of the top seal, Pa
 * @param attic the drained neighbour, for the attic analysis
 * @param contributedInputs plug-in sampled inputs the study includes, in draw order (ids unique)
 */
public record TrapStudy(String name, Stratigraphy stratigraphy, RegularGrid referenceTop, Polygon compartment,
        List<BoundingFault> faults, FluidContrast fluids, SealSetup seal, DepthUncertainty depthUncertainty,
        Optional<UncertainValue> userSpillDepth, Optional<UncertainValue> topSealCapacity, Optional<AtticSetup> attic,
        List<ContributedInput> contributedInputs) {

    public TrapStudy {
        if (stratigraphy == null || referenceTop == null || compartment == null || fluids == null || seal == null) {
            throw new IllegalArgumentException(
                    "a study needs a stratigraphy, a reference-top grid, a compartment outline, fluids and a seal setup");
        }
        faults = List.copyOf(faults == null ? List.of() : faults);
        Set<String> ids = new HashSet<>();
        for (BoundingFault f : faults) {
            if (!ids.add(f.id())) {
                throw new IllegalArgumentException("fault id '" + f.id() + "' is used twice");
            }
        }
        depthUncertainty = depthUncertainty == null ? DepthUncertainty.NONE : depthUncertainty;
        userSpillDepth = userSpillDepth == null ? Optional.empty() : userSpillDepth;
        topSealCapacity = topSealCapacity == null ? Optional.empty() : topSealCapacity;
        attic = attic == null ? Optional.empty() : attic;
        attic.ifPresent(a -> {
            if (!ids.contains(a.drainedFaultId())) {
                throw new IllegalArgumentException("attic analysis names fault '" + a.drainedFaultId()
                        + "', which does not bound the compartment");
            }
        });
        contributedInputs = List.copyOf(contributedInputs == null ? List.of() : contributedInputs);
        Set<String> inputIds = new HashSet<>();
        for (ContributedInput c : contributedInputs) {
            if (!inputIds.add(c.id())) {
                throw new IllegalArgumentException("sampled input '" + c.id() + "' is included twice");
            }
        }
        if (stratigraphy.units().stream().noneMatch(u -> u.reservoir())) {
            throw new IllegalArgumentException("the stratigraphy has no reservoir unit to analyse");
        }
    }

    /** A study without contributed sampled inputs. */
    public TrapStudy(String name, Stratigraphy stratigraphy, RegularGrid referenceTop, Polygon compartment,
            List<BoundingFault> faults, FluidContrast fluids, SealSetup seal, DepthUncertainty depthUncertainty,
            Optional<UncertainValue> userSpillDepth, Optional<UncertainValue> topSealCapacity,
            Optional<AtticSetup> attic) {
        this(name, stratigraphy, referenceTop, compartment, faults, fluids, seal, depthUncertainty, userSpillDepth,
                topSealCapacity, attic, List.of());
    }

    public String name() {
        return name == null ? "unnamed study" : name;
    }
}
