package org.faultbench.core.column;

import org.faultbench.core.LithologyClass;

/**
 * One stratigraphic unit with every property resolved to a single number (one realisation, or the nominal case).
 *
 * @param name unit name, unique within its column
 * @param lithology lithology class
 * @param reservoir whether the unit is treated as a reservoir (may hold and pass hydrocarbons)
 * @param thickness true vertical thickness in metres, &ge; 0
 * @param clayFraction clay (shale) volume fraction Vcl in [0, 1]
 */
public record UnitSlice(String name, LithologyClass lithology, boolean reservoir, double thickness, double clayFraction) {

    public UnitSlice {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("unit name is empty");
        }
        if (lithology == null) {
            throw new IllegalArgumentException("unit '" + name + "': lithology is missing");
        }
        if (!(thickness >= 0) || Double.isInfinite(thickness)) {
            throw new IllegalArgumentException("unit '" + name + "': thickness must be a finite number >= 0, was " + thickness);
        }
        if (!(clayFraction >= 0 && clayFraction <= 1)) {
            throw new IllegalArgumentException("unit '" + name + "': clay fraction must be in [0, 1], was " + clayFraction);
        }
    }
}
