package org.faultbench.faults.scaling;

import org.faultbench.faults.profile.ProfileFit;

/**
 * One fault on the D–L plot: its fitted length and maximum displacement, from the horizon with the largest fitted
 * throw.
 *
 * @param faultId id of the fault
 * @param horizon horizon whose profile gave the point
 * @param length fitted tip-to-tip length (m)
 * @param maxThrow absolute fitted maximum throw (m)
 * @param maxDisplacement dip-slip displacement of that throw (m)
 * @param fit the profile fit behind the point
 */
public record DisplacementLengthPoint(String faultId, String horizon, double length, double maxThrow,
        double maxDisplacement, ProfileFit fit) {

    /** D/L of the point. */
    public double ratio() {
        return maxDisplacement / length;
    }

    /** How far the point lies off {@code law}, in orders of magnitude: log10(D / D_law(L)). */
    public double log10Offset(ScalingLaw law) {
        return Math.log10(maxDisplacement / law.displacementAt(length));
    }
}
