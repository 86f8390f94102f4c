package org.faultbench.digitize.raster;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** 2×2 box-filter reduction, channel by channel, rounded half up: hand calculations (common practice). */
class TilePixelsTest {

    private static int grey(int value) {
        return 0xFF000000 | value << 16 | value << 8 | value;
    }

    @Test
    void oddEdgesAverageOnlyThePixelsThatExist() {
        TilePixels tile = new TilePixels(3, 3, new int[] {
                grey(0), grey(10), grey(100),
                grey(20), grey(31), grey(201),
                grey(7), grey(8), grey(255) });
        TilePixels half = tile.halved();
        assertEquals(2, half.width());
        assertEquals(2, half.height());
        // (0+10+20+31)/4 = 15.25 → 15; (100+201)/2 = 150.5 → 151; (7+8)/2 = 7.5 → 8; 255 alone
        assertArrayEquals(new int[] { grey(15), grey(151), grey(8), grey(255) }, half.argb());
    }

    @Test
    void channelsAndAlphaAreAveragedSeparately() {
        TilePixels tile = new TilePixels(2, 1, new int[] { 0xFF_FF_00_10, 0x00_00_FF_11 });
        // alpha (255+0)/2 = 127.5 → 128 = 0x80; red 0x80; green 0x80; blue (16+17)/2 = 16.5 → 17 = 0x11
        assertArrayEquals(new int[] { 0x80_80_80_11 }, tile.halved().argb());
    }
}
