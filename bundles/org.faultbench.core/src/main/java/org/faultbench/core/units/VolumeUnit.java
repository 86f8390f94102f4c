package org.faultbench.core.units;

/** Volume units for in-place volumes; Faultbench works in cubic metres internally. */
public enum VolumeUnit {
    CUBIC_METRE("m3", 1.0),
    /**
     * Oil barrel of 42 US gallons of 231 cubic inches: 42 x 231 x 0.0254^3 = 0.158987294928 m3 exactly. A stock-tank
     * barrel (STB) is this barrel measured at stock-tank conditions.
     */
    BARREL("bbl", 42 * 231 * 0.0254 * 0.0254 * 0.0254);

    private final String symbol;
    private final double cubicMetres;

    VolumeUnit(String symbol, double cubicMetres) {
        this.symbol = symbol;
        this.cubicMetres = cubicMetres;
    }

    public String symbol() {
        return symbol;
    }

    public double toCubicMetres(double value) {
        return value * cubicMetres;
    }

    public double fromCubicMetres(double valueInCubicMetres) {
        return valueInCubicMetres / cubicMetres;
    }
}
