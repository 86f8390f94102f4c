package org.faultbench.study;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

import org.faultbench.digitize.georef.ControlPoint;
import org.faultbench.digitize.georef.TransformKind;
import org.faultbench.digitize.sketch.MapSheet;

/**
 * What the map editor saves and reopens (format "faultbench-mapsheet", see DEVELOPERS.md): the digitized sheet and
 * how its scan is georeferenced.
 *
 * @param image the scanned map, relative to the map-sheet file's folder; empty for a sheet drawn without a scan
 * @param transform the pixel-to-map transform fitted to the control points
 * @param controlPoints the georeference control points, enabled or not
 * @param sheet the digitized features
 */
public record MapSheetFile(Optional<String> image, TransformKind transform, List<ControlPoint> controlPoints,
        MapSheet sheet) {
    public MapSheetFile {
        Objects.requireNonNull(image, "image");
        Objects.requireNonNull(transform, "transform kind");
        controlPoints = List.copyOf(controlPoints);
        Objects.requireNonNull(sheet, "map sheet");
    }
}
