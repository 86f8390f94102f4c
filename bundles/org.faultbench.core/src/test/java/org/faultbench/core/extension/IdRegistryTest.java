package org.faultbench.core.extension;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class IdRegistryTest {
    private final IdRegistry<String> registry = new IdRegistry<>("widget", w -> "the " + w);

    @Test
    void keepsRegistrationOrderAndFindsById() {
        registry.register("b", "second");
        registry.register("a", "first");
        assertEquals(List.of("b", "a"), registry.ids());
        assertEquals(List.of("second", "first"), registry.list());
        assertEquals("first", registry.find("a").orElseThrow());
        assertTrue(registry.find("c").isEmpty());
        assertEquals(List.of("second"), registry.matching(w -> w.startsWith("s")));
    }

    @Test
    void refusesATakenOrMissingId() {
        registry.register("a", "first");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> registry.register("a", "other"));
        assertEquals("widget id 'a' is already registered by the first", e.getMessage());
        assertEquals("widget or its id is missing: nameless", assertThrows(IllegalArgumentException.class,
                () -> registry.register(" ", "nameless")).getMessage());
        assertThrows(IllegalArgumentException.class, () -> registry.register("z", null));
        assertEquals(List.of("first"), registry.list(), "nothing refused was kept");
    }
}
