package org.faultbench.digitize.sketch;

import java.util.Objects;
import java.util.Optional;

/**
 * One change to a {@link MapSheet}: a feature added, removed or replaced by an edited version with the same id.
 * Edits are values that can be applied and reverted, so that the workbench can keep them on an undo stack. Applying
 * checks that the sheet still holds what the edit starts from, so a stale edit fails instead of losing work.
 *
 * @param before the feature before the change; null when the edit adds a feature
 * @param after the feature after the change; null when the edit removes a feature
 */
public record MapSheetEdit(SheetFeature before, SheetFeature after) {

    public MapSheetEdit {
        if (before == null && after == null) {
            throw new IllegalArgumentException("an edit needs a feature before or after the change");
        }
        if (before != null && after != null && !before.id().equals(after.id())) {
            throw new IllegalArgumentException("an edit replaces a feature by one with the same id, was "
                    + before.id() + " by " + after.id());
        }
    }

    public static MapSheetEdit adding(SheetFeature feature) {
        return new MapSheetEdit(null, SheetGeometry.required(feature, "feature to add"));
    }

    public static MapSheetEdit removing(SheetFeature feature) {
        return new MapSheetEdit(SheetGeometry.required(feature, "feature to remove"), null);
    }

    public static MapSheetEdit replacing(SheetFeature before, SheetFeature after) {
        return new MapSheetEdit(SheetGeometry.required(before, "feature to replace"),
                SheetGeometry.required(after, "replacement feature"));
    }

    public FeatureId featureId() {
        return before != null ? before.id() : after.id();
    }

    /** The edit that undoes this one. */
    public MapSheetEdit inverse() {
        return new MapSheetEdit(after, before);
    }

    /** Makes the change on {@code sheet}, which must hold {@link #before()} (or no feature with its id). */
    public void apply(MapSheet sheet) {
        Optional<SheetFeature> current = SheetGeometry.required(sheet, "map sheet").find(featureId());
        if (!Objects.equals(current.orElse(null), before)) {
            throw new IllegalStateException("cannot " + label() + ": the sheet has changed since ("
                    + current.map(SheetFeature::describe).orElse("feature " + featureId() + " is gone") + ")");
        }
        if (before == null) {
            sheet.add(after);
        } else if (after == null) {
            sheet.remove(before.id());
        } else {
            sheet.replace(after);
        }
    }

    /** Undoes the change on {@code sheet}, which must hold {@link #after()} (or no feature with its id). */
    public void revert(MapSheet sheet) {
        inverse().apply(sheet);
    }

    /** What the edit does, for an undo menu: "add contour 1500 m on Top A". */
    public String label() {
        if (before == null) {
            return "add " + after.describe();
        }
        return (after == null ? "delete " : "edit ") + before.describe();
    }
}
