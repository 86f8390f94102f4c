package org.faultbench.seal;

import static org.faultbench.seal.TestColumns.column;
import static org.faultbench.seal.TestColumns.point;
import static org.faultbench.seal.TestColumns.sand;
import static org.faultbench.seal.TestColumns.shale;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Map;

import org.faultbench.core.column.ResolvedColumn;
import org.junit.jupiter.api.Test;

class ShaleSmearFactorCriterionTest {

    @Test
    void throwOverShaleThickness() {
        // Lindsay et al. 1993, IAS Spec. Publ. 15, SSF = T / t = 50 / 10 = 5; hand calculation
        SealEvaluation evaluation = new ShaleSmearFactorCriterion().evaluate(point(TestColumns.oneThinShale(), 70, 50));
        assertEquals(5, evaluation.attributeValue(), 1e-12);
        assertEquals("SSF", evaluation.attributeName());
    }

    @Test
    void defaultGibsonLimitOfFourCallsSsfFiveLeaking() {
        // SSF 5 > 4: smear doubtful after Gibson 1994 (AAPG Bull. 78), still continuous below 7 after Lindsay 1993
        FaultPointContext ctx = point(TestColumns.oneThinShale(), 70, 50);
        SealEvaluation gibson = new ShaleSmearFactorCriterion().evaluate(ctx);
        assertEquals(SealBasis.FAULT_ROCK, gibson.basis());
        assertEquals(0, gibson.thresholdPressure(), 0);
        assertEquals(Double.POSITIVE_INFINITY, new ShaleSmearFactorCriterion(7).evaluate(ctx).thresholdPressure());
    }

    @Test
    void severalShalesGiveTheSmallestSsf() {
        // SSF is not additive; take the minimum of the beds (Lindsay et al. 1993, as summarised in the AAPG Wiki)
        ResolvedColumn column = column(sand("S1", 20, 0), shale("Thin", 5, 1), sand("S2", 20, 0),
                shale("Thick", 20, 1), sand("S3", 60, 0));
        assertEquals(80.0 / 20, new ShaleSmearFactorCriterion().evaluate(point(column, 100, 80)).attributeValue(),
                1e-12);
    }

    @Test
    void noShaleInTheWindowMeansNoSmear() {
        ResolvedColumn column = column(sand("Upper", 50, 0.2), sand("Lower", 50, 0.2));
        SealEvaluation evaluation = new ShaleSmearFactorCriterion().evaluate(point(column, 80, 40));
        assertEquals(Double.POSITIVE_INFINITY, evaluation.attributeValue());
        assertEquals(0, evaluation.thresholdPressure(), 0);
    }

    @Test
    void invalidLimitIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> new ShaleSmearFactorCriterion(0));
        assertThrows(IllegalArgumentException.class, () -> new ShaleSmearFactorCriterion(Double.NaN));
        assertEquals(4, new ShaleSmearFactorCriterion().maximumSealingSsf(), 0);
    }

    @Test
    void aRealisationMayDrawItsOwnLimit() {
        ShaleSmearFactorCriterion fixed = new ShaleSmearFactorCriterion();
        assertSame(fixed, fixed.forRealisation(SampledValues.NONE), "no drawn value: the fixed limit");
        assertSame(fixed, fixed.forRealisation(SampledValues.of(Map.of("other-input", 9.0))));
        SealCriterion drawn = fixed.forRealisation(SampledValues.of(Map.of(
                ShaleSmearFactorCriterion.SAMPLED_MAXIMUM_ID, 6.5)));
        assertEquals(6.5, ((ShaleSmearFactorCriterion) drawn).maximumSealingSsf(), 0);
        assertEquals(4, fixed.maximumSealingSsf(), 0, "the shared instance keeps its setting");
        assertThrows(IllegalArgumentException.class, () -> SampledValues.of(Map.of("x", Double.NaN)));
    }
}
