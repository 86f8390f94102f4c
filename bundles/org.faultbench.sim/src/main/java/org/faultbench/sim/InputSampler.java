package org.faultbench.sim;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.apache.commons.math3.random.RandomGenerator;
import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.seal.SampledValues;
import org.faultbench.strat.ColumnDraw;
import org.faultbench.strat.StratUnit;

/**
 * Draws the inputs of a realisation in one fixed order, one uniform draw per scalar input (fixed inputs included),
 * so that every draw index means the same input in every realisation. {@link #drawLabels()} names the draws in that
 * order; the tornado analysis moves one draw at a time.
 *
 * <p>Order: depth shift; throw scale per fault; brine density; trapped-fluid density; calibration shift; user spill
 * depth, top-seal capacity and drainage depth when the study has them; per unit thickness and Vcl; per unit N/G,
 * porosity, Sw and Bo; the study's contributed sampled inputs in the study's order (none: the draws of a study
 * without them are unchanged); then the residual depth field's lattice (not labelled: it is not a tornado input).
 * Contributed values act after all draws, on the target each declares ({@link InputTarget}).
 */
public final class InputSampler {
    private final TrapStudy study;
    private final List<String> labels;
    private final double[] extent;

    public InputSampler(TrapStudy study) {
        this.study = study;
        GridGeometry g = study.referenceTop().geometry();
        this.extent = new double[] { g.x(0), g.x(g.nx() - 1), g.y(0), g.y(g.ny() - 1) };
        this.labels = Collections.unmodifiableList(buildLabels());
    }

    private List<String> buildLabels() {
        List<String> names = new ArrayList<>();
        names.add("depth shift of the reference horizon");
        for (BoundingFault f : study.faults()) {
            names.add("throw scale of fault " + f.id());
        }
        names.add("brine density");
        names.add("trapped-fluid density");
        names.add("seal calibration shift");
        study.userSpillDepth().ifPresent(v -> names.add("spill depth (user)"));
        study.topSealCapacity().ifPresent(v -> names.add("top-seal capacity"));
        study.attic().ifPresent(v -> names.add("well drainage depth"));
        for (StratUnit unit : study.stratigraphy().units()) {
            names.add("thickness of " + unit.name());
            names.add("Vcl of " + unit.name());
        }
        for (StratUnit unit : study.stratigraphy().units()) {
            names.add("N/G of " + unit.name());
            names.add("porosity of " + unit.name());
            names.add("Sw of " + unit.name());
            names.add("Bo of " + unit.name());
        }
        for (ContributedInput c : study.contributedInputs()) {
            names.add(c.input().name());
        }
        return names;
    }

    /** Names of the labelled draws, in draw order. */
    public List<String> drawLabels() {
        return labels;
    }

    public RealisationInputs sample(RandomGenerator rng) {
        double shift = study.depthUncertainty().shift().sample(rng);
        double[] throwScale = new double[study.faults().size()];
        for (int f = 0; f < throwScale.length; f++) {
            throwScale[f] = study.faults().get(f).throwScale().sample(rng);
        }
        double brine = study.fluids().brineDensity().sample(rng);
        double hydrocarbon = study.fluids().hydrocarbonDensity().sample(rng);
        double calibration = study.seal().calibrationShift().sample(rng);
        double spill = optional(study.userSpillDepth().orElse(null), rng);
        double topSeal = optional(study.topSealCapacity().orElse(null), rng);
        double drainage = optional(study.attic().map(AtticSetup::drainageDepth).orElse(null), rng);
        ColumnDraw columns = study.stratigraphy().sampleDraw(rng);
        var properties = study.stratigraphy().sampleReservoirProperties(rng);
        List<ContributedInput> contributed = study.contributedInputs();
        Map<String, Double> criterionValues = contributed.isEmpty() ? Map.of() : new HashMap<>();
        for (ContributedInput c : contributed) {
            double value = c.distribution().sample(rng);
            switch (c.target()) {
                case DEPTH_SHIFT -> shift += value;
                case THROW_SCALE -> scaleAll(throwScale, value);
                case THRESHOLD_LOG_SHIFT -> calibration += value;
                case CRITERION -> criterionValues.put(c.id(), value);
            }
        }
        CorrelatedResidualField residual = null;
        DepthUncertainty depth = study.depthUncertainty();
        if (depth.hasResidual()) {
            residual = CorrelatedResidualField.sample(extent[0], extent[1], extent[2], extent[3],
                    depth.correlationLength(), depth.residualStandardDeviation(), rng);
        }
        return new RealisationInputs(shift, throwScale, brine, hydrocarbon, calibration, spill, topSeal, drainage,
                columns.representative(), properties, residual, columns, SampledValues.of(criterionValues));
    }

    private static void scaleAll(double[] throwScale, double factor) {
        for (int f = 0; f < throwScale.length; f++) {
            throwScale[f] *= factor;
        }
    }

    private static double optional(UncertainValue value, RandomGenerator rng) {
        return value == null ? Double.NaN : value.sample(rng);
    }
}
