package org.faultbench.core.units;

/** Length and depth units met in subsurface data; Faultbench works in metres internally. */
public enum LengthUnit {
    METRE("m", 1.0),
    /** International foot, exactly 0.3048 m (not the US survey foot). */
    FOOT("ft", 0.3048);

    private final String symbol;
    private final double metres;

    LengthUnit(String symbol, double metres) {
        this.symbol = symbol;
        this.metres = metres;
    }

    public String symbol() {
        return symbol;
    }

    public double toMetres(double value) {
        return value * metres;
    }

    public double fromMetres(double valueInMetres) {
        return valueInMetres / metres;
    }
}
