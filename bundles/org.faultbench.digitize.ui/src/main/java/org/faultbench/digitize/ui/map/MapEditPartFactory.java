package org.faultbench.digitize.ui.map;

import org.eclipse.gef.EditPart;
import org.eclipse.gef.EditPartFactory;
import org.faultbench.digitize.raster.ImagePyramid;
import org.faultbench.digitize.sketch.FeatureId;
import org.faultbench.digitize.ui.editing.MapDocument;

/** Edit parts of the map viewer: the sheet, its features (by id) and its control points (by id). */
final class MapEditPartFactory implements EditPartFactory {
    private final ImagePyramid pyramid;

    /** @param pyramid the scan's pyramid, or null without a scan */
    MapEditPartFactory(ImagePyramid pyramid) {
        this.pyramid = pyramid;
    }

    @Override
    public EditPart createEditPart(EditPart context, Object model) {
        if (model instanceof MapDocument document) {
            return new SheetEditPart(document, pyramid);
        }
        if (model instanceof FeatureId id) {
            return new FeatureEditPart(id);
        }
        if (model instanceof ControlPointKey key) {
            return new ControlPointEditPart(key);
        }
        throw new IllegalArgumentException("no edit part for " + model);
    }
}
