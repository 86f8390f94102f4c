package org.faultbench.ui;

import org.faultbench.core.units.LengthUnit;
import org.faultbench.core.units.PressureUnit;
import org.faultbench.core.units.VolumeUnit;
import org.faultbench.ui.preferences.FaultbenchPreferences;

/**
 * The units the user chose to read results in (Window &gt; Preferences &gt; Faultbench). The model works in metres,
 * pascals and cubic metres; views convert only when they show a number, through this class, so every view agrees.
 * Volumes follow the length unit: 10⁶ m³ with metres, 10⁶ bbl (stock-tank barrels) with feet, the habit of each
 * unit system (common practice).
 *
 * @param length unit of depths, thicknesses, columns and distances
 * @param pressure unit of threshold and capillary pressures
 */
public record DisplayUnits(LengthUnit length, PressureUnit pressure) {
    public static final DisplayUnits SI = new DisplayUnits(LengthUnit.METRE, PressureUnit.BAR);
    /** Volumes are shown in millions of the volume unit. */
    private static final double VOLUME_SCALE = 1e-6;

    /** The units stored in the preferences now. */
    public static DisplayUnits current() {
        return FaultbenchPreferences.displayUnits();
    }

    public double length(double metres) {
        return length.fromMetres(metres);
    }

    public String lengthSymbol() {
        return length.symbol();
    }

    /** A length with its unit, e.g. "1234.5 ft"; a dash when not finite. */
    public String lengthText(double metres, int decimals) {
        return NumberText.of(length(metres), decimals) + " " + lengthSymbol();
    }

    public double pressure(double pascals) {
        return pressure.fromPascals(pascals);
    }

    public String pressureSymbol() {
        return pressure.symbol();
    }

    /** A pressure with its unit, e.g. "3.2 bar"; a dash when not finite. */
    public String pressureText(double pascals, int decimals) {
        return NumberText.of(pressure(pascals), decimals) + " " + pressureSymbol();
    }

    public VolumeUnit volumeUnit() {
        return length == LengthUnit.FOOT ? VolumeUnit.BARREL : VolumeUnit.CUBIC_METRE;
    }

    /** A volume in millions of {@link #volumeUnit()}. */
    public double volume(double cubicMetres) {
        return VOLUME_SCALE * volumeUnit().fromCubicMetres(cubicMetres);
    }

    /** Header text of {@link #volume}: "10⁶ m³" or "10⁶ bbl". */
    public String volumeSymbol() {
        return volumeUnit() == VolumeUnit.BARREL ? "10\u2076 bbl" : "10\u2076 m\u00b3";
    }
}
