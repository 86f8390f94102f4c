package org.faultbench.sim.ui;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.sim.ExceedanceLevel;
import org.faultbench.sim.SimulationResult;
import org.faultbench.sim.StreamingSummary;
import org.faultbench.sim.UnitQuantity;
import org.faultbench.sim.UnitSummary;

/**
 * One line of the results table: a unit, a quantity and its statistics in display units (m, or 10^6 m³ for
 * volumes).
 */
public record ResultRow(String unit, String quantity, double p90, double p50, double p10, double mean, double baseCase) {

    /** Quantities a geologist reads first, in that order. */
    static final UnitQuantity[] SHOWN = { UnitQuantity.CREST, UnitQuantity.SPILL_DEPTH, UnitQuantity.LEAK_DEPTH,
            UnitQuantity.CONTACT, UnitQuantity.COLUMN, UnitQuantity.ATTIC_CONTACT, UnitQuantity.ATTIC_COLUMN,
            UnitQuantity.STOIIP, UnitQuantity.ATTIC_STOIIP };

    public static List<ResultRow> of(SimulationResult result) {
        List<ResultRow> rows = new ArrayList<>();
        for (UnitSummary unit : result.units()) {
            for (UnitQuantity q : SHOWN) {
                StreamingSummary s = unit.statistics(q);
                if (s.finiteFraction() == 0) {
                    continue;
                }
                double scale = "m3".equals(q.unit()) ? 1e-6 : 1;
                String label = q.label() + ("m3".equals(q.unit()) ? " [10\u2076 m\u00b3]" : " [m]");
                rows.add(new ResultRow(unit.unitName(), label, scale * s.level(ExceedanceLevel.P90),
                        scale * s.level(ExceedanceLevel.P50), scale * s.level(ExceedanceLevel.P10), scale * s.mean(),
                        scale * unit.baseCase().get(q)));
            }
        }
        return rows;
    }
}
