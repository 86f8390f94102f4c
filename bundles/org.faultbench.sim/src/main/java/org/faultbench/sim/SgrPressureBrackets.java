package org.faultbench.sim;

import org.faultbench.seal.SgrPressureModel;

/**
 * The threshold pressures of a pressure model that never falls as SGR rises, tabulated every 0.1 % SGR from 0 to
 * 100 %: the values at the grid points on either side of an SGR bracket the model's value there. Comparing a
 * free-water level against a depth then mostly needs no evaluation of the model (a power of ten for the Bretan
 * envelope), and never a wrong answer.
 */
final class SgrPressureBrackets {
    private static final int STEPS_PER_PERCENT = 10;
    private static final int STEPS = 100 * STEPS_PER_PERCENT;

    private final double[] sgr = new double[STEPS + 1];
    private final double[] pressure = new double[STEPS + 1];

    /** @param model a model whose pressure is nondecreasing in SGR, in floating point too */
    SgrPressureBrackets(SgrPressureModel model, double burialDepth) {
        for (int k = 0; k <= STEPS; k++) {
            sgr[k] = k / (double) STEPS_PER_PERCENT;
            pressure[k] = model.thresholdPressure(sgr[k], burialDepth);
        }
    }

    /** The grid step k with sgr(k) &le; value &le; sgr(k + 1); -1 for a value outside [0, 100] %. */
    int step(double value) {
        if (!(value >= 0 && value <= 100)) {
            return -1;
        }
        int k = Math.min((int) (value * STEPS_PER_PERCENT), STEPS - 1);
        // the product may round across a grid point: settle k against the tabulated grid values themselves
        while (sgr[k] > value) {
            k--;
        }
        while (sgr[k + 1] < value) {
            k++;
        }
        return k;
    }

    /** The SGR at the upper end of step k. */
    double stepEnd(int step) {
        return sgr[step + 1];
    }

    /** The pressure at the lower end of step k: at most the model's value anywhere in the step. */
    double low(int step) {
        return pressure[step];
    }

    /** The pressure at the upper end of step k: at least the model's value anywhere in the step. */
    double high(int step) {
        return pressure[step + 1];
    }
}
