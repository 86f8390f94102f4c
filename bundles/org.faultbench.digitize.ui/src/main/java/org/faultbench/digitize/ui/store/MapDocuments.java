package org.faultbench.digitize.ui.store;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.faultbench.digitize.georef.ControlPoint;
import org.faultbench.digitize.georef.TransformKind;
import org.faultbench.digitize.sketch.MapSheet;
import org.faultbench.digitize.ui.editing.DigitizingDefaults;
import org.faultbench.digitize.ui.editing.Georeference;
import org.faultbench.digitize.ui.editing.MapDocument;

/**
 * Opens what the editor is started on: a map-sheet file of the store, or a scan image with its control-point sidecar
 * (if any) and an empty sheet; and turns the editor's document back into what the store saves.
 */
public final class MapDocuments {

    private MapDocuments() {
    }

    /** The document for {@code file}; also returns where it will be saved. */
    public static Opened open(Path file, MapSheetDocumentStore store) throws IOException {
        if (store.handles(file)) {
            MapSheetDocument saved = store.load(file);
            return new Opened(new MapDocument(saved.sheet(), new Georeference(saved.transformKind(),
                    saved.controlPoints()), saved.scan(), new DigitizingDefaults()), file);
        }
        Path sidecar = ControlPointCsv.sidecarOf(file);
        List<ControlPoint> points = Files.exists(sidecar) ? ControlPointCsv.read(sidecar) : List.of();
        MapDocument document = new MapDocument(new MapSheet(), new Georeference(TransformKind.AFFINE, points),
                Optional.of(file.toAbsolutePath()), new DigitizingDefaults());
        return new Opened(document, store.defaultFileFor(file));
    }

    /** What the store writes for {@code document}. */
    public static MapSheetDocument toSaved(MapDocument document) {
        return new MapSheetDocument(document.sheet(), document.georeference().points(),
                document.georeference().kind(), document.scan());
    }

    /**
     * @param document the editor's document
     * @param saveTo the map-sheet file Save writes to
     */
    public record Opened(MapDocument document, Path saveTo) {
    }
}
