package org.faultbench.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Optional;

import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.seal.ShaleGougeRatioCriterion;
import org.junit.jupiter.api.Test;

class InputSamplerTest {

    @Test
    void everyLabelledInputTakesExactlyOneDraw() {
        TrapStudy study = SingleFaultDome.study(20, new ShaleGougeRatioCriterion(), UncertainValue.normal(1, 0.1),
                Optional.of(new AtticSetup("F1", UncertainValue.fixed(1060))));
        InputSampler sampler = new InputSampler(study);
        CountingUniforms rng = new CountingUniforms();
        sampler.sample(rng);
        // depth shift, throw scale, brine, oil, calibration, drainage depth, 4 units x (thickness, Vcl),
        // 4 units x (N/G, porosity, Sw, Bo)
        assertEquals(6 + 8 + 16, sampler.drawLabels().size());
        assertEquals(sampler.drawLabels().size(), rng.draws);
        assertEquals("thickness of Sand A", sampler.drawLabels().get(8));
    }

    @Test
    void aScriptedDrawMovesOnlyItsInput() {
        TrapStudy study = SingleFaultDome.study(20, new ShaleGougeRatioCriterion(), UncertainValue.normal(1, 0.1),
                Optional.empty());
        InputSampler sampler = new InputSampler(study);
        RealisationInputs median = sampler.sample(ScriptedUniforms.medians());
        RealisationInputs low = sampler.sample(ScriptedUniforms.moving(1, 0.1));
        // Normal(1, 0.1) at cumulative 0.10: 1 - 1.28155 * 0.1 (standard normal tables)
        assertEquals(1 - 0.128155, low.throwScale()[0], 1e-5);
        assertEquals(1.0, median.throwScale()[0], 1e-12);
        assertEquals(median.brineDensity(), low.brineDensity(), 0);
    }
}
