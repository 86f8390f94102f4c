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
        /**
         * Per fault, realisations in which each cell leaks, indexed by {@link FaultPlaneFrame#cell}. A byte holds the
         * count of a block, and keeps the counts a worker writes small enough to stay in its cache.
         */
        final byte[][] leakCells;

        Block(StudyGeometry geometry, int count) {
            if (count > Byte.MAX_VALUE) {
                throw new IllegalArgumentException("a block holds at most " + Byte.MAX_VALUE + " realisations, was "
                        + count);
            }
            outcomes = new RealisationOutcome[count];
            leakCells = new byte[geometry.faults.size()][];
            for (FaultPlaneFrame frame : geometry.faults) {
                leakCells[frame.index] = new byte[frame.cells()];
            }
        }
    }

    private final StudyGeometry geometry;
    private final List<Map<UnitQuantity, StreamingSummary>> statistics = new ArrayList<>();
    private final long[][] mechanismCounts;
    /** Laid out like {@link Block#leakCells}; turned row by row in {@link #leakMaps()}. */
    private final long[][] leakCounts;
    private int realisations;

    ResultAccumulator(StudyGeometry geometry, int reservoirUnits) {
        this.geometry = geometry;
        for (int s = 0; s < reservoirUnits; s++) {
            Map<UnitQuantity, StreamingSummary> perQuantity = new EnumMap<>(UnitQuantity.class);
            for (UnitQuantity q : UnitQuantity.values()) {
                perQuantity.put(q, new StreamingSummary());
            }
            statistics.add(perQuantity);
        }
        mechanismCounts = new long[reservoirUnits][Mechanism.values().length];
        leakCounts = new long[geometry.faults.size()][];
        for (FaultPlaneFrame frame : geometry.faults) {
            leakCounts[frame.index] = new long[frame.cells()];
        }
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
                    perQuantity.get(q).add(outcome.get(s, q));
                }
                mechanismCounts[s][outcome.mechanism[s].ordinal()]++;
            }
        }
        for (int f = 0; f < leakCounts.length; f++) {
            byte[] cells = block.leakCells[f];
            for (int c = 0; c < cells.length; c++) {
                leakCounts[f][c] += cells[c];
            }
        }
    }

    int realisations() {
        return realisations;
    }

    Map<UnitQuantity, StreamingSummary> statistics(int slot) {
        return statistics.get(slot);
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
            long[] counts = leakCounts[frame.index];
            double[] probability = new double[counts.length];
            for (int column = 0; column < frame.columns; column++) {
                for (int row = 0; row < frame.rows; row++) {
                    long count = counts[frame.cell(column, row)];
                    probability[row * frame.columns + column] = realisations == 0 ? 0 : count / (double) realisations;
                }
            }
            maps.add(new LeakProbabilityMap(frame.bounding.id(), frame.u.clone(), frame.zTop, frame.cellHeight,
                    frame.rows, probability));
        }
        return List.copyOf(maps);
    }
}
