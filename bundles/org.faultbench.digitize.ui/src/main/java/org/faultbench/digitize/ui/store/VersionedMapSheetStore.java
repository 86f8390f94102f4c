package org.faultbench.digitize.ui.store;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Optional;

import org.eclipse.core.runtime.ILog;
import org.faultbench.study.MapSheetFile;
import org.faultbench.study.StudyFormatException;
import org.faultbench.study.store.MapSheetStore;
import org.faultbench.study.store.OpenedMapSheet;

/**
 * The map editor's store for the versioned map-sheet file ({@code *.mapsheet.json}, format "faultbench-mapsheet"):
 * every feature, the control points and the transform in one file, saved atomically with a backup and restored
 * from it after a crash (the repair is logged). The scan is kept relative to the file, so a workspace can move.
 */
public final class VersionedMapSheetStore implements MapSheetDocumentStore {
    static final String SUFFIX = ".mapsheet.json";
    private final MapSheetStore store = new MapSheetStore();

    @Override
    public MapSheetDocument load(Path file) throws IOException {
        try {
            OpenedMapSheet opened = store.open(file);
            if (opened.report().recovered()) {
                ILog.of(VersionedMapSheetStore.class).warn(opened.report().summary());
            }
            MapSheetFile content = opened.mapSheet();
            Optional<Path> scan = content.image().map(image -> file.toAbsolutePath().resolveSibling(image).normalize());
            return new MapSheetDocument(content.sheet(), content.controlPoints(), content.transform(), scan);
        } catch (StudyFormatException e) {
            throw new IOException(e.getMessage(), e);
        }
    }

    @Override
    public void save(Path file, MapSheetDocument document) throws IOException {
        Path folder = file.toAbsolutePath().getParent();
        Optional<String> image = document.scan()
                .map(scan -> folder.relativize(scan.toAbsolutePath()).toString().replace('\\', '/'));
        store.save(file, new MapSheetFile(image, document.transformKind(), document.controlPoints(), document.sheet()));
    }

    @Override
    public boolean handles(Path file) {
        return file.getFileName().toString().endsWith(SUFFIX);
    }

    @Override
    public Path defaultFileFor(Path scan) {
        String name = scan.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return scan.resolveSibling((dot > 0 ? name.substring(0, dot) : name) + SUFFIX);
    }
}
