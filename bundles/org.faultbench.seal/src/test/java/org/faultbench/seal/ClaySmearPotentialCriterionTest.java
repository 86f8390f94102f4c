package org.faultbench.seal;

import static org.faultbench.seal.TestColumns.column;
import static org.faultbench.seal.TestColumns.point;
import static org.faultbench.seal.TestColumns.sand;
import static org.faultbench.seal.TestColumns.shale;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.faultbench.core.column.ResolvedColumn;
import org.junit.jupiter.api.Test;

class ClaySmearPotentialCriterionTest {

    /** Sand 0-50, 10 m shale 50-60, sand 60-200. */
    private static final ResolvedColumn COLUMN = column(sand("Upper", 50, 0), shale("Shale", 10, 1),
            sand("Lower", 140, 0));

    @Test
    void oneShaleTwentyMetresFromItsCutOff() {
        // s = 80, T = 60: 20 m below the footwall cut-off (base 60), 30 m above the hanging-wall cut-off (top 110);
        // CSP = t^2 / d = 10^2 / 20 = 5 m (Bouvier et al. 1989; Fulljames et al. 1997 form; hand calculation)
        SealEvaluation evaluation = new ClaySmearPotentialCriterion().evaluate(point(COLUMN, 80, 60));
        assertEquals(5, evaluation.attributeValue(), 1e-12);
        assertEquals("m", evaluation.attributeUnit());
    }

    @Test
    void contributionsOfSeveralBedsAdd() {
        ResolvedColumn column = column(sand("S1", 20, 0), shale("A", 4, 1), sand("S2", 16, 0), shale("B", 6, 1),
                sand("S3", 104, 0));
        // s = 70, T = 60: bed A (20-24) 46 m below its FW cut-off, 10 m above its HW cut-off (80) -> 16 / 10;
        // bed B (40-46) 24 m below its FW cut-off, 30 m above its HW cut-off (100) -> 36 / 24; hand calculation
        double expected = 16.0 / 10 + 36.0 / 24;
        assertEquals(expected, new ClaySmearPotentialCriterion().evaluate(point(column, 70, 60)).attributeValue(),
                1e-12);
    }

    @Test
    void uncalibratedCriterionGivesNoSealCredit() {
        SealEvaluation evaluation = new ClaySmearPotentialCriterion().evaluate(point(COLUMN, 80, 60));
        assertEquals(SealBasis.FAULT_ROCK, evaluation.basis());
        assertEquals(0, evaluation.thresholdPressure(), 0);
        assertEquals(Double.POSITIVE_INFINITY, new ClaySmearPotentialCriterion().minimumSealingCsp());
    }

    @Test
    void calibratedThresholdDecides() {
        FaultPointContext ctx = point(COLUMN, 80, 60);
        assertEquals(Double.POSITIVE_INFINITY, new ClaySmearPotentialCriterion(5).evaluate(ctx).thresholdPressure());
        assertEquals(0, new ClaySmearPotentialCriterion(5.01).evaluate(ctx).thresholdPressure(), 0);
        assertThrows(IllegalArgumentException.class, () -> new ClaySmearPotentialCriterion(-1));
        assertThrows(IllegalArgumentException.class, () -> new ClaySmearPotentialCriterion(Double.NaN));
    }
}
