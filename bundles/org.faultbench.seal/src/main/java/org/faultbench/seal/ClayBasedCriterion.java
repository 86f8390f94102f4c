package org.faultbench.seal;

import java.util.Arrays;
import java.util.Set;
import java.util.stream.Collectors;

import org.faultbench.core.LithologyClass;

/**
 * Common frame of the clay-based (fault-rock) criteria SGR, SSF and CSP, valid for clastic units only:
 * <ul>
 * <li>zero throw means no fault rock: the attribute is undefined and the point is judged by juxtaposition;</li>
 * <li>otherwise the throw window must lie inside the footwall column, and the attribute is computed from it;</li>
 * <li>the fault-rock threshold applies where reservoir faces reservoir; elsewhere the point seals by juxtaposition
 * (threshold +infinity) and the attribute is still reported.</li>
 * </ul>
 */
public abstract class ClayBasedCriterion implements SealCriterion {

    private static final Set<LithologyClass> CLASTIC = Arrays.stream(LithologyClass.values())
            .filter(LithologyClass::isClastic).collect(Collectors.toUnmodifiableSet());

    @Override
    public final Set<LithologyClass> validFor() {
        return CLASTIC;
    }

    @Override
    public final SealEvaluation evaluate(FaultPointContext ctx) {
        if (ctx.faultThrow() == 0) {
            return SealEvaluation.juxtaposition(ctx.reservoirAgainstReservoir());
        }
        ThrowWindow window = ThrowWindow.of(ctx);
        window.requireInsideColumn(name());
        double value = attribute(window);
        if (!ctx.reservoirAgainstReservoir()) {
            return new SealEvaluation(attributeName(), attributeUnit(), value, Double.POSITIVE_INFINITY,
                    SealBasis.JUXTAPOSITION);
        }
        return new SealEvaluation(attributeName(), attributeUnit(), value, faultRockThreshold(value, ctx),
                SealBasis.FAULT_ROCK);
    }

    /** Short name of the attribute, e.g. "SGR". */
    protected abstract String attributeName();

    /** Unit of the attribute, empty when dimensionless. */
    protected abstract String attributeUnit();

    /** The attribute over a throw window of positive length inside the column. */
    protected abstract double attribute(ThrowWindow window);

    /** Threshold pressure, Pa, of the fault rock with this attribute at this point. */
    protected abstract double faultRockThreshold(double attribute, FaultPointContext ctx);
}
