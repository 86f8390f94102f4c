package org.faultbench.digitize.sketch;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;

/**
 * The digitized map sheet: features by id, in the order they were added (replacing keeps the place, so drawing
 * order survives edits). Every change is announced to the listeners as a {@link MapSheetEdit}, which an editor
 * uses to redraw and an undo history to record. Not thread-safe: change it from one thread, e.g. the UI thread.
 */
public final class MapSheet {
    private final Map<FeatureId, SheetFeature> features = new LinkedHashMap<>();
    private final List<MapSheetListener> listeners = new CopyOnWriteArrayList<>();
    private long highestId;

    /** An id that no feature on this sheet has or had, for a feature about to be added. */
    public FeatureId nextId() {
        highestId++;
        return new FeatureId(highestId);
    }

    public void add(SheetFeature feature) {
        SheetGeometry.required(feature, "feature to add");
        if (features.containsKey(feature.id())) {
            throw new IllegalArgumentException("feature " + feature.id() + " is already on the sheet ("
                    + features.get(feature.id()).describe() + ")");
        }
        features.put(feature.id(), feature);
        highestId = Math.max(highestId, feature.id().value());
        fire(MapSheetEdit.adding(feature));
    }

    /** Removes the feature with {@code id} and returns it. */
    public SheetFeature remove(FeatureId id) {
        SheetFeature removed = require(id);
        features.remove(id);
        fire(MapSheetEdit.removing(removed));
        return removed;
    }

    /** Puts {@code edited} in place of the feature with its id and returns the one replaced. */
    public SheetFeature replace(SheetFeature edited) {
        SheetFeature replaced = require(SheetGeometry.required(edited, "replacement feature").id());
        features.put(edited.id(), edited);
        fire(MapSheetEdit.replacing(replaced, edited));
        return replaced;
    }

    public Optional<SheetFeature> find(FeatureId id) {
        return Optional.ofNullable(features.get(id));
    }

    /** The feature with {@code id}, which must be on the sheet. */
    public SheetFeature require(FeatureId id) {
        SheetFeature feature = features.get(SheetGeometry.required(id, "feature id"));
        if (feature == null) {
            throw new IllegalArgumentException("no feature " + id + " on the sheet");
        }
        return feature;
    }

    /** All features, in drawing order. */
    public List<SheetFeature> features() {
        return List.copyOf(features.values());
    }

    /** The features of one type, e.g. {@code ContourFeature.class}, in drawing order. */
    public <T extends SheetFeature> List<T> features(Class<T> type) {
        List<T> selected = new ArrayList<>();
        for (SheetFeature feature : features.values()) {
            if (type.isInstance(feature)) {
                selected.add(type.cast(feature));
            }
        }
        return selected;
    }

    /**
     * A copy holding the same (immutable) features and none of the listeners, for work off the thread that edits
     * this sheet, e.g. a topology check in a background job.
     */
    public MapSheet snapshot() {
        MapSheet copy = new MapSheet();
        copy.features.putAll(features);
        copy.highestId = highestId;
        return copy;
    }

    public void addListener(MapSheetListener listener) {
        listeners.add(SheetGeometry.required(listener, "map sheet listener"));
    }

    public void removeListener(MapSheetListener listener) {
        listeners.remove(listener);
    }

    private void fire(MapSheetEdit edit) {
        for (MapSheetListener listener : listeners) {
            listener.sheetChanged(this, edit);
        }
    }
}
