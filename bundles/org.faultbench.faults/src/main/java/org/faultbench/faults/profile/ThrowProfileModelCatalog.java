package org.faultbench.faults.profile;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** The throw-profile shapes a project can fit, by id, in registration order. */
public final class ThrowProfileModelCatalog {

    /** Ids of the built-in shapes, in the order of {@link ThrowProfileModel#builtIns()}. */
    public static final List<String> BUILT_IN_IDS = List.of("elliptical", "bell", "linear-taper");

    private final Map<String, ThrowProfileModel> models = new LinkedHashMap<>();

    /** The built-ins under their ids, as the bundle's plugin.xml contributes them. */
    public static ThrowProfileModelCatalog withBuiltIns() {
        ThrowProfileModelCatalog catalog = new ThrowProfileModelCatalog();
        List<ThrowProfileModel> builtIns = ThrowProfileModel.builtIns();
        for (int i = 0; i < builtIns.size(); i++) {
            catalog.register(BUILT_IN_IDS.get(i), builtIns.get(i));
        }
        return catalog;
    }

    /** @throws IllegalArgumentException when the id is empty or already taken */
    public synchronized void register(String id, ThrowProfileModel model) {
        if (id == null || id.isBlank() || model == null) {
            throw new IllegalArgumentException("throw-profile model or its id is missing");
        }
        if (models.containsKey(id)) {
            throw new IllegalArgumentException("throw-profile model id '" + id + "' is already registered by "
                    + models.get(id).name());
        }
        models.put(id, model);
    }

    public synchronized Optional<ThrowProfileModel> find(String id) {
        return Optional.ofNullable(models.get(id));
    }

    public synchronized List<ThrowProfileModel> list() {
        return List.copyOf(models.values());
    }

    public synchronized List<String> ids() {
        return List.copyOf(models.keySet());
    }
}
