package org.faultbench.strat;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.core.column.UnitSlice;

/**
 * One realisation's draws of a stratigraphy (per unit: thickness draw, clay fraction), resolved to a column at any map
 * position. Without position-dependent thicknesses every position gets the same column object.
 */
public final class ColumnDraw {
    private final Stratigraphy stratigraphy;
    private final double[] thicknessDraws;
    private final double[] clayFractions;
    private final ResolvedColumn representative;

    ColumnDraw(Stratigraphy stratigraphy, double[] thicknessDraws, double[] clayFractions) {
        this.stratigraphy = stratigraphy;
        this.thicknessDraws = thicknessDraws;
        this.clayFractions = clayFractions;
        ThicknessModel model = stratigraphy.thicknessModel();
        List<StratUnit> units = stratigraphy.units();
        double[] thickness = new double[units.size()];
        for (int i = 0; i < thickness.length; i++) {
            thickness[i] = model.representativeThickness(units.get(i), thicknessDraws[i]);
        }
        representative = column(thickness);
    }

    /** Whether {@link #columnAt} differs from place to place. */
    public boolean variesWithPosition() {
        return stratigraphy.thicknessModel().variesWithPosition();
    }

    /** The column for displays and nominal frames; the column everywhere when thicknesses do not vary. */
    public ResolvedColumn representative() {
        return representative;
    }

    /** The column at (x, y): each unit's thickness there, from its draw. */
    public ResolvedColumn columnAt(double x, double y) {
        if (!variesWithPosition()) {
            return representative;
        }
        return column(thicknessesAt(x, y));
    }

    /** Each unit's thickness at (x, y), m, in column order. */
    public double[] thicknessesAt(double x, double y) {
        ThicknessModel model = stratigraphy.thicknessModel();
        List<StratUnit> units = stratigraphy.units();
        double[] thickness = new double[units.size()];
        for (int i = 0; i < thickness.length; i++) {
            thickness[i] = model.thicknessAt(units.get(i), thicknessDraws[i], x, y);
        }
        return thickness;
    }

    private ResolvedColumn column(double[] thickness) {
        List<StratUnit> units = stratigraphy.units();
        List<UnitSlice> slices = new ArrayList<>(units.size());
        for (int i = 0; i < thickness.length; i++) {
            StratUnit unit = units.get(i);
            slices.add(new UnitSlice(unit.name(), unit.lithology(), unit.reservoir(), thickness[i], clayFractions[i]));
        }
        return new ResolvedColumn(slices);
    }
}
