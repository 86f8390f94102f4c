package org.faultbench.seal.carbonate;

import java.util.List;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.core.column.UnitSlice;
import org.faultbench.seal.FaultPointContext;

/** Small columns for criterion tests (stratigraphic position 0 at the top of the first unit). */
final class TestColumns {

    private TestColumns() {
    }

    static UnitSlice carbonate(String name, double thickness) {
        return new UnitSlice(name, LithologyClass.CARBONATE, true, thickness, 0.02);
    }

    static UnitSlice shale(String name, double thickness) {
        return new UnitSlice(name, LithologyClass.SEAL, false, thickness, 0.8);
    }

    static UnitSlice sand(String name, double thickness) {
        return new UnitSlice(name, LithologyClass.RESERVOIR, true, thickness, 0.1);
    }

    static ResolvedColumn column(UnitSlice... units) {
        return new ResolvedColumn(List.of(units));
    }

    static FaultPointContext point(ResolvedColumn column, double footwallPosition, double faultThrow) {
        return new FaultPointContext(1500 + footwallPosition, faultThrow, footwallPosition, column, 2000);
    }
}
