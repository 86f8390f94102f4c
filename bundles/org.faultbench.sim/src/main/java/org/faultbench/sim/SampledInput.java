package org.faultbench.sim;

import org.faultbench.core.uncertain.Bounds;
import org.faultbench.core.uncertain.UncertainValue;

/**
 * An extra uncertain input contributed by a plug-in (extension point {@value SampledInputContributions#POINT}). A
 * study includes it by naming its id in the analysis file's {@code sampledInputs} list (optionally with its own
 * distribution); the simulator then draws it once per realisation, after the built-in inputs, and applies it to its
 * {@link #target()}. Installing a contribution never changes a study that does not name it.
 */
public interface SampledInput {

    String id();

    /** Name shown in tornado charts and reports. */
    String name();

    /** The default distribution, used when the analysis file gives none. */
    UncertainValue distribution();

    /** What the drawn value acts on. */
    InputTarget target();

    /** Values the target accepts; a distribution is truncated to them or rejected at load. Default: any number. */
    default Bounds bounds() {
        return Bounds.UNBOUNDED;
    }
}
