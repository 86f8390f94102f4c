package org.faultbench.sim;

import org.faultbench.core.uncertain.UncertainValue;

/**
 * The drained neighbour of the compartment: the fault that separates it from the compartment and the depth down to
 * which the producing well there drains the reservoir.
 *
 * @param drainedFaultId id of the bounding fault between the compartment and the drained block
 * @param drainageDepth the well's drainage depth, m TVDSS
 */
public record AtticSetup(String drainedFaultId, UncertainValue drainageDepth) {

    public AtticSetup {
        if (drainedFaultId == null || drainedFaultId.isBlank() || drainageDepth == null) {
            throw new IllegalArgumentException("attic analysis needs the drained block's fault and a drainage depth");
        }
    }
}
