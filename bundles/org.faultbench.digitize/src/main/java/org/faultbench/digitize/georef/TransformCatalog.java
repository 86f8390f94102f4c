package org.faultbench.digitize.georef;

import java.util.List;
import java.util.Optional;

import org.faultbench.core.extension.IdRegistry;

/** The georeference transform types a map sheet can be fitted with, by id, in registration order. */
public final class TransformCatalog {

    private final IdRegistry<TransformType> types = new IdRegistry<>("transform", TransformType::name);

    /** The built-in kinds, stiffest first, as the bundle's plugin.xml contributes them. */
    public static TransformCatalog withBuiltIns() {
        TransformCatalog catalog = new TransformCatalog();
        for (TransformKind kind : TransformKind.values()) {
            catalog.register(TransformType.of(kind));
        }
        return catalog;
    }

    /** @throws IllegalArgumentException when the id is already taken */
    public void register(TransformType type) {
        types.register(type == null ? null : type.id(), type);
    }

    public Optional<TransformType> find(String id) {
        return types.find(id);
    }

    public List<TransformType> list() {
        return types.list();
    }

    public List<String> ids() {
        return types.ids();
    }
}
