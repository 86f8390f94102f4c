package org.faultbench.digitize.io;

/**
 * The sign convention of the depths in a file. Faultbench depths are positive downward (TVDSS); files exported as
 * elevations are negative downward and must be flipped on import, which the user declares because a file cannot say.
 */
public enum DepthSign {
    /** Depths below the datum are positive (TVDSS): kept as they are. */
    POSITIVE_DOWN,
    /** Elevations: depths below the datum are negative and their sign is flipped. */
    NEGATIVE_DOWN;

    /** The positive-down depth of a value written in this convention. */
    public double toDepth(double value) {
        return this == POSITIVE_DOWN ? value : 0.0 - value;
    }
}
