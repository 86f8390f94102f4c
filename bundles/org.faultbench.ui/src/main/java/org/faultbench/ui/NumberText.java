package org.faultbench.ui;

import java.util.Locale;

/** How numbers are shown in tables: fixed decimals, a dash for "not available". */
public final class NumberText {
    private NumberText() {
    }

    public static String of(double value, int decimals) {
        return Double.isFinite(value) ? String.format(Locale.ROOT, "%." + decimals + "f", value) : "\u2013";
    }

    public static String percent(double fraction) {
        return Double.isFinite(fraction) ? String.format(Locale.ROOT, "%.0f %%", 100 * fraction) : "\u2013";
    }
}
