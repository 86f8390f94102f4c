package org.faultbench.faults.qc;

import java.util.Locale;

/**
 * Numbers as QC messages show them: metres to the metre (tenths for non-zero values below 10 m), ratios to three
 * significant digits.
 */
final class Numbers {

    private Numbers() {
    }

    static String metres(double value) {
        return String.format(Locale.ROOT, value != 0 && Math.abs(value) < 10 ? "%.1f m" : "%.0f m", value);
    }

    static String ratio(double value) {
        return String.format(Locale.ROOT, "%.3g", value);
    }
}
