package org.faultbench.faults.profile;

import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Wall;

/**
 * The footwall and hanging-wall cut-off lines of one horizon on one fault: the unit from which throw is read and
 * whose order with other horizons QC checks.
 */
public record CutOffPair(CutOffLine footwall, CutOffLine hangingWall) {

    public CutOffPair {
        if (footwall == null || hangingWall == null) {
            throw new IllegalArgumentException("cut-off pair: the " + (footwall == null ? "footwall" : "hanging-wall")
                    + " cut-off line is missing");
        }
        if (footwall.wall() != Wall.FOOTWALL || hangingWall.wall() != Wall.HANGING_WALL) {
            throw new IllegalArgumentException("cut-off pair of horizon '" + footwall.horizon() + "': expected a"
                    + " footwall then a hanging-wall line, got " + footwall.wall() + " and " + hangingWall.wall());
        }
        if (!footwall.horizon().equals(hangingWall.horizon())) {
            throw new IllegalArgumentException("cut-off pair: footwall line is of horizon '" + footwall.horizon()
                    + "' but hanging-wall line of horizon '" + hangingWall.horizon() + "'");
        }
        if (!footwall.faultId().equals(hangingWall.faultId())) {
            throw new IllegalArgumentException("cut-off pair of horizon '" + footwall.horizon() + "': footwall line is"
                    + " on fault '" + footwall.faultId() + "' but hanging-wall line on fault '"
                    + hangingWall.faultId() + "'");
        }
    }

    public String horizon() {
        return footwall.horizon();
    }

    public String faultId() {
        return footwall.faultId();
    }

    /** Cut-off line of {@code wall}. */
    public CutOffLine line(Wall wall) {
        return wall == Wall.FOOTWALL ? footwall : hangingWall;
    }

    public ThrowProfile throwProfile() {
        return ThrowProfile.of(this);
    }
}
