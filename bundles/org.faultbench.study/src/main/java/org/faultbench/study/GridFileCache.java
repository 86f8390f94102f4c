package org.faultbench.study;

import java.io.IOException;
import java.lang.ref.SoftReference;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.LinkedHashMap;
import java.util.Map;

import org.faultbench.core.grid.RegularGrid;
import org.faultbench.core.units.LengthUnit;

/**
 * The grids an analysis file names, kept after reading so that re-reading the study after an edit of its
 * stratigraphy (every edit in the workbench goes through the reader) does not parse its grid files again on the
 * user's thread. A grid is reused only while its file has the same size and modification time and is read with the
 * same format and unit; grids are immutable, so sharing them is safe. Few and softly held: memory wins over speed.
 */
final class GridFileCache {
    /** Grids kept: a study names a reference top and a few isochores (common practice: one per mapped interval). */
    private static final int CAPACITY = 8;
    static final GridFileCache SHARED = new GridFileCache();

    /** What identifies one reading of one file version. */
    private record Key(Path file, String format, LengthUnit unit, long size, long modified) {
    }

    interface Loader {
        RegularGrid load() throws IOException;
    }

    private final Map<Key, SoftReference<RegularGrid>> grids = new LinkedHashMap<>(16, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<Key, SoftReference<RegularGrid>> eldest) {
            return size() > CAPACITY;
        }
    };

    /** The grid of {@code file} read with {@code format} and {@code unit}: kept, or loaded now and kept. */
    RegularGrid read(Path file, String format, LengthUnit unit, Loader loader) throws IOException {
        BasicFileAttributes attributes = Files.readAttributes(file, BasicFileAttributes.class);
        Key key = new Key(file.toAbsolutePath().normalize(), format, unit, attributes.size(),
                attributes.lastModifiedTime().toMillis());
        synchronized (grids) {
            SoftReference<RegularGrid> kept = grids.get(key);
            RegularGrid grid = kept == null ? null : kept.get();
            if (grid != null) {
                return grid;
            }
        }
        RegularGrid grid = loader.load();
        synchronized (grids) {
            grids.put(key, new SoftReference<>(grid));
        }
        return grid;
    }

    /** Number of grids held, for tests. */
    int size() {
        synchronized (grids) {
            return grids.size();
        }
    }
}
