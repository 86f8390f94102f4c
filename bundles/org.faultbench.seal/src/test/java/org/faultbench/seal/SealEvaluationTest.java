package org.faultbench.seal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class SealEvaluationTest {

    @Test
    void juxtapositionLeaksOrSealsCompletely() {
        SealEvaluation leak = SealEvaluation.juxtaposition(true);
        assertEquals(0, leak.thresholdPressure(), 0);
        assertTrue(Double.isNaN(leak.attributeValue()));
        assertEquals(Double.POSITIVE_INFINITY, SealEvaluation.juxtaposition(false).thresholdPressure());
    }

    @Test
    void invalidEvaluationsAreRejected() {
        assertThrows(IllegalArgumentException.class,
                () -> new SealEvaluation("SGR", "%", 20, -1, SealBasis.FAULT_ROCK));
        assertThrows(IllegalArgumentException.class,
                () -> new SealEvaluation("SGR", "%", Double.NaN, 1e5, SealBasis.FAULT_ROCK));
        assertThrows(IllegalArgumentException.class, () -> new SealEvaluation("SGR", "%", 20, 1e5, null));
    }
}
