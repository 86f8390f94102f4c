package org.faultbench.report.chart;

import java.util.ArrayList;
import java.util.List;

/** Round tick values (1, 2, 2.5 or 5 times a power of ten) covering a range with about the wanted count. */
public final class Ticks {
    private Ticks() {
    }

    public static double step(double min, double max, int wanted) {
        double raw = (max - min) / Math.max(1, wanted);
        if (!(raw > 0) || Double.isInfinite(raw)) {
            return 1;
        }
        double power = Math.pow(10, Math.floor(Math.log10(raw)));
        for (double m : new double[] { 1, 2, 2.5, 5, 10 }) {
            if (m * power >= raw) {
                return m * power;
            }
        }
        return 10 * power;
    }

    public static List<Double> values(double min, double max, int wanted) {
        double step = step(min, max, wanted);
        List<Double> ticks = new ArrayList<>();
        for (double v = Math.ceil(min / step - 1e-9) * step; v <= max + 1e-9 * step; v += step) {
            ticks.add(Math.abs(v) < 1e-9 * step ? 0 : v);
        }
        return ticks;
    }
}
