package org.faultbench.study.store;

import java.io.IOException;
import java.nio.file.Path;

import org.faultbench.study.MapSheetFile;
import org.faultbench.study.MapSheetFileFormat;
import org.faultbench.study.StudyFormatException;

/** Opens and saves map-sheet files through the {@link AtomicFileStore}, so the map editor never loses a sheet. */
public final class MapSheetStore {
    private final AtomicFileStore store = new AtomicFileStore();
    private final MapSheetFileFormat format = new MapSheetFileFormat();

    public OpenedMapSheet open(Path file) throws StudyFormatException {
        StoredContent stored;
        try {
            stored = store.open(file, content -> format.read(content, file.toString()));
        } catch (IOException e) {
            throw new StudyFormatException(file.toString(), "", e.getMessage(), e);
        }
        return new OpenedMapSheet(format.read(stored.content(), file.toString()), stored.report());
    }

    public void save(Path file, MapSheetFile mapSheet) throws IOException {
        store.save(file, format.write(mapSheet));
    }
}
