package org.faultbench.digitize.ui.store;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

import org.faultbench.digitize.georef.ControlPoint;
import org.faultbench.digitize.georef.TransformKind;
import org.faultbench.digitize.sketch.MapSheet;

/**
 * What a map-sheet file holds: the digitized sheet, the control points of its scan, the transform fitted to them and
 * where the scan is.
 *
 * @param sheet the features
 * @param controlPoints the control points, in table order (copied)
 * @param transformKind the transform fitted to the enabled points
 * @param scan the scanned map, absolute; empty for a sheet without a scan
 */
public record MapSheetDocument(MapSheet sheet, List<ControlPoint> controlPoints, TransformKind transformKind,
        Optional<Path> scan) {

    public MapSheetDocument {
        Objects.requireNonNull(sheet, "sheet");
        controlPoints = List.copyOf(controlPoints);
        Objects.requireNonNull(transformKind, "transformKind");
        Objects.requireNonNull(scan, "scan");
    }
}
