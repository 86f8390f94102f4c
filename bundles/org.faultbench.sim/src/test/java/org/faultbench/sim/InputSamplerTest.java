package org.faultbench.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
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

    @Test
    void contributedInputsDrawAfterTheBuiltInsAndActOnTheirTargets() {
        TrapStudy plain = SingleFaultDome.study(20, new ShaleGougeRatioCriterion(), UncertainValue.normal(1, 0.1),
                Optional.empty());
        TrapStudy study = withInputs(plain,
                new ContributedInput(new Extra("depth", InputTarget.DEPTH_SHIFT), UncertainValue.uniform(10, 20)),
                new ContributedInput(new Extra("throw", InputTarget.THROW_SCALE), UncertainValue.fixed(2)),
                new ContributedInput(new Extra("log", InputTarget.THRESHOLD_LOG_SHIFT), UncertainValue.fixed(0.5)),
                new ContributedInput(new Extra("rule", InputTarget.CRITERION), UncertainValue.uniform(4, 7)));
        InputSampler before = new InputSampler(plain);
        InputSampler sampler = new InputSampler(study);
        int builtIn = before.drawLabels().size();
        assertEquals(before.drawLabels(), sampler.drawLabels().subList(0, builtIn));
        assertEquals(List.of("extra depth", "extra throw", "extra log", "extra rule"),
                sampler.drawLabels().subList(builtIn, builtIn + 4));
        CountingUniforms rng = new CountingUniforms();
        sampler.sample(rng);
        assertEquals(builtIn + 4, rng.draws, "one draw per contributed input");

        RealisationInputs base = before.sample(ScriptedUniforms.medians());
        RealisationInputs median = sampler.sample(ScriptedUniforms.medians());
        assertEquals(base.depthShift() + 15, median.depthShift(), 1e-12, "median of uniform(10, 20) added");
        assertEquals(2 * base.throwScale()[0], median.throwScale()[0], 1e-12);
        assertEquals(base.calibrationShift() + 0.5, median.calibrationShift(), 1e-12);
        assertEquals(5.5, median.criterionValues().value("rule").getAsDouble(), 1e-12);
        assertTrue(base.criterionValues().isEmpty());
        RealisationInputs high = sampler.sample(ScriptedUniforms.moving(builtIn + 3, 0.9));
        assertEquals(4 + 0.9 * 3, high.criterionValues().value("rule").getAsDouble(), 1e-12);
        assertEquals(median.depthShift(), high.depthShift(), 0, "only the moved input changes");
    }

    static TrapStudy withInputs(TrapStudy s, ContributedInput... inputs) {
        return new TrapStudy(s.name(), s.stratigraphy(), s.referenceTop(), s.compartment(), s.faults(), s.fluids(),
                s.seal(), s.depthUncertainty(), s.userSpillDepth(), s.topSealCapacity(), s.attic(), List.of(inputs));
    }

    record Extra(String id, InputTarget target) implements SampledInput {
        public String name() {
            return "extra " + id;
        }

        public UncertainValue distribution() {
            return UncertainValue.fixed(0);
        }
    }
}
