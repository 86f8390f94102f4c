package org.faultbench.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.faults.FaultPlaneColumns;
import org.faultbench.faults.FaultPlaneSampler;
import org.faultbench.juxtaposition.HungColumns;
import org.faultbench.juxtaposition.JuxtapositionRaster;
import org.faultbench.seal.ShaleGougeRatioCriterion;
import org.junit.jupiter.api.Test;

class SealAttributePainterTest {

    @Test
    void shaleGougeRatioIsPaintedCellByCell() {
        TrapStudy study = SingleFaultDome.juxtapositionOnly(20);
        BoundingFault fault = study.faults().get(0);
        FaultPlaneColumns columns = new FaultPlaneSampler(fault.columns()).sample(fault.fault(), fault.footwallCutOff(),
                fault.hangingWallCutOff());
        ResolvedColumn column = study.stratigraphy().nominal();
        JuxtapositionRaster raster = JuxtapositionRaster.paint(columns, new HungColumns(column, column, 1), 950, 1200,
                5);
        String name = SealAttributePainter.paint(raster, columns, column, 1, new ShaleGougeRatioCriterion(), 2000);
        assertEquals("SGR [%]", name);
        // column 199 (y = 0): footwall Sand A top at 1025 m, throw 20 m. The cell centred at 1047.5 m has footwall
        // position s = 72.5 m and the window [52.5, 72.5] lies in Sand A (Vcl 0.1): SGR 10 %
        // (Yielding, Freeman & Needham 1997; hand calculation).
        int row = (int) ((1047.5 - 950) / 5);
        assertEquals(1047.5, raster.rowDepth(row), 1e-9);
        assertEquals(10, raster.attribute(name)[raster.cellIndex(199, row)], 1e-9);
        // Bretan et al. 2003 at 2 km: 10^(10/27 - 0.5) bar
        assertEquals(Math.pow(10, 10.0 / 27 - 0.5) * 1e5,
                raster.attribute(SealAttributePainter.THRESHOLD)[raster.cellIndex(199, row)], 1e-6);
        // far above the column nothing is painted
        assertTrue(Double.isNaN(raster.attribute(name)[raster.cellIndex(199, 0)]));
    }
}
