package org.faultbench.faults.repair;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Fault;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;

/**
 * Merges two faults mapped as separate segments into one. The traces are joined at their nearest ends by a straight
 * piece, the first fault keeping its direction; the merged fault takes the first fault's dip and dip direction, and
 * cut-off lines of the same horizon and wall are joined. Faults of opposite sense or dipping in opposite directions
 * are refused: joining them is exactly the over-correlation QC warns about.
 */
public final class MergeFaultsOperation extends FaultEditOperation {

    /** Dip directions further apart than this belong to faults dipping towards opposite sides. */
    private static final double MAX_DIP_DIRECTION_DIFFERENCE = 90;

    private final FaultLabel merged;

    /** Merge keeping the first fault's id and name. */
    public MergeFaultsOperation(FaultModel model, String firstId, String secondId) {
        this(model, firstId, secondId, new FaultLabel(firstId, model.fault(firstId).name()));
    }

    public MergeFaultsOperation(FaultModel model, String firstId, String secondId, FaultLabel merged) {
        super("Merge faults '" + model.fault(firstId).name() + "' and '" + model.fault(secondId).name() + "'", model,
                List.of(firstId, secondId));
        if (firstId.equals(secondId)) {
            throw new IllegalArgumentException("cannot merge fault '" + model.fault(firstId).name() + "' with itself");
        }
        this.merged = merged;
    }

    @Override
    List<FaultRecord> edit(List<FaultRecord> originals) {
        FaultRecord first = originals.get(0);
        FaultRecord second = originals.get(1);
        checkCompatible(first.fault(), second.fault());
        List<Part> parts = order(first, second);
        Part head = parts.get(0);
        Part tail = parts.get(1);
        Coordinate[] headPoints = head.points();
        Coordinate[] tailPoints = tail.points();
        double gap = headPoints[headPoints.length - 1].distance(tailPoints[0]);
        Coordinate[] joined = new Coordinate[headPoints.length + tailPoints.length];
        System.arraycopy(headPoints, 0, joined, 0, headPoints.length);
        System.arraycopy(tailPoints, 0, joined, headPoints.length, tailPoints.length);
        LineString trace = new GeometryFactory().createLineString(joined);
        Fault fault = first.fault();
        Fault mergedFault = new Fault(merged.id(), merged.name(), trace, fault.dipDegrees(),
                fault.dipAzimuthDegrees(), fault.isNormal());
        List<CutOffLine> lines = joinCutOffs(head.moved(merged.id(), 0),
                tail.moved(merged.id(), head.record().fault().length() + gap));
        return List.of(new FaultRecord(mergedFault, first.growthFault() || second.growthFault(), lines));
    }

    private static void checkCompatible(Fault a, Fault b) {
        if (a.isNormal() != b.isNormal()) {
            throw new IllegalArgumentException("fault '" + a.name() + "' is " + sense(a) + " but '" + b.name()
                    + "' is " + sense(b) + "; they cannot be one fault");
        }
        double difference = Math.abs(a.dipAzimuthDegrees() - b.dipAzimuthDegrees()) % 360;
        if (Math.min(difference, 360 - difference) > MAX_DIP_DIRECTION_DIFFERENCE) {
            throw new IllegalArgumentException("faults '" + a.name() + "' (dip direction " + a.dipAzimuthDegrees()
                    + ") and '" + b.name() + "' (dip direction " + b.dipAzimuthDegrees() + ") dip towards opposite"
                    + " sides; if one was digitised with the wrong dip side, swap its walls first");
        }
    }

    private static String sense(Fault fault) {
        return fault.isNormal() ? "normal" : "reverse";
    }

    /** The first fault in its own direction, the second placed before or after it, reversed if needed. */
    private static List<Part> order(FaultRecord first, FaultRecord second) {
        List<List<Part>> joins = List.of(
                List.of(new Part(first, false), new Part(second, false)),
                List.of(new Part(first, false), new Part(second, true)),
                List.of(new Part(second, false), new Part(first, false)),
                List.of(new Part(second, true), new Part(first, false)));
        List<Part> best = joins.get(0);
        for (List<Part> join : joins) {
            if (gap(join) < gap(best)) {
                best = join;
            }
        }
        return best;
    }

    private static double gap(List<Part> join) {
        Coordinate[] head = join.get(0).points();
        return head[head.length - 1].distance(join.get(1).points()[0]);
    }

    /** Lines of the same horizon and wall joined head to tail; lines found on one part only kept as they are. */
    private static List<CutOffLine> joinCutOffs(List<CutOffLine> head, List<CutOffLine> tail) {
        Map<String, CutOffLine> byKey = new LinkedHashMap<>();
        for (CutOffLine line : head) {
            byKey.put(key(line), line);
        }
        for (CutOffLine line : tail) {
            byKey.merge(key(line), line, CutOffLines::joined);
        }
        return new ArrayList<>(byKey.values());
    }

    private static String key(CutOffLine line) {
        return line.horizon() + '\u0000' + line.wall();
    }

    /** One of the merged faults, walked forwards or backwards. */
    private record Part(FaultRecord record, boolean reversed) {

        Coordinate[] points() {
            LineString trace = record.fault().trace();
            return (reversed ? trace.reverse() : trace).getCoordinates();
        }

        List<CutOffLine> moved(String faultId, double offset) {
            double length = record.fault().length();
            return record.cutOffs().stream()
                    .map(line -> CutOffLines.moved(line, faultId, reversed, length, offset))
                    .toList();
        }
    }
}
