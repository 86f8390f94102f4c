package org.faultbench.juxtaposition.paint;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** The overlays the Allan diagram can draw, by id, in registration order. */
public final class OverlayCatalog {

    private final Map<String, Overlay> overlays = new LinkedHashMap<>();

    /** The built-in overlay, as the bundle's plugin.xml contributes it. */
    public static OverlayCatalog withBuiltIns() {
        OverlayCatalog catalog = new OverlayCatalog();
        catalog.register(new ShallowestWindowOverlay());
        return catalog;
    }

    /** @throws IllegalArgumentException when the id is already taken */
    public synchronized void register(Overlay overlay) {
        if (overlays.containsKey(overlay.id())) {
            throw new IllegalArgumentException("overlay id '" + overlay.id() + "' is already registered by "
                    + overlays.get(overlay.id()).name());
        }
        overlays.put(overlay.id(), overlay);
    }

    public synchronized Optional<Overlay> find(String id) {
        return Optional.ofNullable(overlays.get(id));
    }

    public synchronized List<Overlay> list() {
        return List.copyOf(overlays.values());
    }

    public synchronized List<String> ids() {
        return List.copyOf(overlays.keySet());
    }
}
