package org.faultbench.sim;

import org.faultbench.core.uncertain.UncertainValue;

/**
 * A contributed sampled input as a study uses it: the contribution and the distribution the study draws it from
 * (its own or the analysis file's), already restricted to the contribution's bounds.
 */
public record ContributedInput(SampledInput input, UncertainValue distribution) {

    public ContributedInput {
        if (input == null) {
            throw new IllegalArgumentException("contributed sampled input missing");
        }
        distribution = (distribution == null ? input.distribution() : distribution).within(input.bounds(),
                "sampled input '" + input.id() + "'");
    }

    /** The contribution with its own distribution. */
    public static ContributedInput withDefault(SampledInput input) {
        return new ContributedInput(input, null);
    }

    public String id() {
        return input.id();
    }

    public InputTarget target() {
        return input.target();
    }
}
