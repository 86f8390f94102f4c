package org.faultbench.sim;

import org.faultbench.core.uncertain.Bounds;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.seal.ShaleSmearFactorCriterion;

/**
 * The largest shale smear factor still taken as a continuous smear, as an uncertain input of the SSF criterion.
 * Default range uniform between 4 (Gibson 1994, the criterion's fixed default) and 7 (Lindsay et al. 1993, above
 * which they found smears may become incomplete); both limits from memory of those papers, and a study should narrow
 * the range against its own field data. At least 1: a smaller limit would call a throw thinner than the bed unsealed.
 */
public final class MaximumSealingSsfInput implements SampledInput {

    @Override
    public String id() {
        return ShaleSmearFactorCriterion.SAMPLED_MAXIMUM_ID;
    }

    @Override
    public String name() {
        return "maximum sealing SSF";
    }

    @Override
    public UncertainValue distribution() {
        return UncertainValue.uniform(ShaleSmearFactorCriterion.DEFAULT_MAXIMUM_SEALING_SSF, 7);
    }

    @Override
    public InputTarget target() {
        return InputTarget.CRITERION;
    }

    @Override
    public Bounds bounds() {
        return Bounds.atLeast(1);
    }
}
