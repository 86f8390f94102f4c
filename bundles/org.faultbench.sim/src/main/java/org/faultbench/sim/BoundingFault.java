package org.faultbench.sim;

import org.faultbench.core.uncertain.Bounds;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Fault;

/**
 * A fault that bounds the compartment, with the reference horizon's cut-off lines on both walls.
 *
 * @param fault the fault
 * @param footwallCutOff footwall cut-off line of the reference horizon
 * @param hangingWallCutOff hanging-wall cut-off line of the reference horizon
 * @param throwScale factor applied to the mapped throw in each realisation (1 = as mapped), &ge; 0
 * @param columns number of fault-plane columns sampled along strike
 */
public record BoundingFault(Fault fault, CutOffLine footwallCutOff, CutOffLine hangingWallCutOff,
        UncertainValue throwScale, int columns) {

    public BoundingFault {
        if (fault == null || footwallCutOff == null || hangingWallCutOff == null) {
            throw new IllegalArgumentException("bounding fault: fault and both cut-off lines are required");
        }
        throwScale = (throwScale == null ? UncertainValue.fixed(1) : throwScale)
                .within(Bounds.NON_NEGATIVE, "fault '" + fault.id() + "' throw scale");
        if (columns < 2) {
            throw new IllegalArgumentException("fault '" + fault.id() + "': at least 2 fault-plane columns are needed, was "
                    + columns);
        }
    }

    public String id() {
        return fault.id();
    }
}
