package org.faultbench.strat;

import org.faultbench.core.uncertain.UncertainValue;

/**
 * Where a unit's thickness comes from when a column is resolved. A realisation takes one draw per unit from
 * {@link #thicknessOf}; {@link #thicknessAt} turns that draw into the thickness at a map position. With
 * {@link ConstantThickness} the draw is the thickness everywhere (layer cake); with {@link IsochoreThickness} the draw
 * of an isochore unit is a scale factor applied to its thickness grid.
 */
@FunctionalInterface
public interface ThicknessModel {

    /** The uncertain quantity drawn once per realisation for {@code unit}: its thickness (m) or a scale factor. */
    UncertainValue thicknessOf(StratUnit unit);

    /** The thickness (m, &ge; 0) of {@code unit} at (x, y) for the realisation's {@code draw} of {@link #thicknessOf}. */
    default double thicknessAt(StratUnit unit, double draw, double x, double y) {
        return draw;
    }

    /** Whether {@link #thicknessAt} depends on the position; false lets callers resolve one column for everywhere. */
    default boolean variesWithPosition() {
        return false;
    }

    /** A thickness representative of the whole map for displays and nominal frames (the draw itself when constant). */
    default double representativeThickness(StratUnit unit, double draw) {
        return draw;
    }
}
