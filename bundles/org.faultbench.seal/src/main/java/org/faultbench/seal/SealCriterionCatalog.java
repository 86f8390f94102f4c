package org.faultbench.seal;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The seal criteria a project can choose from, by id, in registration order. Plain Java so that the built-ins work
 * headless and an Eclipse extension point can register more later.
 */
public final class SealCriterionCatalog {

    private final Map<String, SealCriterion> criteria = new LinkedHashMap<>();

    /**
     * A catalog with the built-ins in their default configuration: juxtaposition only, SGR (Bretan et al. 2003),
     * SSF (maximum sealing 4) and CSP (uncalibrated, no seal credit until a threshold is set).
     */
    public static SealCriterionCatalog withBuiltIns() {
        SealCriterionCatalog catalog = new SealCriterionCatalog();
        catalog.register(new JuxtapositionOnlyCriterion());
        catalog.register(new ShaleGougeRatioCriterion());
        catalog.register(new ShaleSmearFactorCriterion());
        catalog.register(new ClaySmearPotentialCriterion());
        return catalog;
    }

    /** @throws IllegalArgumentException when the id is empty or already taken */
    public synchronized void register(SealCriterion criterion) {
        if (criterion == null || criterion.id() == null || criterion.id().isBlank()) {
            throw new IllegalArgumentException("seal criterion or its id is missing: " + criterion);
        }
        if (criteria.containsKey(criterion.id())) {
            throw new IllegalArgumentException("seal criterion id '" + criterion.id() + "' is already registered by "
                    + criteria.get(criterion.id()).name());
        }
        criteria.put(criterion.id(), criterion);
    }

    public synchronized Optional<SealCriterion> find(String id) {
        return Optional.ofNullable(criteria.get(id));
    }

    public synchronized List<SealCriterion> list() {
        return List.copyOf(criteria.values());
    }
}
