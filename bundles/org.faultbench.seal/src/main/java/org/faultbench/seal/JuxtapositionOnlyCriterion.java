package org.faultbench.seal;

import java.util.EnumSet;
import java.util.Set;

import org.faultbench.core.LithologyClass;

/**
 * The conservative rule with no fault-rock credit: reservoir against reservoir leaks (0 Pa), anything else seals
 * (+infinity). Valid for every lithology; the usual choice for carbonates, where clay-based rules do not apply.
 */
public final class JuxtapositionOnlyCriterion implements SealCriterion {

    public static final String ID = "juxtaposition";

    private static final Set<LithologyClass> ALL = Set.copyOf(EnumSet.allOf(LithologyClass.class));

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String name() {
        return "Juxtaposition only";
    }

    @Override
    public Set<LithologyClass> validFor() {
        return ALL;
    }

    @Override
    public SealEvaluation evaluate(FaultPointContext ctx) {
        return SealEvaluation.juxtaposition(ctx.reservoirAgainstReservoir());
    }
}
