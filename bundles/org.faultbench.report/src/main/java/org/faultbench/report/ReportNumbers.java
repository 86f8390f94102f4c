package org.faultbench.report;

import java.util.Locale;

/**
 * How the report prints numbers, in one place so that tests format results.json the same way: depths and columns
 * to 0.1 m, volumes to the whole m³ or barrel with thousands separators, shares in per cent. A missing value
 * (no leak point in any realisation) prints as "n/a".
 */
public final class ReportNumbers {
    public static final String MISSING = "n/a";

    private ReportNumbers() {
    }

    /** A depth, column or other length in metres. */
    public static String metres(double value) {
        return Double.isFinite(value) ? String.format(Locale.ROOT, "%.1f", value) : MISSING;
    }

    /** A volume in m³ or barrels. */
    public static String volume(double value) {
        return Double.isFinite(value) ? String.format(Locale.ROOT, "%,.0f", value) : MISSING;
    }

    /** A value of the unit {@code unit} as UnitQuantity names it ("m" or "m3"). */
    public static String quantity(double value, String unit) {
        return "m3".equals(unit) ? volume(value) : metres(value);
    }

    /** A fraction in [0, 1] as per cent with one decimal. */
    public static String percent(double fraction) {
        return Double.isFinite(fraction) ? String.format(Locale.ROOT, "%.1f %%", 100 * fraction) : MISSING;
    }

    /** A plain input number without trailing zeros. */
    public static String plain(double value) {
        if (!Double.isFinite(value)) {
            return MISSING;
        }
        if (value == Math.rint(value) && Math.abs(value) < 1e15) {
            return String.format(Locale.ROOT, "%.0f", value);
        }
        return String.format(Locale.ROOT, "%.6g", value).replaceAll("(\\.\\d*?)0+$", "$1").replaceAll("\\.$", "");
    }
}
