package org.faultbench.digitize.ui.store;

import java.io.IOException;
import java.nio.file.Path;

/**
 * Reads and writes map-sheet files for the map editor. The editor knows only this interface; the product uses
 * {@link VersionedMapSheetStore} (the versioned map-sheet file of the study bundle).
 */
public interface MapSheetDocumentStore {

    /** @throws IOException naming the file, line and field when the file cannot be read */
    MapSheetDocument load(Path file) throws IOException;

    /** Writes {@code document} to {@code file} (and whatever companion files the format needs). */
    void save(Path file, MapSheetDocument document) throws IOException;

    /** Whether {@code file} looks like a file of this store (by name), as opposed to a scan image. */
    boolean handles(Path file);

    /** The file a sheet digitized on {@code scan} is saved to when it has none yet. */
    Path defaultFileFor(Path scan);
}
