package org.faultbench.core.uncertain;

import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A one-line text form of an {@link UncertainValue} for table cells, where a geologist types
 * {@code 14}, {@code normal(14, 2)}, {@code triangular(0.20, 0.25, 0.28)}, {@code uniform(3, 7)},
 * {@code lognormal(100, 0.5)} (median, sigma of ln) or {@code normal(14, 2, 0, 30)} (truncated at 0 and 30).
 * Kind names may be shortened to their first letters ({@code n}, {@code tri}, {@code u}, {@code logn}); an open
 * truncation limit is written {@code inf} or {@code -inf}.
 * Parsing and formatting are inverse for every value the format can write.
 */
public final class UncertainValueNotation {

    private UncertainValueNotation() {
    }

    /**
     * Reads {@code text}; the value is checked against {@code bounds} as the model will check it.
     *
     * @throws IllegalArgumentException with a message fit for a status line
     */
    public static UncertainValue parse(String text, Bounds bounds, String field) {
        String t = text == null ? "" : text.trim();
        if (t.isEmpty()) {
            throw new IllegalArgumentException(field + ": enter a number or a distribution such as normal(14, 2)");
        }
        int open = t.indexOf('(');
        UncertainValue value;
        if (open < 0) {
            double fixed = number(t, field);
            if (!Double.isFinite(fixed)) {
                throw new IllegalArgumentException(field + ": '" + t + "' is not a finite number");
            }
            value = UncertainValue.fixed(fixed);
        } else {
            if (!t.endsWith(")")) {
                throw new IllegalArgumentException(field + ": missing ')' in '" + t + "'");
            }
            String kind = t.substring(0, open).trim().toLowerCase(Locale.ROOT);
            List<Double> args = arguments(t.substring(open + 1, t.length() - 1), field);
            value = build(kind, args, field);
        }
        return value.within(bounds, field);
    }

    /** The text {@link #parse} reads back to the same value; truncation equal to {@code bounds} is left implicit. */
    public static String format(UncertainValue value, Bounds bounds) {
        if (value instanceof FixedValue f) {
            return number(f.value());
        }
        if (value instanceof NormalValue n) {
            return "normal(" + number(n.mean()) + ", " + number(n.standardDeviation())
                    + limits(n.lower(), n.upper(), bounds) + ")";
        }
        if (value instanceof TriangularValue tr) {
            return "triangular(" + number(tr.min()) + ", " + number(tr.mode()) + ", " + number(tr.max()) + ")";
        }
        if (value instanceof UniformValue u) {
            return "uniform(" + number(u.min()) + ", " + number(u.max()) + ")";
        }
        LogNormalValue l = (LogNormalValue) value;
        return "lognormal(" + number(l.median()) + ", " + number(l.sigmaLn()) + limits(l.lower(), l.upper(), bounds)
                + ")";
    }

    private static String limits(double lower, double upper, Bounds bounds) {
        boolean implicit = (lower == bounds.min() || lower == Double.NEGATIVE_INFINITY)
                && (upper == bounds.max() || upper == Double.POSITIVE_INFINITY);
        return implicit ? "" : ", " + number(lower) + ", " + number(upper);
    }

    private static UncertainValue build(String kind, List<Double> a, String field) {
        if (matches(kind, "normal", 1)) {
            return arity(a, field, "normal(mean, sd) or normal(mean, sd, min, max)", 2, 4).size() == 2
                    ? UncertainValue.normal(a.get(0), a.get(1))
                    : UncertainValue.truncatedNormal(a.get(0), a.get(1), a.get(2), a.get(3));
        }
        if (matches(kind, "triangular", 3)) {
            arity(a, field, "triangular(min, mode, max)", 3, 3);
            return UncertainValue.triangular(a.get(0), a.get(1), a.get(2));
        }
        if (matches(kind, "uniform", 1)) {
            arity(a, field, "uniform(min, max)", 2, 2);
            return UncertainValue.uniform(a.get(0), a.get(1));
        }
        if (matches(kind, "lognormal", 4)) {
            arity(a, field, "lognormal(median, sigmaLn) or lognormal(median, sigmaLn, min, max)", 2, 4);
            LogNormalValue l = LogNormalValue.ofMedian(a.get(0), a.get(1));
            return a.size() == 2 ? l : new LogNormalValue(l.median(), l.sigmaLn(), a.get(2), a.get(3));
        }
        throw new IllegalArgumentException(field + ": unknown distribution '" + kind
                + "'; use normal, triangular, uniform or lognormal");
    }

    private static boolean matches(String kind, String name, int shortest) {
        return kind.length() >= shortest && name.startsWith(kind);
    }

    private static List<Double> arity(List<Double> args, String field, String usage, int min, int max) {
        if (args.size() < min || args.size() > max || (min == 2 && max == 4 && args.size() == 3)) {
            throw new IllegalArgumentException(field + ": expected " + usage + ", found " + args.size() + " numbers");
        }
        return args;
    }

    private static List<Double> arguments(String inside, String field) {
        List<Double> values = new ArrayList<>();
        for (String part : inside.split("[,;]")) {
            values.add(number(part.trim(), field));
        }
        return values;
    }

    /** A number; "inf" and "-inf" stand for open truncation limits, the only place the model accepts them. */
    private static double number(String text, String field) {
        String t = text.toLowerCase(Locale.ROOT);
        if (t.equals("inf") || t.equals("+inf")) {
            return Double.POSITIVE_INFINITY;
        }
        if (t.equals("-inf")) {
            return Double.NEGATIVE_INFINITY;
        }
        try {
            double v = Double.parseDouble(text);
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException(field + ": '" + text + "' is not a finite number");
            }
            return v;
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(field + ": '" + text + "' is not a number", e);
        }
    }

    private static String number(double v) {
        if (v == Double.POSITIVE_INFINITY) {
            return "inf";
        }
        if (v == Double.NEGATIVE_INFINITY) {
            return "-inf";
        }
        DecimalFormat format = new DecimalFormat("0.##########", DecimalFormatSymbols.getInstance(Locale.ROOT));
        return format.format(v);
    }
}
