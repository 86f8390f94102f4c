package org.faultbench.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

class FaultPlaneFrameTest {

    private static FaultPlaneFrame frame(double cellHeight) {
        TrapStudy study = SingleFaultDome.juxtapositionOnly(20);
        return new FaultPlaneFrame(study.faults().get(0), 0, -500, 0, study.stratigraphy().nominal(), 1, cellHeight);
    }

    @Test
    void rowCentresAreHalfACellBelowTheRowTops() {
        FaultPlaneFrame frame = frame(5);
        for (int row = 0; row < frame.rows; row++) {
            assertEquals(frame.zTop + (row + 0.5) * 5, frame.rowCentre(row));
        }
    }

    @Test
    void firstRowCentredAtOrBelowMatchesAScanOfTheCentres() {
        // equivalence check against the plain scan it replaces, at random depths and right at or next to centres
        for (double cellHeight : new double[] { 5, 0.7, 3.3 }) {
            FaultPlaneFrame frame = frame(cellHeight);
            SplittableRandom random = new SplittableRandom(5);
            for (int i = 0; i < 50_000; i++) {
                double z = switch (i % 4) {
                    case 0 -> frame.rowCentre(random.nextInt(frame.rows));
                    case 1 -> Math.nextDown(frame.rowCentre(random.nextInt(frame.rows)));
                    case 2 -> Math.nextUp(frame.rowCentre(random.nextInt(frame.rows)));
                    default -> frame.zTop + random.nextDouble(-20, frame.rows * cellHeight + 20);
                };
                int expected = 0;
                while (expected < frame.rows && frame.rowCentre(expected) < z) {
                    expected++;
                }
                assertEquals(expected, frame.firstRowCentredAtOrBelow(z), "z " + z + ", cell height " + cellHeight);
            }
        }
    }

    /**
     * The shortcut that trusts an estimate clear of a whole row agrees with the estimate checked against the centres
     * (tolerance 0.5 turns the shortcut off), right at the edge of its tolerance: depths a few millionths of a row
     * from a centre, where it is first trusted.
     */
    @Test
    void theShortcutAgreesWithTheCheckedEstimateAtTheEdgeOfItsTolerance() {
        for (double cellHeight : new double[] { 5, 0.7, 3.3 }) {
            FaultPlaneFrame frame = frame(cellHeight);
            SplittableRandom random = new SplittableRandom(7);
            for (int i = 0; i < 50_000; i++) {
                double offsetInRows = random.nextDouble(-3e-6, 3e-6);
                double z = frame.rowCentre(random.nextInt(frame.rows)) + offsetInRows * cellHeight;
                int checked = FaultPlaneFrame.rowCentredAtOrBelow(z, frame.firstCentre(), frame.inverseCellHeight(),
                        frame.rowCentres(), frame.rows, 0.5);
                assertEquals(checked, frame.firstRowCentredAtOrBelow(z), "z " + z + ", cell height " + cellHeight);
                int expected = 0;
                while (expected < frame.rows && frame.rowCentre(expected) < z) {
                    expected++;
                }
                assertEquals(expected, checked, "z " + z + ", cell height " + cellHeight);
            }
        }
    }
}
