package org.faultbench.sim;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.NullProgressMonitor;
import org.eclipse.core.runtime.SubMonitor;
import org.faultbench.core.LithologyClass;
import org.faultbench.strat.StratUnit;

/**
 * Runs the trap analysis of a study over many realisations of its uncertain inputs, in parallel, reporting progress
 * and honouring cancellation through the monitor, and summarises each reservoir unit's results as P90/P50/P10
 * (exceedance convention), means and mechanism shares, with leak probability per fault-plane cell and a tornado of
 * the inputs that move each unit's contact most. Memory does not grow with the number of realisations.
 */
public final class MonteCarloSimulator {
    /** Realisations per block handed to a worker. */
    private static final int BLOCK_SIZE = 32;
    /** Cumulative probabilities of the tornado's low and high cases: the inputs' P90 and P10. */
    private static final double TORNADO_LOW = ExceedanceLevel.P90.cumulativeProbability();
    private static final double TORNADO_HIGH = ExceedanceLevel.P10.cumulativeProbability();

    public SimulationResult run(TrapStudy study, SimulationSettings settings, IProgressMonitor monitor) {
        SubMonitor progress = SubMonitor.convert(monitor == null ? new NullProgressMonitor() : monitor,
                "Simulating " + study.name(), 100);
        progress.subTask("Preparing the fault planes and the structure");
        StudyGeometry geometry = new StudyGeometry(study, settings.cellHeight());
        InputSampler sampler = new InputSampler(study);
        RealisationEvaluator baseEvaluator = new RealisationEvaluator(geometry);
        int[] reservoirUnits = baseEvaluator.reservoirUnits();
        RealisationOutcome baseCase = baseEvaluator.evaluate(sampler.sample(ScriptedUniforms.medians()), null);
        progress.worked(2);

        progress.subTask("Ranking inputs (tornado)");
        Map<String, List<TornadoBar>> tornado = tornado(study, sampler, baseEvaluator, reservoirUnits);
        progress.worked(3);

        ResultAccumulator accumulator = new ResultAccumulator(geometry, reservoirUnits.length, baseCase);
        ThreadLocal<RealisationEvaluator> evaluators = ThreadLocal.withInitial(() -> new RealisationEvaluator(geometry));
        boolean complete = new OrderedParallelRunner(settings.threads(), BLOCK_SIZE).run(settings.realisations(),
                (first, count, cancelled) -> runBlock(geometry, sampler, evaluators.get(), settings.seed(), first, count,
                        cancelled),
                accumulator::merge, progress.newChild(95));

        List<UnitSummary> units = new ArrayList<>();
        for (int s = 0; s < reservoirUnits.length; s++) {
            String name = study.stratigraphy().units().get(reservoirUnits[s]).name();
            units.add(new UnitSummary(name, accumulator.statistics(s), accumulator.mechanismFractions(s),
                    UnitSummary.baseCaseOf(baseCase, s), baseCase.mechanism[s], baseCase.leakLocation[s],
                    accumulator.histograms(s)));
        }
        return new SimulationResult(study.name(), settings, accumulator.realisations(), complete, List.copyOf(units),
                accumulator.leakMaps(), tornado, applicabilityWarnings(study));
    }

    private static ResultAccumulator.Block runBlock(StudyGeometry geometry, InputSampler sampler,
            RealisationEvaluator evaluator, long seed, int first, int count, java.util.function.BooleanSupplier cancelled) {
        ResultAccumulator.Block block = new ResultAccumulator.Block(geometry, count);
        for (int i = 0; i < count && !cancelled.getAsBoolean(); i++) {
            long index = first + (long) i;
            RealisationInputs inputs = sampler.sample(RealisationRandom.of(seed, index));
            block.outcomes[i] = evaluator.evaluate(inputs, block.leakRuns);
        }
        return block;
    }

    private static Map<String, List<TornadoBar>> tornado(TrapStudy study, InputSampler sampler,
            RealisationEvaluator evaluator, int[] reservoirUnits) {
        List<String> labels = sampler.drawLabels();
        List<List<TornadoBar>> bars = new ArrayList<>();
        for (int s = 0; s < reservoirUnits.length; s++) {
            bars.add(new ArrayList<>());
        }
        for (int d = 0; d < labels.size(); d++) {
            RealisationOutcome low = evaluator.evaluate(sampler.sample(ScriptedUniforms.moving(d, TORNADO_LOW)), null);
            RealisationOutcome high = evaluator.evaluate(sampler.sample(ScriptedUniforms.moving(d, TORNADO_HIGH)), null);
            for (int s = 0; s < reservoirUnits.length; s++) {
                TornadoBar bar = new TornadoBar(labels.get(d), low.get(s, UnitQuantity.CONTACT),
                        high.get(s, UnitQuantity.CONTACT));
                if (bar.swing() > 0) {
                    bars.get(s).add(bar);
                }
            }
        }
        Map<String, List<TornadoBar>> byUnit = new LinkedHashMap<>();
        for (int s = 0; s < reservoirUnits.length; s++) {
            List<TornadoBar> ranked = new ArrayList<>(bars.get(s));
            ranked.sort(Comparator.comparingDouble(TornadoBar::swing).reversed());
            byUnit.put(study.stratigraphy().units().get(reservoirUnits[s]).name(), List.copyOf(ranked));
        }
        return byUnit;
    }

    /** Warns when the criterion was not calibrated for a lithology the stratigraphy contains. */
    private static List<String> applicabilityWarnings(TrapStudy study) {
        var criterion = study.seal().criterion();
        List<String> warnings = new ArrayList<>();
        for (StratUnit unit : study.stratigraphy().units()) {
            LithologyClass lithology = unit.lithology();
            if (!criterion.validFor().contains(lithology)) {
                warnings.add("The seal criterion '" + criterion.name() + "' is not valid for " + lithology.name()
                        .toLowerCase(java.util.Locale.ROOT) + " unit '" + unit.name()
                        + "': clay-based rules do not apply to carbonates or evaporites; treat its fault-rock"
                        + " thresholds as unsupported.");
            }
        }
        return List.copyOf(warnings);
    }
}
