package org.faultbench.juxtaposition.paint;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.core.column.UnitSlice;
import org.faultbench.faults.FaultPlaneColumns;
import org.faultbench.juxtaposition.HungColumns;
import org.faultbench.juxtaposition.JuxtapositionRaster;
import org.junit.jupiter.api.Test;

class ShallowestWindowOverlayTest {

    /** Sand A 0–50 m, shale 50–80 m, sand B 80–130 m on both walls; ten 100 m columns, footwall cut-off 1000 m. */
    private static OverlayScene scene(double faultThrow) {
        ResolvedColumn column = new ResolvedColumn(List.of(
                new UnitSlice("sand A", LithologyClass.RESERVOIR, true, 50, 0.1),
                new UnitSlice("shale", LithologyClass.SEAL, false, 30, 0.9),
                new UnitSlice("sand B", LithologyClass.RESERVOIR, true, 50, 0.1)));
        int n = 10;
        double[] u = new double[n];
        double[] zero = new double[n];
        double[] footwall = new double[n];
        double[] hangingWall = new double[n];
        for (int k = 0; k < n; k++) {
            u[k] = 50 + 100 * k;
            footwall[k] = 1000;
            hangingWall[k] = 1000 + faultThrow;
        }
        FaultPlaneColumns columns = new FaultPlaneColumns("f1", "top sand A", 100, u, u, zero, footwall, hangingWall);
        return new OverlayScene("f1", JuxtapositionRaster.paint(columns, new HungColumns(column, column, 0), 1000,
                1200, 10), column);
    }

    @Test
    void lineAtTheTopOfTheShallowestReservoirWindow() {
        // throw 60 m: footwall sand B 1080–1130 m faces hanging-wall sand A 1060–1110 m, so the first
        // reservoir/reservoir window starts at 1080 m (Allan 1989 construction, hand calculation); footwall sand A
        // 1000–1050 m is above hanging-wall sand A's top at 1060 m
        List<OverlayMark> marks = new ShallowestWindowOverlay().marks(scene(60));
        assertEquals(1, marks.size());
        assertTrue(marks.get(0).isDepthLine());
        assertEquals(1080, marks.get(0).z(), 1e-9);
    }

    @Test
    void noLineWhenNoReservoirFacesReservoir() {
        // throw 140 m > column thickness 130 m: every reservoir faces overburden or underburden
        assertEquals(List.of(), new ShallowestWindowOverlay().marks(scene(140)));
    }
}
