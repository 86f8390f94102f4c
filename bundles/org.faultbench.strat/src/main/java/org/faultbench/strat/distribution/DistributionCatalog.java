package org.faultbench.strat.distribution;

import java.util.List;
import java.util.Optional;

import org.faultbench.core.extension.IdRegistry;

/** The contributed parameterisations of uncertain inputs, by id, in registration order. */
public final class DistributionCatalog {

    /**
     * Keys the analysis file already gives a meaning (the distribution kinds and the isochore thickness); a
     * contribution may not take them.
     */
    public static final List<String> RESERVED_IDS = List.of("normal", "truncatedNormal", "uniform", "triangular",
            "lognormal", "isochore", "scale");

    private final IdRegistry<DistributionType> types = new IdRegistry<>("distribution", DistributionType::name);

    /** The built-ins, as the bundle's plugin.xml contributes them. */
    public static DistributionCatalog withBuiltIns() {
        DistributionCatalog catalog = new DistributionCatalog();
        BuiltInDistributions.TYPES.forEach(catalog::register);
        return catalog;
    }

    /** @throws IllegalArgumentException when the id is reserved or already taken */
    public void register(DistributionType type) {
        if (type != null && RESERVED_IDS.contains(type.id())) {
            throw new IllegalArgumentException("id '" + type.id() + "' is reserved by the analysis file format "
                    + RESERVED_IDS);
        }
        types.register(type == null ? null : type.id(), type);
    }

    public Optional<DistributionType> find(String id) {
        return types.find(id);
    }

    public List<DistributionType> list() {
        return types.list();
    }

    public List<String> ids() {
        return types.ids();
    }
}
