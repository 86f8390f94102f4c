package org.faultbench.seal;

import java.util.List;
import java.util.Optional;

import org.faultbench.core.extension.IdRegistry;

/**
 * The seal criteria a project can choose from, by id, in registration order. Plain Java so that the built-ins work
 * headless and an Eclipse extension point can register more later.
 */
public final class SealCriterionCatalog {

    private final IdRegistry<SealCriterion> criteria = new IdRegistry<>("seal criterion", SealCriterion::name);

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
    public void register(SealCriterion criterion) {
        criteria.register(criterion == null ? null : criterion.id(), criterion);
    }

    public Optional<SealCriterion> find(String id) {
        return criteria.find(id);
    }

    public List<SealCriterion> list() {
        return criteria.list();
    }
}
