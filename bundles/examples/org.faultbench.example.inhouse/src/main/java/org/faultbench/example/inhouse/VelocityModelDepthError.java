package org.faultbench.example.inhouse;

import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.sim.InputTarget;
import org.faultbench.sim.SampledInput;

/**
 * The depth error of a team's velocity model as an input of its own, so that the tornado ranks it apart from the
 * mapping error the study already carries as its depth shift. Both act on the depth of the reference horizon and
 * add up. The default spread, normal with mean 0 and standard deviation 8 m, is an invented example: a team sets it
 * from its own well ties, in the analysis file's {@code sampledInputs} entry.
 */
public final class VelocityModelDepthError implements SampledInput {
    public static final String ID = "example.velocity-depth-error";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String name() {
        return "velocity-model depth error";
    }

    @Override
    public UncertainValue distribution() {
        return UncertainValue.normal(0, 8);
    }

    @Override
    public InputTarget target() {
        return InputTarget.DEPTH_SHIFT;
    }
}
