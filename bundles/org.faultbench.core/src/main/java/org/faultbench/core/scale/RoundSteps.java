package org.faultbench.core.scale;

import java.util.ArrayList;
import java.util.List;

/**
 * Round steps for axis ticks, contour intervals and scale bars: a mantissa from a short list times a power of ten
 * (Heckbert 1990, "Nice numbers for graph labels", Graphics Gems, 61&ndash;63: 1, 2 and 5; from memory), and the
 * multiples of such a step within a range. The workbench plots and the report charts both label their axes with it,
 * so a number reads the same on screen and on paper.
 */
public final class RoundSteps {
    private RoundSteps() {
    }

    /**
     * The smallest step m &middot; 10<sup>k</sup> &ge; {@code rough}, m one of {@code mantissas} (ascending, in
     * [1, 10)) or 10; 1 when {@code rough} is not a positive finite number.
     */
    public static double atLeast(double rough, double... mantissas) {
        if (!(rough > 0) || Double.isInfinite(rough)) {
            return 1;
        }
        double power = Math.pow(10, Math.floor(Math.log10(rough)));
        for (double m : mantissas) {
            if (m * power >= rough) {
                return m * power;
            }
        }
        return 10 * power;
    }

    /**
     * The multiples of {@code step} from {@code min} to {@code max}, both ends included within a billionth of a step
     * (so that rounding in the range does not drop an end tick), with zero written as 0, not as &minus;0 or a
     * rounding remainder.
     */
    public static List<Double> multiples(double min, double max, double step) {
        if (!(step > 0) || Double.isInfinite(step)) {
            throw new IllegalArgumentException("tick step " + step + " is not a positive finite number");
        }
        List<Double> values = new ArrayList<>();
        for (double v = Math.ceil(min / step - 1e-9) * step; v <= max + 1e-9 * step; v += step) {
            values.add(Math.abs(v) < 1e-9 * step ? 0 : v);
        }
        return values;
    }
}
