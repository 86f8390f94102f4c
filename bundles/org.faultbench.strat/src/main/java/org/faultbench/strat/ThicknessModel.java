package org.faultbench.strat;

import org.faultbench.core.uncertain.UncertainValue;

/**
 * Where a unit's thickness comes from when a column is resolved. Today every unit has one thickness
 * ({@link ConstantThickness}); an isochore-grid model will later answer with the thickness at one map location, so a
 * {@link Stratigraphy} bound to that model resolves the column of that location without other changes.
 */
@FunctionalInterface
public interface ThicknessModel {

    /** The uncertain true vertical thickness of {@code unit}, metres, never negative. */
    UncertainValue thicknessOf(StratUnit unit);
}
