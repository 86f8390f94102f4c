package org.faultbench.seal;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.faultbench.core.LithologyClass;

/**
 * A rule that turns the geometry and stratigraphy at a fault point into a seal attribute and a threshold pressure.
 * Implementations are stateless with respect to points, so one instance evaluates a whole fault.
 */
public interface SealCriterion {

    /** Stable identifier, used to register and find the criterion (e.g. "sgr"). */
    String id();

    /** Name shown to the user. */
    String name();

    /** Lithology classes the rule was calibrated for. */
    Set<LithologyClass> validFor();

    SealEvaluation evaluate(FaultPointContext ctx);

    /**
     * This criterion with the settings an analysis file gives in {@code seal.parameters}, for contributed criteria
     * (the built-ins read their own fields). Returns a new instance, since one registered instance is shared; the
     * default accepts no parameters.
     *
     * @throws IllegalArgumentException when a parameter is unknown or invalid; the message starts with its key
     */
    default SealCriterion configured(CriterionParameters parameters) {
        parameters.requireOnly(List.of());
        return this;
    }

    /**
     * This criterion for one Monte Carlo realisation, given what the realisation drew for the contributed sampled
     * inputs that act on the criterion (extension point {@code org.faultbench.sim.sampledInputs}, target
     * {@code criterion}). Returns a new instance when a value changes a setting, since one instance is shared; the
     * default ignores the values. Inputs absent from {@code values} leave the criterion's own setting.
     *
     * @throws IllegalArgumentException when a value is outside what the setting accepts
     */
    default SealCriterion forRealisation(SampledValues values) {
        return this;
    }

    /** One warning for each unit in the throw window whose lithology the criterion is not valid for. */
    default List<ApplicabilityWarning> applicabilityWarnings(FaultPointContext ctx) {
        ThrowWindow window = ThrowWindow.of(ctx);
        List<ApplicabilityWarning> warnings = new ArrayList<>();
        for (int index : window.unitsInside()) {
            LithologyClass lithology = ctx.footwallColumn().unit(index).lithology();
            if (!validFor().contains(lithology)) {
                warnings.add(ApplicabilityWarning.of(this, ctx.footwallColumn().unit(index), window));
            }
        }
        return List.copyOf(warnings);
    }
}
