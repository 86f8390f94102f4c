package org.faultbench.sim;

import org.faultbench.core.uncertain.UncertainValue;

/**
 * An extra uncertain input contributed by a plug-in (extension point
 * {@value SampledInputContributions#POINT}). Seam only: the simulator does not draw these yet; see
 * {@link SampledInputContributions}.
 */
public interface SampledInput {

    String id();

    String name();

    /** The input's distribution; its nominal value is the base case. */
    UncertainValue distribution();
}
