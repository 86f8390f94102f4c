package org.faultbench.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.stat.correlation.PearsonsCorrelation;
import org.apache.commons.math3.stat.descriptive.moment.StandardDeviation;
import org.junit.jupiter.api.Test;

class CorrelatedResidualFieldTest {
    private static final int FIELDS = 4000;
    private static final double L = 500;
    private static final double SD = 8;

    private static double[] valuesAt(double x, double y) {
        double[] v = new double[FIELDS];
        for (int r = 0; r < FIELDS; r++) {
            v[r] = CorrelatedResidualField.sample(0, 3000, 0, 2000, L, SD, RealisationRandom.of(5, r)).value(x, y);
        }
        return v;
    }

    @Test
    void standardDeviationIsTheSameOnAndBetweenLatticeNodes() {
        // the rescaling keeps the marginal sd at the requested value everywhere (standard error of an sd estimate
        // from 4000 values ~ 1.1 %)
        assertEquals(SD, new StandardDeviation().evaluate(valuesAt(1000, 1000)), 0.05 * SD);
        assertEquals(SD, new StandardDeviation().evaluate(valuesAt(1260, 1240)), 0.05 * SD);
    }

    @Test
    void nearbyPointsAreCorrelatedAndDistantOnesAreNot() {
        PearsonsCorrelation pearson = new PearsonsCorrelation();
        double near = pearson.correlation(valuesAt(1000, 1000), valuesAt(1040, 1000));
        double far = pearson.correlation(valuesAt(300, 300), valuesAt(2700, 1700));
        assertTrue(near > 0.85, "points 0.08 L apart: r = " + near);
        assertTrue(Math.abs(far) < 0.1, "points several L apart: r = " + far);
    }

    @Test
    void drawCountIsFixedByTheExtent() {
        CountingUniforms rng = new CountingUniforms();
        CorrelatedResidualField.sample(0, 3000, 0, 2000, L, SD, rng);
        assertEquals(CorrelatedResidualField.drawCount(0, 3000, 0, 2000, L), rng.draws);
    }
}
