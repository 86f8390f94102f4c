package org.faultbench.seal;

import static org.faultbench.seal.TestColumns.column;
import static org.faultbench.seal.TestColumns.point;
import static org.faultbench.seal.TestColumns.sand;
import static org.faultbench.seal.TestColumns.shale;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.faultbench.core.column.ResolvedColumn;
import org.junit.jupiter.api.Test;

class ShaleGougeRatioCriterionTest {

    private final ShaleGougeRatioCriterion sgr = new ShaleGougeRatioCriterion();

    @Test
    void sixtyMetresSandAndFortyMetresShale() {
        ResolvedColumn column = column(sand("Sand", 60, 0.1), shale("Shale", 40, 0.9));
        // Yielding, Freeman & Needham 1997, AAPG Bull. 81, SGR = sum(Vsh dz) / T: (6 + 36) / 100 = 42 %; hand calc
        assertEquals(42, sgr.evaluate(point(column, 100, 100)).attributeValue(), 1e-9);
    }

    @Test
    void windowClipsTheUnitsItCuts() {
        // window [40, 100]: (10 x 0.1 + 30 x 0.9 + 20 x 0.1) / 60 = 50 % (Yielding et al. 1997 formula over the
        // window [s - T, s], common practice; hand calculation)
        SealEvaluation evaluation = sgr.evaluate(point(TestColumns.sandShaleSand(), 100, 60));
        assertEquals(50, evaluation.attributeValue(), 1e-9);
        assertEquals("SGR", evaluation.attributeName());
        assertEquals("%", evaluation.attributeUnit());
    }

    @Test
    void discreteShaleBed() {
        // one 10 m shale (Vsh 1) in a 50 m window of clean sand: 10 / 50 = 20 % (Yielding et al. 1997; hand calc)
        assertEquals(20, sgr.evaluate(point(TestColumns.oneThinShale(), 70, 50)).attributeValue(), 1e-9);
    }

    @Test
    void reservoirAgainstReservoirTakesTheBretanThreshold() {
        // FW sand B at 100 m faces HW sand A at 40 m; SGR 50 % at 2 km: 10^(50/27 - 0.5) = 22.48 bar
        // (Bretan, Yielding & Jones 2003, AAPG Bull. 87; hand calculation)
        SealEvaluation evaluation = sgr.evaluate(point(TestColumns.sandShaleSand(), 100, 60));
        assertEquals(SealBasis.FAULT_ROCK, evaluation.basis());
        assertEquals(22.48e5, evaluation.thresholdPressure(), 0.005e5);
    }

    @Test
    void reservoirAgainstShaleSealsByJuxtapositionButKeepsTheAttribute() {
        // FW sand B at 120 m faces HW shale at 60 m: window [60, 120] = 20 x 0.9 + 40 x 0.1 -> 36.67 %
        SealEvaluation evaluation = sgr.evaluate(point(TestColumns.sandShaleSand(), 120, 60));
        assertEquals(SealBasis.JUXTAPOSITION, evaluation.basis());
        assertEquals(Double.POSITIVE_INFINITY, evaluation.thresholdPressure());
        assertEquals(100 * 22.0 / 60, evaluation.attributeValue(), 1e-9);
    }

    @Test
    void zeroThrowMeansNoFaultRockAndFallsBackToJuxtaposition() {
        SealEvaluation inSand = sgr.evaluate(point(TestColumns.sandShaleSand(), 100, 0));
        assertEquals(SealBasis.JUXTAPOSITION, inSand.basis());
        assertTrue(Double.isNaN(inSand.attributeValue()));
        assertEquals(0, inSand.thresholdPressure(), 0, "sand against itself: no seal");
        SealEvaluation inShale = sgr.evaluate(point(TestColumns.sandShaleSand(), 60, 0));
        assertEquals(Double.POSITIVE_INFINITY, inShale.thresholdPressure());
    }

    @Test
    void windowLeavingTheColumnIsRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> sgr.evaluate(point(TestColumns.sandShaleSand(), 30, 60)));
        assertTrue(e.getMessage().startsWith("Shale gouge ratio (SGR): the throw window [-30.0, 30.0] m leaves"),
                e.getMessage());
    }

    @Test
    void pressureModelIsPluggable() {
        TabulatedSgrPressure table = new TabulatedSgrPressure(
                List.of(new SgrPressurePoint(0, 0), new SgrPressurePoint(100, 100e5)));
        ShaleGougeRatioCriterion criterion = new ShaleGougeRatioCriterion(table);
        assertEquals(50e5, criterion.evaluate(point(TestColumns.sandShaleSand(), 100, 60)).thresholdPressure(), 1e-3);
        assertEquals(table, criterion.pressureModel());
        assertThrows(IllegalArgumentException.class, () -> new ShaleGougeRatioCriterion(null));
    }
}
