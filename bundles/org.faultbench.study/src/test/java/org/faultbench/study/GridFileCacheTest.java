package org.faultbench.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.concurrent.atomic.AtomicInteger;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.core.units.LengthUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class GridFileCacheTest {
    @TempDir
    Path dir;

    private final GridFileCache cache = new GridFileCache();
    private final AtomicInteger loads = new AtomicInteger();

    private RegularGrid read(Path file, LengthUnit unit) throws IOException {
        return cache.read(file, "esri-ascii", unit, () -> {
            loads.incrementAndGet();
            return new RegularGrid(new GridGeometry(2, 2, 0, 0, 1, 1), new double[] { loads.get(), 0, 0, 0 });
        });
    }

    @Test
    void aFileIsParsedOnceWhileItIsUnchanged() throws IOException {
        Path file = Files.writeString(dir.resolve("top.asc"), "grid");
        RegularGrid first = read(file, LengthUnit.METRE);
        assertSame(first, read(file, LengthUnit.METRE));
        assertSame(first, read(dir.resolve("./top.asc"), LengthUnit.METRE), "the same file by another path");
        assertEquals(1, loads.get());
    }

    @Test
    void aChangedFileOrAnotherUnitIsReadAgain() throws IOException {
        Path file = Files.writeString(dir.resolve("top.asc"), "grid");
        RegularGrid metres = read(file, LengthUnit.METRE);
        assertNotSame(metres, read(file, LengthUnit.FOOT), "feet give other depths");
        Files.writeString(file, "grid, edited");
        Files.setLastModifiedTime(file, FileTime.fromMillis(Files.getLastModifiedTime(file).toMillis() + 2000));
        assertNotSame(metres, read(file, LengthUnit.METRE), "a new version of the file");
        assertEquals(3, loads.get());
    }

    @Test
    void holdsAFewGridsOnly() throws IOException {
        for (int i = 0; i < 20; i++) {
            read(Files.writeString(dir.resolve("g" + i + ".asc"), "grid"), LengthUnit.METRE);
        }
        assertEquals(8, cache.size());
    }
}
