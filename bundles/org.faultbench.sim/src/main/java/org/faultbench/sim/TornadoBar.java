package org.faultbench.sim;

/**
 * One input's effect on a unit's contact depth: the contact with the input at its P90 (low, cumulative 0.10) and at
 * its P10 (high, cumulative 0.90), every other input at its median.
 */
public record TornadoBar(String input, double contactWithLowInput, double contactWithHighInput) {

    /** Absolute change of the contact between the two cases, m. */
    public double swing() {
        double d = contactWithHighInput - contactWithLowInput;
        return Double.isNaN(d) ? 0 : Math.abs(d);
    }
}
