package org.faultbench.sim.ui;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.sim.ExceedanceLevel;
import org.faultbench.sim.SimulationResult;
import org.faultbench.sim.StreamingSummary;
import org.faultbench.sim.UnitQuantity;
import org.faultbench.sim.UnitSummary;
import org.faultbench.ui.DisplayUnits;

/**
 * One line of the results table: a unit, a quantity and its statistics in the display units of the preferences
 * (lengths in m or ft, volumes in 10⁶ m³ or 10⁶ bbl).
 */
public record ResultRow(String unit, String quantity, double p90, double p50, double p10, double mean, double baseCase) {

    /** Quantities a geologist reads first, in that order. */
    static final UnitQuantity[] SHOWN = { UnitQuantity.CREST, UnitQuantity.SPILL_DEPTH, UnitQuantity.LEAK_DEPTH,
            UnitQuantity.CONTACT, UnitQuantity.COLUMN, UnitQuantity.ATTIC_CONTACT, UnitQuantity.ATTIC_COLUMN,
            UnitQuantity.STOIIP, UnitQuantity.ATTIC_STOIIP };

    public static List<ResultRow> of(SimulationResult result) {
        return of(result, DisplayUnits.SI);
    }

    public static List<ResultRow> of(SimulationResult result, DisplayUnits units) {
        List<ResultRow> rows = new ArrayList<>();
        for (UnitSummary unit : result.units()) {
            for (UnitQuantity q : SHOWN) {
                StreamingSummary s = unit.statistics(q);
                if (s.finiteFraction() == 0) {
                    continue;
                }
                rows.add(new ResultRow(unit.unitName(), label(q, units), display(q, s.level(ExceedanceLevel.P90), units),
                        display(q, s.level(ExceedanceLevel.P50), units), display(q, s.level(ExceedanceLevel.P10), units),
                        display(q, s.mean(), units), display(q, unit.baseCase().get(q), units)));
            }
        }
        return rows;
    }

    static boolean isVolume(UnitQuantity q) {
        return "m3".equals(q.unit());
    }

    /** A model value (m or m³) in display units. */
    static double display(UnitQuantity q, double value, DisplayUnits units) {
        return isVolume(q) ? units.volume(value) : units.length(value);
    }

    /** The display unit of {@code q}, e.g. "ft" or "10⁶ m³". */
    static String unitSymbol(UnitQuantity q, DisplayUnits units) {
        return isVolume(q) ? units.volumeSymbol() : units.lengthSymbol();
    }

    /** "contact (controlling depth) [ft]". */
    static String label(UnitQuantity q, DisplayUnits units) {
        return q.label() + " [" + unitSymbol(q, units) + "]";
    }
}
