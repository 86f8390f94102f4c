package org.faultbench.juxtaposition;

import java.util.List;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.core.column.UnitSlice;
import org.faultbench.faults.FaultPlaneColumns;

/** Shared test columns and fault planes. */
final class TestFixtures {

    static final int SAND_A = 0;
    static final int SHALE = 1;
    static final int SAND_B = 2;
    static final int OVERBURDEN = -1;
    static final int UNDERBURDEN = 3;

    private TestFixtures() {
    }

    /** Sand A 0-50 m, shale 50-80 m, sand B 80-130 m (the worked column of the juxtaposition check values). */
    static ResolvedColumn sandShaleSand() {
        return column(50, 30, 50);
    }

    static ResolvedColumn column(double sandA, double shale, double sandB) {
        return new ResolvedColumn(List.of(
                new UnitSlice("sand A", LithologyClass.RESERVOIR, true, sandA, 0.1),
                new UnitSlice("shale", LithologyClass.SEAL, false, shale, 0.9),
                new UnitSlice("sand B", LithologyClass.RESERVOIR, true, sandB, 0.1)));
    }

    /** Columns of 100 m along a 100 m x count fault, footwall cut-off at {@code footwall}, throws as given. */
    static FaultPlaneColumns columns(double footwall, double... throwPerColumn) {
        int n = throwPerColumn.length;
        double[] u = new double[n];
        double[] zero = new double[n];
        double[] zFootwall = new double[n];
        double[] zHangingWall = new double[n];
        for (int k = 0; k < n; k++) {
            u[k] = 50 + 100 * k;
            zFootwall[k] = footwall;
            zHangingWall[k] = footwall + throwPerColumn[k];
        }
        return new FaultPlaneColumns("f1", "top sand A", 100, u, u, zero, zFootwall, zHangingWall);
    }

    /** Ten 100 m columns, footwall cut-off 1000 m, constant throw. */
    static FaultPlaneColumns constantThrow(double throwValue) {
        double[] throwPerColumn = new double[10];
        java.util.Arrays.fill(throwPerColumn, throwValue);
        return columns(1000, throwPerColumn);
    }

    /** Throw 100 - 0.1 u at the centres u = 50 ... 950 of ten 100 m columns: 95, 85, ..., 5 m. */
    static FaultPlaneColumns linearTaper() {
        return columns(1000, 95, 85, 75, 65, 55, 45, 35, 25, 15, 5);
    }

    static HungColumns sameColumnBothWalls() {
        return new HungColumns(sandShaleSand(), sandShaleSand(), 0);
    }
}
