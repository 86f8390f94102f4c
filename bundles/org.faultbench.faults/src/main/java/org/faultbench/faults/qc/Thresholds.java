package org.faultbench.faults.qc;

/** Checks of the thresholds rules are configured with, so a bad setting fails with a message naming it. */
final class Thresholds {

    private Thresholds() {
    }

    static double nonNegative(String rule, String name, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException("QC rule '" + rule + "': " + name + " must be a finite number >= 0, was "
                    + value);
        }
        return value;
    }

    static double fraction(String rule, String name, double value) {
        if (!(value > 0 && value < 1)) {
            throw new IllegalArgumentException("QC rule '" + rule + "': " + name + " must be in (0, 1), was " + value);
        }
        return value;
    }
}
