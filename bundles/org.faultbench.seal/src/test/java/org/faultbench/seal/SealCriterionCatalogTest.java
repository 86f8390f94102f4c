package org.faultbench.seal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;

import org.faultbench.core.LithologyClass;
import org.junit.jupiter.api.Test;

class SealCriterionCatalogTest {

    @Test
    void holdsTheBuiltInsInOrder() {
        SealCriterionCatalog catalog = SealCriterionCatalog.withBuiltIns();
        assertEquals(List.of("juxtaposition", "sgr", "ssf", "csp"),
                catalog.list().stream().map(SealCriterion::id).toList());
        assertTrue(catalog.find("sgr").orElseThrow() instanceof ShaleGougeRatioCriterion);
        assertTrue(catalog.find("nothing").isEmpty());
    }

    @Test
    void registersMoreButRejectsATakenId() {
        SealCriterionCatalog catalog = SealCriterionCatalog.withBuiltIns();
        catalog.register(new SealCriterion() {
            @Override
            public String id() {
                return "carbonate-table";
            }

            @Override
            public String name() {
                return "Carbonate fault-rock table";
            }

            @Override
            public Set<LithologyClass> validFor() {
                return Set.of(LithologyClass.CARBONATE);
            }

            @Override
            public SealEvaluation evaluate(FaultPointContext ctx) {
                return SealEvaluation.juxtaposition(false);
            }
        });
        assertEquals(5, catalog.list().size());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> catalog.register(new ShaleSmearFactorCriterion(7)));
        assertEquals("seal criterion id 'ssf' is already registered by Shale smear factor (SSF)", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> catalog.register(null));
    }
}
