package org.faultbench.faults.repair;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Fault;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.linearref.LengthIndexedLine;

/**
 * Splits a fault into two at an along-strike distance, e.g. at the relay between two throw-polarity domains that
 * were correlated into one trace. Both parts keep the dip, dip direction, sense and growth flag; each cut-off line is
 * cut at the split point (its depth there interpolated) and the second part's u starts again at 0.
 */
public final class SplitFaultOperation extends FaultEditOperation {

    private final double splitU;
    private final FaultLabel first;
    private final FaultLabel second;

    /** Split into parts labelled "&lt;id&gt;-a" / "&lt;name&gt; (a)" and "&lt;id&gt;-b" / "&lt;name&gt; (b)". */
    public SplitFaultOperation(FaultModel model, String faultId, double splitU) {
        this(model, faultId, splitU, new FaultLabel(faultId + "-a", model.fault(faultId).name() + " (a)"),
                new FaultLabel(faultId + "-b", model.fault(faultId).name() + " (b)"));
    }

    /**
     * @param splitU along-strike distance of the split (m), strictly inside the trace
     * @param first label of the part from u = 0 to the split
     * @param second label of the part from the split to the trace end
     */
    public SplitFaultOperation(FaultModel model, String faultId, double splitU, FaultLabel first, FaultLabel second) {
        super("Split fault '" + model.fault(faultId).name() + "'", model, List.of(faultId));
        this.splitU = splitU;
        this.first = first;
        this.second = second;
    }

    @Override
    List<FaultRecord> edit(List<FaultRecord> originals) {
        FaultRecord original = originals.get(0);
        Fault fault = original.fault();
        double length = fault.length();
        if (!(splitU > 0 && splitU < length)) {
            throw new IllegalArgumentException("split point u = " + splitU + " m must lie inside the trace of fault '"
                    + fault.name() + "', between 0 and " + length + " m");
        }
        return List.of(part(original, first, 0, splitU), part(original, second, splitU, length));
    }

    private static FaultRecord part(FaultRecord original, FaultLabel label, double from, double to) {
        Fault fault = original.fault();
        LineString trace = (LineString) new LengthIndexedLine(fault.trace()).extractLine(from, to);
        Fault piece = new Fault(label.id(), label.name(), trace, fault.dipDegrees(), fault.dipAzimuthDegrees(),
                fault.isNormal());
        List<CutOffLine> lines = new ArrayList<>();
        for (CutOffLine line : original.cutOffs()) {
            CutOffLines.slice(line, label.id(), from, to).ifPresent(lines::add);
        }
        return new FaultRecord(piece, original.growthFault(), lines);
    }
}
