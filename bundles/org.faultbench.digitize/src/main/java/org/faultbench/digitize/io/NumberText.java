package org.faultbench.digitize.io;

import java.math.BigDecimal;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.regex.Pattern;

/**
 * Reading and writing of decimal numbers in exchange files. Parsing accepts plain decimal notation only
 * ({@code -12.5}, {@code .5}, {@code 1.0E+30}); Java's own parser would also take {@code NaN}, {@code Infinity},
 * {@code 1d} or hexadecimal, none of which another program would write or read back.
 */
final class NumberText {
    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

    private NumberText() {
    }

    /** The finite value of {@code token}, or empty when it is not a decimal number or overflows. */
    static OptionalDouble parse(String token) {
        String text = token.trim();
        if (!DECIMAL.matcher(text).matches()) {
            return OptionalDouble.empty();
        }
        double value = Double.parseDouble(text);
        return Double.isFinite(value) ? OptionalDouble.of(value) : OptionalDouble.empty();
    }

    /** Whether {@code token} is a finite decimal number. */
    static boolean isNumber(String token) {
        return parse(token).isPresent();
    }

    /** The shortest text that reads back as exactly {@code value}, without exponent: for header coordinates. */
    static String plain(double value) {
        return BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
    }

    /** {@code value} with {@code decimals} digits after the point: for grid values. */
    static String fixed(double value, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", value);
    }
}
