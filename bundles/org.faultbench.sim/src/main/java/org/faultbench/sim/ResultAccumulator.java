package org.faultbench.sim;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import org.faultbench.trap.Mechanism;

/** Folds blocks of realisations, in order, into streaming statistics and leak counts. */
final class ResultAccumulator {

    /** The results of consecutive realisations evaluated by one worker. */
    static final class Block {
        final RealisationOutcome[] outcomes;
        /** The runs of leaking cells of these realisations. */
        final LeakRuns leakRuns;

        Block(StudyGeometry geometry, int count) {
            if (count > LeakRuns.MAX_REALISATIONS) {
                throw new IllegalArgumentException("a block holds at most " + LeakRuns.MAX_REALISATIONS
                        + " realisations, was " + count);
            }
            outcomes = new RealisationOutcome[count];
            leakRuns = new LeakRuns(geometry.faults);
        }
    }

    private final StudyGeometry geometry;
    private final List<Map<UnitQuantity, StreamingSummary>> statistics = new ArrayList<>();
    private final List<Map<UnitQuantity, AdaptiveHistogram>> histograms = new ArrayList<>();
    private final long[][] mechanismCounts;
    /** Summed differences of the blocks' {@link LeakRuns}; integrated once, in {@link #leakMaps()}. */
    private final long[][] leakDifferences;
    private int realisations;

    /** @param baseCase the base-case outcome, from which the histograms' starting ranges are chosen */
    ResultAccumulator(StudyGeometry geometry, int reservoirUnits, RealisationOutcome baseCase) {
        this.geometry = geometry;
        for (int s = 0; s < reservoirUnits; s++) {
            Map<UnitQuantity, StreamingSummary> perQuantity = new EnumMap<>(UnitQuantity.class);
            for (UnitQuantity q : UnitQuantity.values()) {
                perQuantity.put(q, new StreamingSummary());
            }
            statistics.add(perQuantity);
            histograms.add(HistogramBins.forUnit(baseCase, s, AdaptiveHistogram.DEFAULT_BINS));
        }
        mechanismCounts = new long[reservoirUnits][Mechanism.values().length];
        leakDifferences = LeakRuns.newTotals(geometry.faults);
    }

    void merge(Block block) {
        for (RealisationOutcome outcome : block.outcomes) {
            if (outcome == null) {
                return; // a cancelled block ends early; nothing after its last realisation was evaluated
            }
            realisations++;
            for (int s = 0; s < statistics.size(); s++) {
                Map<UnitQuantity, StreamingSummary> perQuantity = statistics.get(s);
                for (UnitQuantity q : UnitQuantity.values()) {
                    double value = outcome.get(s, q);
                    perQuantity.get(q).add(value);
                    histograms.get(s).get(q).add(value);
                }
                mechanismCounts[s][outcome.mechanism[s].ordinal()]++;
            }
        }
        block.leakRuns.addTo(leakDifferences);
    }

    int realisations() {
        return realisations;
    }

    Map<UnitQuantity, StreamingSummary> statistics(int slot) {
        return statistics.get(slot);
    }

    Map<UnitQuantity, AdaptiveHistogram> histograms(int slot) {
        return histograms.get(slot);
    }

    Map<Mechanism, Double> mechanismFractions(int slot) {
        Map<Mechanism, Double> fractions = new EnumMap<>(Mechanism.class);
        for (Mechanism m : Mechanism.values()) {
            fractions.put(m, realisations == 0 ? 0 : mechanismCounts[slot][m.ordinal()] / (double) realisations);
        }
        return fractions;
    }

    List<LeakProbabilityMap> leakMaps() {
        List<LeakProbabilityMap> maps = new ArrayList<>();
        for (FaultPlaneFrame frame : geometry.faults) {
            long[] counts = LeakRuns.integrate(frame, leakDifferences[frame.index]);
            double[] probability = new double[counts.length];
            for (int c = 0; c < counts.length; c++) {
                probability[c] = realisations == 0 ? 0 : counts[c] / (double) realisations;
            }
            maps.add(new LeakProbabilityMap(frame.bounding.id(), frame.u.clone(), frame.zTop, frame.cellHeight,
                    frame.rows, probability));
        }
        return List.copyOf(maps);
    }
}
