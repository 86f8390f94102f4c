package org.faultbench.digitize.georef;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** The georeference transform types a map sheet can be fitted with, by id, in registration order. */
public final class TransformCatalog {

    private final Map<String, TransformType> types = new LinkedHashMap<>();

    /** The built-in kinds, stiffest first, as the bundle's plugin.xml contributes them. */
    public static TransformCatalog withBuiltIns() {
        TransformCatalog catalog = new TransformCatalog();
        for (TransformKind kind : TransformKind.values()) {
            catalog.register(TransformType.of(kind));
        }
        return catalog;
    }

    /** @throws IllegalArgumentException when the id is already taken */
    public synchronized void register(TransformType type) {
        if (types.containsKey(type.id())) {
            throw new IllegalArgumentException("transform id '" + type.id() + "' is already registered by "
                    + types.get(type.id()).name());
        }
        types.put(type.id(), type);
    }

    public synchronized Optional<TransformType> find(String id) {
        return Optional.ofNullable(types.get(id));
    }

    public synchronized List<TransformType> list() {
        return List.copyOf(types.values());
    }

    public synchronized List<String> ids() {
        return List.copyOf(types.keySet());
    }
}
