package org.faultbench.example.inhouse;

import static org.faultbench.core.extension.ElementStub.element;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.faultbench.core.extension.ElementStub;
import org.faultbench.sim.ContributedInput;
import org.faultbench.sim.InputTarget;
import org.faultbench.sim.SampledInput;
import org.faultbench.sim.SampledInputContributions;
import org.junit.jupiter.api.Test;

class VelocityModelDepthErrorTest {

    @Test
    void shiftsTheReferenceHorizonWithItsOwnSpread() {
        ContributedInput input = ContributedInput.withDefault(new VelocityModelDepthError());
        assertEquals(InputTarget.DEPTH_SHIFT, input.target());
        // Normal(0, 8) at cumulative 0.9: 8 * 1.28155 (standard normal tables, z at 0.90 = 1.28155)
        assertEquals(8 * 1.28155, input.distribution().quantile(0.9), 1e-4);
        assertEquals(0, input.distribution().nominal(), 0);
    }

    @Test
    void isContributedUnderItsId() throws Exception {
        String pluginXml = Files.readString(Path.of("plugin.xml"));
        assertTrue(pluginXml.contains("<input id=\"example.velocity-depth-error\" name=\"velocity-model depth error\""));
        Map<String, SampledInput> inputs = new LinkedHashMap<>(SampledInputContributions.builtIns());
        VelocityModelDepthError contribution = new VelocityModelDepthError();
        assertEquals(List.of(), SampledInputContributions.readInto(inputs, ElementStub.all(
                element("input").by("org.faultbench.example.inhouse").with("id", VelocityModelDepthError.ID)
                        .with("name", "velocity-model depth error").creates("class", contribution))));
        assertSame(contribution, inputs.get(VelocityModelDepthError.ID));
    }
}
