package org.faultbench.digitize.ui.editing;

import java.nio.file.Path;
import java.util.Objects;
import java.util.Optional;

import org.faultbench.digitize.sketch.MapSheet;

/**
 * What the map editor edits: the digitized sheet, the georeference of its scan, and the scan itself (optional: a
 * sheet can be edited without its scan). Digitizing defaults travel with it but are not saved.
 *
 * @param sheet the digitized features, in map metres
 * @param georeference control points and transform kind of the scan
 * @param scan the scanned map image, if any
 * @param defaults what new features get (horizon, next contour value, fault name)
 */
public record MapDocument(MapSheet sheet, Georeference georeference, Optional<Path> scan,
        DigitizingDefaults defaults) {

    public MapDocument {
        Objects.requireNonNull(sheet, "sheet");
        Objects.requireNonNull(georeference, "georeference");
        Objects.requireNonNull(scan, "scan");
        Objects.requireNonNull(defaults, "defaults");
    }
}
