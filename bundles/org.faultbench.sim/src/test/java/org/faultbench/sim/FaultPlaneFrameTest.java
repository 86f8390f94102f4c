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
}
