package org.faultbench.juxtaposition.paint;

import java.util.List;
import java.util.Optional;

import org.faultbench.core.extension.IdRegistry;

/** The painters the Allan diagram offers, by id, in registration order. */
public final class AttributePainterCatalog {

    private final IdRegistry<AttributePainter> painters = new IdRegistry<>("attribute painter", AttributePainter::name);

    /** The built-ins, as the bundle's plugin.xml contributes them. */
    public static AttributePainterCatalog withBuiltIns() {
        AttributePainterCatalog catalog = new AttributePainterCatalog();
        BuiltInPainters.painters().forEach(catalog::register);
        return catalog;
    }

    /** @throws IllegalArgumentException when the id is already taken */
    public void register(AttributePainter painter) {
        painters.register(painter == null ? null : painter.id(), painter);
    }

    public Optional<AttributePainter> find(String id) {
        return painters.find(id);
    }

    public List<AttributePainter> list() {
        return painters.list();
    }

    public List<String> ids() {
        return painters.ids();
    }
}
