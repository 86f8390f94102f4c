package org.faultbench.benchmarks;

import java.util.concurrent.TimeUnit;

import org.eclipse.core.runtime.NullProgressMonitor;
import org.faultbench.seal.BretanCapacity;
import org.faultbench.seal.JuxtapositionOnlyCriterion;
import org.faultbench.seal.ShaleGougeRatioCriterion;
import org.faultbench.sim.MonteCarloSimulator;
import org.faultbench.sim.SimulationResult;
import org.faultbench.sim.SimulationSettings;
import org.faultbench.sim.TrapStudy;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The performance targets of the simulator: one complete run of {@value #REALISATIONS} realisations of
 * {@link ThreeFaultCompartment} (3 faults × 1,000 columns, 12 units), on as many threads as the machine has
 * processors, once with juxtaposition only and once with shale gouge ratio and the Bretan et al. (2003) envelope.
 * Each operation is a whole run as a user starts it (base case, tornado, realisations, statistics and leak maps),
 * timed once per iteration.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(2)
@Warmup(iterations = 3)
@Measurement(iterations = 5)
public class MonteCarloBenchmark {
    public static final int REALISATIONS = 10_000;
    private static final long SEED = 20_240_611L;

    private TrapStudy juxtapositionStudy;
    private TrapStudy sgrStudy;

    @Setup
    public void buildStudies() {
        juxtapositionStudy = ThreeFaultCompartment.study(new JuxtapositionOnlyCriterion());
        sgrStudy = ThreeFaultCompartment.study(new ShaleGougeRatioCriterion(new BretanCapacity()));
    }

    @Benchmark
    public SimulationResult juxtapositionOnly() {
        return run(juxtapositionStudy);
    }

    @Benchmark
    public SimulationResult shaleGougeRatioWithBretan() {
        return run(sgrStudy);
    }

    private static SimulationResult run(TrapStudy study) {
        SimulationSettings settings = new SimulationSettings(REALISATIONS, SEED,
                Runtime.getRuntime().availableProcessors(), SimulationSettings.DEFAULT_CELL_HEIGHT);
        return new MonteCarloSimulator().run(study, settings, new NullProgressMonitor());
    }
}
