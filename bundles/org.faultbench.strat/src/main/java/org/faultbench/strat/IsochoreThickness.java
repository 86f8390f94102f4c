package org.faultbench.strat;

import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

import org.faultbench.core.uncertain.UncertainValue;

/**
 * Units with an {@link Isochore} take their thickness from its grid at each position, scaled by the factor drawn for
 * the realisation; the other units keep their own (constant) thickness.
 */
public final class IsochoreThickness implements ThicknessModel {
    private final Map<String, Isochore> byUnit = new TreeMap<>();

    /** @param isochores by unit name (matched ignoring case and surrounding blanks) */
    public IsochoreThickness(Map<String, Isochore> isochores) {
        isochores.forEach((name, isochore) -> byUnit.put(key(name), isochore));
    }

    /** The isochore of {@code unit}, or null when the unit has a constant thickness. */
    public Isochore isochoreOf(StratUnit unit) {
        return byUnit.get(key(unit.name()));
    }

    @Override
    public UncertainValue thicknessOf(StratUnit unit) {
        Isochore isochore = isochoreOf(unit);
        return isochore == null ? unit.thickness() : isochore.scale();
    }

    @Override
    public double thicknessAt(StratUnit unit, double draw, double x, double y) {
        Isochore isochore = isochoreOf(unit);
        return isochore == null ? draw : isochore.thicknessAt(draw, x, y);
    }

    @Override
    public boolean variesWithPosition() {
        return !byUnit.isEmpty();
    }

    @Override
    public double representativeThickness(StratUnit unit, double draw) {
        Isochore isochore = isochoreOf(unit);
        return isochore == null ? draw : isochore.meanThickness(draw);
    }

    private static String key(String name) {
        return name.strip().toLowerCase(Locale.ROOT);
    }
}
