package org.faultbench.juxtaposition.paint;

import java.util.List;
import java.util.Optional;

import org.faultbench.core.extension.IdRegistry;

/** The overlays the Allan diagram can draw, by id, in registration order. */
public final class OverlayCatalog {

    private final IdRegistry<Overlay> overlays = new IdRegistry<>("overlay", Overlay::name);

    /** The built-in overlay, as the bundle's plugin.xml contributes it. */
    public static OverlayCatalog withBuiltIns() {
        OverlayCatalog catalog = new OverlayCatalog();
        catalog.register(new ShallowestWindowOverlay());
        return catalog;
    }

    /** @throws IllegalArgumentException when the id is already taken */
    public void register(Overlay overlay) {
        overlays.register(overlay == null ? null : overlay.id(), overlay);
    }

    public Optional<Overlay> find(String id) {
        return overlays.find(id);
    }

    public List<Overlay> list() {
        return overlays.list();
    }

    public List<String> ids() {
        return overlays.ids();
    }
}
