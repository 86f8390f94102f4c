package org.faultbench.sim;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/**
 * Equivalence check of the difference-array counts against the straightforward count they replace: one increment per
 * leaking cell per realisation, on random disjoint runs, over full blocks and over blocks summed before integration.
 */
class LeakRunsTest {

    private static List<FaultPlaneFrame> frames() {
        TrapStudy study = SingleFaultDome.juxtapositionOnly(20);
        return List.of(new FaultPlaneFrame(study.faults().get(0), 0, -500, 0, study.stratigraphy().nominal(), 1, 5));
    }

    @Test
    void countsEqualAPerCellCountOnRandomRuns() {
        List<FaultPlaneFrame> frames = frames();
        FaultPlaneFrame frame = frames.get(0);
        SplittableRandom random = new SplittableRandom(11);
        long[][] totals = LeakRuns.newTotals(frames);
        long[] reference = new long[frame.cells()];
        int marked = 0;
        for (int block = 0; block < 5; block++) {
            LeakRuns runs = new LeakRuns(frames);
            long[] blockReference = new long[frame.cells()];
            // a full block: every difference reaches the limit of a byte in the columns every realisation marks
            for (int realisation = 0; realisation < LeakRuns.MAX_REALISATIONS; realisation++) {
                for (int column = 0; column < frame.columns; column++) {
                    int row = random.nextInt(3); // runs of a column: disjoint, top down, as the leak search hands them
                    while (row < frame.rows) {
                        int end = Math.min(frame.rows, row + random.nextInt(0, 12));
                        runs.addRun(0, column, row, end);
                        for (int r = row; r < end; r++) {
                            blockReference[r * frame.columns + column]++;
                            marked++;
                        }
                        row = end + random.nextInt(0, 6);
                    }
                }
            }
            assertArrayEquals(blockReference, runs.counts(frame), "block " + block);
            runs.addTo(totals);
            for (int c = 0; c < reference.length; c++) {
                reference[c] += blockReference[c];
            }
        }
        assertArrayEquals(reference, LeakRuns.integrate(frame, totals[0]), "blocks summed, then integrated");
        assertTrue(marked > 0);
    }

    @Test
    void aRunDownToTheLastRowEndsInTheExtraDifference() {
        List<FaultPlaneFrame> frames = frames();
        FaultPlaneFrame frame = frames.get(0);
        LeakRuns runs = new LeakRuns(frames);
        runs.addRun(0, frame.columns - 1, frame.rows - 2, frame.rows);
        runs.addRun(0, frame.columns - 1, 0, 0); // empty: nothing
        long[] expected = new long[frame.cells()];
        expected[(frame.rows - 2) * frame.columns + frame.columns - 1] = 1;
        expected[(frame.rows - 1) * frame.columns + frame.columns - 1] = 1;
        assertArrayEquals(expected, runs.counts(frame));
    }

    /**
     * The branch-free form adds what addRun adds, and nothing for an empty or reversed run, even on a difference that
     * a full block has taken to the limit of a byte (it wraps past the limit and back).
     */
    @Test
    void aRunWithoutABranchAddsTheSameAndNothingWhenEmpty() {
        List<FaultPlaneFrame> frames = frames();
        FaultPlaneFrame frame = frames.get(0);
        int column = 3;
        LeakRuns plain = new LeakRuns(frames);
        LeakRuns branchFree = new LeakRuns(frames);
        byte[] differences = branchFree.differences(0);
        int columnStart = column * (frame.rows + 1);
        for (int realisation = 0; realisation < LeakRuns.MAX_REALISATIONS; realisation++) {
            plain.addRun(0, column, 2, 5);
            LeakRuns.addRunOrNothing(differences, columnStart, 2, 5);
            LeakRuns.addRunOrNothing(differences, columnStart, 2, 2); // empty, on the difference at its limit
            LeakRuns.addRunOrNothing(differences, columnStart, 5, 1); // reversed: nothing
        }
        long[] counts = branchFree.counts(frame);
        assertArrayEquals(plain.counts(frame), counts);
        assertEquals(LeakRuns.MAX_REALISATIONS, counts[2 * frame.columns + column], "row 2 leaks in every realisation");
        assertEquals(0, counts[5 * frame.columns + column], "row 5 is past the run");
    }
}
