package org.faultbench.faults.repair;

import java.util.List;

import org.faultbench.faults.Fault;

/**
 * Swaps the walls of a fault: it now dips the other way (dip direction turned by 180 degrees) and every cut-off line
 * moves to the other wall, so the lines stay on the same side of the trace and throw changes sign. Fixes a fault
 * digitised with the wrong dip side, or the part of a split fault that dips the other way.
 */
public final class SwapWallsOperation extends FaultEditOperation {

    public SwapWallsOperation(FaultModel model, String faultId) {
        super("Swap walls of fault '" + model.fault(faultId).name() + "'", model, List.of(faultId));
    }

    @Override
    List<FaultRecord> edit(List<FaultRecord> originals) {
        FaultRecord original = originals.get(0);
        Fault fault = original.fault();
        Fault swapped = new Fault(fault.id(), fault.name(), fault.trace(), fault.dipDegrees(),
                fault.dipAzimuthDegrees() + 180, fault.isNormal());
        return List.of(new FaultRecord(swapped, original.growthFault(),
                original.cutOffs().stream().map(CutOffLines::onOtherWall).toList()));
    }
}
