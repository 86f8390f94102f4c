package org.faultbench.digitize.sketch;

import java.util.Optional;

/**
 * Where a digitized point ends up after snapping.
 *
 * @param kind what it was snapped to
 * @param x map x, metres
 * @param y map y, metres
 * @param target the feature snapped to; empty for {@link SnapKind#NONE}
 */
public record SnapResult(SnapKind kind, double x, double y, Optional<FeatureId> target) {

    public SnapResult {
        SheetGeometry.required(kind, "snap kind");
        SheetGeometry.required(target, "snap target (use Optional.empty() for none)");
        if (target.isEmpty() != (kind == SnapKind.NONE)) {
            throw new IllegalArgumentException("a snap to " + kind + " must " + (kind == SnapKind.NONE ? "not " : "")
                    + "name the feature snapped to");
        }
    }
}
