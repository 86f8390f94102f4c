package org.faultbench.report.chart;

import java.util.List;

import org.faultbench.core.scale.RoundSteps;

/** Round tick values (1, 2, 2.5 or 5 times a power of ten) covering a range with about the wanted count. */
public final class Ticks {
    private Ticks() {
    }

    public static double step(double min, double max, int wanted) {
        return RoundSteps.atLeast((max - min) / Math.max(1, wanted), 1, 2, 2.5, 5);
    }

    public static List<Double> values(double min, double max, int wanted) {
        return RoundSteps.multiples(min, max, step(min, max, wanted));
    }
}
