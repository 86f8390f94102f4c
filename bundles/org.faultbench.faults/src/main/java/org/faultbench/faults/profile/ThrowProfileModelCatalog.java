package org.faultbench.faults.profile;

import java.util.List;
import java.util.Optional;

import org.faultbench.core.extension.IdRegistry;

/** The throw-profile shapes a project can fit, by id, in registration order. */
public final class ThrowProfileModelCatalog {

    /** Ids of the built-in shapes, in the order of {@link ThrowProfileModel#builtIns()}. */
    public static final List<String> BUILT_IN_IDS = List.of("elliptical", "bell", "linear-taper");

    private final IdRegistry<ThrowProfileModel> models = new IdRegistry<>("throw-profile model", ThrowProfileModel::name);

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
    public void register(String id, ThrowProfileModel model) {
        models.register(id, model);
    }

    public Optional<ThrowProfileModel> find(String id) {
        return models.find(id);
    }

    public List<ThrowProfileModel> list() {
        return models.list();
    }

    public List<String> ids() {
        return models.ids();
    }
}
