package org.faultbench.digitize.io;

import org.faultbench.core.units.LengthUnit;

/**
 * The length units a file is declared to use. Exchange files carry no units, so the user states them on import and
 * the readers convert to metres; map coordinates and depths often differ (x, y in metres, depths in feet).
 *
 * @param xy unit of the map coordinates x and y and of grid spacings
 * @param z unit of depths, grid values and measured depths
 */
public record FileUnits(LengthUnit xy, LengthUnit z) {
    /** Everything in metres. */
    public static final FileUnits METRES = new FileUnits(LengthUnit.METRE, LengthUnit.METRE);

    public FileUnits {
        if (xy == null || z == null) {
            throw new IllegalArgumentException("file units missing: x/y unit " + xy + ", z unit " + z);
        }
    }

    /** The same unit for x, y and z. */
    public static FileUnits of(LengthUnit unit) {
        return new FileUnits(unit, unit);
    }
}
