package org.faultbench.core.units;

/** Pressure units met in pressure data and seal calibrations; Faultbench works in pascals internally. */
public enum PressureUnit {
    PASCAL("Pa", 1.0),
    KILOPASCAL("kPa", 1.0e3),
    BAR("bar", 1.0e5),
    MEGAPASCAL("MPa", 1.0e6),
    /**
     * Pound-force per square inch: 0.45359237 kg x 9.80665 m/s^2 / (0.0254 m)^2 = 6894.757... Pa, from the exact
     * definitions of the pound, standard gravity and the inch.
     */
    PSI("psi", 0.45359237 * 9.80665 / (0.0254 * 0.0254));

    private final String symbol;
    private final double pascals;

    PressureUnit(String symbol, double pascals) {
        this.symbol = symbol;
        this.pascals = pascals;
    }

    public String symbol() {
        return symbol;
    }

    public double toPascals(double value) {
        return value * pascals;
    }

    public double fromPascals(double valueInPascals) {
        return valueInPascals / pascals;
    }
}
