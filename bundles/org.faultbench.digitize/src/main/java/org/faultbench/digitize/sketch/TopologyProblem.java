package org.faultbench.digitize.sketch;

import java.util.List;

/**
 * A topology problem on a map sheet, located so that the editor can zoom to it.
 *
 * @param kind what is wrong
 * @param featureIds the features involved (copied)
 * @param x map x of the problem, metres
 * @param y map y of the problem, metres
 * @param message explanation for the geologist
 */
public record TopologyProblem(ProblemKind kind, List<FeatureId> featureIds, double x, double y, String message) {

    public TopologyProblem {
        SheetGeometry.required(kind, "problem kind");
        featureIds = List.copyOf(SheetGeometry.required(featureIds, "problem feature ids"));
        if (featureIds.isEmpty()) {
            throw new IllegalArgumentException("a topology problem must name at least one feature");
        }
        SheetGeometry.point(x, y, "topology problem location");
        message = SheetGeometry.name(message, "topology problem message");
    }

    public Severity severity() {
        return kind.severity();
    }
}
