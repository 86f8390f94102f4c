package org.faultbench.trap;

/**
 * A point on a bounding fault where the trapped reservoir could leak: a reservoir-reservoir juxtaposition, with the
 * capillary threshold pressure of the fault rock there (0 where nothing seals the window).
 *
 * @param faultId fault identifier
 * @param u distance along strike on the fault, metres
 * @param z depth, metres positive down
 * @param thresholdPressurePa fault-rock threshold (entry) pressure, Pa, &ge; 0
 */
public record LeakCandidate(String faultId, double u, double z, double thresholdPressurePa) {

    public LeakCandidate {
        if (faultId == null || faultId.isBlank()) {
            throw new IllegalArgumentException("leak candidate fault id is empty");
        }
        if (!Double.isFinite(u) || !Double.isFinite(z)) {
            throw new IllegalArgumentException("leak candidate on fault '" + faultId
                    + "': u and z must be finite numbers, was u = " + u + ", z = " + z);
        }
        if (!(thresholdPressurePa >= 0) || Double.isInfinite(thresholdPressurePa)) {
            throw new IllegalArgumentException("leak candidate on fault '" + faultId
                    + "': threshold pressure must be a finite number >= 0 Pa, was " + thresholdPressurePa);
        }
    }
}
