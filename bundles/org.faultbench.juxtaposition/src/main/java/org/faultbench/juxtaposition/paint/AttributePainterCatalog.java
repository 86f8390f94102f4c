package org.faultbench.juxtaposition.paint;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** The painters the Allan diagram offers, by id, in registration order. */
public final class AttributePainterCatalog {

    private final Map<String, AttributePainter> painters = new LinkedHashMap<>();

    /** The built-ins, as the bundle's plugin.xml contributes them. */
    public static AttributePainterCatalog withBuiltIns() {
        AttributePainterCatalog catalog = new AttributePainterCatalog();
        BuiltInPainters.painters().forEach(catalog::register);
        return catalog;
    }

    /** @throws IllegalArgumentException when the id is already taken */
    public synchronized void register(AttributePainter painter) {
        if (painters.containsKey(painter.id())) {
            throw new IllegalArgumentException("attribute painter id '" + painter.id() + "' is already registered by "
                    + painters.get(painter.id()).name());
        }
        painters.put(painter.id(), painter);
    }

    public synchronized Optional<AttributePainter> find(String id) {
        return Optional.ofNullable(painters.get(id));
    }

    public synchronized List<AttributePainter> list() {
        return List.copyOf(painters.values());
    }

    public synchronized List<String> ids() {
        return List.copyOf(painters.keySet());
    }
}
