package org.faultbench.sim;

import org.apache.commons.math3.random.AbstractRandomGenerator;

/**
 * A "random" generator that plays back chosen uniform values: the median (0.5) for every draw except one moved to a
 * chosen probability. Fed to {@link InputSampler} it gives the base case (every input at its P50) and the
 * one-at-a-time low and high cases of a tornado analysis.
 */
final class ScriptedUniforms extends AbstractRandomGenerator {
    private final int movedDraw;
    private final double movedTo;
    private int next;

    private ScriptedUniforms(int movedDraw, double movedTo) {
        this.movedDraw = movedDraw;
        this.movedTo = movedTo;
    }

    /** Every input at its median. */
    static ScriptedUniforms medians() {
        return new ScriptedUniforms(-1, 0.5);
    }

    /** Every input at its median except draw {@code draw}, which sits at cumulative probability {@code p}. */
    static ScriptedUniforms moving(int draw, double p) {
        return new ScriptedUniforms(draw, p);
    }

    @Override
    public void setSeed(long seed) {
        next = 0;
    }

    @Override
    public double nextDouble() {
        return next++ == movedDraw ? movedTo : 0.5;
    }
}
