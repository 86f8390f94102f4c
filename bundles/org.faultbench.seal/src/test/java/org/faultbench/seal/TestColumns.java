package org.faultbench.seal;

import java.util.List;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.core.column.UnitSlice;

/** Columns and fault points shared by the seal tests. */
final class TestColumns {

    static final double BURIAL_2_KM = 2000;

    private TestColumns() {
    }

    static UnitSlice sand(String name, double thickness, double clayFraction) {
        return new UnitSlice(name, LithologyClass.RESERVOIR, true, thickness, clayFraction);
    }

    static UnitSlice shale(String name, double thickness, double clayFraction) {
        return new UnitSlice(name, LithologyClass.SEAL, false, thickness, clayFraction);
    }

    static ResolvedColumn column(UnitSlice... units) {
        return new ResolvedColumn(List.of(units));
    }

    /** Sand A 0-50 m (Vsh 0.1), shale 50-80 m (Vsh 0.9), sand B 80-130 m (Vsh 0.1). */
    static ResolvedColumn sandShaleSand() {
        return column(sand("Sand A", 50, 0.1), shale("Shale", 30, 0.9), sand("Sand B", 50, 0.1));
    }

    /** Clean sand 0-40 m, 10 m shale (Vsh 1) 40-50 m, clean sand 50-100 m. */
    static ResolvedColumn oneThinShale() {
        return column(sand("Upper sand", 40, 0), shale("Shale", 10, 1), sand("Lower sand", 50, 0));
    }

    static FaultPointContext point(ResolvedColumn column, double footwallPosition, double faultThrow) {
        return new FaultPointContext(2500, faultThrow, footwallPosition, column, BURIAL_2_KM);
    }
}
