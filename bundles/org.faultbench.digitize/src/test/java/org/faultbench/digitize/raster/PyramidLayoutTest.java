package org.faultbench.digitize.raster;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Level sizes are ceil(size / 2^k); tiles per row ceil(levelSize / tileSize): hand calculations. */
class PyramidLayoutTest {
    private final PyramidLayout scan = new PyramidLayout(12_000, 9_000, 256);

    @Test
    void levelsHalveRoundingUpUntilOneTileHoldsTheLevel() {
        // 12000 → 6000 → 3000 → 1500 → 750 → 375 → 188 (≤ 256): 7 levels
        assertEquals(7, scan.levelCount());
        assertEquals(375, scan.levelWidth(5));
        assertEquals(282, scan.levelHeight(5)); // 9000 / 32 = 281.25
        assertEquals(188, scan.levelWidth(6)); // 12000 / 64 = 187.5
        assertEquals(141, scan.levelHeight(6)); // 9000 / 64 = 140.625
    }

    @Test
    void lastTileColumnAndRowAreTheRemainder() {
        assertEquals(47, scan.tilesAcross(0)); // 12000 / 256 = 46.875
        assertEquals(36, scan.tilesDown(0)); // 9000 / 256 = 35.16
        assertEquals(256, scan.tileWidth(0, 45));
        assertEquals(224, scan.tileWidth(0, 46)); // 12000 − 46·256
        assertEquals(40, scan.tileHeight(0, 35)); // 9000 − 35·256
    }

    @Test
    void totalCountsEveryLevel() {
        // 47·36 + 24·18 + 12·9 + 6·5 + 3·3 + 2·2 + 1·1 = 1692 + 432 + 108 + 30 + 9 + 4 + 1
        assertEquals(2276, scan.totalTiles());
    }

    @Test
    void imageSmallerThanATileHasOneLevel() {
        PyramidLayout small = new PyramidLayout(100, 256, 256);
        assertEquals(1, small.levelCount());
        assertEquals(1, small.totalTiles());
    }

    @Test
    void outOfRangeLevelAndTileAreRejectedWithTheirRange() {
        IllegalArgumentException level = assertThrows(IllegalArgumentException.class, () -> scan.levelWidth(7));
        assertTrue(level.getMessage().contains("0 to 6, got 7"), level.getMessage());
        IllegalArgumentException column = assertThrows(IllegalArgumentException.class, () -> scan.tileKey(0, 47, 0));
        assertTrue(column.getMessage().contains("column at level 0 must be 0 to 46, got 47"), column.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new PyramidLayout(0, 10, 256));
    }
}
