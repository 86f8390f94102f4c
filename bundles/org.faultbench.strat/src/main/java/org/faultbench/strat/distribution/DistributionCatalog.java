package org.faultbench.strat.distribution;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** The contributed parameterisations of uncertain inputs, by id, in registration order. */
public final class DistributionCatalog {

    /**
     * Keys the analysis file already gives a meaning (the distribution kinds and the isochore thickness); a
     * contribution may not take them.
     */
    public static final List<String> RESERVED_IDS = List.of("normal", "truncatedNormal", "uniform", "triangular",
            "lognormal", "isochore", "scale");

    private final Map<String, DistributionType> types = new LinkedHashMap<>();

    /** The built-ins, as the bundle's plugin.xml contributes them. */
    public static DistributionCatalog withBuiltIns() {
        DistributionCatalog catalog = new DistributionCatalog();
        BuiltInDistributions.TYPES.forEach(catalog::register);
        return catalog;
    }

    /** @throws IllegalArgumentException when the id is reserved or already taken */
    public synchronized void register(DistributionType type) {
        if (RESERVED_IDS.contains(type.id())) {
            throw new IllegalArgumentException("id '" + type.id() + "' is reserved by the analysis file format "
                    + RESERVED_IDS);
        }
        if (types.containsKey(type.id())) {
            throw new IllegalArgumentException("distribution id '" + type.id() + "' is already registered by "
                    + types.get(type.id()).name());
        }
        types.put(type.id(), type);
    }

    public synchronized Optional<DistributionType> find(String id) {
        return Optional.ofNullable(types.get(id));
    }

    public synchronized List<DistributionType> list() {
        return List.copyOf(types.values());
    }

    public synchronized List<String> ids() {
        return List.copyOf(types.keySet());
    }
}
