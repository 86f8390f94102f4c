package org.faultbench.faults.scaling;

/**
 * A published (or locally fitted) displacement–length scaling law D = c · L^n, maximum displacement D and fault
 * length L both in metres, drawn as a reference line on the D–L plot.
 *
 * @param name label for the plot legend
 * @param c coefficient; NaN when only the exponent is known
 * @param n exponent, &gt; 0
 * @param source citation: authors, year, journal, and any caveat on the constants
 */
public record ScalingLaw(String name, double c, double n, String source) {

    public ScalingLaw {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("scaling law: name is empty");
        }
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException("scaling law '" + name + "': source is empty");
        }
        if (!(c > 0) && !Double.isNaN(c) || Double.isInfinite(c)) {
            throw new IllegalArgumentException("scaling law '" + name + "': coefficient c must be a finite number > 0"
                    + " (or NaN if unknown), was " + c);
        }
        if (!(n > 0) || Double.isInfinite(n)) {
            throw new IllegalArgumentException("scaling law '" + name + "': exponent n must be a finite number > 0,"
                    + " was " + n);
        }
    }

    /** Whether c is known, so that the law gives a displacement and can be drawn as a line. */
    public boolean hasCoefficient() {
        return !Double.isNaN(c);
    }

    /** Maximum displacement (m) the law predicts for fault length {@code length} (m). */
    public double displacementAt(double length) {
        if (!hasCoefficient()) {
            throw new IllegalArgumentException("scaling law '" + name + "' gives only the exponent n = " + n
                    + ", no coefficient, so it predicts no displacement");
        }
        if (!(length > 0) || Double.isInfinite(length)) {
            throw new IllegalArgumentException("scaling law '" + name + "': fault length must be a finite number > 0 m,"
                    + " was " + length);
        }
        return c * Math.pow(length, n);
    }
}
