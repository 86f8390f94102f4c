package org.faultbench.faults.repair;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Fault;
import org.faultbench.faults.Wall;

/**
 * One fault of the model with everything an edit replaces together: the fault, its growth flag and its cut-off
 * lines. Immutable, so an undo can put back exactly what was there.
 */
record FaultRecord(Fault fault, boolean growthFault, List<CutOffLine> cutOffs) {

    FaultRecord {
        cutOffs = List.copyOf(cutOffs);
        for (CutOffLine line : cutOffs) {
            if (!line.faultId().equals(fault.id())) {
                throw new IllegalArgumentException("cut-off line of horizon '" + line.horizon() + "' belongs to fault '"
                        + line.faultId() + "', not to '" + fault.id() + "'");
            }
        }
    }

    String id() {
        return fault.id();
    }

    Optional<CutOffLine> cutOff(String horizon, Wall wall) {
        return cutOffs.stream().filter(line -> line.horizon().equals(horizon) && line.wall() == wall).findFirst();
    }

    /** A copy with {@code line} added, replacing any line of the same horizon and wall. */
    FaultRecord withCutOff(CutOffLine line) {
        List<CutOffLine> lines = new ArrayList<>(cutOffs);
        lines.removeIf(old -> old.horizon().equals(line.horizon()) && old.wall() == line.wall());
        lines.add(line);
        return new FaultRecord(fault, growthFault, lines);
    }

    FaultRecord withGrowthFault(boolean growth) {
        return new FaultRecord(fault, growth, cutOffs);
    }
}
