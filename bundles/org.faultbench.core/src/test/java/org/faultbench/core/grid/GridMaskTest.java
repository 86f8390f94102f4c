package org.faultbench.core.grid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class GridMaskTest {
    private final GridGeometry g = new GridGeometry(3, 2, 0, 0, 10, 10);

    @Test
    void flagsAreCopiedAndCounted() {
        boolean[] flags = {true, false, false, true, true, false};
        GridMask mask = GridMask.of(g, flags);
        flags[1] = true;
        assertFalse(mask.contains(1, 0));
        assertTrue(mask.contains(1, 1));
        assertTrue(mask.contains(3));
        assertEquals(3, mask.count());
    }

    @Test
    void complementAllAndNone() {
        GridMask mask = GridMask.of(g, new boolean[] {true, false, false, true, true, false});
        assertEquals(3, mask.not().count());
        assertTrue(mask.not().contains(1, 0));
        assertEquals(6, GridMask.all(g).count());
        assertEquals(0, GridMask.none(g).count());
    }

    @Test
    void wrongFlagCountIsRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> GridMask.of(g, new boolean[4]));
        assertTrue(e.getMessage().contains("needs 6 flags, was 4"), e.getMessage());
    }
}
